/**
 * `npm run bench -- health`: /api/health latency while one user sends the largest request the limits allow.
 * A throw-away PostgreSQL and a real server with the default limits (REQUEST_WORK_BUDGET, body size); the heavy
 * requests are POST /api/evaluate lists filling the whole work budget: 8×8 designs (the most designs, so the
 * most validation on the event loop) and 64×64 designs (the most work per design). A probe asks for
 * /api/health every 50 ms while each runs and prints p50 / p95 / max latency next to the heavy request's time.
 */
import os from 'node:os';
import { DEMO_USERS } from '../server/seed/accounts.ts';
import { patternWork } from '../shared/compute/pattern-work.ts';
import { signIn } from './load.ts';
import { startBenchServer } from './bench-server.ts';

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))] ?? NaN;
};

export async function run(): Promise<void> {
  const server = await startBenchServer('health');
  const config = server.config;
  try {
    const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!;
    const session = await signIn(server.url, engineer.email, engineer.password);
    const budget = config.REQUEST_WORK_BUDGET;
    const lists = [
      { name: '8×8 designs', nx: 8 },
      { name: '64×64 designs', nx: 64 },
    ].map(({ name, nx }) => {
      const n = Math.floor(budget / patternWork({ nx, ny: nx }));
      // Pitch differs per design, so no geometry is shared between them.
      return { name: `${n} ${name}`, body: JSON.stringify(Array.from({ length: n }, (_, i) => ({ frequencyGHz: 28, nx, ny: nx, dxMm: 5 + i * 1e-4, dyMm: 5.2, steerAzDeg: i % 50, phaseBits: 6 }))) };
    });
    const rows = [];
    for (const { name, body } of lists) {
      const t0 = performance.now();
      let done = 0;
      const heavy = fetch(`${server.url}/api/evaluate`, { method: 'POST', headers: { cookie: session.cookie, 'x-csrf-token': session.csrf, 'content-type': 'application/json' }, body }).then(async (res) => {
        await res.arrayBuffer();
        done = performance.now();
        return res.status;
      });
      const latencies: number[] = [];
      while (done === 0) {
        const s = performance.now();
        await (await fetch(`${server.url}/api/health`)).arrayBuffer();
        latencies.push(performance.now() - s);
        await new Promise((r) => setTimeout(r, 50));
      }
      const status = await heavy;
      rows.push({
        'heavy request': name, status, 'body MB': +(body.length / 1e6).toFixed(2), 'heavy s': +((done - t0) / 1000).toFixed(1),
        'health probes': latencies.length, 'health p50 ms': +quantile(latencies, 0.5).toFixed(1), 'health p95 ms': +quantile(latencies, 0.95).toFixed(1), 'health max ms': +Math.max(...latencies).toFixed(1),
      });
    }
    process.stdout.write(`work budget ${budget.toExponential(2)} element·samples; ${os.cpus().length} CPUs; load average ${os.loadavg().map((l) => l.toFixed(2)).join(' ')}\n`);
    console.table(rows);
  } finally {
    await server.stop();
  }
}
