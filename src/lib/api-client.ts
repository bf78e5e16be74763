import type { Problem } from '@shared/problem';
import { ApiError } from './problem';

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/**
 * Listeners told about a 401 anywhere but the sign-in calls: `fromMe` when it was the signed-in check itself
 * (GET /auth/me, which answers a 401 as "nobody" rather than as an error).
 */
type UnauthorizedListener = (how: { fromMe: boolean }) => void;
const unauthorizedListeners = new Set<UnauthorizedListener>();
export function onUnauthorized(fn: UnauthorizedListener) {
  unauthorizedListeners.add(fn);
  return () => {
    unauthorizedListeners.delete(fn);
  };
}
export function notifyUnauthorized(how: { fromMe: boolean }) {
  unauthorizedListeners.forEach((fn) => fn(how));
}

/** Listeners told when the person whose session ended signs in again in place (a refused preview sends again). */
const resumedListeners = new Set<() => void>();
export function onSessionResumed(fn: () => void) {
  resumedListeners.add(fn);
  return () => {
    resumedListeners.delete(fn);
  };
}
export function notifySessionResumed() {
  resumedListeners.forEach((fn) => fn());
}

async function request<T>(method: Method, path: string, body?: unknown, init: RequestInit = {}): Promise<T> {
  const headers: Record<string, string> = { accept: 'application/json' };
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  if (body !== undefined && !isForm) headers['content-type'] = 'application/json';
  if (method !== 'GET') headers['x-trayline-csrf'] = '1';
  let res: Response;
  try {
    res = await fetch(`/api${path}`, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? (body as FormData) : JSON.stringify(body),
      ...init,
    });
  } catch {
    throw new ApiError({
      type: 'about:blank',
      title: 'Offline',
      status: 0,
      code: 'network',
      detail: 'Cannot reach Trayline. Check the connection and try again.',
    });
  }
  if (res.status === 204) return undefined as T;
  const type = res.headers.get('content-type') ?? '';
  const data = type.includes('json') ? await res.json() : await res.text();
  if (!res.ok) {
    const problem: Problem =
      typeof data === 'object' && data && 'status' in data
        ? (data as Problem)
        : { type: 'about:blank', title: res.statusText, status: res.status, code: 'http', detail: String(data) };
    if (res.status === 401 && !path.startsWith('/auth/')) notifyUnauthorized({ fromMe: false });
    throw new ApiError(problem);
  }
  return data as T;
}

export const api = {
  get: <T>(path: string, init?: RequestInit) => request<T>('GET', path, undefined, init),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, body ?? {}),
  put: <T>(path: string, body?: unknown) => request<T>('PUT', path, body ?? {}),
  patch: <T>(path: string, body?: unknown) => request<T>('PATCH', path, body ?? {}),
  delete: <T>(path: string) => request<T>('DELETE', path),
};

/** Builds a query string from defined values. */
export function qs(params: Record<string, string | number | boolean | undefined | null>): string {
  const p = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== null && v !== '') p.set(k, String(v));
  const s = p.toString();
  return s ? `?${s}` : '';
}
