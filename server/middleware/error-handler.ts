import type { ErrorRequestHandler } from 'express';
import type { Logger } from 'pino';
import { ApiError } from '../errors.ts';

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

/** Mounted last. Known errors answer with their status; anything else is logged and answered as a bare 500. */
export function errorHandler(log: Logger): ErrorRequestHandler {
  // Keep all four parameters: Express recognises an error handler by its arity.
  return (err: unknown, req, res, _next) => {
    const known = err instanceof ApiError ? err : err instanceof Error ? fromBodyParser(err as BodyParserError) : null;
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
    log.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side; it has been logged.' } });
  };
}
