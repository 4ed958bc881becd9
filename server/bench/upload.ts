import type { RequestHandler } from 'express';
import multer from 'multer';
import { ApiError } from '../errors.ts';

/** multer's own failures as the API's errors: too large is 413, anything else about the form is 400. */
function uploadError(err: unknown, limitBytes: number): ApiError | unknown {
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') {
      return new ApiError(413, 'payload_too_large', `file: must be at most ${limitBytes} bytes`, [{ field: 'file', message: `must be at most ${limitBytes} bytes` }]);
    }
    const field = err.field ?? 'file';
    return new ApiError(400, 'invalid_upload', `${field}: ${err.message.toLowerCase()} (send one CSV in field "file")`, [{ field, message: err.message.toLowerCase() }]);
  }
  return err;
}

/**
 * One optional file in field `file`, held in memory (never written to disk) up to limitBytes; other
 * multipart fields land in req.body, all of them strings. Non-multipart requests pass through untouched.
 */
export function singleUpload(limitBytes: number): RequestHandler {
  const handle = multer({ storage: multer.memoryStorage(), limits: { fileSize: limitBytes, files: 1, fields: 20, fieldSize: 64 * 1024 } }).single('file');
  return (req, res, next) => handle(req, res, (err: unknown) => next(err ? uploadError(err, limitBytes) : undefined));
}
