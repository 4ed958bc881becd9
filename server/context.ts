/** What the app factory needs; features add their services here so routes reach them through one object. */
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from './config.ts';
import type { Mailer } from './mail/mailer.ts';
import type { SweepRunner } from './sweeps/runner.ts';

export interface AppContext {
  config: Config;
  db: DataSource;
  log: Logger;
  /** Outgoing mail; absent in tests that send none. */
  mailer?: Mailer;
  /** The embedded sweep worker (queue consumer and thread pool); absent in tests that run no sweeps. */
  sweeps?: SweepRunner;
}
