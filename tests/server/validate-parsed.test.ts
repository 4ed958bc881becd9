import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { parsedOneOrMany, validateOneOrMany } from '../../server/middleware/validate-one-or-many.ts';
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

// A body schema whose output differs from its input, so a raw body handed out by mistake would show.
const Named = z.object({ name: z.string().trim().toUpperCase(), tags: z.array(z.string()).default([]) }).strict();

describe('parsed(req, "body", schema) hands out the parsed body', () => {
  function bodyApp(read: z.ZodType, check = true) {
    const app = express();
    app.use(express.json());
    app.post('/x', ...(check ? [validate({ body: Named })] : []), (req, res) => {
      try {
        res.json({ value: parsed(req, 'body', read) });
      } catch (err) {
        res.status(500).json({ error: String(err) });
      }
    });
    return app;
  }
  it('gives the transformed value with defaults filled in', async () => {
    const res = await request(bodyApp(Named)).post('/x').send({ name: '  ada ' });
    expect(res.status).toBe(200);
    expect(res.body.value).toEqual({ name: 'ADA', tags: [] });
  });
  it('throws on a route that never validated its body', async () => {
    const res = await request(bodyApp(Named, false)).post('/x').send({ name: 'ada' });
    expect(res.status).toBe(500);
    expect(res.body.error).toContain('did not validate body with that schema');
  });
});

describe('parsedOneOrMany(req, item) hands out one parsed item or a list of them', () => {
  function listApp(read: z.ZodType) {
    const app = express();
    app.use(express.json());
    app.post('/x', validateOneOrMany(Named, { max: 3, tooFew: 'must hold at least one', tooMany: 'must hold at most 3' }), (req, res) => {
      try {
        res.json({ value: parsedOneOrMany(req, read) });
      } catch (err) {
        res.status(500).json({ error: String(err) });
      }
    });
    return app;
  }
  it('gives one parsed item for a single body', async () => {
    const res = await request(listApp(Named)).post('/x').send({ name: 'ada' });
    expect(res.status).toBe(200);
    expect(res.body.value).toEqual({ name: 'ADA', tags: [] });
  });
  it('gives every item parsed, in order, for a list', async () => {
    const res = await request(listApp(Named)).post('/x').send([{ name: 'ada' }, { name: 'bo', tags: ['x'] }]);
    expect(res.status).toBe(200);
    expect(res.body.value).toEqual([
      { name: 'ADA', tags: [] },
      { name: 'BO', tags: ['x'] },
    ]);
  });
  it('refuses a schema that did not check the body', async () => {
    const res = await request(listApp(Other)).post('/x').send([{ name: 'ada' }]);
    expect(res.status).toBe(500);
    expect(res.body.error).toContain('did not validate its body as one or many of that schema');
  });
});
