import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi } from './api-mock';
import { sessionFor, userList } from './fixtures';
import { renderApp } from './render-app';

const signedOut = { 'POST /api/auth/refresh': apiError(401, 'No session') };

async function fillSignIn(
  user: ReturnType<typeof renderApp>['user'],
  email: string,
  password: string,
) {
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('sign-in', () => {
  it('signs in and goes to the page named by next', async () => {
    const fake = mockApi({
      ...signedOut,
      'POST /api/auth/sign-in': { status: 200, body: sessionFor('desk_chief') },
      'GET /api/users': { status: 200, body: { items: userList, total: userList.length } },
    });
    const { user, location } = renderApp('/sign-in?next=%2Fpeople%3Fsort%3Demail%26order%3Ddesc');

    await fillSignIn(user, 'chief@marrowby-gazette.test', 'correct horse battery');

    expect(await screen.findByRole('heading', { level: 1, name: 'People' })).toBeInTheDocument();
    expect(location()).toBe('/people?sort=email&order=desc');
    expect(fake.calls('POST /api/auth/sign-in')[0]?.body).toEqual({
      email: 'chief@marrowby-gazette.test',
      password: 'correct horse battery',
    });
    // The new token is used at once, and the list is asked for in the order of the URL.
    const [usersRequest] = fake.calls('GET /api/users');
    expect(usersRequest?.headers.get('Authorization')).toBe('Bearer token-desk_chief');
    expect(usersRequest?.search.get('sort')).toBe('email');
    expect(document.title).toBe('People · Skyledger');
  });

  it('never follows a next that leaves the desk', async () => {
    mockApi({
      ...signedOut,
      'POST /api/auth/sign-in': { status: 200, body: sessionFor('reporter') },
    });
    const { user, location } = renderApp('/sign-in?next=%2F%2Fevil.test%2Fphish');

    await fillSignIn(user, 'reporter@marrowby-gazette.test', 'correct horse battery');

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Welcome to the desk, Joss' }),
    ).toBeInTheDocument();
    expect(location()).toBe('/');
  });

  it('checks the fields before sending anything', async () => {
    const fake = mockApi(signedOut);
    const { user } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), 'not-an-address');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Enter your password')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('aria-invalid', 'true');
    expect(fake.calls('POST /api/auth/sign-in')).toHaveLength(0);
  });

  it("shows the API's field errors under their fields", async () => {
    mockApi({
      ...signedOut,
      'POST /api/auth/sign-in': apiError(400, 'email must be an email', { email: 'isEmail' }),
    });
    const { user } = renderApp('/sign-in');

    await fillSignIn(user, 'chief@marrowby-gazette', 'correct horse battery');

    const email = screen.getByLabelText('E-mail');
    await waitFor(() => expect(email).toHaveAttribute('aria-invalid', 'true'));
    expect(email).toHaveAccessibleDescription('Enter a valid e-mail address');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('says so when the e-mail or password is wrong (401)', async () => {
    mockApi({
      ...signedOut,
      'POST /api/auth/sign-in': apiError(401, 'E-mail or password is wrong'),
    });
    const { user, location } = renderApp('/sign-in');

    await fillSignIn(user, 'chief@marrowby-gazette.test', 'wrong password here');

    expect(await screen.findByRole('alert')).toHaveTextContent('E-mail or password is wrong');
    expect(location()).toBe('/sign-in');
  });

  it('says until when a locked account stays locked (423)', async () => {
    mockApi({
      ...signedOut,
      'POST /api/auth/sign-in': apiError(
        423,
        'This account is locked after repeated failed sign-ins, until 14:35 UTC',
      ),
    });
    const { user } = renderApp('/sign-in');

    await fillSignIn(user, 'chief@marrowby-gazette.test', 'wrong password again');

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'This account is locked after repeated failed sign-ins, until 14:35 UTC',
    );
  });

  it('asks to wait after too many attempts (429)', async () => {
    mockApi({
      ...signedOut,
      'POST /api/auth/sign-in': apiError(429, 'ThrottlerException: Too Many Requests'),
    });
    const { user } = renderApp('/sign-in');

    await fillSignIn(user, 'chief@marrowby-gazette.test', 'yet another guess');

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'Too many attempts in a short time. Wait a minute, then try again.',
    );
  });
});
