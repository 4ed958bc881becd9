/**
 * `npm run bench -- load [--connections 16] [--seconds 10]`: a throw-away PostgreSQL and a real server with
 * the demo data on loopback, N signed-in clients (one session each, on their own connection) and autocannon
 * driving four scenarios for a bounded time each: the signed-in `GET /api/me` (the cost of the stack itself),
 * trade-table design pages, per-point result pages and candidate evaluations. The load comes from a worker
 * thread (bench/load-driver.mjs), so the server's event loop is not also the load generator's. Prints requests
 * per second and p50/p95/p99 latency per scenario (each after a 2 s warm-up that is not counted), then stops. `--profile DIR` writes a CPU profile of the
 * server's thread while the load runs (open it in Chrome DevTools or speedscope).
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { Session as Inspector } from 'node:inspector/promises';
import os from 'node:os';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { DEMO_USERS } from '../server/seed/accounts.ts';
import { startBenchServer } from './bench-server.ts';

/** Seconds each scenario runs unmeasured before its measured run. */
const WARMUP_SECONDS = 2;

interface Session {
  cookie: string;
  csrf: string;
}

interface Scenario {
  name: string;
  method: 'GET' | 'POST';
  /** Paths visited in turn, so the pages differ as a user's would. */
  paths: string[];
  body?: string;
}

/** One row of the table, as bench/load-driver.mjs posts it. */
type DriveResult = Record<'requests' | 'req/s' | 'p50 ms' | 'p95 ms' | 'p99 ms' | 'non-2xx' | 'errors', number> & { scenario: string };

function args(argv: string[]): { connections: number; seconds: number; profile?: string } {
  const get = (name: string, fallback: number) => {
    const i = argv.indexOf(`--${name}`);
    const v = i >= 0 ? Number(argv[i + 1]) : fallback;
    if (!Number.isInteger(v) || v < 1 || v > 1000) throw new Error(`--${name}: must be an integer from 1 to 1000`);
    return v;
  };
  const p = argv.indexOf('--profile');
  return { connections: get('connections', 16), seconds: get('seconds', 10), profile: p >= 0 ? argv[p + 1] : undefined };
}

/** Cookie jar of one client: the latest value of every cookie set so far. */
function merge(jar: Map<string, string>, res: Response): void {
  for (const line of res.headers.getSetCookie()) {
    const [pair = ''] = line.split(';');
    const eq = pair.indexOf('=');
    if (eq > 0) jar.set(pair.slice(0, eq).trim(), pair.slice(eq + 1).trim());
  }
}

/** Signs in through the API as a browser would (CSRF token, then the rotated session's token); also used by bench lighthouse. */
export async function signIn(url: string, email: string, password: string): Promise<Session> {
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

/**
 * CPU time the server's main thread has used, in ms (Linux: /proc, user + system, 10 ms ticks). Divided by the
 * requests served it gives the stack's cost per request, which moves far less with the machine's load than
 * latency does (the load generator runs on another thread and is not counted).
 */
function serverThreadCpuMs(): number {
  try {
    const stat = readFileSync(`/proc/${process.pid}/task/${process.pid}/stat`, 'utf8');
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    return (Number(fields[11]) + Number(fields[12])) * 10;
  } catch {
    return NaN;
  }
}

/** One scenario driven from a worker thread; resolves with its row. */
function drive(url: string, sessions: Session[], scenario: Scenario, connections: number, seconds: number): Promise<DriveResult> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./load-driver.mjs', import.meta.url), { workerData: { url, sessions, scenario, connections, seconds } });
    worker.once('message', (row: DriveResult) => resolve(row));
    worker.once('error', reject);
    worker.once('exit', (code) => (code === 0 ? undefined : reject(new Error(`load driver exited ${code}`))));
  });
}

export async function run(argv: string[]): Promise<void> {
  const { connections, seconds, profile } = args(argv);
  // The N clients stand for N people but share one demo account: let each have its one evaluation open.
  const server = await startBenchServer('load', { env: { HEAVY_REQUESTS_PER_USER: String(Math.min(64, connections)) } });
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
        // Half the design pages judged over a scan window, as the trade table asks when the study has a target sheet.
        const window = kind === 'designs' && i % 2 === 1 ? '&scanAz=-45..45' : '';
        return `/api/sweeps/${sweep!.id}/${kind}?offset=${offset}&limit=50${sort ? `&sort=${sort}` : ''}${filter}${window}`;
      });
    const design = { frequencyGHz: 28, nx: 8, ny: 4, dxMm: 5.35, taperX: { kind: 'taylor', sllDb: 25, nbar: 4 }, phaseBits: 6, element: { kind: 'cosine', q: 1.5 }, steerAzDeg: 30, channelPowerDbm: 10 };
    const scenarios: Scenario[] = [
      { name: 'GET /api/me (signed in)', method: 'GET', paths: ['/api/me'] },
      { name: 'trade table: GET designs page', method: 'GET', paths: pages('designs', sweep.designsTotal, ['scanLossEdgeDb:asc', 'worstSllDb:desc', 'nx:asc', '']) },
      { name: 'points: GET results page', method: 'GET', paths: pages('results', sweep.pointsTotal, ['scanLossDb:asc', 'eirpDbm:desc', '']) },
      { name: 'POST /api/evaluate (8×4 design)', method: 'POST', paths: ['/api/evaluate'], body: JSON.stringify(design) },
    ];
    process.stdout.write(
      `${connections} signed-in clients, ${seconds} s per scenario; demo sweep ${sweep.designsTotal} designs / ${sweep.pointsTotal} points; ${os.cpus().length} CPUs\n`,
    );
    const inspector = profile ? new Inspector() : undefined;
    if (inspector) {
      inspector.connect();
      await inspector.post('Profiler.enable');
      await inspector.post('Profiler.start');
    }
    const rows = [];
    for (const s of scenarios) {
      // A short unmeasured run first, so the scenario that happens to go first does not also pay for the JIT
      // and the cold caches (common benchmarking practice).
      await drive(server.url, sessions, s, connections, WARMUP_SECONDS);
      const cpu0 = serverThreadCpuMs();
      const row = await drive(server.url, sessions, s, connections, seconds);
      rows.push({ ...row, 'server CPU ms/req': +((serverThreadCpuMs() - cpu0) / Math.max(1, row.requests)).toFixed(2) });
    }
    if (inspector && profile) {
      const { profile: cpu } = await inspector.post('Profiler.stop');
      mkdirSync(profile, { recursive: true });
      const file = path.join(profile, `load-${Date.now()}.cpuprofile`);
      writeFileSync(file, JSON.stringify(cpu));
      process.stdout.write(`CPU profile of the server thread: ${file}\n`);
    }
    process.stdout.write(`load average ${os.loadavg().map((l) => l.toFixed(2)).join(' ')}\n`);
    console.table(rows);
  } finally {
    await server.stop();
  }
}
