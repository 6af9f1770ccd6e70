import { DEMO_PASSWORD } from '../src/database/seed.js';
import { signIn, startApp, type Harness } from './harness.js';

let h: Harness;
beforeAll(async () => {
  h = await startApp();
});
afterAll(() => h.close());

const login = (email: string, password: string) =>
  h.http().post('/api/auth/login').send({ email, password });

test('login gives tokens and the user; me answers with the access token', async () => {
  const session = await signIn(h, 'quality@demo.test');
  expect(session.user).toMatchObject({ email: 'quality@demo.test', role: 'quality', active: true });
  expect(session).not.toHaveProperty('user.passwordHash');
  const me = await h
    .http()
    .get('/api/auth/me')
    .auth(session.accessToken, { type: 'bearer' })
    .expect(200);
  expect(me.body.email).toBe('quality@demo.test');
});

test('an unknown email and a wrong password get the same answer', async () => {
  const unknown = await login('nobody@demo.test', 'whatever-password');
  const wrong = await login('quality@demo.test', 'wrong-password-1');
  expect(unknown.status).toBe(401);
  expect(wrong.status).toBe(401);
  expect(unknown.body).toEqual(wrong.body);
});

test('refresh rotates; replaying a spent refresh token ends the whole sign-in', async () => {
  const first = await signIn(h, 'inspector@demo.test');
  const second = await h
    .http()
    .post('/api/auth/refresh')
    .send({ refreshToken: first.refreshToken })
    .expect(200);
  expect(second.body.refreshToken).not.toBe(first.refreshToken);
  const third = await h
    .http()
    .post('/api/auth/refresh')
    .send({ refreshToken: second.body.refreshToken })
    .expect(200);
  // The first token comes back: someone holds a copy.
  await h.http().post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(401);
  // Every token of that family is dead now, the newest included, and so are its access tokens.
  await h
    .http()
    .post('/api/auth/refresh')
    .send({ refreshToken: third.body.refreshToken })
    .expect(401);
  await h.http().get('/api/auth/me').auth(third.body.accessToken, { type: 'bearer' }).expect(401);
  // Another sign-in of the same person is untouched.
  const other = await signIn(h, 'inspector@demo.test');
  await h.http().get('/api/auth/me').auth(other.accessToken, { type: 'bearer' }).expect(200);
});

test('logout ends the sign-in', async () => {
  const session = await signIn(h, 'supervisor@demo.test');
  await h.http().post('/api/auth/logout').send({ refreshToken: session.refreshToken }).expect(204);
  await h.http().post('/api/auth/refresh').send({ refreshToken: session.refreshToken }).expect(401);
  await h.http().get('/api/auth/me').auth(session.accessToken, { type: 'bearer' }).expect(401);
});

test('five failures a minute for one account and address give 429, even with the right password', async () => {
  const admin = await signIn(h, 'admin@demo.test');
  await h
    .http()
    .post('/api/users')
    .auth(admin.accessToken, { type: 'bearer' })
    .send({
      email: 'throttled@demo.test',
      name: 'Throttled',
      role: 'inspector',
      password: 'long-enough-2',
    })
    .expect(201);
  for (let i = 0; i < 5; i++)
    expect((await login('throttled@demo.test', 'wrong-password-x')).status).toBe(401);
  const blocked = await login('throttled@demo.test', 'long-enough-2');
  expect(blocked.status).toBe(429);
  expect(blocked.body.message).toMatch(/try again in \d+ s/);
  // Another account from the same address is not held up.
  expect((await login('quality@demo.test', DEMO_PASSWORD)).status).toBe(200);
});

test('a deactivated user can neither sign in nor use a token they hold', async () => {
  const admin = await signIn(h, 'admin@demo.test');
  const created = await h
    .http()
    .post('/api/users')
    .auth(admin.accessToken, { type: 'bearer' })
    .send({
      email: 'leaving@demo.test',
      name: 'Leaving Person',
      role: 'inspector',
      password: 'long-enough-1',
    })
    .expect(201);
  const theirs = await h
    .http()
    .post('/api/auth/login')
    .send({ email: 'leaving@demo.test', password: 'long-enough-1' })
    .expect(200);
  await h
    .http()
    .post(`/api/users/${created.body.id}/deactivate`)
    .auth(admin.accessToken, { type: 'bearer' })
    .expect(200);
  await h.http().get('/api/auth/me').auth(theirs.body.accessToken, { type: 'bearer' }).expect(401);
  await h
    .http()
    .post('/api/auth/refresh')
    .send({ refreshToken: theirs.body.refreshToken })
    .expect(401);
  const again = await h
    .http()
    .post('/api/auth/login')
    .send({ email: 'leaving@demo.test', password: 'long-enough-1' });
  expect(again.status).toBe(401);
});

test('passwords shorter than 10 characters are refused when a user is made', async () => {
  const admin = await signIn(h, 'admin@demo.test');
  const res = await h
    .http()
    .post('/api/users')
    .auth(admin.accessToken, { type: 'bearer' })
    .send({ email: 'short@demo.test', name: 'Short', role: 'inspector', password: 'short-pw1' })
    .expect(400);
  expect(res.body.field).toBe('password');
});
