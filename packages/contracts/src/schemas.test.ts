import { describe, expect, it } from 'vitest';
import { PASSWORD_MIN_LENGTH, acceptInvitationSchema, signInSchema } from './auth.js';
import { inviteUserSchema, updateUserSchema } from './users.js';

describe('shared schemas', () => {
  it('accepts a well-formed sign-in and names the broken fields of a bad one', () => {
    expect(
      signInSchema.safeParse({ email: 'editor@marrowby-gazette.test', password: 'x' }).success,
    ).toBe(true);
    const bad = signInSchema.safeParse({ email: 'nope', password: '' });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['email', 'password']);
  });

  it('holds new passwords to the minimum length the API enforces', () => {
    const short = 'x'.repeat(PASSWORD_MIN_LENGTH - 1);
    expect(acceptInvitationSchema.safeParse({ token: 't', password: short }).success).toBe(false);
    expect(acceptInvitationSchema.safeParse({ token: 't', password: `${short}x` }).success).toBe(
      true,
    );
  });

  it('trims names and knows only the four roles', () => {
    expect(
      inviteUserSchema.parse({ email: 'a@b.test', displayName: '  Ada  ', role: 'reporter' })
        .displayName,
    ).toBe('Ada');
    expect(
      inviteUserSchema.safeParse({ email: 'a@b.test', displayName: 'Ada', role: 'editor' }).success,
    ).toBe(false);
  });

  it('needs the version a change is based on', () => {
    expect(updateUserSchema.safeParse({ role: 'copy_desk' }).success).toBe(false);
    expect(updateUserSchema.safeParse({ role: 'copy_desk', version: 3 }).success).toBe(true);
  });
});
