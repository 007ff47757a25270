import { createTestApp, type TestApp } from './support/test-app';

describe('the platform: health, docs, schema, errors and headers', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await createTestApp('platform');
  });
  afterAll(() => t.close());

  it('reports health with the database checked', async () => {
    const response = await t.http().get('/api/health').expect(200);
    expect(response.body).toEqual({ status: 'ok', checks: { database: 'up' } });
  });

  it('publishes the OpenAPI document with the auth and people routes', async () => {
    const response = await t.http().get('/api/docs-json').expect(200);
    expect(response.body.info.title).toBe('Skyledger API');
    expect(Object.keys(response.body.paths)).toEqual(
      expect.arrayContaining([
        '/api/auth/sign-in',
        '/api/auth/refresh',
        '/api/me',
        '/api/users',
        '/api/users/{id}',
      ]),
    );
  });

  it('has migrations that match the entities exactly', async () => {
    const pending = await t.dataSource.driver.createSchemaBuilder().log();
    expect(pending.upQueries.map((query) => query.query)).toEqual([]);
  });

  it('answers an unknown API route with a 404 in the error shape', async () => {
    const response = await t.http().get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body).toMatchObject({ statusCode: 404, error: 'Not Found' });
  });

  it('sends security headers with a strict Content-Security-Policy', async () => {
    const response = await t.http().get('/api/health');
    expect(response.headers['content-security-policy']).toContain("script-src 'self'");
    expect(response.headers['content-security-policy']).toContain("frame-ancestors 'none'");
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['referrer-policy']).toBe('no-referrer');
  });
});
