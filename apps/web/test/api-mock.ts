import type { ApiErrorBody } from '@skyledger/contracts';
import { vi } from 'vitest';

export interface RecordedRequest {
  method: string;
  path: string;
  search: URLSearchParams;
  headers: Headers;
  /** The parsed JSON, or the FormData of a multipart upload. */
  body: unknown;
  /** The request's abort signal, to check that a stale request was cancelled. */
  signal: AbortSignal | undefined;
}

export interface MockReply {
  status: number;
  /** Sent as JSON, or as the bytes themselves when it is a Blob. */
  body?: unknown;
}

type Handler = (request: RecordedRequest) => MockReply | Promise<MockReply>;

/** A route of the fake API: `'GET /api/users'` and the reply, or a function making it. */
export type Routes = Record<string, MockReply | Handler>;

export function apiError(
  statusCode: number,
  message: string,
  fields?: Record<string, string>,
): MockReply {
  const error =
    {
      400: 'Bad Request',
      401: 'Unauthorized',
      403: 'Forbidden',
      404: 'Not Found',
      409: 'Conflict',
      410: 'Gone',
      422: 'Unprocessable Entity',
      423: 'Locked',
      429: 'Too Many Requests',
    }[statusCode] ?? 'Error';
  const body: ApiErrorBody = { statusCode, error, message, ...(fields ? { fields } : {}) };
  return { status: statusCode, body };
}

/**
 * Stubs fetch with a fake API. Every request is recorded; one that matches no route
 * fails the test, so a screen cannot quietly call something unexpected.
 */
export function mockApi(initialRoutes: Routes) {
  const routes: Routes = { ...initialRoutes };
  const requests: RecordedRequest[] = [];

  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://127.0.0.1');
    const method = (init?.method ?? 'GET').toUpperCase();
    const request: RecordedRequest = {
      method,
      path: url.pathname,
      search: url.searchParams,
      headers: new Headers(init?.headers),
      body:
        typeof init?.body === 'string'
          ? JSON.parse(init.body)
          : init?.body instanceof FormData
            ? init.body
            : undefined,
      signal: init?.signal ?? undefined,
    };
    requests.push(request);
    const route = routes[`${method} ${url.pathname}`];
    if (!route) throw new Error(`Unexpected request in test: ${method} ${url.pathname}`);
    const reply = typeof route === 'function' ? await route(request) : route;
    if (reply.body instanceof Blob) {
      // jsdom's Blob is not the one Node's Response knows: hand it the bytes.
      return new Response(await reply.body.arrayBuffer(), {
        status: reply.status,
        headers: { 'Content-Type': reply.body.type },
      });
    }
    return new Response(reply.body === undefined ? null : JSON.stringify(reply.body), {
      status: reply.status,
      headers: reply.body === undefined ? {} : { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);

  return {
    requests,
    /** Requests to one route, e.g. `calls('PATCH /api/users/u-2')`. */
    calls: (route: string) => requests.filter((r) => `${r.method} ${r.path}` === route),
    /** Replaces or adds routes mid-test, e.g. what a refetch will answer. */
    use: (more: Routes) => Object.assign(routes, more),
  };
}
