import { isApiErrorBody, type ApiErrorBody, type SessionResponse } from '@skyledger/contracts';
import { env } from '@/config/env';

/** The one error the API client throws; `status` 0 means the server could not be reached. */
export class ApiError extends Error {
  readonly status: number;
  readonly body: ApiErrorBody;

  constructor(status: number, body: ApiErrorBody) {
    super(body.message);
    this.name = 'ApiError';
    this.status = status;
    this.body = body;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions {
  method?: Method;
  /** JSON-encoded, except FormData, which goes as multipart with the browser's boundary. */
  body?: unknown;
  /** How to read a successful answer: JSON (default) or the raw bytes, e.g. a file. */
  responseType?: 'json' | 'blob';
  /** Query string parameters; undefined values are left out. */
  params?: Record<string, string | number | undefined>;
  /** Send the access token and refresh it on a 401 (default true). */
  auth?: boolean;
  signal?: AbortSignal;
  /** For a multipart upload: how much of the body has gone up, from 0 to 1. */
  onUploadProgress?: (fraction: number) => void;
}

export interface SessionEvents {
  /** A 401 was answered by a successful refresh: the token and perhaps the person changed. */
  onRefreshed: (session: SessionResponse) => void;
  /** The refresh failed: the session is over and the person must sign in again. */
  onExpired: () => void;
}

// The access token lives in memory only: a page reload restores it from the
// httpOnly refresh cookie, so script on the page can never read a long-lived secret.
let accessToken: string | null = null;
let refreshInFlight: Promise<SessionResponse> | null = null;
let sessionEvents: SessionEvents = { onRefreshed: () => {}, onExpired: () => {} };

export function setAccessToken(token: string | null): void {
  accessToken = token;
}

export function setSessionEvents(events: SessionEvents): void {
  sessionEvents = events;
}

function buildUrl(path: string, params: RequestOptions['params']): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params ?? {})) {
    if (value !== undefined) query.set(key, String(value));
  }
  const search = query.toString();
  return `${env.apiUrl}${path}${search ? `?${search}` : ''}`;
}

function fallbackBody(response: Response): ApiErrorBody {
  const message =
    response.status >= 500
      ? `The desk server ran into a problem (${response.status}). Try again in a moment.`
      : `The desk server answered with an unexpected error (${response.status}).`;
  return { statusCode: response.status, error: response.statusText || 'Error', message };
}

async function toApiError(response: Response): Promise<ApiError> {
  const body: unknown = await response.json().catch(() => undefined);
  return new ApiError(response.status, isApiErrorBody(body) ? body : fallbackBody(response));
}

/** The answer of an XMLHttpRequest as a fetch Response, so one parser reads both. */
function responseOf(xhr: XMLHttpRequest): Response {
  const headers = new Headers();
  for (const line of xhr
    .getAllResponseHeaders()
    .trim()
    .split(/[\r\n]+/)) {
    const at = line.indexOf(':');
    if (at > 0) headers.append(line.slice(0, at).trim(), line.slice(at + 1).trim());
  }
  // A 204 or 205 may not carry a body.
  const body = [204, 205].includes(xhr.status) ? null : (xhr.response as Blob);
  return new Response(body, { status: xhr.status, statusText: xhr.statusText, headers });
}

/**
 * fetch cannot tell how much of an upload has gone; XMLHttpRequest can. Only uploads
 * that show their progress go this way, with the same headers and the same answer.
 */
function sendWithProgress(
  url: string,
  method: Method,
  headers: Headers,
  body: FormData,
  onProgress: (fraction: number) => void,
  signal: AbortSignal | undefined,
): Promise<Response> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(method, url);
    headers.forEach((value, name) => xhr.setRequestHeader(name, value));
    xhr.responseType = 'blob';
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      onProgress(1);
      resolve(responseOf(xhr));
    };
    xhr.onerror = () => reject(new TypeError('The upload failed on the network'));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(body);
  });
}

async function send(
  path: string,
  options: RequestOptions,
  token: string | null,
): Promise<Response> {
  const multipart = options.body instanceof FormData;
  const headers = new Headers({
    Accept: options.responseType === 'blob' ? '*/*' : 'application/json',
  });
  if (options.body !== undefined && !multipart) headers.set('Content-Type', 'application/json');
  if (token) headers.set('Authorization', `Bearer ${token}`);
  try {
    if (multipart && options.onUploadProgress) {
      return await sendWithProgress(
        buildUrl(path, options.params),
        options.method ?? 'POST',
        headers,
        options.body as FormData,
        options.onUploadProgress,
        options.signal,
      );
    }
    return await fetch(buildUrl(path, options.params), {
      method: options.method ?? 'GET',
      headers,
      body: multipart
        ? (options.body as FormData)
        : options.body === undefined
          ? undefined
          : JSON.stringify(options.body),
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (cause) {
    if (options.signal?.aborted) throw cause;
    throw new ApiError(0, {
      statusCode: 0,
      error: 'Network Error',
      message: "Can't reach the desk server. Check your connection and try again.",
    });
  }
}

async function parse<T>(
  response: Response,
  responseType: RequestOptions['responseType'],
): Promise<T> {
  if (!response.ok) throw await toApiError(response);
  if (response.status === 204 || response.status === 202) return undefined as T;
  if (responseType === 'blob') return (await response.blob()) as T;
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

/**
 * Trades the refresh cookie for a new access token. Concurrent callers share one
 * request: the server rotates the refresh token on every use and treats a replayed
 * one as theft, so two parallel refreshes would end the session.
 */
export function refreshSession(): Promise<SessionResponse> {
  refreshInFlight ??= send('/auth/refresh', { method: 'POST' }, null)
    .then((response) => parse<SessionResponse>(response, 'json'))
    .then((session) => {
      accessToken = session.accessToken;
      return session;
    })
    .finally(() => {
      refreshInFlight = null;
    });
  return refreshInFlight;
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const auth = options.auth ?? true;
  const tokenSent = auth ? accessToken : null;
  const response = await send(path, options, tokenSent);
  if (response.status !== 401 || !auth) return parse<T>(response, options.responseType);

  // A request that raced another one's refresh already has a fresh token to retry with.
  if (accessToken === tokenSent || accessToken === null) {
    try {
      sessionEvents.onRefreshed(await refreshSession());
    } catch {
      accessToken = null;
      sessionEvents.onExpired();
      throw await toApiError(response);
    }
  }
  const retried = await send(path, options, accessToken);
  if (retried.status === 401) {
    accessToken = null;
    sessionEvents.onExpired();
  }
  return parse<T>(retried, options.responseType);
}

export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'GET' }),
  post: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'POST', body }),
  patch: <T>(path: string, body: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PATCH', body }),
  put: <T>(path: string, body: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PUT', body }),
  delete: (path: string) => apiRequest<void>(path, { method: 'DELETE' }),
  /** The bytes at a path, with the bearer token: for files that an <img src> could not fetch. */
  blob: (path: string, options?: Pick<RequestOptions, 'signal' | 'params'>) =>
    apiRequest<Blob>(path, { ...options, method: 'GET', responseType: 'blob' }),
};
