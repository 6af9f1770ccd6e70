import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startApp, type Harness } from './harness.js';

let h: Harness;
let pwa: string;
beforeAll(async () => {
  pwa = mkdtempSync(join(tmpdir(), 'gumshoe-pwa-'));
  mkdirSync(join(pwa, 'assets'));
  writeFileSync(join(pwa, 'index.html'), '<!doctype html><title>Gumshoe</title>');
  writeFileSync(join(pwa, 'sw.js'), 'self.addEventListener("fetch", () => {});');
  writeFileSync(join(pwa, 'manifest.webmanifest'), '{"name":"Gumshoe"}');
  writeFileSync(join(pwa, 'assets', 'app-1234.js'), 'console.log(1);');
  h = await startApp({ GUMSHOE_PWA_DIR: pwa, GUMSHOE_CORS_ORIGIN: 'https://desk.plant.test' });
});
afterAll(async () => {
  await h.close();
  rmSync(pwa, { recursive: true, force: true });
});

test('the app shell is served at / and for client-side routes, never cached', async () => {
  for (const path of ['/', '/lots/123', '/review']) {
    const res = await h.http().get(path).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.text).toContain('<title>Gumshoe</title>');
  }
});

test('the service worker and the manifest come with their types; sw.js is not cached', async () => {
  const sw = await h.http().get('/sw.js').expect(200);
  expect(sw.headers['content-type']).toMatch(/^(text|application)\/javascript/);
  expect(sw.headers['cache-control']).toBe('no-cache');
  const manifest = await h.http().get('/manifest.webmanifest').expect(200);
  expect(manifest.headers['content-type']).toMatch(/^application\/manifest\+json/);
  const index = await h.http().get('/index.html').expect(200);
  expect(index.headers['cache-control']).toBe('no-cache');
});

test('a missing asset and an unknown API path are 404s, not the app shell', async () => {
  await h.http().get('/assets/missing-9999.js').expect(404);
  const api = await h.http().get('/api/no-such-thing').expect(404);
  expect(api.headers['content-type']).toMatch(/json/);
  expect(api.body.statusCode).toBe(404);
});

test('security headers are set', async () => {
  const res = await h.http().get('/api/health').expect(200);
  expect(res.headers['x-content-type-options']).toBe('nosniff');
  expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  expect(res.headers['content-security-policy']).not.toContain('upgrade-insecure-requests');
  expect(res.headers).not.toHaveProperty('x-powered-by');
});

test('CORS answers only the configured origin', async () => {
  const allowed = await h.http().get('/api/health').set('Origin', 'https://desk.plant.test');
  expect(allowed.headers['access-control-allow-origin']).toBe('https://desk.plant.test');
  const other = await h.http().get('/api/health').set('Origin', 'https://elsewhere.test');
  expect(other.headers).not.toHaveProperty('access-control-allow-origin');
});

test('bad JSON and a too-large body are 4xx JSON, not 500', async () => {
  const bad = await h
    .http()
    .post('/api/auth/login')
    .set('Content-Type', 'application/json')
    .send('{"email": ')
    .expect(400);
  expect(bad.body).toMatchObject({ statusCode: 400, field: 'body' });
  const big = await h
    .http()
    .post('/api/auth/login')
    .set('Content-Type', 'application/json')
    .send(JSON.stringify({ email: 'x@demo.test', password: 'y'.repeat(3 * 1024 * 1024) }))
    .expect(413);
  expect(big.body.statusCode).toBe(413);
});
