import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { serveClient } from '../../server/client-static.ts';

const dir = mkdtempSync(path.join(os.tmpdir(), 'lobewise-static-'));
const script = `export const greeting = ${JSON.stringify('hello '.repeat(400))};\n`;
mkdirSync(path.join(dir, 'assets'));
writeFileSync(path.join(dir, 'index.html'), '<!doctype html><title>t</title><div id="app"></div>');
writeFileSync(path.join(dir, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
writeFileSync(path.join(dir, 'assets', 'index-AbC123.js'), script);
const br = brotliCompressSync(script);
const gz = gzipSync(script);
writeFileSync(path.join(dir, 'assets', 'index-AbC123.js.br'), br);
writeFileSync(path.join(dir, 'assets', 'index-AbC123.js.gz'), gz);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const app = express();
serveClient(app, dir);
// supertest decodes brotli and gzip itself: the length sent shows which copy went out, the text that it decodes.

describe('serving the built client', () => {
  it('sends the brotli copy of a hashed asset to a browser that takes brotli, cached for a year as immutable', async () => {
    const res = await request(app).get('/assets/index-AbC123.js').set('accept-encoding', 'gzip, deflate, br');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(Number(res.headers['content-length'])).toBe(br.length);
    expect(res.text).toBe(script);
  });

  it('falls back to gzip, then to the plain file', async () => {
    const viaGzip = await request(app).get('/assets/index-AbC123.js').set('accept-encoding', 'gzip');
    expect(viaGzip.headers['content-encoding']).toBe('gzip');
    expect(Number(viaGzip.headers['content-length'])).toBe(gz.length);
    expect(viaGzip.text).toBe(script);
    const plain = await request(app).get('/assets/index-AbC123.js').set('accept-encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(Number(plain.headers['content-length'])).toBe(Buffer.byteLength(script));
    expect(plain.text).toBe(script);
  });

  it('has index.html and unhashed files revalidated on every load', async () => {
    for (const url of ['/', '/studies/0b7f1c3e-1111-4222-8333-944445555666', '/favicon.svg']) {
      const res = await request(app).get(url);
      expect(res.status, url).toBe(200);
      expect(res.headers['cache-control'], url).toBe('no-cache');
    }
    expect((await request(app).get('/sign-in')).text).toContain('<div id="app">');
  });
});
