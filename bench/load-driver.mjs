/**
 * Worker thread of `bench load` (bench/load.ts): drives one scenario with autocannon (N connections, one
 * signed-in session each, for a bounded time) and posts back requests per second and latency percentiles.
 * It runs off the server's thread so that generating the load does not take the server's event loop; plain
 * JavaScript because a worker thread does not inherit tsx's loader.
 */
import { createRequire } from 'node:module';
import { parentPort, workerData } from 'node:worker_threads';

const autocannon = createRequire(import.meta.url)('autocannon');

const percentile = (sorted, p) => sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))] ?? NaN;

async function drive({ url, sessions, scenario: s, connections, seconds }) {
  let next = 0;
  let visit = 0;
  const latencies = [];
  const instance = autocannon({
    url,
    connections,
    duration: seconds,
    method: s.method,
    body: s.body,
    headers: { 'content-type': 'application/json' },
    // One signed-in session per connection.
    setupClient: (client) => {
      const session = sessions[next++ % sessions.length];
      client.setHeaders({ cookie: session.cookie, 'x-csrf-token': session.csrf, 'content-type': 'application/json' });
    },
    requests: [{ setupRequest: (req) => ({ ...req, path: s.paths[visit++ % s.paths.length] }) }],
  });
  let non2xx = 0;
  instance.on('response', (_c, status, _bytes, ms) => {
    latencies.push(ms);
    if (status < 200 || status > 299) non2xx++;
  });
  const result = await instance;
  latencies.sort((a, b) => a - b);
  return {
    scenario: s.name,
    // Counted here: inside a worker thread autocannon reports raw histograms instead of its totals.
    requests: latencies.length,
    'req/s': Math.round(latencies.length / seconds),
    'p50 ms': +percentile(latencies, 50).toFixed(1),
    'p95 ms': +percentile(latencies, 95).toFixed(1),
    'p99 ms': +percentile(latencies, 99).toFixed(1),
    'non-2xx': non2xx,
    errors: (Number(result.errors) || 0) + (Number(result.timeouts) || 0),
  };
}

parentPort?.postMessage(await drive(workerData));
