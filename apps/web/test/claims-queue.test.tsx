import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { mockApi } from './api-mock';
import { councillor, countsOf, deskPeopleList, queueItems, queueOf } from './claim-fixtures';
import { sessionFor } from './fixtures';
import { renderApp } from './render-app';

const asEditor = {
  'POST /api/auth/refresh': { status: 200, body: sessionFor('science_editor') },
  'GET /api/people': { status: 200, body: deskPeopleList },
};

describe('the claims queue', () => {
  it('shows the claims with counts per status', async () => {
    const fake = mockApi({ ...asEditor, 'GET /api/claims': queueOf(queueItems) });
    renderApp('/claims');

    const table = await screen.findByRole('table');
    expect(within(table).getByRole('rowheader', { name: /Earth’s core/ })).toBeInTheDocument();
    expect(within(table).getByRole('link', { name: /sun’s brightening/ })).toHaveAttribute(
      'href',
      `/claims/${queueItems[1]!.id}`,
    );
    const tabs = screen.getByRole('navigation', { name: 'Claims by status' });
    expect(within(tabs).getByRole('link', { name: /All\s*2/ })).toHaveAttribute('href', '/claims');
    expect(within(tabs).getByRole('link', { name: /In research\s*1/ })).toHaveAttribute(
      'href',
      '/claims?status=in_research',
    );
    expect(screen.getByText('Claims 1–2 of 2, page 1 of 1')).toBeInTheDocument();
    expect(fake.calls('GET /api/claims')[0]?.search.toString()).toBe('');
    expect(document.title).toBe('Claims · Skyledger');
  });

  it('writes the filters into the URL and asks the API for exactly them', async () => {
    const fake = mockApi({ ...asEditor, 'GET /api/claims': queueOf(queueItems) });
    const { user, location } = renderApp('/claims?status=filed&sort=summary&order=asc');

    const filters = await screen.findByRole('form', { name: 'Filter the queue' });
    await user.click(within(filters).getByRole('combobox', { name: 'Researched by' }));
    await user.click(await screen.findByRole('option', { name: 'Nobody yet' }));
    await user.type(within(filters).getByLabelText('Topic'), 'sea-level');
    await user.type(within(filters).getByLabelText('Filed from'), '2026-11-01');
    await user.type(within(filters).getByLabelText('Filed to'), '2026-11-30');
    await user.click(within(filters).getByRole('combobox', { name: 'Legal review' }));
    await user.click(await screen.findByRole('option', { name: 'Flagged for legal review' }));
    await user.click(within(filters).getByRole('checkbox', { name: 'Only mine' }));
    await user.click(within(filters).getByRole('button', { name: 'Apply filters' }));

    const expected =
      'status=filed&assignee=none&mine=true&topic=sea-level&filedFrom=2026-11-01&filedTo=2026-11-30&legal=true&sort=summary&order=asc';
    await waitFor(() => expect(location()).toBe(`/claims?${expected}`));
    await waitFor(() => expect(fake.calls('GET /api/claims')).toHaveLength(2));
    expect(fake.calls('GET /api/claims')[1]?.search.toString()).toBe(expected);
  });

  it('filters by a claimant found by name', async () => {
    const fake = mockApi({
      ...asEditor,
      'GET /api/claims': queueOf(queueItems),
      'GET /api/claimants': { status: 200, body: [councillor] },
    });
    const { user, location } = renderApp('/claims');

    const filters = await screen.findByRole('form', { name: 'Filter the queue' });
    await user.type(within(filters).getByRole('searchbox', { name: 'Claimant' }), 'threl');
    await user.click(await within(filters).findByRole('button', { name: /Cllr Edwin Threlkeld/ }));

    await waitFor(() => expect(location()).toBe(`/claims?claimant=${councillor.id}`));
    expect(fake.calls('GET /api/claimants')[0]?.search.get('q')).toBe('threl');
    // The filters are drawn afresh for the new address; the chosen claimant shows in them.
    await waitFor(() =>
      expect(
        within(screen.getByRole('form', { name: 'Filter the queue' })).getByText(
          'Cllr Edwin Threlkeld',
          { selector: 'span.rt-Text' },
        ),
      ).toBeInTheDocument(),
    );
  });

  it('sorts on the server when a column header is pressed, and pages through', async () => {
    const fake = mockApi({
      ...asEditor,
      'GET /api/claims': {
        status: 200,
        body: {
          items: queueItems,
          total: 60,
          page: 1,
          pageSize: 25,
          counts: countsOf({ filed: 60 }),
        },
      },
    });
    const { user, location } = renderApp('/claims?status=filed');

    await user.click(await screen.findByRole('button', { name: 'Claim' }));
    await waitFor(() => expect(location()).toBe('/claims?status=filed&sort=summary&order=asc'));
    await waitFor(() =>
      expect(screen.getByRole('columnheader', { name: 'Claim' })).toHaveAttribute(
        'aria-sort',
        'ascending',
      ),
    );
    await user.click(await screen.findByRole('button', { name: 'Next page' }));
    await waitFor(() =>
      expect(location()).toBe('/claims?status=filed&sort=summary&order=asc&page=2'),
    );
    await waitFor(() => expect(fake.calls('GET /api/claims')).toHaveLength(3));
    expect(fake.calls('GET /api/claims')[2]?.search.get('page')).toBe('2');
    expect(await screen.findByText('Claims 26–50 of 60, page 2 of 3')).toBeInTheDocument();
  });

  it('says when nothing matches, and offers to clear the filters', async () => {
    mockApi({ ...asEditor, 'GET /api/claims': queueOf([], countsOf({})) });
    renderApp('/claims?topic=ocean-heat');

    expect(
      await screen.findByRole('heading', { name: 'No claims match these filters' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Clear all filters' })).toHaveAttribute(
      'href',
      '/claims',
    );
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
  });

  it.each([
    ['reporter', true],
    ['copy_desk', false],
  ] as const)('offers filing to a %s: %s', async (role, offered) => {
    mockApi({
      'POST /api/auth/refresh': { status: 200, body: sessionFor(role) },
      'GET /api/people': { status: 200, body: deskPeopleList },
      'GET /api/claims': queueOf(queueItems),
    });
    renderApp('/claims');
    await screen.findByRole('table');
    // The page's own button, and the tab in the desk's navigation.
    expect(screen.queryAllByRole('link', { name: /File a claim/ })).toHaveLength(offered ? 2 : 0);
  });
});
