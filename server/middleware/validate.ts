import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { issueFields } from '../../shared/schemas/format-issue.ts';
import { ApiError, invalidInput } from '../errors.ts';

interface Schemas {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
}

/** Which schema validate() checked each part of a request with, so parsed() can hand the value out typed. */
const checkedWith = new WeakMap<Request, Schemas>();

/**
 * The value validate() parsed for one part of the request, typed by its schema: a handler reads
 * `parsed(req, 'query', DesignsQuerySchema)` after `validate({ query: DesignsQuerySchema })` on the same route.
 * Asking for a part with a schema that did not check it is a programming error and throws.
 */
export function parsed<S extends z.ZodType>(req: Request, part: keyof Schemas, schema: S): z.output<S> {
  if (checkedWith.get(req)?.[part] !== schema) throw new Error(`parsed(${part}): this route did not validate ${part} with that schema`);
  return (part === 'body' ? req.body : req[part]) as z.output<S>;
}

/**
 * A body nobody parsed (text/plain, or multipart on a JSON route) would otherwise read as `{}` and slip
 * through schemas whose fields are all optional; refuse it instead of acting on an empty request.
 */
function unparsedBody(req: Request): ApiError | null {
  const hasBody = Number(req.headers['content-length'] ?? 0) > 0 || req.headers['transfer-encoding'] !== undefined;
  if (!hasBody || req.body !== undefined) return null;
  const message = 'must be sent as application/json';
  return new ApiError(415, 'unsupported_media_type', `body: ${message}`, [{ field: 'body', message }]);
}

/**
 * Parses body, query and params with the shared zod schemas and replaces them with the parsed values.
 * Fails with one 400 listing every issue; `message` names the first as "field: rule".
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    checkedWith.set(req, { ...checkedWith.get(req), ...schemas });
    if (schemas.body) {
      const refused = unparsedBody(req);
      if (refused) return next(refused);
    }
    const fields = [];
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const value = part === 'body' && req.body === undefined ? {} : req[part];
      const parsed = schema.safeParse(value);
      if (!parsed.success) {
        // A root-level issue (a list where an object belongs) names the part itself.
        const name = (field: string) => (part === 'body' ? field || 'body' : field ? `${part}.${field}` : part);
        fields.push(...issueFields(parsed.error).map((f) => ({ ...f, field: name(f.field) })));
      } else if (part === 'body') {
        req.body = parsed.data;
      } else {
        // Express 5 exposes query and params through getters; shadow them with the parsed values.
        Object.defineProperty(req, part, { value: parsed.data, writable: true, configurable: true });
      }
    }
    if (fields.length > 0) return next(invalidInput(fields));
    next();
  };
}
