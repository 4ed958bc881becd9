import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { parsed, validate } from '../../server/middleware/validate.ts';

const Listed = z.object({ archived: z.enum(['true', 'false']).transform((v) => v === 'true') }).strict();
const Other = z.object({ archived: z.string() });

function appWith(read: z.ZodType) {
  const app = express();
  app.get('/x', validate({ query: Listed }), (req, res) => {
    try {
      res.json({ value: parsed(req, 'query', read) });
    } catch (err) {
      res.status(500).json({ error: String(err) });
    }
  });
  return app;
}

describe('parsed(req, part, schema) hands out what validate() parsed', () => {
  it('gives the parsed, transformed value for the schema that checked the part', async () => {
    const res = await request(appWith(Listed)).get('/x?archived=true');
    expect(res.status).toBe(200);
    expect(res.body.value).toEqual({ archived: true });
  });
  it('refuses a schema that did not check the part (a programming error, not a cast)', async () => {
    const res = await request(appWith(Other)).get('/x?archived=true');
    expect(res.status).toBe(500);
    expect(res.body.error).toContain('did not validate query with that schema');
  });
});
