import type { ClaimDetail, ClaimHistoryEvent, Role } from '@skyledger/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi, type Routes } from './api-mock';
import { coreClaim, deskPeopleList, filedClaim } from './claim-fixtures';
import { deskPeople, sessionFor } from './fixtures';
import { renderApp } from './render-app';
import { draftVersion, verdictWith } from './verdict-fixtures';

const claimPath = `/api/claims/${coreClaim.id}`;

function claimRoutes(role: Role, claim: ClaimDetail = coreClaim): Routes {
  return {
    'POST /api/auth/refresh': { status: 200, body: sessionFor(role) },
    'GET /api/people': { status: 200, body: deskPeopleList },
    [`GET /api/claims/${claim.id}`]: { status: 200, body: claim },
    [`GET /api/claims/${claim.id}/verdict`]: { status: 200, body: verdictWith() },
  };
}

const history: ClaimHistoryEvent[] = [
  {
    id: 'e1',
    action: 'claim.filed',
    entityType: 'claim',
    entityId: coreClaim.id,
    actor: { id: deskPeople.reporter.id, displayName: deskPeople.reporter.displayName },
    summary: { summary: coreClaim.summary },
    at: '2026-11-12T20:05:00.000Z',
  },
  {
    id: 'e2',
    action: 'source.linked',
    entityType: 'source',
    entityId: coreClaim.sources[0]!.id,
    actor: { id: deskPeople.science_editor.id, displayName: deskPeople.science_editor.displayName },
    summary: { title: coreClaim.sources[0]!.title, grade: 'strong' },
    at: '2026-11-16T09:00:00.000Z',
  },
];

describe('the claim page', { timeout: 20_000 }, () => {
  it('shows the claim and each of its parts in tabs', async () => {
    const png = new Blob([new Uint8Array([0x89, 0x50, 0x4e, 0x47])], { type: 'image/png' });
    const fake = mockApi({
      ...claimRoutes('science_editor'),
      [`GET /api/attachments/${coreClaim.attachments[0]!.id}`]: { status: 200, body: png },
      [`GET ${claimPath}/history`]: { status: 200, body: history },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}`);

    expect(
      await screen.findByRole('heading', { level: 1, name: coreClaim.summary }),
    ).toBeInTheDocument();
    expect(document.title).toBe(`${coreClaim.summary} · Skyledger`);
    expect(screen.getByText(/Researched by/)).toHaveTextContent('Researched by Tobias Renn (you)');
    expect(screen.getByText(coreClaim.text)).toBeInTheDocument();

    await user.click(screen.getByRole('tab', { name: /Appearances \(1\)/ }));
    const appearance = await screen.findByRole('list', { name: 'Appearances, earliest first' });
    expect(within(appearance).getByText('First known')).toBeInTheDocument();
    expect(
      within(appearance).getByRole('link', { name: coreClaim.appearances[0]!.url }),
    ).toHaveAttribute('rel', 'nofollow noopener noreferrer');
    // Seen at 19:42 UTC on 12 November: 19:42 GMT on a London clock.
    expect(appearance).toHaveTextContent('Seen 12 Nov 2026, 19:42 GMT (Europe/London)');

    await user.click(screen.getByRole('tab', { name: /Sources \(1\)/ }));
    const sources = await screen.findByRole('list', { name: 'Sources cited' });
    expect(within(sources).getByText('Peer-reviewed paper')).toBeInTheDocument();
    expect(within(sources).getByText('Grade: Strong')).toBeInTheDocument();
    expect(
      within(sources).getByText(/standard compilation of measured heat flow/),
    ).toBeInTheDocument();

    await user.click(screen.getByRole('tab', { name: /Evidence files \(2\)/ }));
    const preview = await screen.findByRole('img', {
      name: 'Preview of council-webcast-item-6.png',
    });
    expect(preview.getAttribute('src')).toMatch(/^blob:/);
    const [fileRequest] = fake.calls(`GET /api/attachments/${coreClaim.attachments[0]!.id}`);
    expect(fileRequest?.headers.get('Authorization')).toBe('Bearer token-science_editor');
    expect(
      screen.getByRole('button', { name: 'Download ground-temperature-log.csv' }),
    ).toBeInTheDocument();
    expect(fake.calls(`GET /api/attachments/${coreClaim.attachments[1]!.id}`)).toHaveLength(0);

    await user.click(screen.getByRole('tab', { name: /Right of reply \(1\)/ }));
    expect(await screen.findByText('The councillor stands by his remarks.')).toBeInTheDocument();
    await user.click(screen.getByRole('tab', { name: /Experts \(1\)/ }));
    expect(await screen.findByText('Independent of the claimant')).toBeInTheDocument();
    await user.click(screen.getByRole('tab', { name: /Comments \(1\)/ }));
    expect(await screen.findByText('The webcast timestamp is 1:42:10.')).toBeInTheDocument();

    await user.click(screen.getByRole('tab', { name: /History/ }));
    const events = await screen.findByRole('list', { name: 'History of the claim, oldest first' });
    expect(
      within(events)
        .getAllByRole('listitem')
        .map((item) => item.querySelector('p')?.textContent),
    ).toEqual(['Joss Whitcombe filed the claim', 'Tobias Renn cited a source']);
  });

  it('says a claim that does not exist is not found', async () => {
    const missing = '5d2e7f10-6a3b-4b8c-8d1e-3f00000000ff';
    mockApi({
      ...claimRoutes('reporter'),
      [`GET /api/claims/${missing}`]: apiError(404, 'No such claim'),
    });
    renderApp(`/claims/${missing}`);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Page not found' }),
    ).toBeInTheDocument();
  });

  it('opens the tab named in the address', async () => {
    mockApi(claimRoutes('reporter'));
    renderApp(`/claims/${coreClaim.id}#sources`);
    expect(await screen.findByRole('tab', { name: /Sources/, selected: true })).toBeInTheDocument();
  });

  it('shows the stale message and reloads when someone else edited first (409)', async () => {
    const theirs = {
      ...coreClaim,
      summary: 'Heat from the core is what warms the planet',
      version: 5,
    };
    const fake = mockApi({
      ...claimRoutes('science_editor'),
      [`PATCH ${claimPath}`]: () => {
        fake.use({ [`GET ${claimPath}`]: { status: 200, body: theirs } });
        return apiError(409, 'This claim was changed by someone else meanwhile (now version 5)', {
          version: 'stale',
        });
      },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}`);

    await user.click(await screen.findByRole('button', { name: 'Edit the claim' }));
    const form = screen.getByRole('form', { name: 'Edit the claim' });
    const summary = within(form).getByLabelText('Neutral summary');
    await user.clear(summary);
    await user.type(summary, 'Geothermal heat explains warming');
    await user.click(within(form).getByRole('button', { name: 'Save changes' }));

    expect(await within(form).findByRole('alert')).toHaveTextContent(
      'Someone else changed this claim meanwhile, so your change was not saved.',
    );
    expect(fake.calls(`PATCH ${claimPath}`)[0]?.body).toMatchObject({
      summary: 'Geothermal heat explains warming',
      version: 4,
    });
    // The page now shows their version; the typed edit is still in the form.
    expect(
      await screen.findByRole('heading', { level: 1, name: theirs.summary }),
    ).toBeInTheDocument();
    expect(summary).toHaveValue('Geothermal heat explains warming');
    expect(fake.calls(`GET ${claimPath}`)).toHaveLength(2);
  });

  it.each([
    [
      'cleared',
      'The copy desk cleared version 2 with the claim as it stood: readers will be shown what was said, its summary and who said it as cleared. A change to those reaches them only with a version cleared after it.',
    ],
    [
      'published',
      'Readers are shown what was said, its summary and who said it as published with version 2, until a corrected version is cleared and published.',
    ],
  ] as const)(
    'says what readers see while a claim with a %s version is edited',
    async (state, note) => {
      mockApi({
        ...claimRoutes('science_editor'),
        [`GET /api/claims/${coreClaim.id}/verdict`]: {
          status: 200,
          body: verdictWith({ ...draftVersion, id: 'v2', number: 2, state }),
        },
      });
      const { user } = renderApp(`/claims/${coreClaim.id}`);

      await user.click(await screen.findByRole('button', { name: 'Edit the claim' }));
      const form = screen.getByRole('form', { name: 'Edit the claim' });
      expect(await within(form).findByText(note)).toBeInTheDocument();
    },
  );

  it('lets a science editor take a claim nobody has', async () => {
    const filedPath = `/api/claims/${filedClaim.id}`;
    const fake = mockApi({
      ...claimRoutes('science_editor', filedClaim),
      [`POST ${filedPath}/assign`]: () => {
        const taken = {
          ...filedClaim,
          status: 'in_research' as const,
          assignee: { id: deskPeople.science_editor.id, displayName: 'Tobias Renn' },
          version: 2,
        };
        fake.use({ [`GET ${filedPath}`]: { status: 200, body: taken } });
        return { status: 200, body: taken };
      },
    });
    const { user } = renderApp(`/claims/${filedClaim.id}`);

    await user.click(await screen.findByRole('button', { name: 'Take this claim' }));
    expect(await screen.findByText('You are now researching this claim.')).toBeInTheDocument();
    expect(fake.calls(`POST ${filedPath}/assign`)[0]?.body).toEqual({
      assigneeId: deskPeople.science_editor.id,
      version: 1,
    });
    expect(screen.getByText('In research')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Take this claim' })).not.toBeInTheDocument();
  });

  it('lets a desk chief give the claim to someone assignable', async () => {
    const fake = mockApi({
      ...claimRoutes('desk_chief'),
      [`POST ${claimPath}/assign`]: { status: 200, body: coreClaim },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}`);

    await user.click(await screen.findByRole('combobox', { name: 'Give it to' }));
    const options = await screen.findAllByRole('option');
    // Only science editors and desk chiefs research claims.
    expect(options.map((option) => option.textContent)).toEqual([
      'Nobody',
      'Mara Quill (desk chief)',
      'Tobias Renn (science editor)',
    ]);
    await user.click(screen.getByRole('option', { name: 'Mara Quill (desk chief)' }));
    await user.click(screen.getByRole('button', { name: 'Assign' }));
    await waitFor(() => expect(fake.calls(`POST ${claimPath}/assign`)).toHaveLength(1));
    expect(fake.calls(`POST ${claimPath}/assign`)[0]?.body).toEqual({
      assigneeId: deskPeople.desk_chief.id,
      version: 4,
    });
  });

  it('lets a desk chief set the claim aside with a reason', async () => {
    const fake = mockApi({
      ...claimRoutes('desk_chief'),
      [`POST ${claimPath}/transitions`]: { status: 200, body: coreClaim },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}`);

    await user.click(await screen.findByRole('button', { name: 'Set aside' }));
    const dialog = await screen.findByRole('dialog', { name: 'Set the claim aside' });
    await user.click(within(dialog).getByRole('button', { name: 'Set it aside' }));
    expect(await within(dialog).findByText('Choose why it is set aside')).toBeInTheDocument();
    await user.click(within(dialog).getByRole('combobox', { name: 'Why' }));
    await user.click(await screen.findByRole('option', { name: 'Duplicate of an earlier claim' }));
    await user.type(within(dialog).getByLabelText('Note (optional)'), 'Same as the webcast claim');
    await user.click(within(dialog).getByRole('button', { name: 'Set it aside' }));

    expect(await screen.findByText('The claim is set aside.')).toBeInTheDocument();
    expect(fake.calls(`POST ${claimPath}/transitions`)[0]?.body).toEqual({
      to: 'set_aside',
      reason: 'duplicate',
      note: 'Same as the webcast claim',
      version: 4,
    });
  });

  it('hides from a reporter what the role may not do', async () => {
    // The reporter filed this claim, but it is in research: it is no longer theirs to edit.
    mockApi(claimRoutes('reporter'));
    const { user } = renderApp(`/claims/${coreClaim.id}`);

    await screen.findByRole('heading', { level: 1, name: coreClaim.summary });
    expect(screen.queryByRole('button', { name: 'Edit the claim' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Take this claim' })).not.toBeInTheDocument();
    expect(screen.queryByRole('combobox', { name: 'Give it to' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Set aside' })).not.toBeInTheDocument();

    await user.click(screen.getByRole('tab', { name: /Appearances/ }));
    expect(await screen.findByRole('button', { name: 'Add an appearance' })).toBeInTheDocument();
    await user.click(screen.getByRole('tab', { name: /Sources/ }));
    expect(await screen.findByRole('button', { name: 'Cite a source' })).toBeInTheDocument();
    // The source was added by a science editor: a reporter may not regrade it.
    expect(screen.queryByRole('button', { name: /Regrade/ })).not.toBeInTheDocument();
    await user.click(screen.getByRole('tab', { name: /Right of reply/ }));
    await screen.findByText('The councillor stands by his remarks.');
    expect(screen.queryByRole('button', { name: 'Log a reply attempt' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('tab', { name: /Experts/ }));
    await screen.findByText('Independent of the claimant');
    expect(screen.queryByRole('button', { name: 'Add a consultation' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('tab', { name: /Comments/ }));
    expect(await screen.findByRole('form', { name: 'Add a comment' })).toBeInTheDocument();
  });

  it('lets a reporter edit a claim they filed while it is filed', async () => {
    mockApi(claimRoutes('reporter', filedClaim));
    renderApp(`/claims/${filedClaim.id}`);
    expect(await screen.findByRole('button', { name: 'Edit the claim' })).toBeInTheDocument();
  });

  it('cites a new source with its kind, grade and reason', async () => {
    const fake = mockApi({
      ...claimRoutes('science_editor'),
      [`POST ${claimPath}/sources`]: { status: 201, body: coreClaim.sources[0] },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}#sources`);

    await user.click(await screen.findByRole('button', { name: 'Cite a source' }));
    const dialog = await screen.findByRole('dialog', { name: 'Cite a source' });
    await user.click(within(dialog).getByRole('tab', { name: /A new source/ }));
    await user.type(within(dialog).getByLabelText('Title'), 'AR6 WG1 chapter 7');
    await user.type(within(dialog).getByLabelText('Year (optional)'), '2021');
    await user.click(within(dialog).getByRole('combobox', { name: 'Kind of source' }));
    await user.click(await screen.findByRole('option', { name: 'Assessment report' }));
    await user.type(within(dialog).getByLabelText('DOI'), '10.1017/9781009157896.009');
    await user.click(within(dialog).getByRole('combobox', { name: 'Reliability grade' }));
    await user.click(await screen.findByRole('option', { name: 'Strong' }));
    await user.type(
      within(dialog).getByLabelText('Reason for the grade'),
      'The assessed literature.',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Cite the new source' }));

    await waitFor(() => expect(fake.calls(`POST ${claimPath}/sources`)).toHaveLength(1));
    expect(fake.calls(`POST ${claimPath}/sources`)[0]?.body).toEqual({
      source: {
        title: 'AR6 WG1 chapter 7',
        year: 2021,
        doi: '10.1017/9781009157896.009',
        kind: 'assessment_report',
        grade: 'strong',
        gradeReason: 'The assessed literature.',
      },
    });
    expect(await screen.findByText(/is cited for this claim/)).toBeInTheDocument();
  });

  it('logs a reply attempt with its times read in the chosen zone', async () => {
    const fake = mockApi({
      ...claimRoutes('science_editor'),
      [`POST ${claimPath}/reply-attempts`]: { status: 201, body: coreClaim.replyAttempts[0] },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}#reply`);

    await user.click(await screen.findByRole('button', { name: 'Log a reply attempt' }));
    const dialog = await screen.findByRole('dialog', { name: 'Log a reply attempt' });
    await user.type(within(dialog).getByLabelText('Who was contacted'), 'The councillor’s office');
    await user.type(
      within(dialog).getByLabelText('Contacted at (date and time)'),
      '2026-11-16T10:05',
    );
    await user.click(within(dialog).getByRole('combobox', { name: 'Contacted at: time zone' }));
    await user.click(await screen.findByRole('option', { name: 'UTC' }));
    await user.click(within(dialog).getByRole('combobox', { name: 'How' }));
    await user.click(await screen.findByRole('option', { name: 'E-mail' }));
    await user.type(
      within(dialog).getByLabelText('Deadline for a reply (optional)'),
      '2026-11-19T17:00',
    );
    await user.click(within(dialog).getByRole('combobox', { name: 'Outcome' }));
    await user.click(await screen.findByRole('option', { name: 'Awaiting a reply' }));
    await user.click(within(dialog).getByRole('button', { name: 'Log the attempt' }));

    await waitFor(() => expect(fake.calls(`POST ${claimPath}/reply-attempts`)).toHaveLength(1));
    expect(fake.calls(`POST ${claimPath}/reply-attempts`)[0]?.body).toEqual({
      contacted: 'The councillor’s office',
      contactedAt: '2026-11-16T10:05:00Z',
      channel: 'email',
      deadline: '2026-11-19T17:00:00Z',
      outcome: 'awaiting',
    });
  });
});
