/**
 * `npm run bench -- load [--connections 16] [--seconds 10]`: a throw-away PostgreSQL and a real server with
 * the demo data on loopback, N signed-in clients (one session each, on their own connection) and autocannon
 * driving three scenarios for a bounded time each: trade-table design pages, per-point result pages and
 * candidate evaluations. Prints requests per second and p50/p95/p99 latency per scenario, then stops.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { loadConfig } from '../server/config.ts';
import { startCluster } from '../server/db/cluster.ts';
import { freePort } from '../server/db/free-port.ts';
import { startServer } from '../server/index.ts';
import { DEMO_USERS } from '../server/seed/accounts.ts';

/** The slice of autocannon's API used here (the package ships no types). */
interface AutocannonClient {
  setHeaders(headers: Record<string, string>): void;
}
interface AutocannonRequest {
  method?: string;
  path?: string;
  headers?: Record<string, string>;
  body?: string;
}
interface AutocannonOptions {
  url: string;
  connections: number;
  duration: number;
  method?: string;
  body?: string;
  headers?: Record<string, string>;
  requests?: { setupRequest?: (req: AutocannonRequest) => AutocannonRequest }[];
  setupClient?: (client: AutocannonClient) => void;
}
interface AutocannonResult {
  requests: { total: number; average: number };
  non2xx: number;
  errors: number;
  timeouts: number;
  duration: number;
}
interface AutocannonInstance extends Promise<AutocannonResult> {
  on(event: 'response', cb: (client: unknown, status: number, bytes: number, ms: number) => void): void;
}
const autocannon = createRequire(import.meta.url)('autocannon') as (o: AutocannonOptions) => AutocannonInstance;

interface Session {
  cookie: string;
  csrf: string;
}

function args(argv: string[]): { connections: number; seconds: number } {
  const get = (name: string, fallback: number) => {
    const i = argv.indexOf(`--${name}`);
    const v = i >= 0 ? Number(argv[i + 1]) : fallback;
    if (!Number.isInteger(v) || v < 1 || v > 1000) throw new Error(`--${name}: must be an integer from 1 to 1000`);
    return v;
  };
  return { connections: get('connections', 16), seconds: get('seconds', 10) };
}

/** Cookie jar of one client: the latest value of every cookie set so far. */
function merge(jar: Map<string, string>, res: Response): void {
  for (const line of res.headers.getSetCookie()) {
    const [pair = ''] = line.split(';');
    const eq = pair.indexOf('=');
    if (eq > 0) jar.set(pair.slice(0, eq).trim(), pair.slice(eq + 1).trim());
  }
}

async function signIn(url: string, email: string, password: string): Promise<Session> {
  const jar = new Map<string, string>();
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrf = async () => {
    const res = await fetch(`${url}/api/auth/csrf`, { headers: { cookie: cookie() } });
    merge(jar, res);
    return ((await res.json()) as { token: string }).token;
  };
  const login = await fetch(`${url}/api/auth/login`, {
    method: 'POST',
    headers: { cookie: cookie(), 'content-type': 'application/json', 'x-csrf-token': await csrf() },
    body: JSON.stringify({ email, password }),
  });
  if (login.status !== 200) throw new Error(`sign-in answered ${login.status}: ${await login.text()}`);
  merge(jar, login);
  const token = await csrf(); // bound to the session id that sign-in rotated
  return { cookie: cookie(), csrf: token };
}

async function getJson<T>(url: string, session: Session): Promise<T> {
  const res = await fetch(url, { headers: { cookie: session.cookie } });
  if (!res.ok) throw new Error(`GET ${url} answered ${res.status}`);
  return (await res.json()) as T;
}

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))] ?? NaN;

interface Scenario {
  name: string;
  method: 'GET' | 'POST';
  /** Paths visited in turn, so the pages differ as a user's would. */
  paths: string[];
  body?: string;
}

async function drive(url: string, sessions: Session[], s: Scenario, connections: number, seconds: number) {
  let next = 0;
  let visit = 0;
  const latencies: number[] = [];
  const instance = autocannon({
    url,
    connections,
    duration: seconds,
    method: s.method,
    body: s.body,
    headers: { 'content-type': 'application/json' },
    // One signed-in session per connection.
    setupClient: (client) => {
      const session = sessions[next++ % sessions.length]!;
      client.setHeaders({ cookie: session.cookie, 'x-csrf-token': session.csrf, 'content-type': 'application/json' });
    },
    requests: [{ setupRequest: (req) => ({ ...req, path: s.paths[visit++ % s.paths.length] }) }],
  });
  instance.on('response', (_c, _status, _bytes, ms) => latencies.push(ms));
  const result = await instance;
  latencies.sort((a, b) => a - b);
  return {
    scenario: s.name,
    requests: result.requests.total,
    'req/s': Math.round(result.requests.total / seconds),
    'p50 ms': +percentile(latencies, 50).toFixed(1),
    'p95 ms': +percentile(latencies, 95).toFixed(1),
    'p99 ms': +percentile(latencies, 99).toFixed(1),
    'non-2xx': result.non2xx,
    errors: result.errors + result.timeouts,
  };
}

export async function run(argv: string[]): Promise<void> {
  const { connections, seconds } = args(argv);
  const dir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-bench-load-'));
  const cluster = await startCluster({ dataDir: dir, port: await freePort(), database: 'lobewise_bench', durable: false });
  const server = await startServer(
    loadConfig({ NODE_ENV: 'production', DATABASE_URL: cluster.url, PORT: '0', SMTP_FAKE_PORT: '0', LOG_LEVEL: 'warn', SESSION_SECRET: 'bench-secret-0123456789abcdef' }),
  );
  try {
    const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!;
    const sessions: Session[] = [];
    for (let i = 0; i < connections; i++) sessions.push(await signIn(server.url, engineer.email, engineer.password));

    const studies = await getJson<{ id: string }[]>(`${server.url}/api/studies`, sessions[0]!);
    let sweep: { id: string; pointsTotal: number; designsTotal: number } | undefined;
    for (const study of studies) {
      const sweeps = await getJson<{ id: string; status: string; pointsTotal: number; designsTotal: number }[]>(`${server.url}/api/studies/${study.id}/sweeps`, sessions[0]!);
      sweep = sweeps.find((x) => x.status === 'done') ?? sweep;
    }
    if (!sweep) throw new Error('the demo data has no finished sweep to read');
    const pages = (kind: 'designs' | 'results', total: number, sorts: string[]) =>
      Array.from({ length: 12 }, (_, i) => {
        const offset = ((i * 37) % Math.max(1, Math.floor(total / 50))) * 50;
        const sort = sorts[i % sorts.length];
        const filter = i % 3 === 0 ? '&filter[nx]=4..64' : '';
        return `/api/sweeps/${sweep!.id}/${kind}?offset=${offset}&limit=50${sort ? `&sort=${sort}` : ''}${filter}`;
      });
    const design = { frequencyGHz: 28, nx: 8, ny: 4, dxMm: 5.35, taperX: { kind: 'taylor', sllDb: 25, nbar: 4 }, phaseBits: 6, element: { kind: 'cosine', q: 1.5 }, steerAzDeg: 30, channelPowerDbm: 10 };
    const scenarios: Scenario[] = [
      { name: 'trade table: GET designs page', method: 'GET', paths: pages('designs', sweep.designsTotal, ['scanLossEdgeDb:asc', 'worstSllDb:desc', 'nx:asc', '']) },
      { name: 'points: GET results page', method: 'GET', paths: pages('results', sweep.pointsTotal, ['scanLossDb:asc', 'eirpDbm:desc', '']) },
      { name: 'POST /api/evaluate (8×4 design)', method: 'POST', paths: ['/api/evaluate'], body: JSON.stringify(design) },
    ];
    process.stdout.write(
      `${connections} signed-in clients, ${seconds} s per scenario; demo sweep ${sweep.designsTotal} designs / ${sweep.pointsTotal} points; ${os.cpus().length} CPUs\n`,
    );
    const rows = [];
    for (const s of scenarios) rows.push(await drive(server.url, sessions, s, connections, seconds));
    console.table(rows);
  } finally {
    await server.close();
    await cluster.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}
