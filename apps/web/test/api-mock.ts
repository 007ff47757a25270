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
  vi.stubGlobal('XMLHttpRequest', fakeXhrOver(fetchMock));

  return {
    requests,
    /** Requests to one route, e.g. `calls('PATCH /api/users/u-2')`. */
    calls: (route: string) => requests.filter((r) => `${r.method} ${r.path}` === route),
    /** Replaces or adds routes mid-test, e.g. what a refetch will answer. */
    use: (more: Routes) => Object.assign(routes, more),
  };
}

/**
 * An XMLHttpRequest that answers from the same fake API, for uploads that report their
 * progress: the whole body "goes up" in one step, then the route's reply comes back.
 */
function fakeXhrOver(fetchMock: (input: string, init: RequestInit) => Promise<Response>) {
  return class FakeXhr {
    readonly upload: { onprogress: ((event: ProgressEvent) => void) | null } = {
      onprogress: null,
    };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    onabort: (() => void) | null = null;
    responseType = '';
    status = 0;
    statusText = '';
    response: Blob | null = null;
    private method = 'GET';
    private url = '';
    private readonly headers = new Headers();
    private answerHeaders = new Headers();

    open(method: string, url: string) {
      this.method = method;
      this.url = url;
    }

    setRequestHeader(name: string, value: string) {
      this.headers.set(name, value);
    }

    getAllResponseHeaders(): string {
      return [...this.answerHeaders].map(([name, value]) => `${name}: ${value}`).join('\r\n');
    }

    abort() {
      this.onabort?.();
    }

    send(body: FormData) {
      const size = [...body.values()].reduce(
        (sum, value) => sum + (typeof value === 'string' ? value.length : value.size),
        0,
      );
      this.upload.onprogress?.({
        lengthComputable: true,
        loaded: size,
        total: size,
      } as ProgressEvent);
      fetchMock(this.url, { method: this.method, headers: this.headers, body }).then(
        async (response) => {
          this.status = response.status;
          this.statusText = response.statusText;
          this.answerHeaders = response.headers;
          this.response = await response.blob();
          this.onload?.();
        },
        () => this.onerror?.(),
      );
    }
  };
}
