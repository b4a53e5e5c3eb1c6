// The one HTTP client of the app: JSON in and out, the CSRF header on writes, typed errors.

export interface ApiErrorBody {
  code: string;
  message: string;
  details?: unknown;
}

/** An answer from the API that was not 2xx, with its error shape. */
export class ApiError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly details?: unknown,
  ) {
    super(message);
  }
}

let csrfToken: string | null = null;
/** The session query hands the current token over here. */
export function setCsrfToken(token: string | null) {
  csrfToken = token;
}

async function fetchCsrfToken(): Promise<string> {
  const res = await fetch('/api/session', { credentials: 'same-origin' });
  const body = (await res.json()) as { csrfToken: string };
  csrfToken = body.csrfToken;
  return csrfToken;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

/** Options of a read: an AbortSignal, which TanStack Query fires when the read is cancelled or no longer wanted. */
export interface ReadOptions {
  signal?: AbortSignal;
}

async function request<T>(method: Method, path: string, body?: unknown, signal?: AbortSignal, retried = false): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers['X-CSRF-Token'] = await currentCsrfToken();
  const res = await fetch(path, {
    method,
    headers,
    credentials: 'same-origin',
    body: body === undefined ? undefined : JSON.stringify(body),
    signal,
  });
  if (res.status === 204) return undefined as T;
  const parsed = parseJson(await res.text());
  if (!res.ok) {
    const err = toApiError(res.status, parsed);
    if (isCsrfFailure(err) && !retried) {
      await fetchCsrfToken();
      return request<T>(method, path, body, signal, true);
    }
    throw err;
  }
  return parsed as T;
}

const currentCsrfToken = async () => csrfToken ?? (await fetchCsrfToken());

function parseJson(text: string): unknown {
  try {
    return text ? JSON.parse(text) : null;
  } catch {
    return null;
  }
}

function toApiError(status: number, parsed: unknown): ApiError {
  const err = (parsed as { error?: ApiErrorBody } | null)?.error;
  return new ApiError(status, err?.code ?? 'http_error', err?.message ?? `Request failed (${status})`, err?.details);
}

const isCsrfFailure = (err: ApiError) => err.status === 403 && err.code === 'csrf_failed';

export const api = {
  get: <T>(path: string, options: ReadOptions = {}) => request<T>('GET', path, undefined, options.signal),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, body ?? {}),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, body),
  put: <T>(path: string, body: unknown) => request<T>('PUT', path, body),
  delete: <T>(path: string) => request<T>('DELETE', path),
};

/** Options of `upload`: an AbortSignal to cancel the request. */
export interface UploadOptions {
  signal?: AbortSignal;
}

/**
 * POST multipart form data with upload progress (0–1), which fetch cannot report; same CSRF header,
 * same one retry on a stale token, same ApiError on failure (status 0, code `network_error`, when no answer came).
 */
export async function upload<T>(
  path: string,
  formData: FormData,
  onProgress?: (fraction: number) => void,
  options: UploadOptions = {},
): Promise<T> {
  const send = (token: string) =>
    new Promise<T>((resolve, reject) => {
      const xhr = new XMLHttpRequest();
      xhr.open('POST', path);
      xhr.withCredentials = true;
      xhr.setRequestHeader('Accept', 'application/json');
      xhr.setRequestHeader('X-CSRF-Token', token);
      xhr.upload.onprogress = (e) => {
        if (e.lengthComputable && e.total > 0) onProgress?.(Math.min(1, e.loaded / e.total));
      };
      xhr.upload.onload = () => onProgress?.(1);
      xhr.onload = () => {
        const parsed = parseJson(xhr.responseText);
        if (xhr.status >= 200 && xhr.status < 300) resolve(parsed as T);
        else reject(toApiError(xhr.status, parsed));
      };
      xhr.onerror = () =>
        reject(new ApiError(0, 'network_error', 'The upload did not reach Scanwright; check the connection and try again.'));
      xhr.onabort = () => reject(new ApiError(0, 'aborted', 'The upload was cancelled.'));
      if (options.signal?.aborted) return reject(new ApiError(0, 'aborted', 'The upload was cancelled.'));
      options.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
      onProgress?.(0);
      xhr.send(formData);
    });
  try {
    return await send(await currentCsrfToken());
  } catch (err) {
    if (!(err instanceof ApiError) || !isCsrfFailure(err)) throw err;
    return send(await fetchCsrfToken());
  }
}

/** Build a query string from defined values only. */
export function toQuery(params: Record<string, string | number | boolean | undefined | null>): string {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== null && v !== '') q.set(k, String(v));
  const s = q.toString();
  return s ? `?${s}` : '';
}
