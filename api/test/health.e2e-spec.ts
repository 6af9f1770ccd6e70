import { startApp, type Harness } from './harness.js';

let h: Harness;
beforeAll(async () => {
  h = await startApp();
});
afterAll(() => h.close());

test('GET /api/health answers with a real query', async () => {
  const res = await h.http().get('/api/health').expect(200);
  expect(res.body).toEqual({ status: 'ok', version: h.config.version, database: 'ok' });
});
