import { randomUUID } from 'node:crypto';
import type { Role } from '../src/users/entities/user.entity.js';
import { rows, signIn, startApp, type Harness } from './harness.js';
import { lotOpen, part, released, tablet, type Tablet } from './ops.js';

/*
 * The bad-input catalogue: for every DTO, a valid body and a description of its fields; each
 * field then gets every kind of bad value (missing, wrong type, NaN and Infinity as strings, out
 * of range, huge strings, unknown fields). Each must be a 4xx that names the field, and must
 * leave nothing written.
 */
type Kind =
  | 'number'
  | 'integer'
  | 'string'
  | 'enum'
  | 'uuid'
  | 'boolean'
  | 'email'
  | 'date'
  | 'object'
  | 'array';
interface Field {
  path: string;
  kind: Kind;
  range?: [number, number];
  optional?: boolean;
  /** Where the error is reported, if not at `path`: an item of an array is reported on the array. */
  reported?: string;
}
type Body = Record<string, unknown>;

const clone = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

function set(body: Body, path: string, value: unknown): Body {
  const copy = clone(body);
  const keys = path.split('.');
  let at: Record<string, unknown> = copy;
  for (const key of keys.slice(0, -1)) at = at[key] as Record<string, unknown>;
  if (value === undefined) delete at[keys.at(-1)!];
  else at[keys.at(-1)!] = value;
  return copy;
}

const HUGE = 'x'.repeat(100_000);

/** Every bad variant of one field: [what, value]. */
function badValues(field: Field): [string, unknown][] {
  const out: [string, unknown][] = [];
  if (!field.optional) out.push(['missing', undefined]);
  const wrongType: Record<Kind, unknown> = {
    number: '5',
    integer: '5',
    string: 12345,
    enum: 12345,
    uuid: 12345,
    boolean: 'yes',
    email: 12345,
    date: 12345,
    object: 'text',
    array: 'text',
  };
  out.push(['wrong type', wrongType[field.kind]], ['null', null]);
  if (field.kind === 'number' || field.kind === 'integer') {
    out.push(['"NaN"', 'NaN'], ['"Infinity"', 'Infinity'], ['"-Infinity"', '-Infinity']);
    if (field.range) {
      const [lo, hi] = field.range;
      out.push(
        ['below range', lo - Math.max(1, Math.abs(lo))],
        ['above range', hi + Math.max(1, Math.abs(hi))],
      );
    }
    if (field.kind === 'integer') out.push(['fraction', 1.5]);
  }
  if (['string', 'enum', 'uuid', 'email', 'date'].includes(field.kind))
    out.push(['huge string', HUGE]);
  if (['enum', 'uuid', 'email', 'date'].includes(field.kind)) out.push(['malformed', 'not-valid']);
  if (field.kind === 'object') out.push(['unknown nested field', { unexpected: 1 }]);
  return out;
}

interface Case {
  name: string;
  role: Role | 'none';
  method: 'post' | 'put' | 'patch';
  path: () => string;
  valid: () => Body;
  fields: Field[];
}

let h: Harness;
const tokens = new Map<Role, string>();
const ids: Record<string, string> = {};
let t: Tablet;

beforeAll(async () => {
  h = await startApp();
  for (const role of ['inspector', 'supervisor', 'quality', 'admin'] as const) {
    tokens.set(role, (await signIn(h, `${role}@demo.test`)).accessToken);
  }
  const get = async (path: string) =>
    (await h.http().get(path).auth(tokens.get('quality')!, { type: 'bearer' }).expect(200)).body;
  const users = (await h.http().get('/api/users').auth(tokens.get('admin')!, { type: 'bearer' }))
    .body;
  ids.user = users[0].id;
  ids.press = (await get('/api/presses'))[0].id;
  const compound = (await get('/api/compounds'))[0];
  ids.compound = compound.id;
  ids.testSet = compound.currentFit.testSetIds[0];
  ids.fit = compound.currentFitId;
  const spec = (await get('/api/specs'))[0];
  ids.spec = spec.id;
  ids.lot = (await get('/api/lots'))[0].id;
  t = await tablet(h, 'inspector@demo.test');
});
afterAll(() => h.close());

const SPEC_BODY = () => ({
  geometry: { shape: 'disc', diameter: 60, thickness: 10 },
  bonded: true,
  compoundId: ids.compound,
  testDeflection: 1,
  loadTolerancePercent: 15,
  tolerance: { class: 'M2' },
  hardness: { nominal: 55, tolerance: 5 },
  compressionSetLimitPercent: 25,
  compressionSetCondition: { temperatureC: 70, hours: 22 },
  sampling: { level: 'II', aql: 2.5, severity: 'normal' },
  note: 'First issue',
});

const CASES: Case[] = [
  {
    name: 'LoginDto',
    role: 'none',
    method: 'post',
    path: () => '/api/auth/login',
    valid: () => ({
      email: 'quality@demo.test',
      password: 'whatever-it-is',
      deviceId: randomUUID(),
    }),
    fields: [
      { path: 'email', kind: 'email' },
      { path: 'password', kind: 'string' },
      { path: 'deviceId', kind: 'uuid', optional: true },
    ],
  },
  {
    name: 'RefreshDto',
    role: 'none',
    method: 'post',
    path: () => '/api/auth/refresh',
    valid: () => ({ refreshToken: `${randomUUID()}.${'a'.repeat(43)}` }),
    fields: [{ path: 'refreshToken', kind: 'string' }],
  },
  {
    name: 'CreateUserDto',
    role: 'admin',
    method: 'post',
    path: () => '/api/users',
    valid: () => ({
      email: 'new@demo.test',
      name: 'New',
      role: 'inspector',
      password: 'long-enough-9',
    }),
    fields: [
      { path: 'email', kind: 'email' },
      { path: 'name', kind: 'string' },
      { path: 'role', kind: 'enum' },
      { path: 'password', kind: 'string' },
    ],
  },
  {
    name: 'ChangeRoleDto',
    role: 'admin',
    method: 'patch',
    path: () => `/api/users/${ids.user}/role`,
    valid: () => ({ role: 'quality' }),
    fields: [{ path: 'role', kind: 'enum' }],
  },
  {
    name: 'CreatePressDto',
    role: 'admin',
    method: 'post',
    path: () => '/api/presses',
    valid: () => ({ code: 'P9', name: 'Press 9', kind: 'compression', clampForceKn: 1000 }),
    fields: [
      { path: 'code', kind: 'string' },
      { path: 'name', kind: 'string' },
      { path: 'kind', kind: 'enum' },
      { path: 'clampForceKn', kind: 'number', range: [1, 100_000], optional: true },
    ],
  },
  {
    name: 'UpdatePressDto',
    role: 'admin',
    method: 'patch',
    path: () => `/api/presses/${ids.press}`,
    valid: () => ({ name: 'Renamed', kind: 'transfer', clampForceKn: 900, active: true }),
    fields: [
      { path: 'name', kind: 'string', optional: true },
      { path: 'kind', kind: 'enum', optional: true },
      { path: 'clampForceKn', kind: 'number', range: [1, 100_000], optional: true },
      { path: 'active', kind: 'boolean', optional: true },
    ],
  },
  {
    name: 'CreateCompoundDto',
    role: 'quality',
    method: 'post',
    path: () => '/api/compounds',
    valid: () => ({
      code: 'C-9',
      name: 'Compound',
      polymer: 'NBR',
      hardnessShoreA: 60,
      bulkModulusMPa: 2000,
      notes: 'Supplier batch B',
    }),
    fields: [
      { path: 'code', kind: 'string' },
      { path: 'name', kind: 'string' },
      { path: 'polymer', kind: 'enum' },
      { path: 'hardnessShoreA', kind: 'number', range: [10, 95] },
      { path: 'bulkModulusMPa', kind: 'number', range: [100, 10_000], optional: true },
      { path: 'notes', kind: 'string', optional: true },
    ],
  },
  {
    name: 'UpdateCompoundDto',
    role: 'quality',
    method: 'patch',
    path: () => `/api/compounds/${ids.compound}`,
    valid: () => ({
      name: 'Renamed',
      polymer: 'EPDM',
      hardnessShoreA: 62,
      bulkModulusMPa: 2100,
      notes: 'Re-tested',
    }),
    fields: [
      { path: 'name', kind: 'string', optional: true },
      { path: 'polymer', kind: 'enum', optional: true },
      { path: 'hardnessShoreA', kind: 'number', range: [10, 95], optional: true },
      { path: 'bulkModulusMPa', kind: 'number', range: [100, 10_000], optional: true },
      { path: 'notes', kind: 'string', optional: true },
    ],
  },
  {
    name: 'CreateAgingSetDto',
    role: 'quality',
    method: 'post',
    path: () => `/api/compounds/${ids.compound}/aging`,
    valid: () => ({
      name: 'Set at 70 °C, 100 °C, 125 °C',
      thresholdPercent: 40,
      points: [
        { temperatureC: 70, hours: 5000 },
        { temperatureC: 100, hours: 900 },
        { temperatureC: 125, hours: 200 },
      ],
    }),
    fields: [
      { path: 'name', kind: 'string' },
      { path: 'thresholdPercent', kind: 'number', range: [0, 100] },
      { path: 'points', kind: 'array' },
      { path: 'points.0.temperatureC', kind: 'number', range: [-100, 400] },
      { path: 'points.2.hours', kind: 'number', range: [0, 1_000_000] },
    ],
  },
  {
    name: 'PublishFitDto',
    role: 'quality',
    method: 'post',
    path: () => `/api/compounds/${ids.compound}/fits/${ids.fit}/publish`,
    valid: () => ({ note: 'Re-fitted with planar data' }),
    fields: [{ path: 'note', kind: 'string', optional: true }],
  },
  {
    name: 'CreateTestSetDto',
    role: 'quality',
    method: 'post',
    path: () => `/api/compounds/${ids.compound}/test-sets`,
    valid: () => ({
      name: 'uniaxial',
      mode: 'uniaxial',
      temperatureC: 23,
      points: [
        { stretch: 1.1, stress: 0.2 },
        { stretch: 1.5, stress: 0.6 },
      ],
    }),
    fields: [
      { path: 'name', kind: 'string' },
      { path: 'mode', kind: 'enum' },
      { path: 'temperatureC', kind: 'number', range: [-80, 300], optional: true },
      { path: 'points', kind: 'array' },
      { path: 'points.0.stretch', kind: 'number', range: [0.05, 20] },
      { path: 'points.1.stress', kind: 'number', range: [-500, 500] },
    ],
  },
  {
    name: 'CreateFitDto',
    role: 'quality',
    method: 'post',
    path: () => `/api/compounds/${ids.compound}/fits`,
    valid: () => ({
      model: { kind: 'mooney-rivlin', c10: 0.3, c01: 0.05 },
      testSetIds: [ids.testSet],
      objective: 'relative',
      weights: { uniaxial: 1, equibiaxial: 0.5, planar: 2 },
    }),
    fields: [
      { path: 'model', kind: 'object' },
      { path: 'model.kind', kind: 'enum' },
      { path: 'model.c10', kind: 'number', range: [-1000, 1000] },
      { path: 'testSetIds', kind: 'array' },
      { path: 'objective', kind: 'enum' },
      { path: 'weights', kind: 'object', optional: true },
      { path: 'weights.uniaxial', kind: 'number', range: [0, 1000], optional: true },
      { path: 'weights.planar', kind: 'number', range: [0, 1000], optional: true },
    ],
  },
  {
    name: 'CreateSpecDto',
    role: 'quality',
    method: 'post',
    path: () => '/api/specs',
    valid: () => ({ partNumber: 'PN-9', name: 'Part', description: 'A part' }),
    fields: [
      { path: 'partNumber', kind: 'string' },
      { path: 'name', kind: 'string' },
      { path: 'description', kind: 'string', optional: true },
    ],
  },
  {
    name: 'SpecBody',
    role: 'quality',
    method: 'post',
    path: () => `/api/specs/${ids.spec}/revisions`,
    valid: SPEC_BODY,
    fields: [
      { path: 'geometry', kind: 'object' },
      { path: 'geometry.shape', kind: 'enum' },
      { path: 'geometry.diameter', kind: 'number', range: [0.5, 3000] },
      { path: 'geometry.thickness', kind: 'number', range: [0.2, 500] },
      { path: 'bonded', kind: 'boolean' },
      { path: 'compoundId', kind: 'uuid' },
      { path: 'testDeflection', kind: 'number', range: [0.01, 200] },
      { path: 'loadTolerancePercent', kind: 'number', range: [0.5, 50] },
      { path: 'tolerance', kind: 'object' },
      { path: 'tolerance.class', kind: 'enum' },
      { path: 'hardness', kind: 'object' },
      { path: 'hardness.nominal', kind: 'number', range: [20, 90] },
      { path: 'hardness.tolerance', kind: 'number', range: [1, 15] },
      { path: 'compressionSetLimitPercent', kind: 'number', range: [1, 100], optional: true },
      { path: 'compressionSetCondition', kind: 'object', optional: true },
      { path: 'compressionSetCondition.temperatureC', kind: 'number', range: [-100, 400] },
      { path: 'compressionSetCondition.hours', kind: 'number', range: [0, 100_000] },
      { path: 'note', kind: 'string', optional: true },
      { path: 'sampling', kind: 'object' },
      { path: 'sampling.level', kind: 'enum' },
      { path: 'sampling.aql', kind: 'enum' },
      { path: 'sampling.severity', kind: 'enum' },
    ],
  },
  {
    name: 'DispositionDto',
    role: 'supervisor',
    method: 'post',
    path: () => `/api/lots/${ids.lot}/dispositions`,
    valid: () => ({ action: 'hold', note: 'Hold for review' }),
    fields: [
      { path: 'action', kind: 'enum' },
      { path: 'note', kind: 'string' },
    ],
  },
  {
    name: 'TestMailDto',
    role: 'admin',
    method: 'post',
    path: () => '/api/admin/mail/test',
    valid: () => ({ to: 'someone@demo.test' }),
    fields: [{ path: 'to', kind: 'email' }],
  },
  {
    name: 'ReopenDto',
    role: 'supervisor',
    method: 'post',
    path: () => `/api/lots/${ids.lot}/reopen`,
    valid: () => ({ note: 'Re-check' }),
    fields: [{ path: 'note', kind: 'string' }],
  },
];

const written = async () => ({
  audit: await rows(h, 'audit_log'),
  changes: await rows(h, 'change_log'),
  sessions: await rows(h, 'sessions'),
});

describe.each(CASES)('$name', (c) => {
  const send = (body: unknown) => {
    const req = h.http()[c.method](c.path());
    return (c.role === 'none' ? req : req.auth(tokens.get(c.role)!, { type: 'bearer' })).send(
      body as object,
    );
  };
  const variants = () => [
    ...c.fields.flatMap((field) =>
      badValues(field).map(([what, value]) => ({
        field: field.path,
        what,
        body: set(c.valid(), field.path, value),
      })),
    ),
    { field: 'unexpected', what: 'unknown field', body: { ...c.valid(), unexpected: 'x' } },
  ];

  test('every bad variant is a 4xx naming the field, and nothing is written', async () => {
    const before = await written();
    const failures: string[] = [];
    for (const v of variants()) {
      const res = await send(v.body);
      const named = (res.body.fields ?? []).some(
        (f: { field: string }) => f.field === v.field || f.field.startsWith(`${v.field}.`),
      );
      if (res.status < 400 || res.status >= 500 || !named) {
        failures.push(
          `${v.field} ${v.what}: ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`,
        );
      }
    }
    expect(failures).toEqual([]);
    expect(await written()).toEqual(before);
  });
});

describe.each([
  [
    '/api/lots',
    { status: 'open', flagged: 'true', pressId: randomUUID(), limit: '10' },
    ['status', 'flagged', 'pressId', 'specId', 'from', 'to', 'limit'],
  ],
  ['/api/audit', { entity: 'lot', limit: '5' }, ['entity', 'entityId', 'before', 'limit']],
  ['/api/sync/pull', { since: '0', limit: '10' }, ['since', 'limit']],
] as const)('query of %s', (path, valid, fields) => {
  test('bad values and unknown parameters are 400s naming the parameter', async () => {
    const failures: string[] = [];
    const token = tokens.get('quality')!;
    await h.http().get(path).query(valid).auth(token, { type: 'bearer' }).expect(200);
    for (const field of [...fields, 'unexpected']) {
      for (const value of ['NaN', 'Infinity', '-5', '99999999999', HUGE.slice(0, 5000), '1.5']) {
        if (field === 'unexpected' && value !== 'NaN') continue;
        if (['entity', 'entityId'].includes(field) && value.length < 100) continue;
        const res = await h
          .http()
          .get(path)
          .query({ ...valid, [field]: value })
          .auth(token, { type: 'bearer' });
        const named = (res.body.fields ?? []).some((f: { field: string }) => f.field === field);
        if (res.status !== 400 || !named)
          failures.push(`${field}=${value.slice(0, 12)}: ${res.status}`);
      }
    }
    expect(failures).toEqual([]);
  });
});

describe('sync push', () => {
  test('a bad envelope is a 400 naming the field, and nothing is written', async () => {
    const r = await released(h, t.token);
    const { lotId, op } = lotOpen(t, r);
    const valid = { deviceId: t.deviceId, operations: [op, part(t, r, lotId, 1)] };
    const before = { ...(await written()), ops: await rows(h, 'applied_ops') };
    const failures: string[] = [];
    const envelope: Field[] = [
      { path: 'deviceId', kind: 'uuid' },
      { path: 'operations', kind: 'array' },
      { path: 'operations.1.opId', kind: 'uuid' },
      { path: 'operations.1.authorId', kind: 'uuid' },
      { path: 'operations.1.recordedAt', kind: 'date' },
    ];
    for (const field of envelope) {
      for (const [what, value] of badValues(field)) {
        const res = await h
          .http()
          .post('/api/sync/push')
          .auth(t.token, { type: 'bearer' })
          .send(set(valid, field.path, value));
        const named = (res.body.fields ?? []).some(
          (f: { field: string }) => f.field === field.path,
        );
        if (res.status !== 400 || !named)
          failures.push(
            `${field.path} ${what}: ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`,
          );
      }
    }
    const tooMany = {
      deviceId: t.deviceId,
      operations: Array.from({ length: 501 }, () => part(t, r, lotId, 1)),
    };
    const many = await h
      .http()
      .post('/api/sync/push')
      .auth(t.token, { type: 'bearer' })
      .send(tooMany);
    if (many.status !== 400 || many.body.field !== 'operations')
      failures.push(`501 operations: ${many.status}`);
    expect(failures).toEqual([]);
    expect({ ...(await written()), ops: await rows(h, 'applied_ops') }).toEqual(before);
  });

  test('a bad payload rejects that operation with the field in its reason, and writes nothing', async () => {
    const r = await released(h, t.token);
    const { lotId, op } = lotOpen(t, r);
    await t.push([op]);
    const before = { inspections: await rows(h, 'inspections'), ops: await rows(h, 'applied_ops') };
    const payloadFields: Field[] = [
      { path: 'id', kind: 'uuid' },
      { path: 'lotId', kind: 'uuid' },
      { path: 'sampleIndex', kind: 'integer', range: [1, 2000] },
      { path: 'supersedes', kind: 'uuid', optional: true },
      { path: 'measurements', kind: 'object' },
      { path: 'measurements.thickness', kind: 'number', range: [0.05, 500], optional: true },
      { path: 'measurements.load', kind: 'number', range: [0, 10_000_000], optional: true },
      { path: 'measurements.hardness', kind: 'array', optional: true },
      {
        path: 'measurements.hardness.0',
        kind: 'number',
        range: [0, 100],
        reported: 'measurements.hardness',
      },
      { path: 'deviceVerdict', kind: 'object' },
      { path: 'deviceVerdict.status', kind: 'enum' },
      { path: 'deviceVerdict.conforming', kind: 'boolean' },
    ];
    const failures: string[] = [];
    for (const field of payloadFields) {
      for (const [what, value] of badValues(field)) {
        const bad = part(t, r, lotId, 1);
        bad.payload = set(bad.payload, field.path, value);
        const { status, body } = await t.push([bad]);
        const result = body.results?.[0];
        if (
          status !== 200 ||
          result?.status !== 'rejected' ||
          !result.reason?.includes(`payload.${field.reported ?? field.path}`)
        ) {
          failures.push(`${field.path} ${what}: ${status} ${JSON.stringify(result).slice(0, 160)}`);
        }
      }
    }
    expect(failures).toEqual([]);
    expect({
      inspections: await rows(h, 'inspections'),
      ops: await rows(h, 'applied_ops'),
    }).toEqual(before);
  });
});
