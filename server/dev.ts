/** `npm run dev`: the API with PostgreSQL on PORT, and Vite's dev server (hot reload) proxying /api to it. */
import { createServer } from 'vite';
import { loadConfig } from './config.ts';
import { startServer } from './index.ts';

const config = loadConfig();
const running = await startServer(config);
const vite = await createServer({ server: { host: '127.0.0.1' } });
await vite.listen();
process.stdout.write(`API at ${running.url}; open the client at ${vite.resolvedUrls?.local[0] ?? 'http://127.0.0.1:5173'}\n`);

const shutdown = async () => {
  await vite.close();
  await running.close();
  process.exit(0);
};
process.once('SIGTERM', () => void shutdown());
process.once('SIGINT', () => void shutdown());
