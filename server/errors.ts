/**
 * Operational errors: services throw these, the error handler turns them into
 * `{ error: { code, message, fields? } }` with their status. Anything else is a bug and becomes a logged 500.
 */
export interface FieldIssue {
  field: string;
  message: string;
}

export class ApiError extends Error {
  override name = 'ApiError';
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldIssue[],
  ) {
    super(message);
  }
}

export const createError =
  <A extends unknown[]>(code: string, status: number, message: (...args: A) => string) =>
  (...args: A): ApiError =>
    new ApiError(status, code, message(...args));

export const NotFound = createError('not_found', 404, (what: string = 'resource') => `${what} not found`);
export const Unauthenticated = createError('unauthenticated', 401, () => 'sign in first');
export const Forbidden = createError('forbidden', 403, (why: string = 'your role does not allow this') => why);
export const Conflict = createError('conflict', 409, (why: string) => why);
export const PayloadTooLarge = createError('payload_too_large', 413, (limit: string) => `body: must be at most ${limit}`);

/** 400 naming the first field; every issue goes in `fields`. */
export function invalidInput(fields: FieldIssue[]): ApiError {
  const first = fields[0] ?? { field: 'body', message: 'is invalid' };
  return new ApiError(400, 'invalid_input', `${first.field}: ${first.message}`, fields);
}
