import type { ClaimDetail, PublicationView, Role } from '@skyledger/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi, type Routes } from './api-mock';
import { coreClaim, deskPeopleList } from './claim-fixtures';
import { sessionFor } from './fixtures';
import { renderApp } from './render-app';

const claimPath = `/api/claims/${coreClaim.id}`;
const readerPage = 'http://127.0.0.1:3000/explainers/earths-core-not-greenhouse-gases';

const cleared: ClaimDetail = { ...coreClaim, status: 'cleared', version: 9 };
const published: ClaimDetail = { ...coreClaim, status: 'published', version: 11 };

const firstPublication: PublicationView = {
  id: 'c1a2b3c4-0000-4000-8000-000000000001',
  versionNumber: 1,
  sequence: 1,
  state: 'published',
  scheduledFor: null,
  scheduledTimeZone: null,
  publishedAt: '2026-11-20T10:00:00.000Z',
  note: null,
  url: `${readerPage}/v/1`,
  readerUrl: readerPage,
};

const correction: PublicationView = {
  id: 'c1a2b3c4-0000-4000-8000-000000000002',
  versionNumber: 2,
  sequence: 2,
  state: 'published',
  scheduledFor: null,
  scheduledTimeZone: null,
  publishedAt: '2026-11-24T15:30:00.000Z',
  note: { kind: 'correction', text: 'Two surveys give 44 and 47 terawatts, not one.' },
  url: `${readerPage}/v/2`,
  readerUrl: readerPage,
};

function publishingRoutes(role: Role, claim: ClaimDetail, publications: PublicationView[]): Routes {
  return {
    'POST /api/auth/refresh': { status: 200, body: sessionFor(role) },
    'GET /api/people': { status: 200, body: deskPeopleList },
    [`GET ${claimPath}`]: { status: 200, body: claim },
    [`GET ${claimPath}/publications`]: { status: 200, body: publications },
  };
}

async function openPublishing(role: Role, claim: ClaimDetail, publications: PublicationView[]) {
  const fake = mockApi(publishingRoutes(role, claim, publications));
  const app = renderApp(`/claims/${claim.id}#publishing`);
  // The tab's own heading comes once the publications have loaded (the first lazy load is slow).
  await screen.findByRole('heading', { level: 3, name: 'Publications' }, { timeout: 10_000 });
  return { fake, ...app };
}

describe('publishing on the claim page', { timeout: 20_000 }, () => {
  it('publishes a cleared claim after a confirmation, with no note the first time', async () => {
    const { fake, user } = await openPublishing('copy_desk', cleared, []);
    expect(screen.getByText(/Cleared: ready to publish/)).toBeInTheDocument();
    expect(screen.getByText('Nothing published or scheduled yet.')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /View as readers see it/ })).not.toBeInTheDocument();
    fake.use({
      [`POST ${claimPath}/publish`]: () => {
        fake.use({
          [`GET ${claimPath}`]: {
            status: 200,
            body: { ...cleared, status: 'published', version: 10 },
          },
        });
        return { status: 201, body: [firstPublication] };
      },
    });

    await user.click(screen.getByRole('button', { name: 'Publish now' }));
    const dialog = await screen.findByRole('dialog', { name: 'Publish the explainer now?' });
    expect(within(dialog).queryByLabelText('Update note for readers')).not.toBeInTheDocument();
    expect(fake.calls(`POST ${claimPath}/publish`)).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Publish now' }));

    expect(await screen.findByText('Published: readers can read it now.')).toBeInTheDocument();
    expect(fake.calls(`POST ${claimPath}/publish`)[0]?.body).toEqual({ version: 9 });
    const link = await screen.findByRole('link', { name: /View as readers see it/ });
    expect(link).toHaveAttribute('href', readerPage);
    expect(link).toHaveAttribute('target', '_blank');
    const list = screen.getByRole('list', { name: 'Publications, latest first' });
    expect(
      within(list).getByRole('link', { name: /Publication 1 as readers see it/ }),
    ).toHaveAttribute('href', `${readerPage}/v/1`);
  });

  it('schedules at the time typed on the chosen zone’s clock, sent as an instant with its zone', async () => {
    const { fake, user } = await openPublishing('desk_chief', cleared, []);
    const scheduled: PublicationView = {
      ...firstPublication,
      state: 'scheduled',
      publishedAt: null,
      // 09:30 on a New York clock in June is 13:30 UTC (daylight time, UTC−4).
      scheduledFor: '2031-06-20T13:30:00.000Z',
      scheduledTimeZone: 'America/New_York',
      url: '',
    };
    fake.use({ [`POST ${claimPath}/publish`]: { status: 201, body: [scheduled] } });

    await user.click(screen.getByRole('button', { name: 'Schedule…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Schedule the explainer' });
    await user.type(
      within(dialog).getByLabelText('Publish at (date and time)'),
      '2020-01-06T09:30',
    );
    await user.click(within(dialog).getByRole('combobox', { name: 'Publish at: time zone' }));
    await user.click(await screen.findByRole('option', { name: 'America/New York' }));
    await user.click(within(dialog).getByRole('button', { name: 'Schedule it' }));
    expect(
      await within(dialog).findByText('Choose a time at least a minute from now'),
    ).toBeInTheDocument();
    expect(fake.calls(`POST ${claimPath}/publish`)).toHaveLength(0);

    const when = within(dialog).getByLabelText('Publish at (date and time)');
    await user.clear(when);
    await user.type(when, '2031-06-20T09:30');
    await user.click(within(dialog).getByRole('button', { name: 'Schedule it' }));

    await waitFor(() => expect(fake.calls(`POST ${claimPath}/publish`)).toHaveLength(1));
    expect(fake.calls(`POST ${claimPath}/publish`)[0]?.body).toEqual({
      at: '2031-06-20T09:30:00-04:00',
      timeZone: 'America/New_York',
      version: 9,
    });
    expect(
      await screen.findByText(
        'Scheduled: it is published on 20 Jun 2031, 09:30 GMT-4 (America/New York). Readers see nothing of it before then.',
      ),
    ).toBeInTheDocument();
  });

  it('requires an update note, and says why, when the explainer was published before', async () => {
    const { fake, user } = await openPublishing('copy_desk', cleared, [firstPublication]);
    expect(screen.getByText(/The corrected version is cleared/)).toBeInTheDocument();
    fake.use({
      [`POST ${claimPath}/publish`]: { status: 201, body: [correction, firstPublication] },
    });

    await user.click(screen.getByRole('button', { name: 'Publish now' }));
    const dialog = await screen.findByRole('dialog', {
      name: 'Publish the corrected explainer now?',
    });
    expect(within(dialog).getByText(/This explainer was published before/)).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Publish now' }));
    expect(
      await within(dialog).findByText('Choose what kind of change this is'),
    ).toBeInTheDocument();
    expect(
      within(dialog).getByText('Say what changed: readers see this note on the page'),
    ).toBeInTheDocument();
    expect(fake.calls(`POST ${claimPath}/publish`)).toHaveLength(0);

    await user.click(within(dialog).getByRole('combobox', { name: 'Kind of change' }));
    await user.click(await screen.findByRole('option', { name: 'Correction' }));
    expect(
      within(dialog).getByText('Something we published was wrong and is now put right.'),
    ).toBeInTheDocument();
    await user.type(
      within(dialog).getByLabelText('Update note for readers'),
      'Two surveys give 44 and 47 terawatts, not one.',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Publish now' }));

    await waitFor(() => expect(fake.calls(`POST ${claimPath}/publish`)).toHaveLength(1));
    expect(fake.calls(`POST ${claimPath}/publish`)[0]?.body).toEqual({
      note: { kind: 'correction', text: 'Two surveys give 44 and 47 terawatts, not one.' },
      version: 9,
    });
    const list = await screen.findByRole('list', { name: 'Publications, latest first' });
    expect(within(list).getByText(/Two surveys give 44 and 47 terawatts/)).toBeInTheDocument();
    expect(
      within(list).getByRole('link', { name: /Publication 2 as readers see it/ }),
    ).toHaveAttribute('href', `${readerPage}/v/2`);
  });

  it('shows the API’s refusal in its words', async () => {
    const { fake, user } = await openPublishing('copy_desk', cleared, []);
    fake.use({
      [`POST ${claimPath}/publish`]: apiError(
        422,
        'The claim has no cleared verdict version to publish',
        { verdict: 'notCleared' },
      ),
    });
    await user.click(screen.getByRole('button', { name: 'Publish now' }));
    const dialog = await screen.findByRole('dialog', { name: 'Publish the explainer now?' });
    await user.click(within(dialog).getByRole('button', { name: 'Publish now' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent(
      'The claim has no cleared verdict version to publish',
    );
  });

  it('shows a schedule in its own zone and cancels it after a confirmation', async () => {
    const scheduled: PublicationView = {
      ...firstPublication,
      state: 'scheduled',
      publishedAt: null,
      // 09:00 on a London clock in December is 09:00 UTC (GMT).
      scheduledFor: '2026-12-05T09:00:00.000Z',
      scheduledTimeZone: 'Europe/London',
      url: '',
    };
    const { fake, user } = await openPublishing('copy_desk', cleared, [scheduled]);
    expect(screen.getByText(/Scheduled to publish on/)).toHaveTextContent(
      'Scheduled to publish on 5 Dec 2026, 09:00 GMT (Europe/London).',
    );
    expect(screen.queryByRole('button', { name: 'Publish now' })).not.toBeInTheDocument();
    fake.use({
      [`DELETE ${claimPath}/publication-schedule`]: () => {
        fake.use({ [`GET ${claimPath}`]: { status: 200, body: { ...cleared, version: 10 } } });
        return { status: 200, body: [{ ...scheduled, state: 'cancelled' }] };
      },
    });

    await user.click(screen.getByRole('button', { name: 'Cancel the schedule' }));
    const dialog = await screen.findByRole('alertdialog', {
      name: 'Cancel the scheduled publication?',
    });
    expect(dialog).toHaveTextContent('It will not be published on 5 Dec 2026, 09:00 GMT');
    expect(fake.calls(`DELETE ${claimPath}/publication-schedule`)).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Cancel the schedule' }));

    expect(
      await screen.findByText('The schedule is cancelled: nothing will be published on its own.'),
    ).toBeInTheDocument();
    expect(fake.calls(`DELETE ${claimPath}/publication-schedule`)[0]?.body).toEqual({
      version: 9,
    });
    const list = screen.getByRole('list', { name: 'Publications, latest first' });
    expect(within(list).getByText('Schedule cancelled')).toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'Schedule…' })).toBeInTheDocument();
  });

  it('lets a science editor start a correction, saying the public page stays as published', async () => {
    const { fake, user } = await openPublishing('science_editor', published, [
      correction,
      firstPublication,
    ]);
    expect(screen.queryByRole('button', { name: 'Publish now' })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: /View as readers see it/ })).toHaveAttribute(
      'href',
      readerPage,
    );
    const reopened: ClaimDetail = { ...published, status: 'in_research', version: 12 };
    fake.use({
      [`POST ${claimPath}/transitions`]: () => {
        fake.use({ [`GET ${claimPath}`]: { status: 200, body: reopened } });
        return { status: 200, body: reopened };
      },
    });

    await user.click(screen.getByRole('button', { name: 'Start a correction' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Start a correction?' });
    expect(dialog).toHaveTextContent('readers keep seeing the explainer as it was published');
    await user.click(within(dialog).getByRole('button', { name: 'Start the correction' }));

    expect(
      await screen.findByText(/The claim is back in research for a correction/),
    ).toBeInTheDocument();
    expect(fake.calls(`POST ${claimPath}/transitions`)[0]?.body).toEqual({
      to: 'in_research',
      version: 11,
    });
    expect(screen.getByText(/A correction is under way/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Start a correction' })).not.toBeInTheDocument();
  });

  it('shows why a correction could not start', async () => {
    const { fake, user } = await openPublishing('desk_chief', published, [firstPublication]);
    fake.use({
      [`POST ${claimPath}/transitions`]: apiError(
        422,
        'A claim that is “In research” cannot move to “In research”',
        { to: 'notFromHere' },
      ),
    });
    await user.click(screen.getByRole('button', { name: 'Start a correction' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Start a correction?' });
    await user.click(within(dialog).getByRole('button', { name: 'Start the correction' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent(
      'A claim that is “In research” cannot move to “In research”',
    );
  });

  it('offers the copy desk no correction and a reporter no publishing', async () => {
    await openPublishing('copy_desk', published, [firstPublication]);
    expect(screen.queryByRole('button', { name: 'Start a correction' })).not.toBeInTheDocument();
    expect(screen.getByText(/Published: readers can read the explainer/)).toBeInTheDocument();
  });

  it('offers a reporter no publishing on a cleared claim', async () => {
    await openPublishing('reporter', cleared, []);
    expect(screen.getByText(/Cleared: ready to publish/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Publish now' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Schedule…' })).not.toBeInTheDocument();
  });
});
