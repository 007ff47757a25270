import type { RatingLevelView, Role } from '@skyledger/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi, type Routes } from './api-mock';
import { deskPeopleList } from './claim-fixtures';
import { deskPeople, sessionFor } from './fixtures';
import { renderApp } from './render-app';
import {
  auditPage,
  failedMail,
  notificationSettings,
  outboxPage,
  ratingLevels,
} from './verdict-fixtures';

function signedIn(role: Role, more: Routes = {}): Routes {
  return {
    'POST /api/auth/refresh': { status: 200, body: sessionFor(role) },
    'GET /api/people': { status: 200, body: deskPeopleList },
    ...more,
  };
}

const stretched = ratingLevels.find((level) => level.id === 'stretched')!;

describe('the rating scale', { timeout: 20_000 }, () => {
  it('lets others read it, without anything to change', async () => {
    mockApi(
      signedIn('science_editor', { 'GET /api/rating-levels': { status: 200, body: ratingLevels } }),
    );
    renderApp('/rating-scale');
    const levels = await screen.findByRole('list', { name: 'Levels of the scale' });
    expect(within(levels).getAllByRole('listitem')).toHaveLength(4);
    expect(within(levels).getByRole('heading', { name: '3 · Stretched' })).toBeInTheDocument();
    expect(within(levels).getByText(stretched.description)).toBeInTheDocument();
    expect(within(levels).getByText('Outcome, not a rating')).toBeInTheDocument();
    expect(
      screen.queryByRole('button', { name: /Edit|Delete|Add a level/ }),
    ).not.toBeInTheDocument();
  });

  it('keeps a desk chief’s words after a 409 and saves them over the newer version', async () => {
    const newer: RatingLevelView = {
      ...stretched,
      description: 'Someone else’s words.',
      version: 3,
    };
    const fake = mockApi(
      signedIn('desk_chief', {
        'GET /api/rating-levels': { status: 200, body: ratingLevels },
        'PATCH /api/rating-levels/stretched': apiError(
          409,
          'This level was changed by someone else meanwhile (now version 3); reload and try again',
          { version: 'stale' },
        ),
      }),
    );
    const { user } = renderApp('/rating-scale');
    await user.click(await screen.findByRole('button', { name: 'Edit “Stretched”' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit “Stretched”' });
    const description = within(dialog).getByLabelText('What it means');
    await user.clear(description);
    await user.type(description, 'Goes further than the evidence allows.');
    fake.use({
      'GET /api/rating-levels': {
        status: 200,
        body: ratingLevels.map((level) => (level.id === 'stretched' ? newer : level)),
      },
    });
    await user.click(within(dialog).getByRole('button', { name: 'Save the words' }));
    expect(
      await within(dialog).findByText(/Someone else changed this level meanwhile/),
    ).toBeInTheDocument();
    expect(within(dialog).getByLabelText('What it means')).toHaveValue(
      'Goes further than the evidence allows.',
    );

    fake.use({
      'PATCH /api/rating-levels/stretched': {
        status: 200,
        body: { ...newer, description: 'Goes further than the evidence allows.', version: 4 },
      },
    });
    await user.click(within(dialog).getByRole('button', { name: 'Save the words' }));
    expect(await screen.findByText('“Stretched” is saved.')).toBeInTheDocument();
    expect(fake.calls('PATCH /api/rating-levels/stretched').map((call) => call.body)).toEqual([
      { label: 'Stretched', description: 'Goes further than the evidence allows.', version: 2 },
      { label: 'Stretched', description: 'Goes further than the evidence allows.', version: 3 },
    ]);
  });

  it('asks before deleting a level, and offers no delete for one in use', async () => {
    const fake = mockApi(
      signedIn('desk_chief', {
        'GET /api/rating-levels': { status: 200, body: ratingLevels },
        'DELETE /api/rating-levels/stretched': { status: 204 },
      }),
    );
    const { user } = renderApp('/rating-scale');
    const contradicted = await screen.findByRole('article', {
      name: '5 · Contradicted by evidence',
    });
    expect(within(contradicted).queryByRole('button', { name: /Delete/ })).not.toBeInTheDocument();
    expect(contradicted).toHaveTextContent('In use by a verdict, so it stays on the scale.');

    await user.click(screen.getByRole('button', { name: 'Delete “Stretched”' }));
    const ask = await screen.findByRole('alertdialog', { name: 'Delete “Stretched”?' });
    await user.click(within(ask).getByRole('button', { name: 'Keep it' }));
    expect(fake.calls('DELETE /api/rating-levels/stretched')).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Delete “Stretched”' }));
    fake.use({
      'GET /api/rating-levels': {
        status: 200,
        body: ratingLevels.filter((level) => level.id !== 'stretched'),
      },
    });
    await user.click(
      within(await screen.findByRole('alertdialog')).getByRole('button', {
        name: 'Delete the level',
      }),
    );
    expect(await screen.findByText('“Stretched” is deleted.')).toBeInTheDocument();
    expect(fake.calls('DELETE /api/rating-levels/stretched')).toHaveLength(1);
    await waitFor(() =>
      expect(screen.queryByRole('heading', { name: '3 · Stretched' })).not.toBeInTheDocument(),
    );
  });

  it('adds a level, sending an empty number as none', async () => {
    const fake = mockApi(
      signedIn('desk_chief', {
        'GET /api/rating-levels': { status: 200, body: ratingLevels },
        'POST /api/rating-levels': apiError(409, 'The scale already has a level with this id', {
          id: 'taken',
        }),
      }),
    );
    const { user } = renderApp('/rating-scale');
    await user.click(await screen.findByRole('button', { name: 'Add a level' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a level to the scale' });
    await user.type(within(dialog).getByLabelText('Id'), 'Too Early');
    await user.type(within(dialog).getByLabelText('Label'), 'Too early to say');
    await user.type(
      within(dialog).getByLabelText('What it means'),
      'The evidence is still coming in.',
    );
    await user.click(within(dialog).getByRole('checkbox', { name: 'It is a rating' }));
    await user.click(within(dialog).getByRole('button', { name: 'Add the level' }));
    expect(
      await within(dialog).findByText('Use lower-case words joined by hyphens'),
    ).toBeInTheDocument();
    expect(fake.calls('POST /api/rating-levels')).toHaveLength(0);

    await user.clear(within(dialog).getByLabelText('Id'));
    await user.type(within(dialog).getByLabelText('Id'), 'holds-up');
    await user.click(within(dialog).getByRole('button', { name: 'Add the level' }));
    expect(
      await within(dialog).findByText('The scale already has a level with this id'),
    ).toBeInTheDocument();
    expect(fake.calls('POST /api/rating-levels')[0]?.body).toEqual({
      id: 'holds-up',
      number: null,
      label: 'Too early to say',
      description: 'The evidence is still coming in.',
      isRating: false,
    });
  });
});

describe('the outbox', { timeout: 20_000 }, () => {
  const outboxWithRetry = () =>
    signedIn('desk_chief', {
      'GET /api/outbox': { status: 200, body: outboxPage() },
      [`POST /api/outbox/${failedMail.id}/retry`]: {
        status: 200,
        body: { ...failedMail, state: 'pending', attempts: 0, lastError: null },
      },
    });

  it('lists the mails with their state, and puts a failed one back in line', async () => {
    const fake = mockApi(outboxWithRetry());
    const { user } = renderApp('/outbox');
    const table = await screen.findByRole('region', { name: 'Mails' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(3);
    expect(rows[2]).toHaveTextContent('Verdict sent back');
    expect(rows[2]).toHaveTextContent('Failed');
    expect(rows[2]).toHaveTextContent('connect ECONNREFUSED 127.0.0.1:1025');
    expect(rows[2]).toHaveTextContent('Not until retried');
    expect(within(rows[1]!).queryByRole('button', { name: /Retry/ })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: /Failed/ })).toHaveAttribute(
      'href',
      '/outbox?state=failed',
    );

    fake.use({
      'GET /api/outbox': {
        status: 200,
        body: outboxPage([{ ...failedMail, state: 'pending', attempts: 0, lastError: null }]),
      },
    });
    await user.click(
      within(rows[2]!).getByRole('button', {
        name: `Retry the mail to ${failedMail.to}: ${failedMail.subject}`,
      }),
    );
    expect(
      await screen.findByText(`The mail to ${failedMail.to} is back in line.`),
    ).toBeInTheDocument();
    expect(fake.calls(`POST /api/outbox/${failedMail.id}/retry`)).toHaveLength(1);
    await waitFor(() =>
      expect(
        within(screen.getByRole('region', { name: 'Mails' })).getByText('Waiting'),
      ).toBeInTheDocument(),
    );
  });

  it('gives a phone each mail as a card with the same facts and retry', async () => {
    const fake = mockApi(outboxWithRetry());
    const { user } = renderApp('/outbox');
    const cards = await screen.findByRole('list', { name: 'Mails' });
    const [sent, failed] = within(cards).getAllByRole('listitem');
    expect(sent).toHaveTextContent(/^SentSign-off requested/);
    expect(sent).toHaveTextContent('Last errorNone');
    expect(within(sent!).queryByRole('button')).not.toBeInTheDocument();
    expect(failed).toHaveTextContent(/^FailedVerdict sent back/);
    expect(failed).toHaveTextContent(failedMail.subject);
    expect(failed).toHaveTextContent(`To${failedMail.to}`);
    expect(failed).toHaveTextContent('Attempts8');
    expect(failed).toHaveTextContent('Last errorconnect ECONNREFUSED 127.0.0.1:1025');
    expect(failed).toHaveTextContent('Not until retried');

    await user.click(
      within(failed!).getByRole('button', {
        name: `Retry the mail to ${failedMail.to}: ${failedMail.subject}`,
      }),
    );
    expect(
      await screen.findByText(`The mail to ${failedMail.to} is back in line.`),
    ).toBeInTheDocument();
    expect(fake.calls(`POST /api/outbox/${failedMail.id}/retry`)).toHaveLength(1);
  });

  it('reads the state tab from the address', async () => {
    const fake = mockApi(
      signedIn('desk_chief', {
        'GET /api/outbox': { status: 200, body: outboxPage([failedMail]) },
      }),
    );
    renderApp('/outbox?state=failed');
    expect(await screen.findByRole('region', { name: 'Mails: failed' })).toBeInTheDocument();
    expect(fake.calls('GET /api/outbox')[0]?.search.get('state')).toBe('failed');
  });

  it('is the desk chief’s only', async () => {
    mockApi(signedIn('copy_desk'));
    renderApp('/outbox');
    expect(
      await screen.findByRole('heading', { level: 1, name: "You don't have access" }),
    ).toBeInTheDocument();
  });
});

describe('the audit trail', { timeout: 20_000 }, () => {
  it('keeps its filters in the address and asks the API with them', async () => {
    const fake = mockApi(
      signedIn('desk_chief', { 'GET /api/audit': { status: 200, body: auditPage } }),
    );
    const { user, location } = renderApp('/audit');
    const table = await screen.findByRole('region', { name: 'Audit events, newest first' });
    expect(table).toHaveTextContent('Ines Calder moved the claim to “Cleared”');
    expect(table).toHaveTextContent('status: Awaiting sign-off → Cleared');
    expect(table).toHaveTextContent('Mara Quill reworded a level of the rating scale');
    expect(table).toHaveTextContent('label: Stretched → Overstretched');

    await user.type(screen.getByLabelText('Action'), 'claim.cleared');
    await user.click(screen.getByRole('combobox', { name: 'Who' }));
    await user.click(screen.getByRole('option', { name: 'Ines Calder (copy desk)' }));
    await user.type(screen.getByLabelText('From'), '2026-11-01');
    await user.type(screen.getByLabelText('To'), '2026-10-01');
    await user.click(screen.getByRole('button', { name: 'Apply filters' }));
    expect(
      await screen.findByText('The end of the range must not be before its start'),
    ).toBeInTheDocument();
    await user.clear(screen.getByLabelText('To'));
    await user.type(screen.getByLabelText('To'), '2026-11-30');
    await user.click(screen.getByRole('button', { name: 'Apply filters' }));

    const expected = `action=claim.cleared&actor=${deskPeople.copy_desk.id}&from=2026-11-01&to=2026-11-30`;
    await waitFor(() => expect(location()).toBe(`/audit?${expected}`));
    await waitFor(() =>
      expect(fake.calls('GET /api/audit').at(-1)?.search.toString()).toBe(expected),
    );
    // The filters stay in the form, read back from the address.
    expect(screen.getByLabelText('Action')).toHaveValue('claim.cleared');
  });

  it('exports the same filters as CSV with the token', async () => {
    const csv = new Blob(['at,actor\n'], { type: 'text/csv' });
    const fake = mockApi(
      signedIn('desk_chief', {
        'GET /api/audit': { status: 200, body: auditPage },
        'GET /api/audit/export': { status: 200, body: csv },
      }),
    );
    const saved: string[] = [];
    const click = HTMLAnchorElement.prototype.click;
    HTMLAnchorElement.prototype.click = function () {
      saved.push(this.download);
    };
    URL.createObjectURL = () => 'blob:audit';
    URL.revokeObjectURL = () => {};
    try {
      const { user } = renderApp('/audit?entityType=claim&page=2');
      await user.click(await screen.findByRole('button', { name: 'Export CSV' }));
      await waitFor(() => expect(saved).toEqual(['skyledger-audit.csv']));
      const [request] = fake.calls('GET /api/audit/export');
      expect(request?.search.toString()).toBe('entityType=claim');
      expect(request?.headers.get('Authorization')).toBe('Bearer token-desk_chief');
    } finally {
      HTMLAnchorElement.prototype.click = click;
    }
  });
});

describe('notification settings on the account page', { timeout: 20_000 }, () => {
  it('shows a tick per kind of mail and saves the ones turned off', async () => {
    const fake = mockApi(
      signedIn('copy_desk', {
        'GET /api/me/notifications': { status: 200, body: notificationSettings },
        'PUT /api/me/notifications': { status: 200, body: notificationSettings },
      }),
    );
    const { user } = renderApp('/account');
    const form = await screen.findByRole('form', { name: 'Mails the desk sends you' });
    expect(within(form).getAllByRole('checkbox')).toHaveLength(6);
    expect(
      within(form).getByRole('checkbox', { name: 'An explainer I worked on is published' }),
    ).not.toBeChecked();
    await user.click(
      within(form).getByRole('checkbox', { name: 'A verdict awaits sign-off (copy desk)' }),
    );
    await user.click(within(form).getByRole('button', { name: 'Save mail choices' }));
    expect(await screen.findByText('Your choice of mails is saved.')).toBeInTheDocument();
    expect(fake.calls('PUT /api/me/notifications')[0]?.body).toEqual({
      disabled: ['signoff_requested', 'published'],
    });
  });
});
