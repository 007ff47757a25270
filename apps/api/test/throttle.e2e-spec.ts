import { createTestApp, type TestApp } from './support/test-app';

describe('sign-in rate limit', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await createTestApp('throttle', { AUTH_RATE_LIMIT_PER_MINUTE: '3' });
  });
  afterAll(() => t.close());

  it('answers 429 in the error shape once an address passes the limit', async () => {
    for (let attempt = 0; attempt < 3; attempt++) {
      await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: `someone${attempt}@throttle.test`, password: 'x' })
        .expect(401);
    }
    const limited = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: 'someone@throttle.test', password: 'x' });
    expect(limited.status).toBe(429);
    expect(limited.body).toEqual({
      statusCode: 429,
      error: 'Too Many Requests',
      message: 'Too many attempts from this address; wait a minute and try again',
    });
  });

  it('does not limit the health check or other routes', async () => {
    await t.http().get('/api/health').expect(200);
  });
});
