import type { UserListItem } from '@skyledger/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi, type MockReply, type RecordedRequest } from './api-mock';
import { deskPeople, sessionFor, userList } from './fixtures';
import { renderApp } from './render-app';

const chief = { 'POST /api/auth/refresh': { status: 200, body: sessionFor('desk_chief') } };
const listOf = (items: UserListItem[]): MockReply => ({
  status: 200,
  body: { items, total: items.length },
});
const editor = deskPeople.science_editor;

/** The fake API sorts like the real one would, so the table order shows the request was read. */
function sortedList(request: RecordedRequest): MockReply {
  const field = (request.search.get('sort') ?? 'displayName') as 'displayName' | 'email';
  const direction = request.search.get('order') === 'desc' ? -1 : 1;
  const items = [...userList].sort((a, b) => a[field].localeCompare(b[field]) * direction);
  return listOf(items);
}

/** The desktop table; jsdom applies no CSS, so the phone's cards are in the document too. */
async function findTable() {
  return within(await screen.findByRole('table'));
}

function rowOf(name: string) {
  const cell = screen.getByRole('rowheader', { name: new RegExp(name) });
  const row = cell.closest('tr');
  if (!row) throw new Error(`No table row for ${name}`);
  return row;
}

function firstColumn() {
  return screen
    .getAllByRole('rowheader')
    .map((cell) => within(cell).getAllByText(/\S/)[0]?.textContent);
}

describe('People page', () => {
  it('lists the desk and sorts by a clicked column header through the API', async () => {
    const fake = mockApi({ ...chief, 'GET /api/users': sortedList });
    const { user, location } = renderApp('/people');

    expect(await screen.findByRole('columnheader', { name: 'Name' })).toHaveAttribute(
      'aria-sort',
      'ascending',
    );
    expect(fake.calls('GET /api/users')[0]?.search.toString()).toBe('sort=displayName&order=asc');
    expect(firstColumn()).toEqual([
      'Ines Calder',
      'Joss Whitcombe',
      'Mara Quill',
      'Priya Lund',
      'Tobias Renn',
    ]);

    await user.click(screen.getByRole('button', { name: 'E-mail' }));

    await waitFor(() =>
      expect(screen.getByRole('columnheader', { name: 'E-mail' })).toHaveAttribute(
        'aria-sort',
        'ascending',
      ),
    );
    expect(screen.getByRole('columnheader', { name: 'Name' })).not.toHaveAttribute('aria-sort');
    expect(fake.calls('GET /api/users').at(-1)?.search.toString()).toBe('sort=email&order=asc');
    expect(location()).toBe('/people?sort=email&order=asc');
    expect(firstColumn()[0]).toBe('Mara Quill');

    await user.click(screen.getByRole('button', { name: 'E-mail' }));

    await waitFor(() =>
      expect(screen.getByRole('columnheader', { name: 'E-mail' })).toHaveAttribute(
        'aria-sort',
        'descending',
      ),
    );
    expect(fake.calls('GET /api/users').at(-1)?.search.toString()).toBe('sort=email&order=desc');
    expect(firstColumn()[0]).toBe('Joss Whitcombe');
  });

  it('shows role and status as words', async () => {
    mockApi({ ...chief, 'GET /api/users': listOf(userList) });
    renderApp('/people');

    const invited = await screen.findByRole('rowheader', { name: /Priya Lund/ });
    const row = invited.closest('tr');
    expect(row).toHaveTextContent('Invited');
    expect(row).toHaveTextContent('Never');
    expect(within(rowOf('Mara Quill')).getByText('Desk chief')).toBeInTheDocument();
    expect(within(rowOf('Tobias Renn')).getByRole('combobox')).toHaveTextContent('Science editor');
  });

  it('checks the invitation before sending it', async () => {
    const fake = mockApi({ ...chief, 'GET /api/users': listOf(userList) });
    const { user } = renderApp('/people');

    await user.click(await screen.findByRole('button', { name: 'Invite someone' }));
    const dialog = await screen.findByRole('dialog', { name: 'Invite someone to the desk' });
    await user.type(within(dialog).getByLabelText('E-mail'), 'wren.alder@marrowby');
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    expect(await within(dialog).findByText('Enter a name')).toBeInTheDocument();
    expect(within(dialog).getByLabelText('E-mail')).toHaveAccessibleDescription(
      'Enter a valid e-mail address',
    );
    expect(fake.calls('POST /api/users/invitations')).toHaveLength(0);
  });

  it('shows an e-mail already on the desk (409 taken) under the e-mail field', async () => {
    const fake = mockApi({
      ...chief,
      'GET /api/users': listOf(userList),
      'POST /api/users/invitations': apiError(409, 'This e-mail address is already in use', {
        email: 'taken',
      }),
    });
    const { user } = renderApp('/people');

    await user.click(await screen.findByRole('button', { name: 'Invite someone' }));
    const dialog = await screen.findByRole('dialog', { name: 'Invite someone to the desk' });
    await user.type(within(dialog).getByLabelText('Name'), 'Tobias Renn');
    await user.type(within(dialog).getByLabelText('E-mail'), 'editor@marrowby-gazette.test');
    await user.click(within(dialog).getByRole('combobox', { name: 'Role' }));
    await user.click(await screen.findByRole('option', { name: 'Science editor' }));
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    const email = within(dialog).getByLabelText('E-mail');
    await waitFor(() =>
      expect(email).toHaveAccessibleDescription(
        'This e-mail address already has an account on the desk',
      ),
    );
    expect(email).toHaveFocus();
    expect(fake.calls('POST /api/users/invitations')[0]?.body).toEqual({
      displayName: 'Tobias Renn',
      email: 'editor@marrowby-gazette.test',
      role: 'science_editor',
    });
    expect(screen.getByRole('dialog')).toBeInTheDocument();
  });

  it('sends an invitation, closes the dialog and shows the invited person', async () => {
    const invited: UserListItem = {
      id: '7f1c2b4e-0a61-4a8e-9d0c-1f00000000f2',
      email: 'wren.alder@marrowby-gazette.test',
      displayName: 'Wren Alder',
      role: 'reporter',
      status: 'invited',
      createdAt: '2026-03-05T10:00:00.000Z',
      lastSignInAt: null,
      version: 1,
    };
    const fake = mockApi({
      ...chief,
      'GET /api/users': listOf(userList),
      'POST /api/users/invitations': () => {
        fake.use({ 'GET /api/users': listOf([...userList, invited]) });
        return { status: 201, body: invited };
      },
    });
    const { user } = renderApp('/people');

    await user.click(await screen.findByRole('button', { name: 'Invite someone' }));
    const dialog = await screen.findByRole('dialog', { name: 'Invite someone to the desk' });
    await user.type(within(dialog).getByLabelText('Name'), 'Wren Alder');
    await user.type(within(dialog).getByLabelText('E-mail'), 'wren.alder@marrowby-gazette.test');
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    expect(await screen.findByRole('status')).toHaveTextContent(
      'Invitation sent to wren.alder@marrowby-gazette.test.',
    );
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(await screen.findByRole('rowheader', { name: /Wren Alder/ })).toBeInTheDocument();
    expect(fake.calls('POST /api/users/invitations')[0]?.body).toMatchObject({ role: 'reporter' });
  });

  it('changes a role, sending the version the table showed', async () => {
    const promoted = { ...userList[3]!, role: 'desk_chief' as const, version: 5 };
    const fake = mockApi({
      ...chief,
      'GET /api/users': listOf(userList),
      [`PATCH /api/users/${editor.id}`]: () => {
        fake.use({
          'GET /api/users': listOf(userList.map((u) => (u.id === editor.id ? promoted : u))),
        });
        return { status: 200, body: promoted };
      },
    });
    const { user } = renderApp('/people');

    const table = await findTable();
    await user.click(await table.findByRole('combobox', { name: 'Role of Tobias Renn' }));
    await user.click(await screen.findByRole('option', { name: 'Desk chief' }));

    expect(await screen.findByText('Tobias Renn is now Desk chief.')).toBeInTheDocument();
    expect(fake.calls(`PATCH /api/users/${editor.id}`)[0]?.body).toEqual({
      role: 'desk_chief',
      version: 4,
    });
    await waitFor(() =>
      expect(table.getByRole('combobox', { name: 'Role of Tobias Renn' })).toHaveTextContent(
        'Desk chief',
      ),
    );
  });

  it('reloads the table when someone else changed the person first (409 stale)', async () => {
    const renamedElsewhere = { ...userList[3]!, role: 'copy_desk' as const, version: 5 };
    const fake = mockApi({
      ...chief,
      'GET /api/users': listOf(userList),
      [`PATCH /api/users/${editor.id}`]: () => {
        fake.use({
          'GET /api/users': listOf(
            userList.map((u) => (u.id === editor.id ? renamedElsewhere : u)),
          ),
        });
        return apiError(409, 'This user was changed by someone else', { version: 'stale' });
      },
    });
    const { user } = renderApp('/people');

    const table = await findTable();
    await user.click(await table.findByRole('combobox', { name: 'Role of Tobias Renn' }));
    await user.click(await screen.findByRole('option', { name: 'Reporter' }));

    expect(
      await screen.findByText('Someone else changed this person — reloaded.'),
    ).toBeInTheDocument();
    await waitFor(() =>
      expect(table.getByRole('combobox', { name: 'Role of Tobias Renn' })).toHaveTextContent(
        'Copy desk',
      ),
    );
    expect(fake.calls('GET /api/users')).toHaveLength(2);
  });

  it('disables an account only after confirming', async () => {
    const ines = deskPeople.copy_desk;
    const fake = mockApi({
      ...chief,
      'GET /api/users': listOf(userList),
      [`PATCH /api/users/${ines.id}`]: () => {
        fake.use({
          'GET /api/users': listOf(
            userList.map((u) => (u.id === ines.id ? { ...u, status: 'disabled', version: 3 } : u)),
          ),
        });
        return { status: 200, body: { ...userList[1], status: 'disabled', version: 3 } };
      },
    });
    const { user } = renderApp('/people');

    const table = await findTable();
    await user.click(await table.findByRole('button', { name: 'Disable Ines Calder' }));
    const confirm = await screen.findByRole('alertdialog', { name: 'Disable Ines Calder?' });
    expect(fake.calls(`PATCH /api/users/${ines.id}`)).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Disable account' }));

    expect(await screen.findByRole('status')).toHaveTextContent(
      'Ines Calder is disabled and can no longer sign in.',
    );
    expect(fake.calls(`PATCH /api/users/${ines.id}`)[0]?.body).toEqual({
      status: 'disabled',
      version: 2,
    });
    expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument();
    expect(rowOf('Ines Calder')).toHaveTextContent('Disabled');
    expect(
      within(rowOf('Ines Calder')).getByRole('button', { name: 'Re-enable Ines Calder' }),
    ).toBeInTheDocument();
  });

  it('explains in words when the API refuses a role change (422)', async () => {
    const fake = mockApi({
      ...chief,
      'GET /api/users': listOf(userList),
      [`PATCH /api/users/${editor.id}`]: apiError(
        422,
        'The desk must keep at least one active desk chief',
        { role: 'lastDeskChief' },
      ),
    });
    const { user } = renderApp('/people');

    const table = await findTable();
    await user.click(await table.findByRole('combobox', { name: 'Role of Tobias Renn' }));
    await user.click(await screen.findByRole('option', { name: 'Reporter' }));

    expect(await screen.findByRole('status')).toHaveTextContent(
      'The desk needs at least one active desk chief',
    );
    expect(fake.calls('GET /api/users')).toHaveLength(1);
  });

  it('offers no role change or disabling on your own row', async () => {
    mockApi({ ...chief, 'GET /api/users': listOf(userList) });
    renderApp('/people');

    const own = await screen.findByRole('rowheader', { name: /Mara Quill/ });
    const row = own.closest('tr');
    if (!row) throw new Error('No row for the chief');
    expect(within(row).queryByRole('combobox')).not.toBeInTheDocument();
    expect(within(row).queryByRole('button')).not.toBeInTheDocument();
  });

  it('resends an invitation to an invited person', async () => {
    const priya = userList[4]!;
    const fake = mockApi({
      ...chief,
      'GET /api/users': listOf(userList),
      [`POST /api/users/${priya.id}/invitation`]: { status: 202 },
    });
    const { user } = renderApp('/people');

    const table = await findTable();
    await user.click(
      await table.findByRole('button', { name: 'Resend the invitation to Priya Lund' }),
    );

    expect(await screen.findByRole('status')).toHaveTextContent(
      'A fresh invitation link went to p.lund@marrowby-gazette.test.',
    );
    expect(fake.calls(`POST /api/users/${priya.id}/invitation`)).toHaveLength(1);
  });

  it('gives a phone each person as a card, sorted by a choice through the API', async () => {
    const fake = mockApi({ ...chief, 'GET /api/users': sortedList });
    const { user, location } = renderApp('/people');

    const cards = await screen.findByRole('list', { name: 'People on the desk' });
    const cardOf = (name: string) => {
      const card = within(cards)
        .getAllByRole('listitem')
        .find((item) => within(item).queryByText(name));
      if (!card) throw new Error(`No card for ${name}`);
      return within(card);
    };
    expect(cardOf('Priya Lund').getByText('Invited')).toBeInTheDocument();
    expect(cardOf('Priya Lund').getByText('Never')).toBeInTheDocument();
    expect(
      cardOf('Priya Lund').getByRole('button', { name: 'Resend the invitation to Priya Lund' }),
    ).toBeInTheDocument();
    expect(
      cardOf('Tobias Renn').getByRole('combobox', { name: 'Role of Tobias Renn' }),
    ).toHaveTextContent('Science editor');
    expect(
      cardOf('Tobias Renn').getByRole('button', { name: 'Disable Tobias Renn' }),
    ).toBeInTheDocument();
    expect(cardOf('Mara Quill').getByText('That is you')).toBeInTheDocument();
    expect(cardOf('Mara Quill').queryByRole('button')).not.toBeInTheDocument();

    await user.click(screen.getByRole('combobox', { name: 'Sort by' }));
    await user.click(await screen.findByRole('option', { name: 'E-mail, Z to A' }));

    await waitFor(() => expect(location()).toBe('/people?sort=email&order=desc'));
    expect(fake.calls('GET /api/users').at(-1)?.search.toString()).toBe('sort=email&order=desc');
    await waitFor(() =>
      expect(
        within(screen.getByRole('list', { name: 'People on the desk' })).getAllByRole(
          'listitem',
        )[0],
      ).toHaveTextContent('Joss Whitcombe'),
    );
  });
});
