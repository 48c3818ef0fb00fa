import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';

import compression from 'compression';
import express from 'express';
import request from 'supertest';

import { mountWeb } from '@/server/web';

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'fw-web-'));
const SCRIPT = 'console.log("staff app");'.repeat(200);
beforeAll(() => {
  fs.mkdirSync(path.join(dir, '_expo/static/js/web'), { recursive: true });
  fs.mkdirSync(path.join(dir, 'assets/build/web-fonts'), { recursive: true });
  fs.writeFileSync(path.join(dir, 'index.html'), '<html>staff</html>');
  fs.writeFileSync(path.join(dir, 'buyer.html'), '<html>buyer</html>');
  fs.writeFileSync(path.join(dir, 'metadata.json'), '{}');
  fs.writeFileSync(path.join(dir, '_expo/static/js/web/entry-abc.js'), SCRIPT);
  fs.writeFileSync(path.join(dir, '_expo/static/js/web/entry-abc.js.gz'), zlib.gzipSync(SCRIPT));
  fs.writeFileSync(path.join(dir, 'assets/build/web-fonts/Body.123.woff2'), Buffer.from('wOF2'));
});
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

function app() {
  const a = express();
  a.use(compression());
  mountWeb(a, dir, ['/graphql', '/api']);
  return a;
}

it('sends a hashed script compressed ahead of time, to keep for a year', async () => {
  const res = await request(app()).get('/_expo/static/js/web/entry-abc.js').set('Accept-Encoding', 'gzip');
  expect(res.headers['content-encoding']).toBe('gzip');
  expect(res.headers['content-type']).toMatch(/javascript/);
  expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  expect(res.text).toBe(SCRIPT);
});

it('sends it as it is to a client that takes no compression, still for a year', async () => {
  const res = await request(app()).get('/_expo/static/js/web/entry-abc.js').set('Accept-Encoding', 'identity');
  expect(res.headers['content-encoding']).toBeUndefined();
  expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  expect(res.text).toBe(SCRIPT);
});

it('keeps hashed fonts for a year, and other files for an hour', async () => {
  expect((await request(app()).get('/assets/build/web-fonts/Body.123.woff2')).headers['cache-control']).toBe('public, max-age=31536000, immutable');
  expect((await request(app()).get('/metadata.json')).headers['cache-control']).toBe('public, max-age=3600');
});

it.each([
  ['/d/AbCdEfGhIjKlMnOpQrStUvWxYz012345', 'buyer'],
  ['/d/AbCdEfGhIjKlMnOpQrStUvWxYz012345/deposit', 'buyer'],
  ['/stock', 'staff'],
  ['/pianos/12', 'staff'],
  ['/d/x/y/z', 'staff'],
])('answers %s with the %s page, asked again every time', async (url, page) => {
  const res = await request(app()).get(url);
  expect(res.status).toBe(200);
  expect(res.text).toContain(page);
  expect(res.headers['cache-control']).toBe('no-cache');
});

it('leaves API paths to the routes that serve them', async () => {
  expect((await request(app()).get('/graphql')).status).toBe(404);
  expect((await request(app()).get('/api/pianos/1/floor-tag.pdf')).status).toBe(404);
});
