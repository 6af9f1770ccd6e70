/** The server's base path; the PWA is served by the same origin in production and dev. */
export const API_BASE = '/api';

const DEFAULT_TIMEOUT_MS = 15_000;

/** The server answered, but not with 2xx. `reason` is the server's own words. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly reason: string,
    readonly field?: string,
  ) {
    super(`${status}: ${reason}`);
    this.name = 'ApiError';
  }

  /** Worth retrying later: the server or something in front of it is struggling. */
  get retryable(): boolean {
    return this.status >= 500 || this.status === 429 || this.status === 408;
  }
}

/** No answer at all: offline, DNS, reset connection or our own timeout. */
export class NetworkError extends Error {
  constructor(readonly reason: string) {
    super(reason);
    this.name = 'NetworkError';
  }
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Sent as JSON unless it is FormData. */
  body?: unknown;
  token?: string;
  timeoutMs?: number;
  signal?: AbortSignal;
  /** 'blob' for photos and files: the body is handed over as it came. */
  expect?: 'data' | 'blob';
}

/** Nest's error body: `{ message: string | string[], field?, error? }`. */
function reasonFrom(body: unknown, fallback: string): { reason: string; field?: string } {
  if (body && typeof body === 'object') {
    const { message, field } = body as { message?: unknown; field?: unknown };
    const text = Array.isArray(message) ? message.join('; ') : message;
    if (typeof text === 'string' && text) {
      return { reason: text, field: typeof field === 'string' ? field : undefined };
    }
  }
  return { reason: fallback };
}

async function parseBody(response: Response, expect: RequestOptions['expect']): Promise<unknown> {
  const type = response.headers.get('content-type') ?? '';
  if (response.status === 204) return undefined;
  if (expect === 'blob' && response.ok) return response.blob();
  if (type.includes('application/json')) return response.json();
  return response.text();
}

/**
 * The one place that talks HTTP to the plant server: JSON in and out, a bearer token,
 * a timeout (a hung Wi-Fi link must not block the outbox forever) and typed errors.
 */
export async function request<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const { method = 'GET', body, token, timeoutMs = DEFAULT_TIMEOUT_MS, signal, expect } = options;
  const headers: Record<string, string> = { accept: 'application/json' };
  if (token) headers.authorization = `Bearer ${token}`;
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  if (body !== undefined && !isForm) headers['content-type'] = 'application/json';

  const timeout = AbortSignal.timeout(timeoutMs);
  const combined = signal ? AbortSignal.any([signal, timeout]) : timeout;
  let response: Response;
  try {
    response = await fetch(`${API_BASE}${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : isForm ? (body as FormData) : JSON.stringify(body),
      signal: combined,
    });
  } catch (error) {
    if (timeout.aborted) throw new NetworkError(`no answer within ${timeoutMs / 1000} s`);
    if (signal?.aborted) throw error;
    throw new NetworkError(error instanceof Error ? error.message : 'network error');
  }
  let parsed: unknown;
  try {
    parsed = await parseBody(response, expect);
  } catch {
    parsed = undefined;
  }
  if (!response.ok) {
    const { reason, field } = reasonFrom(parsed, response.statusText || `HTTP ${response.status}`);
    throw new ApiError(response.status, reason, field);
  }
  return parsed as T;
}
