import { pino, type DestinationStream, type Logger } from 'pino';
import type { Config } from './config.ts';
import { LOG_REDACT_PATHS } from './log-redaction.ts';

/** `destination` (tests that read the log) also lifts the test default of silence to LOG_LEVEL. */
export function createLogger(config: Pick<Config, 'LOG_LEVEL' | 'NODE_ENV'>, destination?: DestinationStream): Logger {
  const options = { level: config.NODE_ENV === 'test' && !destination ? 'silent' : config.LOG_LEVEL, redact: LOG_REDACT_PATHS };
  // Written asynchronously (lines queued while a write is under way go out together), not one blocking write per
  // request line; pino flushes what is queued when the process exits.
  return pino(options, destination ?? pino.destination({ dest: 1, sync: false }));
}
