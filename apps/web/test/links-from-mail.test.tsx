import type { InvitationInfo } from '@skyledger/contracts';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi } from './api-mock';
import { renderApp } from './render-app';

const signedOut = { 'POST /api/auth/refresh': apiError(401, 'No session') };
const token = 'inv_3kq9XbW2rT';
const invitation: InvitationInfo = {
  email: 'wren.alder@marrowby-gazette.test',
  displayName: 'Wren Alder',
  role: 'science_editor',
  expiresAt: '2026-03-08T10:00:00.000Z',
};

describe('accepting an invitation', () => {
  it('shows who is invited, then sets the password', async () => {
    const fake = mockApi({
      ...signedOut,
      [`GET /api/auth/invitations/${token}`]: { status: 200, body: invitation },
      'POST /api/auth/invitations/accept': { status: 204 },
    });
    const { user } = renderApp(`/accept-invite?token=${token}`);

    expect(await screen.findByText('Wren Alder')).toBeInTheDocument();
    expect(screen.getByText('wren.alder@marrowby-gazette.test')).toBeInTheDocument();
    expect(screen.getByText('Science editor')).toBeInTheDocument();

    await user.type(screen.getByLabelText('New password'), 'tide gauge north quay');
    await user.type(screen.getByLabelText('New password again'), 'tide gauge north quay');
    await user.click(screen.getByRole('button', { name: 'Set my password' }));

    expect(await screen.findByRole('status')).toHaveTextContent(
      'Your password is set, Wren Alder.',
    );
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
    expect(fake.calls('POST /api/auth/invitations/accept')[0]?.body).toEqual({
      token,
      password: 'tide gauge north quay',
    });
  });

  it('checks the password length and that both copies match', async () => {
    const fake = mockApi({
      ...signedOut,
      [`GET /api/auth/invitations/${token}`]: { status: 200, body: invitation },
    });
    const { user } = renderApp(`/accept-invite?token=${token}`);

    await user.type(await screen.findByLabelText('New password'), 'short');
    await user.type(screen.getByLabelText('New password again'), 'shorter');
    await user.click(screen.getByRole('button', { name: 'Set my password' }));

    expect(await screen.findByText('At least 12 characters')).toBeInTheDocument();
    expect(screen.getByText('The two passwords are not the same')).toBeInTheDocument();
    expect(fake.calls('POST /api/auth/invitations/accept')).toHaveLength(0);
  });

  it('says plainly when the invitation has expired (410)', async () => {
    mockApi({
      ...signedOut,
      [`GET /api/auth/invitations/${token}`]: apiError(410, 'This invitation has expired'),
    });
    renderApp(`/accept-invite?token=${token}`);

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'This invitation has expired: invitation links work for 72 hours. Ask your desk chief to send you a fresh one.',
    );
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
    expect(document.title).toBe('Accept your invitation · Skyledger');
  });

  it('says plainly when the invitation was already used (404)', async () => {
    mockApi({
      ...signedOut,
      [`GET /api/auth/invitations/${token}`]: apiError(404, 'Invitation not found'),
    });
    renderApp(`/accept-invite?token=${token}`);

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'This invitation link has already been used',
    );
    expect(screen.getByRole('link', { name: 'Go to sign-in' })).toBeInTheDocument();
  });

  it('explains a link without its token', async () => {
    mockApi(signedOut);
    renderApp('/accept-invite');

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'This invitation link is incomplete.',
    );
  });
});

describe('resetting a password', () => {
  it('always answers the same when asked for a reset link', async () => {
    const fake = mockApi({
      ...signedOut,
      'POST /api/auth/password-reset/request': { status: 202 },
    });
    const { user } = renderApp('/forgot-password');

    await user.type(await screen.findByLabelText('E-mail'), 'someone@marrowby-gazette.test');
    await user.click(screen.getByRole('button', { name: 'Send the reset link' }));

    expect(await screen.findByRole('status')).toHaveTextContent(
      'If an account exists for someone@marrowby-gazette.test, we sent it a link to choose a new password.',
    );
    expect(fake.calls('POST /api/auth/password-reset/request')[0]?.body).toEqual({
      email: 'someone@marrowby-gazette.test',
    });
  });

  it('sets the new password from the e-mailed link', async () => {
    const fake = mockApi({ ...signedOut, 'POST /api/auth/password-reset': { status: 204 } });
    const { user } = renderApp('/reset-password?token=rst_88aa');

    await user.type(await screen.findByLabelText('New password'), 'salt marsh at low tide');
    await user.type(screen.getByLabelText('New password again'), 'salt marsh at low tide');
    await user.click(screen.getByRole('button', { name: 'Set the new password' }));

    expect(await screen.findByRole('status')).toHaveTextContent('Your new password is set.');
    expect(fake.calls('POST /api/auth/password-reset')[0]?.body).toEqual({
      token: 'rst_88aa',
      password: 'salt marsh at low tide',
    });
  });

  it('says the reset link expired (410) and offers a new one', async () => {
    mockApi({
      ...signedOut,
      'POST /api/auth/password-reset': apiError(410, 'This reset link has expired'),
    });
    const { user } = renderApp('/reset-password?token=rst_old');

    await user.type(await screen.findByLabelText('New password'), 'salt marsh at low tide');
    await user.type(screen.getByLabelText('New password again'), 'salt marsh at low tide');
    await user.click(screen.getByRole('button', { name: 'Set the new password' }));

    await waitFor(() =>
      expect(screen.getByRole('alert')).toHaveTextContent('This reset link has expired.'),
    );
    expect(screen.getByRole('link', { name: 'Ask for a new reset link' })).toHaveAttribute(
      'href',
      '/forgot-password',
    );
  });

  it("puts the API's password rule under the password field", async () => {
    mockApi({
      ...signedOut,
      'POST /api/auth/password-reset': apiError(400, 'password must be longer', {
        password: 'minLength',
      }),
    });
    const { user } = renderApp('/reset-password?token=rst_88aa');

    await user.type(await screen.findByLabelText('New password'), 'salt marsh at low tide');
    await user.type(screen.getByLabelText('New password again'), 'salt marsh at low tide');
    await user.click(screen.getByRole('button', { name: 'Set the new password' }));

    const password = screen.getByLabelText('New password');
    await waitFor(() => expect(password).toHaveAttribute('aria-invalid', 'true'));
    expect(password).toHaveAccessibleDescription(
      'Use 12 characters or more. A few unrelated words make a strong one. Too short: use at least 12 characters',
    );
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});
