import { pino, type DestinationStream, type Logger } from 'pino';
import type { Config } from './config.ts';
import { LOG_REDACT_PATHS } from './log-redaction.ts';

/** `destination` (tests that read the log) also lifts the test default of silence to LOG_LEVEL. */
export function createLogger(config: Pick<Config, 'LOG_LEVEL' | 'NODE_ENV'>, destination?: DestinationStream): Logger {
  const options = { level: config.NODE_ENV === 'test' && !destination ? 'silent' : config.LOG_LEVEL, redact: LOG_REDACT_PATHS };
  return destination ? pino(options, destination) : pino(options);
}
