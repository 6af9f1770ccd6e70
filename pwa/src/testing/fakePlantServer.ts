/**
 * A stand-in for the plant server's sync routes, as a `fetch` function: it applies each opId
 * at most once like the real one, keeps uploaded photos, and pages pull changes. Tests make
 * it misbehave through `interrupt` (fail, hang, answer 500 or 409 before handling a request).
 */
import type { PulledChange, PushOperation, PushResult } from '../api/types';

export interface FakeRequest {
  method: string;
  path: string;
  token?: string;
  init: RequestInit;
}

export type Interrupt = (
  request: FakeRequest,
) => Response | undefined | Promise<Response | undefined>;

export function json(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'content-type': 'application/json' },
  });
}

export function fakePlantServer(options: { changes?: PulledChange[] } = {}) {
  const applied = new Map<string, PushOperation>();
  const photos = new Map<string, Blob>();
  const requests: FakeRequest[] = [];
  const changes = options.changes ?? [];
  const validTokens = new Set(['token-a', 'token-b']);
  let rejectOp: (op: PushOperation) => string | undefined = () => undefined;
  let interrupt: Interrupt = () => undefined;

  async function push(body: { operations: PushOperation[] }): Promise<Response> {
    const results: PushResult[] = body.operations.map((op) => {
      if (applied.has(op.opId)) return { opId: op.opId, status: 'duplicate' };
      const reason = rejectOp(op);
      if (reason) return { opId: op.opId, status: 'rejected', reason };
      applied.set(op.opId, op);
      return { opId: op.opId, status: 'applied' };
    });
    return json(200, { results });
  }

  function pull(query: URLSearchParams): Response {
    const since = Number(query.get('since') ?? 0);
    const limit = Number(query.get('limit') ?? 500);
    const after = changes.filter((c) => c.seq > since);
    const page = after.slice(0, limit);
    const cursor = page.at(-1)?.seq ?? since;
    return json(200, { changes: page, cursor, more: after.length > page.length });
  }

  const fetch = async (input: RequestInfo | URL, init: RequestInit = {}): Promise<Response> => {
    const url = new URL(String(input), 'http://plant.test');
    const headers = new Headers(init.headers);
    const token = headers.get('authorization')?.replace(/^Bearer /, '');
    const request: FakeRequest = { method: init.method ?? 'GET', path: url.pathname, token, init };
    requests.push(request);
    const early = await interrupt(request);
    if (early) return early;
    if (url.pathname === '/api/auth/refresh') {
      validTokens.add('token-refreshed');
      return json(200, {
        accessToken: 'token-refreshed',
        refreshToken: 'refresh-2',
        expiresIn: 900,
        user: { id: 'u-a', name: 'A', email: 'a@demo.test', role: 'inspector', active: true },
      });
    }
    if (!token || !validTokens.has(token)) return json(401, { message: 'Unauthorized' });
    if (url.pathname === '/api/sync/push') return push(JSON.parse(String(init.body)));
    if (url.pathname === '/api/sync/pull') return pull(url.searchParams);
    const photo = /^\/api\/photos\/([0-9a-f]{64})$/.exec(url.pathname);
    if (photo?.[1] && init.method === 'PUT') {
      const file = (init.body as FormData).get('file');
      if (!(file instanceof Blob)) return json(400, { message: 'file is missing', field: 'file' });
      photos.set(photo[1], file);
      return json(201, { sha256: photo[1], mime: file.type, bytes: file.size });
    }
    return json(404, { message: `no route ${url.pathname}` });
  };

  return {
    fetch,
    applied,
    photos,
    requests,
    revokeToken: (token: string) => validTokens.delete(token),
    rejectWhen: (rule: typeof rejectOp) => (rejectOp = rule),
    interruptWith: (rule: Interrupt) => (interrupt = rule),
  };
}

export type FakePlantServer = ReturnType<typeof fakePlantServer>;
