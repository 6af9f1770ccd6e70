import { randomUUID } from 'node:crypto';
import { signIn, startApp, type Harness } from './harness.js';
import { lotOpen, part, released, tablet, type Released, type Tablet } from './ops.js';

let h: Harness;
let t: Tablet;
let r: Released;
let admin: string;
beforeAll(async () => {
  h = await startApp();
  t = await tablet(h, 'inspector@demo.test');
  r = await released(h, t.token);
  admin = (await signIn(h, 'admin@demo.test')).accessToken;
});
afterAll(() => h.close());

const messagesAbout = async (lotNumber: string) => {
  const res = await h.http().get('/api/admin/mail').auth(admin, { type: 'bearer' }).expect(200);
  return (res.body as { subject: string; to: string; text: string }[]).filter((m) =>
    m.subject.includes(lotNumber),
  );
};

async function settled(lotNumber: string) {
  for (let i = 0; i < 100 && (await messagesAbout(lotNumber)).length === 0; i++) {
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  // Give a second message, if one were coming, the time to arrive.
  await new Promise((resolve) => setTimeout(resolve, 500));
  return messagesAbout(lotNumber);
}

test('a lot the server flags mails the supervisors exactly once, however often it is pushed', async () => {
  const { lotId, op } = lotOpen(t, r, 10); // sample 5, rejected at 1 nonconforming part
  const lotNumber = op.payload.lotNumber as string;
  const batch = [op, part(t, r, lotId, 1), part(t, r, lotId, 2, 1.7)];
  await t.push(batch);
  await t.push(batch);
  await t.push([part(t, r, lotId, 3, 0.4)]);
  const mail = await settled(lotNumber);
  expect(mail).toHaveLength(1);
  expect(mail[0]!.to).toBe('supervisor@demo.test');
  expect(mail[0]!.text).toContain(`Lot ${lotNumber}`);
});

test('a critical defect on a sampled part flags the lot and mails once', async () => {
  const { lotId, op } = lotOpen(t, r, 200); // sample 32, rejected at 3 — but a critical defect rejects at once
  const lotNumber = op.payload.lotNumber as string;
  const sampled = part(t, r, lotId, 1);
  const defect = t.op('defect.record', {
    id: randomUUID(),
    lotId,
    inspectionId: sampled.payload.id,
    type: 'bond-failure',
    location: 'flexing',
    severity: 'critical',
    note: 'rubber–metal bond open along one edge',
  });
  const { body } = await t.push([op, sampled, defect]);
  expect(body.results.map((x) => x.status)).toEqual(['applied', 'applied', 'applied']);
  const lot = await h
    .http()
    .get(`/api/lots/${lotId}`)
    .auth(t.token, { type: 'bearer' })
    .expect(200);
  expect(lot.body.serverVerdict).toBe('flagged');
  expect(lot.body.verdictReason).toMatch(/critical defect/);
  expect(await settled(lotNumber)).toHaveLength(1);
});

test('the settings say where mail goes and who gets flagged lots, without credentials', async () => {
  const res = await h
    .http()
    .get('/api/admin/mail/settings')
    .auth(admin, { type: 'bearer' })
    .expect(200);
  expect(res.body).toMatchObject({
    transport: 'local',
    flaggedLotRecipients: ['supervisor@demo.test'],
  });
  expect(res.body.server).toMatch(/^smtp:\/\/127\.0\.0\.1:\d+$/);
  expect(res.body.queue).toEqual({
    sent: expect.any(Number),
    waiting: expect.any(Number),
    failed: 0,
  });
});

test('a test message goes through the real SMTP conversation to the local server, audited', async () => {
  await h
    .http()
    .post('/api/admin/mail/test')
    .auth(admin, { type: 'bearer' })
    .send({ to: 'someone@demo.test' })
    .expect(202);
  const mail = await settled('Gumshoe test message');
  expect(mail.map((m) => m.to)).toEqual(['someone@demo.test']);
  const audit = await h
    .http()
    .get('/api/audit?entity=mail')
    .auth(admin, { type: 'bearer' })
    .expect(200);
  expect(audit.body[0]).toMatchObject({ action: 'mail.test', after: { to: 'someone@demo.test' } });
  for (const body of [{}, { to: 'not an address' }, { to: 'a@b.test', cc: 'x' }]) {
    const bad = await h
      .http()
      .post('/api/admin/mail/test')
      .auth(admin, { type: 'bearer' })
      .send(body);
    expect(bad.status).toBe(400);
  }
});
