import type { ApiErrorBody } from '@shared/schemas/common';

/** An error the API answered with; `fields` holds per-field messages for forms. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly body: ApiErrorBody,
  ) {
    super(body.message);
    this.name = 'ApiError';
  }
  get fields() {
    return this.body.fields ?? {};
  }
}

export const OFFLINE_MESSAGE = 'Can’t reach the server, what you typed is kept. Try again in a moment.';

/**
 * The request never reached the server, no answer came back, or the server said it cannot reach
 * its database (503): nothing was saved, and trying again is safe.
 */
export class NetworkError extends Error {
  constructor(readonly retryAfterSeconds: number | null = null) {
    super(OFFLINE_MESSAGE);
    this.name = 'NetworkError';
  }
}

let onUnauthorized: (() => void) | null = null;
/** The app decides what a 401 means (back to sign-in); set once by the providers. */
export function setUnauthorizedHandler(handler: () => void) {
  onUnauthorized = handler;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

async function request<T>(method: Method, url: string, body?: unknown, init: RequestInit = {}): Promise<T> {
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      credentials: 'same-origin',
      headers: body === undefined || isForm ? { Accept: 'application/json' } : { 'Content-Type': 'application/json', Accept: 'application/json' },
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
      ...init,
    });
  } catch (error) {
    if ((error as Error).name === 'AbortError') throw error;
    throw new NetworkError();
  }
  if (res.status === 503) {
    const retryAfter = Number(res.headers.get('Retry-After'));
    throw new NetworkError(Number.isFinite(retryAfter) && retryAfter > 0 ? retryAfter : null);
  }
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const data = text ? safeJson(text) : undefined;
  if (!res.ok) {
    const errorBody: ApiErrorBody =
      data && typeof data === 'object' && 'message' in data ? (data as ApiErrorBody) : { error: 'http_' + res.status, message: `The server answered ${res.status}.` };
    if (res.status === 401 && !url.startsWith('/api/auth/')) onUnauthorized?.();
    throw new ApiError(res.status, errorBody);
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** The one API helper every feature uses. */
export const api = {
  get: <T>(url: string, init?: RequestInit) => request<T>('GET', url, undefined, init),
  post: <T>(url: string, body?: unknown) => request<T>('POST', url, body ?? {}),
  put: <T>(url: string, body?: unknown) => request<T>('PUT', url, body),
  patch: <T>(url: string, body?: unknown) => request<T>('PATCH', url, body),
  delete: <T = void>(url: string) => request<T>('DELETE', url),
};

/** Builds `?a=1&b=2` from defined values. */
export function toQuery(params: Record<string, string | number | boolean | undefined | null>) {
  const search = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== null && v !== '') search.set(k, String(v));
  const s = search.toString();
  return s ? `?${s}` : '';
}
