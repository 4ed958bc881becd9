/**
 * `npm run bench -- pages`: what each page of the app costs a first-time visitor. Builds the client if stale
 * (as `npm start` does), serves it with the real server and demo data against a throw-away PostgreSQL, and
 * opens every page in Debian's Chromium with an empty cache, counting the bytes that went over the wire
 * (headers plus body as sent, so after brotli or gzip) until the network is quiet. Scripts and styles are
 * reported apart from the rest (fonts, images, API answers).
 */
import os from 'node:os';
import { chromium, type Browser, type BrowserContext } from 'playwright-core';
import { DEMO_USERS } from '../server/seed/accounts.ts';
import { startBenchServer } from './bench-server.ts';

const kB = (n: number) => +(n / 1000).toFixed(1);

interface Visit {
  page: string;
  'scripts+styles kB': number;
  'scripts+styles files': number;
  'all kB': number;
  requests: number;
  'uncompressed scripts+styles kB': number;
  'console errors': number;
}

/** Console errors seen while measuring (a missing AG Grid module, say), printed after the table. */
const consoleErrors: string[] = [];

/** Opens one path in a fresh context (empty HTTP cache) and totals what was transferred until the network is idle. */
async function measure(browser: Browser, storageState: Awaited<ReturnType<BrowserContext['storageState']>> | undefined, url: string, name: string, ready = 'h1'): Promise<Visit> {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, storageState });
  const page = await context.newPage();
  let errors = 0;
  page.on('console', (msg) => {
    // The signed-out pages ask who is signed in and get the expected 401.
    if (msg.type() !== 'error' || /status of 401/.test(msg.text())) return;
    errors++;
    consoleErrors.push(`${name}: ${msg.text().slice(0, 300)}`);
  });
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
  const types = new Map<string, string>();
  const decoded = new Map<string, number>();
  let code = 0;
  let codeFiles = 0;
  let codeDecoded = 0;
  let all = 0;
  let requests = 0;
  cdp.on('Network.responseReceived', (e) => types.set(e.requestId, e.type));
  cdp.on('Network.dataReceived', (e) => decoded.set(e.requestId, (decoded.get(e.requestId) ?? 0) + e.dataLength));
  cdp.on('Network.loadingFinished', (e) => {
    requests++;
    all += e.encodedDataLength; // headers + body as sent
    const type = types.get(e.requestId);
    if (type === 'Script' || type === 'Stylesheet') {
      code += e.encodedDataLength;
      codeFiles++;
      codeDecoded += decoded.get(e.requestId) ?? 0;
    }
  });
  await page.goto(url, { waitUntil: 'load' });
  // The page's own content first (a busy machine can pause the network between the lazy chunks), then quiet.
  await page.locator(ready).first().waitFor({ timeout: 60_000 });
  await page.waitForLoadState('networkidle');
  await context.close();
  return { page: name, 'scripts+styles kB': kB(code), 'scripts+styles files': codeFiles, 'all kB': kB(all), requests, 'uncompressed scripts+styles kB': kB(codeDecoded), 'console errors': errors };
}

export async function run(): Promise<void> {
  const server = await startBenchServer('pages', { client: true });
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    const url = server.url;
    // Sign in once through the real page; every measured visit starts from that cookie with an empty cache.
    const admin = DEMO_USERS.find((u) => u.role === 'admin')!;
    const signIn = await browser.newContext();
    const page = await signIn.newPage();
    await page.goto(`${url}/sign-in`);
    await page.getByLabel('E-mail').fill(admin.email);
    await page.getByLabel('Password').fill(admin.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Studies', level: 1 }).waitFor();
    const studies = (await (await page.request.get(`${url}/api/studies`)).json()) as { id: string }[];
    let studyId = studies[0]?.id;
    for (const s of studies) {
      const sweeps = (await (await page.request.get(`${url}/api/studies/${s.id}/sweeps`)).json()) as { status: string }[];
      if (sweeps.some((w) => w.status === 'done')) studyId = s.id;
    }
    const state = await signIn.storageState();
    await signIn.close();

    const rows: Visit[] = [];
    const signedOut: [string, string, string?][] = [
      ['sign-in', '/sign-in'],
      ['forgot password', '/forgot-password'],
      ['not found', '/no/such/page', '.ant-result-title'],
    ];
    for (const [name, p, ready] of signedOut) rows.push(await measure(browser, undefined, `${url}${p}`, `${name} (signed out)`, ready));
    const signedIn: [string, string, string?][] = [
      ['studies', '/'],
      ['study (demo)', `/studies/${studyId}`, '[role=tab]'],
      ['review packet', `/studies/${studyId}/packet`],
      ['account', '/account'],
      ['team', '/team'],
      ['outbox', '/outbox'],
    ];
    for (const [name, p, ready] of signedIn) rows.push(await measure(browser, state, `${url}${p}`, name, ready));
    process.stdout.write(`first visit of each page, empty cache, as served by \`npm start\` (${os.cpus().length} CPUs, load ${os.loadavg().map((l) => l.toFixed(2)).join(' ')})\n`);
    console.table(rows);
    for (const e of consoleErrors) process.stdout.write(`console error on ${e}\n`);
  } finally {
    await browser.close();
    await server.stop();
  }
}
