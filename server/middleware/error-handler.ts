import type { ErrorRequestHandler } from 'express';
import type { Logger } from 'pino';
import { ApiError } from '../errors.ts';
import { scrubUrl } from '../log-redaction.ts';

interface BodyParserError extends Error {
  type?: string;
  status?: number;
  limit?: number;
}

/** Errors thrown by express.json and friends carry a `type`; map the ones a client can cause. */
function fromBodyParser(err: BodyParserError): ApiError | null {
  switch (err.type) {
    case 'entity.parse.failed':
      return new ApiError(400, 'invalid_json', `body: is not valid JSON (${err.message})`, [
        { field: 'body', message: 'is not valid JSON' },
      ]);
    case 'entity.too.large':
      return new ApiError(413, 'payload_too_large', `body: must be at most ${err.limit} bytes`, [
        { field: 'body', message: `must be at most ${err.limit} bytes` },
      ]);
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new ApiError(415, 'unsupported_media_type', `body: ${err.message}`);
    default:
      return typeof err.status === 'number' && err.status >= 400 && err.status < 500
        ? new ApiError(err.status, 'bad_request', err.message)
        : null;
  }
}

interface PgError extends Error {
  code?: string;
}

/** PostgreSQL errors a request can cause or meet, by SQLSTATE; everything else stays a 500. */
function fromPostgres(err: PgError): ApiError | null {
  const code = err.code ?? '';
  if (code === '23503') return new ApiError(409, 'conflict', 'other records still refer to this one; remove or archive them first');
  if (code === '23505') return new ApiError(409, 'conflict', 'a record with the same key already exists');
  if (code === '22P02') return new ApiError(400, 'invalid_input', 'a value has the wrong format (for example an id that is not a UUID)');
  if (code === 'P0001' && /signed/i.test(err.message)) return new ApiError(409, 'conflict', err.message);
  // Server shutting down, connection lost or refused: the database is away, not the request at fault.
  // TypeORM releases a transaction's runner when its connection dies, so the commit then fails this way.
  const connectionLost =
    err.name === 'QueryRunnerAlreadyReleasedError' ||
    /Connection terminated|connection timeout|not queryable|terminating connection/i.test(err.message);
  if (['57P01', '57P02', '57P03', '08006', '08001', '08003', 'ECONNREFUSED', 'ECONNRESET'].includes(code) || connectionLost) {
    return new ApiError(503, 'database_unavailable', 'the database is unavailable; try again in a moment');
  }
  return null;
}

/** Mounted last. Known errors answer with their status; anything else is logged and answered as a bare 500. */
export function errorHandler(log: Logger): ErrorRequestHandler {
  // Keep all four parameters: Express recognises an error handler by its arity.
  return (err: unknown, req, res, _next) => {
    const known =
      err instanceof ApiError
        ? err
        : err instanceof Error
          ? (fromBodyParser(err as BodyParserError) ?? fromPostgres(err as PgError))
          : null;
    // Work stopped because its client went away (heavy-request.ts aborts it): nobody to answer, nothing broken.
    if (err instanceof Error && err.name === 'AbortError' && res.destroyed) {
      log.debug({ method: req.method, url: scrubUrl(req.originalUrl) }, 'work stopped: the client went away');
      return;
    }
    if (res.headersSent) {
      req.socket.destroy();
      return;
    }
    if (known) {
      res.status(known.status).json({
        error: { code: known.code, message: known.message, ...(known.fields ? { fields: known.fields } : {}) },
      });
      return;
    }
    log.error({ err, method: req.method, url: scrubUrl(req.originalUrl) }, 'unhandled error');
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side; it has been logged.' } });
  };
}
