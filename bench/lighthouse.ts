/**
 * `npm run bench -- lighthouse`: Lighthouse 12.2.3's performance category for the sign-in page and the demo
 * study's page, as `npm start` serves them (client built if stale, real server and demo data on loopback,
 * throw-away PostgreSQL), in Debian's Chromium. Both of Lighthouse's own settings are run: its default (a
 * mid-range phone on a slow 4G link, simulated) and its desktop preset. Scores are 0–100; the metrics in ms.
 */
import { createRequire } from 'node:module';
import os from 'node:os';
import * as chromeLauncher from 'chrome-launcher'; // Lighthouse's own launcher, installed with it
import lighthouse, { desktopConfig, type Config } from 'lighthouse';
import { DEMO_USERS } from '../server/seed/accounts.ts';
import { signIn } from './load.ts';
import { startBenchServer } from './bench-server.ts';


export async function run(): Promise<void> {
  const server = await startBenchServer('lighthouse', { client: true });
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    chromeFlags: ['--headless=new', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    const url = server.url;
    const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!;
    const session = await signIn(url, engineer.email, engineer.password);
    const studies = (await (await fetch(`${url}/api/studies`, { headers: { cookie: session.cookie } })).json()) as { id: string }[];
    let studyId = studies[0]?.id;
    for (const s of studies) {
      const sweeps = (await (await fetch(`${url}/api/studies/${s.id}/sweeps`, { headers: { cookie: session.cookie } })).json()) as { status: string }[];
      if (sweeps.some((w) => w.status === 'done')) studyId = s.id;
    }
    const pages: [string, string, Record<string, string>][] = [
      ['sign-in', `${url}/sign-in`, {}],
      ['study (demo, signed in)', `${url}/studies/${studyId}`, { Cookie: session.cookie }],
    ];
    const settings: [string, Config | undefined][] = [
      ['mobile (default)', undefined],
      ['desktop', desktopConfig],
    ];
    const rows = [];
    for (const [name, pageUrl, headers] of pages) {
      for (const [preset, config] of settings) {
        const result = await lighthouse(pageUrl, { port: chrome.port, output: 'json', logLevel: 'error', onlyCategories: ['performance'], extraHeaders: headers }, config);
        if (!result) throw new Error(`Lighthouse returned nothing for ${pageUrl}`);
        const { lhr } = result;
        if (lhr.runtimeError) throw new Error(`Lighthouse on ${pageUrl} (${preset}): ${lhr.runtimeError.message}`);
        const ms = (id: string) => Math.round(lhr.audits[id]?.numericValue ?? NaN);
        rows.push({
          page: name,
          settings: preset,
          score: Math.round((lhr.categories.performance?.score ?? NaN) * 100),
          'FCP ms': ms('first-contentful-paint'),
          'LCP ms': ms('largest-contentful-paint'),
          'TBT ms': ms('total-blocking-time'),
          CLS: +(lhr.audits['cumulative-layout-shift']?.numericValue ?? NaN).toFixed(3),
          'SI ms': ms('speed-index'),
          'final URL': new URL(lhr.finalDisplayedUrl).pathname,
        });
      }
    }
    process.stdout.write(`Lighthouse ${(createRequire(import.meta.url)('lighthouse/package.json') as { version: string }).version}, ${os.cpus().length} CPUs, load ${os.loadavg().map((l) => l.toFixed(2)).join(' ')}\n`);
    console.table(rows);
  } finally {
    chrome.kill();
    await server.stop();
  }
}
