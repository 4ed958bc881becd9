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
  SMTP_URL: z.string().optional(),
  SMTP_FAKE_PORT: port.default(2525),
  MAIL_FROM: z.string().default('Lobewise <no-reply@lobewise.test>'),
  PUBLIC_URL: z.string().url().optional(),
  SEED_DEMO: bool.default(true),
  TRUST_PROXY: bool.default(false),
});

export type Config = Readonly<z.output<typeof EnvSchema>>;

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = EnvSchema.safeParse(env);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new Error(`Config validation error: ${issue.path.join('.')}: ${issue.message}`);
  }
  return Object.freeze(parsed.data);
}
