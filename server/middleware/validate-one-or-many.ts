/**
 * validate() for a body that is one item or a list of up to `max` items (as POST /api/evaluate takes), with the
 * same answers as validate({ body: z.union([item, z.array(item).min(1).max(max)]) }), but a list is parsed a
 * slice at a time with the event loop free in between: zod needs ~0.1 ms per design, so 10,000 designs in one
 * go would hold every other request for over a second. The handler reads the result with parsedOneOrMany().
 */
import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { issueFields } from '../../shared/schemas/format-issue.ts';
import { invalidInput, type FieldIssue } from '../errors.ts';
import { validate } from './validate.ts';

const SLICE = 200;
const yieldToLoop = () => new Promise<void>((resolve) => setImmediate(resolve));

export interface ListRules {
  max: number;
  /** Messages of the list schema (kept identical to the shared one). */
  tooFew: string;
  tooMany: string;
}

/** Which item schema validateOneOrMany() checked each request's body with (one item or a list of them). */
const checkedWith = new WeakMap<Request, z.ZodType>();

/**
 * The body validateOneOrMany(item) parsed, typed by the item schema: one item or a list of them. parsed(req,
 * 'body', item) would only cover the single-item case, so this route reads its body here; asking with a schema
 * that did not check the body is a programming error and throws.
 */
export function parsedOneOrMany<S extends z.ZodType>(req: Request, item: S): z.output<S> | z.output<S>[] {
  if (checkedWith.get(req) !== item) throw new Error('parsedOneOrMany: this route did not validate its body as one or many of that schema');
  const body: unknown = req.body;
  return body as z.output<S> | z.output<S>[];
}

export function validateOneOrMany(item: z.ZodType, rules: ListRules): RequestHandler {
  const one = validate({ body: item });
  return async (req, res, next) => {
    checkedWith.set(req, item);
    if (!Array.isArray(req.body)) return one(req, res, next);
    // Still the raw JSON list here: each item is parsed below and the list replaced by the parsed items.
    const list: unknown[] = req.body;
    if (list.length === 0) return next(invalidInput([{ field: 'body', message: rules.tooFew }]));
    if (list.length > rules.max) return next(invalidInput([{ field: 'body', message: rules.tooMany }]));
    const parsed: unknown[] = new Array(list.length);
    const fields: FieldIssue[] = [];
    for (let start = 0; start < list.length; start += SLICE) {
      if (start > 0) await yieldToLoop();
      if (res.closed) return; // the client left; nothing to answer
      for (let i = start; i < Math.min(list.length, start + SLICE); i++) {
        const r = item.safeParse(list[i]);
        if (r.success) parsed[i] = r.data;
        else fields.push(...issueFields(r.error).map((f) => ({ ...f, field: `[${i}]${f.field === '' || f.field.startsWith('[') ? '' : '.'}${f.field}` })));
      }
    }
    if (fields.length > 0) return next(invalidInput(fields));
    req.body = parsed;
    next();
  };
}
