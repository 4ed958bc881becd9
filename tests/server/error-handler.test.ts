import type { AddressInfo } from 'node:net';
import express from 'express';
import { pino } from 'pino';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ApiError, NotFound } from '../../server/errors.ts';
import { errorHandler } from '../../server/middleware/error-handler.ts';
import { validate } from '../../server/middleware/validate.ts';
import { createLogger } from '../../server/logger.ts';

const log = createLogger({ LOG_LEVEL: 'silent', NODE_ENV: 'test' });

function appWith(route: express.RequestHandler[]) {
  const app = express();
  app.use(express.json({ limit: '1kb' }));
  app.post('/thing', ...route, (req, res) => res.json({ got: req.body }));
  app.use(errorHandler(log));
  return app;
}

const Thing = z.object({ nx: z.number().int().min(1, 'must be at least 1'), name: z.string() }).strict();

describe('errorHandler', () => {
  it('turns a zod failure into a 400 naming the field and the rule', async () => {
    const res = await request(appWith([validate({ body: Thing })])).post('/thing').send({ nx: 0, name: 'a' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.message).toMatch(/^nx: /);
    expect(res.body.error.fields[0].field).toBe('nx');
  });

  it('lists every failing field at once', async () => {
    const res = await request(appWith([validate({ body: Thing })])).post('/thing').send({ nx: 'x', extra: 1 });
    expect(res.status).toBe(400);
    const fields = res.body.error.fields.map((f: { field: string }) => f.field);
    expect(fields).toContain('nx');
    expect(fields).toContain('name');
  });

  it('replaces the body with the parsed value', async () => {
    const Coerced = z.object({ n: z.coerce.number() });
    const res = await request(appWith([validate({ body: Coerced })])).post('/thing').send({ n: '5' });
    expect(res.body.got).toEqual({ n: 5 });
  });

  it('answers a known error with its own status and code', async () => {
    const res = await request(appWith([() => { throw NotFound('study'); }])).post('/thing').send({});
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'study not found' } });
  });

  it('hides unknown errors behind a generic 500 without a stack', async () => {
    const res = await request(appWith([() => { throw new Error('secret detail at /srv/x.ts:12'); }])).post('/thing').send({});
    expect(res.status).toBe(500);
    expect(JSON.stringify(res.body)).not.toMatch(/secret|\.ts|at /);
    expect(res.body.error.code).toBe('internal');
  });

  it('forwards rejected async handlers (Express 5)', async () => {
    const res = await request(appWith([async () => { throw new ApiError(409, 'conflict', 'signed'); }])).post('/thing').send({});
    expect(res.status).toBe(409);
  });

  it('answers malformed JSON with 400 naming the body', async () => {
    const res = await request(appWith([])).post('/thing').set('content-type', 'application/json').send('{"nx":');
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].field).toBe('body');
  });

  it('answers an oversized body with 413', async () => {
    const res = await request(appWith([])).post('/thing').send({ s: 'x'.repeat(5000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('maps PostgreSQL errors a request can meet to 4xx/503 by SQLSTATE', async () => {
    const pgError = (code: string, message = 'x') => Object.assign(new Error(message), { code });
    const statusFor = async (code: string) =>
      (await request(appWith([() => { throw pgError(code); }])).post('/thing').send({})).status;
    expect(await statusFor('23503')).toBe(409);
    expect(await statusFor('23505')).toBe(409);
    expect(await statusFor('22P02')).toBe(400);
    expect(await statusFor('57P01')).toBe(503);
    expect(await statusFor('ECONNREFUSED')).toBe(503);
    expect(await statusFor('42P01')).toBe(500);
    // A transaction whose connection died mid-way fails at commit with TypeORM's released-runner error.
    const released = Object.assign(new Error('Query runner already released. Cannot run queries anymore.'), { name: 'QueryRunnerAlreadyReleasedError' });
    expect((await request(appWith([() => { throw released; }])).post('/thing').send({})).status).toBe(503);
  });
});

describe('work stopped because its client went away', () => {
  it('is not logged as an unhandled error, while other errors still are', async () => {
    const lines: { level: number; msg: string }[] = [];
    const captured = pino({ level: 'debug' }, { write: (line: string) => void lines.push(JSON.parse(line)) });
    let thrown!: () => void;
    const settled = new Promise<void>((resolve) => (thrown = resolve));
    const app = express();
    app.post('/work', (req, res, next) => {
      // As heavy-request.ts does: the client's leaving aborts the work, whose promise rejects with an AbortError.
      res.once('close', () => {
        next(Object.assign(new Error('The task has been aborted'), { name: 'AbortError' }));
        thrown();
      });
    });
    app.post('/broken', () => {
      throw new Error('a real bug');
    });
    app.use(errorHandler(captured));
    const server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    try {
      const gone = new AbortController();
      const answer = fetch(`${url}/work`, { method: 'POST', signal: gone.signal }).catch((e: unknown) => e);
      await new Promise((r) => setTimeout(r, 100));
      gone.abort();
      await answer;
      await settled;
      expect((await fetch(`${url}/broken`, { method: 'POST' })).status).toBe(500);
    } finally {
      server.close();
    }
    const errors = lines.filter((l) => l.level >= 50).map((l) => l.msg);
    expect(errors).toEqual(['unhandled error']); // the bug only
    expect(lines.some((l) => l.level === 20 && /client went away/.test(l.msg))).toBe(true);
  });
});

describe('validate() and bodies nobody parsed', () => {
  const Optional = z.object({ name: z.string().optional() }).strict();
  it('refuses text/plain on a JSON route with 415 naming the body', async () => {
    const res = await request(appWith([validate({ body: Optional })])).post('/thing').set('content-type', 'text/plain').send('name=x');
    expect(res.status).toBe(415);
    expect(res.body.error.fields[0].field).toBe('body');
  });
  it('still accepts an empty body for a schema whose fields are optional', async () => {
    const res = await request(appWith([validate({ body: Optional })])).post('/thing');
    expect(res.status).toBe(200);
  });
});
