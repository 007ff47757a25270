import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { apiError, mockApi, type MockReply, type RecordedRequest } from '../../test/api-mock';
import { sessionFor, userList } from '../../test/fixtures';
import { api, ApiError, setAccessToken, setSessionEvents } from './api-client';

const usersReply: MockReply = { status: 200, body: { items: userList, total: userList.length } };

/** The fake API accepts only the rotated token, like the server after a refresh. */
function acceptsOnly(token: string) {
  return (request: RecordedRequest): MockReply =>
    request.headers.get('Authorization') === `Bearer ${token}`
      ? usersReply
      : apiError(401, 'The access token has expired');
}

describe('api client', () => {
  const onRefreshed = vi.fn();
  const onExpired = vi.fn();

  beforeEach(() => {
    setSessionEvents({ onRefreshed, onExpired });
    setAccessToken('expired-token');
  });

  afterEach(() => {
    setSessionEvents({ onRefreshed: () => {}, onExpired: () => {} });
  });

  it('sends the access token as a Bearer header', async () => {
    setAccessToken('fresh-token');
    const fake = mockApi({ 'GET /api/users': acceptsOnly('fresh-token') });

    await expect(api.get('/users')).resolves.toEqual({ items: userList, total: 5 });
    expect(fake.requests[0]?.headers.get('Authorization')).toBe('Bearer fresh-token');
  });

  it('refreshes once on a 401 and retries the request with the new token', async () => {
    const fake = mockApi({
      'GET /api/users': acceptsOnly('rotated-token'),
      'POST /api/auth/refresh': { status: 200, body: sessionFor('desk_chief', 'rotated-token') },
    });

    await expect(api.get('/users')).resolves.toEqual({ items: userList, total: 5 });

    expect(fake.requests.map((r) => `${r.method} ${r.path}`)).toEqual([
      'GET /api/users',
      'POST /api/auth/refresh',
      'GET /api/users',
    ]);
    expect(fake.requests[1]?.headers.get('Authorization')).toBeNull();
    expect(fake.requests[2]?.headers.get('Authorization')).toBe('Bearer rotated-token');
    expect(onRefreshed).toHaveBeenCalledWith(sessionFor('desk_chief', 'rotated-token'));
    expect(onExpired).not.toHaveBeenCalled();
  });

  it('shares one refresh between two requests that get a 401 at the same time', async () => {
    let releaseRefresh: () => void = () => {};
    const refreshAnswered = new Promise<void>((resolve) => {
      releaseRefresh = resolve;
    });
    const fake = mockApi({
      'GET /api/users': acceptsOnly('rotated-token'),
      'GET /api/me': (request) =>
        request.headers.get('Authorization') === 'Bearer rotated-token'
          ? { status: 200, body: sessionFor('desk_chief').user }
          : apiError(401, 'The access token has expired'),
      // The server would treat a second use of the same refresh cookie as theft.
      'POST /api/auth/refresh': async () => {
        await refreshAnswered;
        return { status: 200, body: sessionFor('desk_chief', 'rotated-token') };
      },
    });

    const both = Promise.all([api.get('/users'), api.get('/me')]);
    await vi.waitFor(() => expect(fake.calls('POST /api/auth/refresh')).toHaveLength(1));
    releaseRefresh();

    await expect(both).resolves.toEqual([
      { items: userList, total: 5 },
      sessionFor('desk_chief').user,
    ]);
    expect(fake.calls('POST /api/auth/refresh')).toHaveLength(1);
    expect(fake.calls('GET /api/users')).toHaveLength(2);
    expect(fake.calls('GET /api/me')).toHaveLength(2);
  });

  it('retries without a second refresh when its 401 arrives after another refresh finished', async () => {
    let meAnswered: () => void = () => {};
    const meDone = new Promise<void>((resolve) => {
      meAnswered = resolve;
    });
    const fake = mockApi({
      'GET /api/me': (request) =>
        request.headers.get('Authorization') === 'Bearer rotated-token'
          ? { status: 200, body: sessionFor('desk_chief').user }
          : apiError(401, 'The access token has expired'),
      // This 401 for the old token comes back only after /me has refreshed and retried.
      'GET /api/users': async (request) => {
        if (request.headers.get('Authorization') === 'Bearer rotated-token') return usersReply;
        await meDone;
        return apiError(401, 'The access token has expired');
      },
      'POST /api/auth/refresh': { status: 200, body: sessionFor('desk_chief', 'rotated-token') },
    });

    const users = api.get('/users');
    await api.get('/me');
    meAnswered();

    await expect(users).resolves.toEqual({ items: userList, total: 5 });
    expect(fake.calls('POST /api/auth/refresh')).toHaveLength(1);
    expect(fake.calls('GET /api/users')).toHaveLength(2);
  });

  it('ends the session when the refresh fails, and throws the 401', async () => {
    const fake = mockApi({
      'GET /api/users': apiError(401, 'The access token has expired'),
      'POST /api/auth/refresh': apiError(401, 'The refresh token is not valid'),
    });

    const failure = api.get('/users');

    await expect(failure).rejects.toBeInstanceOf(ApiError);
    await expect(failure).rejects.toMatchObject({ status: 401 });
    expect(onExpired).toHaveBeenCalledTimes(1);
    expect(fake.calls('GET /api/users')).toHaveLength(1);
  });

  it('throws the API error body as an ApiError without refreshing for other statuses', async () => {
    const fake = mockApi({
      'PATCH /api/users/u-1': apiError(409, 'This person was changed by someone else', {
        version: 'stale',
      }),
    });

    const failure = api.patch('/users/u-1', { role: 'reporter', version: 1 });

    await expect(failure).rejects.toMatchObject({
      status: 409,
      body: { fields: { version: 'stale' }, message: 'This person was changed by someone else' },
    });
    expect(fake.requests).toHaveLength(1);
    expect(fake.requests[0]?.body).toEqual({ role: 'reporter', version: 1 });
  });

  it('turns a network failure into an ApiError with status 0', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));

    await expect(api.get('/users')).rejects.toMatchObject({
      status: 0,
      message: "Can't reach the desk server. Check your connection and try again.",
    });
  });

  it('sends query parameters and leaves out undefined ones', async () => {
    const fake = mockApi({ 'GET /api/users': usersReply });
    setAccessToken('fresh-token');

    await api.get('/users', { params: { sort: 'email', order: 'desc', page: undefined } });

    expect(fake.requests[0]?.search.toString()).toBe('sort=email&order=desc');
  });
});
