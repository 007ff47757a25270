import { InvalidEnvironmentError, validateEnv } from './env.schema';

describe('validateEnv', () => {
  const complete = { DB_PASSWORD: 'pw', JWT_SECRET: 'x'.repeat(32) };

  it('fills every default', () => {
    const env = validateEnv(complete);
    expect(env).toMatchObject({
      PORT: 3000,
      DB_PORT: 3307,
      HOST: '127.0.0.1',
      INVITE_TTL_HOURS: 72,
      DESK_TIME_ZONE: 'UTC',
    });
    // Left unset, it follows NODE_ENV (configuration.ts): Secure in production only.
    expect(env.COOKIE_SECURE).toBeUndefined();
  });

  it('lists everything missing or wrong at once, by name', () => {
    let error: unknown;
    try {
      validateEnv({ PORT: 'eighty', JWT_SECRET: 'short' });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(InvalidEnvironmentError);
    const message = (error as Error).message;
    expect(message).toContain('DB_PASSWORD: is required but not set');
    expect(message).toContain('JWT_SECRET: must be at least 32 characters');
    expect(message).toMatch(/PORT: /);
  });

  it('treats an empty variable as unset', () => {
    expect(() => validateEnv({ ...complete, DB_PASSWORD: '' })).toThrow(/DB_PASSWORD: is required/);
  });
});
