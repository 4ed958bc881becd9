/**
 * The one place that reads process.env. Parsed once with zod; a bad value stops start-up naming the key.
 * Every variable and its default is listed in README.md.
 */
import { z } from 'zod';

const port = z.coerce.number().int().min(0).max(65535);
const bool = z
  .enum(['true', 'false', '1', '0', ''])
  .transform((v) => v === 'true' || v === '1');

const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: port.default(5180),
  DATABASE_URL: z.string().url().optional(),
  PGPORT_LOBEWISE: port.default(54329),
  DATA_DIR: z.string().default('.data'),
  SESSION_SECRET: z.string().min(16).optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  BODY_LIMIT: z.string().default('1mb'),
  SWEEP_THREADS: z.coerce.number().int().min(1).max(64).optional(),
  SWEEP_POINT_LIMIT: z.coerce.number().int().min(1).default(2_000_000),
  /** Seconds between looks for sweep chunks nobody runs (new sweeps from other processes, dead workers). */
  SWEEP_RECOVERY_SECONDS: z.coerce.number().min(0.2).max(3600).default(5),
  /** Largest range-data or calibration file accepted (bytes). */
  UPLOAD_LIMIT_BYTES: z.coerce.number().int().min(1024).default(2_000_000),
  /** Monte Carlo runs with more trials than this are split over the request pool's threads (smaller: one task). */
  MONTE_CARLO_SPLIT_TRIALS: z.coerce.number().int().min(1).default(200),
  /** Largest work one request may ask for, in element·samples (see shared/compute/pattern-work.ts). */
  REQUEST_WORK_BUDGET: z.coerce.number().min(1e5).max(1e12).default(1e9),
  /** Heavy requests (evaluate, bench maths) one user may have running at once; more answer 429. */
  HEAVY_REQUESTS_PER_USER: z.coerce.number().int().min(1).max(64).default(2),
  /** Sweep progress streams (server-sent events) one user may have open at once; more answer 429. */
  EVENT_STREAMS_PER_USER: z.coerce.number().int().min(1).max(256).default(8),
  SMTP_URL: z.string().optional(),
  SMTP_FAKE_PORT: port.default(2525),
  MAIL_FROM: z.string().default('Lobewise <no-reply@lobewise.test>'),
  PUBLIC_URL: z.string().url().optional(),
  SEED_DEMO: bool.default(true),
  TRUST_PROXY: bool.default(false),
});

export type Config = Readonly<z.output<typeof EnvSchema>>;

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  // An empty variable means "not set", as in most shells' `FOO= cmd`.
  const present = Object.fromEntries(Object.entries(env).filter(([, v]) => v !== undefined && v !== ''));
  const parsed = EnvSchema.safeParse(present);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new Error(`Config validation error: ${issue.path.join('.')}: ${issue.message}`);
  }
  return Object.freeze(parsed.data);
}
