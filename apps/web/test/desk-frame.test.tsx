import type { Role } from '@skyledger/contracts';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { navItemsFor } from '@/app/nav-items';
import { apiError, mockApi } from './api-mock';
import { sessionFor, userList } from './fixtures';
import { renderApp } from './render-app';

const signedInAs = (role: Role) => ({
  'POST /api/auth/refresh': { status: 200, body: sessionFor(role) },
});

async function navLinks() {
  const nav = await screen.findByRole('navigation', { name: 'Desk sections' });
  // Radix TabNav keeps a hidden copy of each label for layout; read the link names.
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent?.slice(0, link.textContent.length / 2));
}

describe('desk frame', () => {
  it.each([
    [
      'desk_chief',
      'Mara Quill',
      'Desk chief',
      [
        'Desk',
        'Claims',
        'Awaiting sign-off',
        'Cleared to publish',
        'File a claim',
        'Search',
        'Datasets',
        'Workbench',
        'Rating scale',
        'People',
        'Outbox',
        'Audit trail',
        'Account',
      ],
    ],
    [
      'science_editor',
      'Tobias Renn',
      'Science editor',
      [
        'Desk',
        'Claims',
        'File a claim',
        'Search',
        'Datasets',
        'Workbench',
        'Rating scale',
        'Account',
      ],
    ],
    [
      'copy_desk',
      'Ines Calder',
      'Copy desk',
      [
        'Desk',
        'Claims',
        'Awaiting sign-off',
        'Cleared to publish',
        'Search',
        'Datasets',
        'Workbench',
        'Rating scale',
        'Account',
      ],
    ],
    [
      'reporter',
      'Joss Whitcombe',
      'Reporter',
      [
        'Desk',
        'Claims',
        'File a claim',
        'Search',
        'Datasets',
        'Workbench',
        'Rating scale',
        'Account',
      ],
    ],
  ] as const)('shows a %s the navigation of their role', async (role, name, label, links) => {
    mockApi(signedInAs(role));
    renderApp('/');

    expect(await navLinks()).toEqual(links);
    const banner = screen.getByRole('banner');
    expect(within(banner).getByText(name)).toBeInTheDocument();
    expect(within(banner).getByText(label)).toBeInTheDocument();
    expect(within(banner).getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
  });

  it('greets the person and says what their role may do', async () => {
    mockApi(signedInAs('copy_desk'));
    renderApp('/');

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Welcome to the desk, Ines' }),
    ).toBeInTheDocument();
    const duties = screen.getByRole('heading', { name: 'What you may do here' }).parentElement;
    expect(duties).toHaveTextContent('Sign off or send back a verdict someone else drafted');
    expect(duties).not.toHaveTextContent('Invite people');
    expect(document.title).toBe('Desk · Skyledger');
  });

  it('shows a reporter who opens /people that they have no access, and asks no data', async () => {
    const fake = mockApi(signedInAs('reporter'));
    renderApp('/people');

    expect(
      await screen.findByRole('heading', { level: 1, name: "You don't have access" }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the desk' })).toHaveAttribute('href', '/');
    expect(fake.calls('GET /api/users')).toHaveLength(0);
    expect(await navLinks()).toEqual(navItemsFor('reporter').map((item) => item.label));
  });

  it('sends a signed-out person to sign-in, keeping where they were going', async () => {
    mockApi({ 'POST /api/auth/refresh': apiError(401, 'No session') });
    const { location } = renderApp('/people?sort=role&order=asc');

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Sign in to the desk' }),
    ).toBeInTheDocument();
    expect(location()).toBe(`/sign-in?next=${encodeURIComponent('/people?sort=role&order=asc')}`);
  });

  it('restores the session from the refresh cookie once on start', async () => {
    const fake = mockApi({
      ...signedInAs('desk_chief'),
      'GET /api/users': { status: 200, body: { items: userList, total: userList.length } },
    });
    const { user } = renderApp('/');

    await user.click(await screen.findByRole('link', { name: /People/ }));
    expect(await screen.findByRole('heading', { level: 1, name: 'People' })).toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: /Account/ }));
    expect(await screen.findByRole('heading', { name: 'Your account' })).toBeInTheDocument();

    expect(fake.calls('POST /api/auth/refresh')).toHaveLength(1);
  });

  it('sends the person to sign-in with next when their session runs out', async () => {
    mockApi({
      'POST /api/auth/refresh': { status: 200, body: sessionFor('desk_chief') },
      'GET /api/users': apiError(401, 'The access token has expired'),
    });
    const { user, location, queryClient } = renderApp('/');
    await screen.findByRole('heading', { level: 1, name: 'Welcome to the desk, Mara' });
    // From now on the refresh cookie is gone too.
    mockApi({
      'POST /api/auth/refresh': apiError(401, 'The refresh token is not valid'),
      'GET /api/users': apiError(401, 'The access token has expired'),
    });

    await user.click(screen.getByRole('link', { name: /People/ }));

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Sign in to the desk' }),
    ).toBeInTheDocument();
    expect(location()).toBe('/sign-in?next=%2Fpeople');
    expect(queryClient.getQueryData(['auth', 'session'])).toBeNull();
  });

  it('signs out: tells the API, forgets the person and shows the sign-in page', async () => {
    const fake = mockApi({
      ...signedInAs('science_editor'),
      'POST /api/auth/sign-out': { status: 204 },
    });
    const { user, location, queryClient } = renderApp('/account');

    expect(await screen.findByText('editor@marrowby-gazette.test')).toBeInTheDocument();
    await user.click(within(screen.getByRole('main')).getByRole('button', { name: 'Sign out' }));

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Sign in to the desk' }),
    ).toBeInTheDocument();
    expect(location()).toBe('/sign-in');
    expect(fake.calls('POST /api/auth/sign-out')).toHaveLength(1);
    expect(queryClient.getQueryData(['auth', 'session'])).toBeNull();
  });

  it('shows a page-not-found page with a way back', async () => {
    mockApi(signedInAs('reporter'));
    renderApp('/no-such-page/here');

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Page not found' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the desk' })).toHaveAttribute('href', '/');
    expect(document.title).toBe('Page not found · Skyledger');
  });

  it('shows a readable error page when the desk server fails', async () => {
    mockApi({
      ...signedInAs('desk_chief'),
      'GET /api/users': { status: 502, body: '<html>Bad gateway</html>' },
    });
    renderApp('/people');

    expect(
      await screen.findByRole('heading', { level: 1, name: 'This page could not load' }),
    ).toBeInTheDocument();
    expect(
      screen.getByText('The desk server ran into a problem. Try again in a moment.'),
    ).toBeInTheDocument();
    // The frame stays, so the person can move on.
    expect(await navLinks()).toEqual(navItemsFor('desk_chief').map((item) => item.label));
  });
});
