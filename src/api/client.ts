/**
 * The one HTTP client. JSON in and out; failures become ApiRequestError with the server's code,
 * message ("field: rule") and field list. State-changing requests carry the CSRF token.
 */
export interface FieldIssue {
  field: string;
  message: string;
}

export class ApiRequestError extends Error {
  override name = 'ApiRequestError';
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: FieldIssue[] = [],
  ) {
    super(message);
  }
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

let csrfToken: string | null = null;

async function fetchCsrfToken(): Promise<string> {
  const res = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
  if (!res.ok) throw new ApiRequestError(res.status, 'csrf_unavailable', 'could not get a CSRF token');
  csrfToken = ((await res.json()) as { token: string }).token;
  return csrfToken;
}

/** Forget the token (after sign-in or sign-out the session changes). */
export function resetCsrfToken(): void {
  csrfToken = null;
}

async function toError(res: Response): Promise<ApiRequestError> {
  const body = (await res.json().catch(() => null)) as {
    error?: { code?: string; message?: string; fields?: FieldIssue[] };
  } | null;
  const e = body?.error;
  return new ApiRequestError(res.status, e?.code ?? 'http_error', e?.message ?? `${res.status} ${res.statusText}`, e?.fields ?? []);
}

export async function request<T>(method: Method, path: string, body?: unknown, retried = false): Promise<T> {
  const headers: Record<string, string> = { accept: 'application/json' };
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  if (body !== undefined && !isForm) headers['content-type'] = 'application/json';
  if (method !== 'GET') headers['x-csrf-token'] = csrfToken ?? (await fetchCsrfToken());
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? (body as FormData) : JSON.stringify(body),
    });
  } catch {
    throw new ApiRequestError(0, 'network', 'The server could not be reached. Check your connection and try again.');
  }
  if (!res.ok) {
    const err = await toError(res);
    if (err.code === 'csrf_invalid' && !retried) {
      resetCsrfToken();
      return request<T>(method, path, body, true);
    }
    throw err;
  }
  if (res.status === 204) return undefined as T;
  const type = res.headers.get('content-type') ?? '';
  return (type.includes('json') ? await res.json() : await res.text()) as T;
}

export const api = {
  get: <T>(path: string) => request<T>('GET', path),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, body ?? {}),
  put: <T>(path: string, body: unknown) => request<T>('PUT', path, body),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, body),
  delete: <T>(path: string) => request<T>('DELETE', path),
};
