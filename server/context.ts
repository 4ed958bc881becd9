/** What the app factory needs; features add their services here so routes reach them through one object. */
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from './config.ts';

export interface AppContext {
  config: Config;
  db: DataSource;
  log: Logger;
}
