import { createHash } from 'node:crypto';
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { signIn, startApp, type Harness } from './harness.js';

let h: Harness;
let token: string;
beforeAll(async () => {
  h = await startApp();
  token = (await signIn(h, 'inspector@demo.test')).accessToken;
});
afterAll(() => h.close());

const sha = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');
// A 1×1 PNG: the signature, then IHDR, IDAT and IEND chunks.
const PNG = Buffer.from(
  '89504e470d0a1a0a0000000d4948445200000001000000010806000000' +
    '1f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082',
  'hex',
);
const JPEG = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(64, 1)]);
const WEBP = Buffer.concat([
  Buffer.from('RIFF'),
  Buffer.from([36, 0, 0, 0]),
  Buffer.from('WEBPVP8 '),
  Buffer.alloc(28),
]);

const put = (name: string, bytes: Buffer, filename = 'photo.png', contentType = 'image/png') =>
  h
    .http()
    .put(`/api/photos/${name}`)
    .auth(token, { type: 'bearer' })
    .attach('file', bytes, { filename, contentType });

test.each([
  ['PNG', PNG, 'image/png'],
  ['JPEG', JPEG, 'image/jpeg'],
  ['WebP', WEBP, 'image/webp'],
])('a %s is stored by its hash, once, and read back with its type', async (_kind, bytes, mime) => {
  const name = sha(bytes);
  const first = await put(name, bytes, 'whatever.bin', 'application/octet-stream').expect(201);
  expect(first.body).toEqual({ sha256: name, mime, bytes: bytes.length });
  await put(name, bytes).expect(200);
  expect(existsSync(join(h.config.dataDir, 'photos', name.slice(0, 2), name))).toBe(true);
  const got = await h
    .http()
    .get(`/api/photos/${name}`)
    .auth(token, { type: 'bearer' })
    .buffer(true)
    .parse((res, done) => {
      const parts: Buffer[] = [];
      res.on('data', (part: Buffer) => parts.push(part));
      res.on('end', () => done(null, Buffer.concat(parts)));
    })
    .expect(200);
  expect(got.headers['content-type']).toBe(mime);
  expect(Buffer.compare(got.body as Buffer, bytes)).toBe(0);
});

test('reading a photo needs a sign-in', async () => {
  await h
    .http()
    .get(`/api/photos/${sha(PNG)}`)
    .expect(401);
});

test('text under a .png name with an image type is refused by its content', async () => {
  const text = Buffer.from('<?php echo "not a photo"; ?>');
  const res = await put(sha(text), text, 'photo.png', 'image/png').expect(415);
  expect(res.body.message).toMatch(/JPEG, PNG or WebP/);
});

test('a hash that does not match the bytes is refused', async () => {
  const res = await put(sha(Buffer.from('other bytes')), PNG).expect(400);
  expect(res.body.field).toBe('sha256');
});

test('more than 10 MB is refused with 413', async () => {
  const big = Buffer.concat([PNG, Buffer.alloc(10 * 1024 * 1024 + 1)]);
  await put(sha(big), big).expect(413);
});

test('a request without the file is a 400 naming it; extra form fields are refused', async () => {
  const bare = await h
    .http()
    .put(`/api/photos/${sha(PNG)}`)
    .auth(token, { type: 'bearer' })
    .expect(400);
  expect(bare.body.field).toBe('file');
  await h
    .http()
    .put(`/api/photos/${sha(PNG)}`)
    .auth(token, { type: 'bearer' })
    .field('note', 'not allowed')
    .attach('file', PNG, 'p.png')
    .expect(400);
});

test.each([
  '..%2F..%2Fjwt-secret',
  '..%2F..%2F..%2Fetc%2Fpasswd',
  '%2E%2E',
  sha(PNG).toUpperCase(),
  sha(PNG).slice(1),
  `${sha(PNG)}.png`,
  `${sha(PNG).slice(0, 60)}%00abc`,
])(
  'a name that is not a lowercase SHA-256 (%s) is refused and nothing is written',
  async (name) => {
    const before = readdirSync(h.config.dataDir).sort();
    const res = await put(name, PNG);
    expect([400, 404]).toContain(res.status);
    expect(readdirSync(h.config.dataDir).sort()).toEqual(before);
  },
);
