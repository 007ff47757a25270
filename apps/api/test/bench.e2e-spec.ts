import { AppModule } from '../src/app.module';
import { BenchModule } from '../src/bench/bench.module';
import { createTestApp, type TestApp } from './support/test-app';

describe('the benchmark’s reference routes', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await createTestApp('bench');
  });
  afterAll(() => t.close());

  it('answers a constant without a sign-in, kept out of the API docs', async () => {
    const response = await t.http().get('/api/bench/ping').expect(200);
    expect(response.body).toEqual({ pong: true });
    const docs = await t.http().get('/api/docs-json').expect(200);
    expect(Object.keys(docs.body.paths)).not.toContain('/api/bench/ping');
  });

  it('answers the same behind the sign-in, for the signed-in floor', async () => {
    await t.http().get('/api/bench/signed-in-ping').expect(401);
    const reporter = await t.addUser('reporter', 'reporter@bench.test');
    const { accessToken } = await t.signIn(reporter.email, reporter.password);
    const response = await t
      .http()
      .get('/api/bench/signed-in-ping')
      .set('Authorization', `Bearer ${accessToken}`)
      .expect(200);
    expect(response.body).toEqual({ pong: true });
  });

  it('is not part of the app in production', () => {
    const modules = (env: string) => {
      const before = process.env.NODE_ENV;
      process.env.NODE_ENV = env;
      try {
        return AppModule.forRoot().imports ?? [];
      } finally {
        process.env.NODE_ENV = before;
      }
    };
    expect(modules('development')).toContain(BenchModule);
    expect(modules('production')).not.toContain(BenchModule);
  });
});
