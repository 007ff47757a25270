import type { AttachmentView, ClaimDetail } from '@skyledger/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi } from './api-mock';
import { deskPeopleList, weatherClub } from './claim-fixtures';
import { deskPeople, sessionFor } from './fixtures';
import { renderApp } from './render-app';

const reporter = deskPeople.reporter;
const asReporter = {
  'POST /api/auth/refresh': { status: 200, body: sessionFor('reporter') },
  'GET /api/people': { status: 200, body: deskPeopleList },
  // The filing form looks for earlier claims like the one typed (tested in its own suite).
  'GET /api/claims/similar': { status: 200, body: [] },
};

const newClaimId = '5d2e7f10-6a3b-4b8c-8d1e-3f00000000aa';
const appearanceId = '6e3f8a21-7b4c-4c9d-9e2f-4000000000aa';
const captureId = '7f4a9b32-8c5d-4d0e-8f3a-5000000000aa';

const filed: ClaimDetail = {
  id: newClaimId,
  summary: 'The sun’s brightening explains recent warming',
  text: 'The sun is getting brighter, and that is all there is to it.',
  status: 'filed',
  topics: ['attribution', 'solar'],
  legalReview: true,
  claimant: weatherClub,
  assignee: null,
  filedBy: { id: reporter.id, displayName: reporter.displayName },
  filedAt: '2026-11-28T20:00:00.000Z',
  updatedAt: '2026-11-28T20:00:00.000Z',
  setAsideReason: null,
  setAsideNote: null,
  version: 1,
  appearances: [
    {
      id: appearanceId,
      url: 'https://radio.lowmoor.test/shows/2026-11-28',
      outlet: 'Lowmoor Community Radio',
      seenAt: '2026-11-28T18:05:00.000Z',
      seenTimeZone: 'Europe/Berlin',
      isFirstKnown: true,
      captureAttachmentId: null,
      addedBy: { id: reporter.id, displayName: reporter.displayName },
      createdAt: '2026-11-28T20:00:00.000Z',
      version: 1,
    },
  ],
  sources: [],
  attachments: [],
  replyAttempts: [],
  consultations: [],
  comments: [],
};

const capture: AttachmentView = {
  id: captureId,
  originalName: 'radio-page.png',
  mediaType: 'image/png',
  size: 8,
  sha256: 'c5a1f0e2d3b4a5968778695a4b3c2d1e0f9e8d7c6b5a49382716f5e4d3c2b1a0',
  uploadedBy: { id: reporter.id, displayName: reporter.displayName },
  uploadedAt: '2026-11-28T20:00:01.000Z',
};

/** Long text goes in as one paste: typing it key by key only slows the test. */
async function paste(user: ReturnType<typeof renderApp>['user'], field: HTMLElement, text: string) {
  await user.click(field);
  await user.paste(text);
}

async function fillTheClaim(user: ReturnType<typeof renderApp>['user']) {
  const form = await screen.findByRole('form', { name: 'File a claim' });
  await paste(user, within(form).getByLabelText('The claim as it was said'), filed.text);
  await paste(user, within(form).getByLabelText('Neutral summary'), filed.summary);
  await user.type(within(form).getByLabelText('Topics'), 'Solar, attribution');
  await user.type(within(form).getByRole('searchbox', { name: 'Find the claimant' }), 'low');
  await user.click(await within(form).findByRole('button', { name: /Lowmoor Weather Club/ }));
  await paste(user, within(form).getByLabelText('Web address'), filed.appearances[0]!.url);
  await user.type(within(form).getByLabelText('Outlet or platform'), 'Lowmoor Community Radio');
  await user.type(within(form).getByLabelText('Seen at (date and time)'), '2026-11-28T19:05');
  await user.click(within(form).getByRole('combobox', { name: 'Seen at: time zone' }));
  await user.click(await screen.findByRole('option', { name: 'Europe/Berlin' }));
  await user.click(within(form).getByRole('checkbox', { name: 'Needs legal review' }));
  return form;
}

describe('filing a claim', { timeout: 20_000 }, () => {
  it('counts the summary against its 75 characters as it is typed', async () => {
    mockApi(asReporter);
    const { user } = renderApp('/claims/new');
    const summary = await screen.findByLabelText('Neutral summary');
    await user.type(summary, 'The sun is brightening');
    expect(summary).toHaveAccessibleDescription('One neutral line: 22 of 75 characters');
    await paste(user, summary, 'x'.repeat(60));
    expect(summary).toHaveAccessibleDescription(
      'One neutral line: 82 of 75 characters, 7 too many',
    );
  });

  it('files the claim, uploads its capture, attaches it and opens the claim', async () => {
    let claimState = filed;
    const fake = mockApi({
      ...asReporter,
      'GET /api/claimants': { status: 200, body: [weatherClub] },
      'POST /api/claims': { status: 201, body: filed },
      [`POST /api/claims/${newClaimId}/attachments`]: async () => {
        // The person sees what is happening while the bytes go up.
        await screen.findByText('Uploading the capture…');
        return { status: 201, body: capture };
      },
      [`PATCH /api/claims/${newClaimId}/appearances/${appearanceId}`]: () => {
        claimState = {
          ...filed,
          attachments: [capture],
          appearances: [{ ...filed.appearances[0]!, captureAttachmentId: captureId, version: 2 }],
        };
        return { status: 200, body: claimState.appearances[0] };
      },
      [`GET /api/claims/${newClaimId}`]: () => ({ status: 200, body: claimState }),
    });
    const { user, location } = renderApp('/claims/new');

    const form = await fillTheClaim(user);
    const png = new File(
      [new Uint8Array([0x89, 0x50, 0x4e, 0x47, 13, 10, 26, 10])],
      'radio-page.png',
      {
        type: 'image/png',
      },
    );
    await user.upload(within(form).getByLabelText('Capture of the page (optional)'), png);
    await user.click(within(form).getByRole('button', { name: 'File the claim' }));

    expect(
      await screen.findByRole('heading', { level: 1, name: filed.summary }),
    ).toBeInTheDocument();
    expect(location()).toBe(`/claims/${newClaimId}`);
    expect(fake.calls('POST /api/claims')[0]?.body).toEqual({
      text: filed.text,
      summary: filed.summary,
      topics: ['solar', 'attribution'],
      legalReview: true,
      claimantId: weatherClub.id,
      firstAppearance: {
        url: filed.appearances[0]!.url,
        outlet: 'Lowmoor Community Radio',
        // 19:05 on a Berlin clock in November is 18:05 UTC (CET, UTC+1, IANA tz database).
        seenAt: '2026-11-28T19:05:00+01:00',
        seenTimeZone: 'Europe/Berlin',
      },
    });
    const upload = fake.calls(`POST /api/claims/${newClaimId}/attachments`)[0]?.body as FormData;
    expect([...upload.keys()]).toEqual(['file']);
    expect((upload.get('file') as File).name).toBe('radio-page.png');
    expect(
      fake.calls(`PATCH /api/claims/${newClaimId}/appearances/${appearanceId}`)[0]?.body,
    ).toEqual({ captureAttachmentId: captureId, version: 1 });
    expect(await screen.findByText('The claim is filed.')).toBeInTheDocument();
  });

  it('describes a new claimant in the same filing', async () => {
    const fake = mockApi({
      ...asReporter,
      'POST /api/claims': apiError(422, 'Nothing more needed'),
    });
    const { user } = renderApp('/claims/new');
    const form = await screen.findByRole('form', { name: 'File a claim' });
    await user.type(
      within(form).getByLabelText('The claim as it was said'),
      'Warming stopped in 2016.',
    );
    await user.type(
      within(form).getByLabelText('Neutral summary'),
      'Global warming stopped in 2016',
    );
    await user.click(
      within(form).getByRole('button', { name: 'Someone new: describe the claimant' }),
    );
    await user.type(within(form).getByLabelText("Claimant's name"), 'Hesketh Barrow');
    await user.click(within(form).getByRole('combobox', { name: 'Kind of claimant' }));
    await user.click(await screen.findByRole('option', { name: 'Private individual' }));
    await user.click(within(form).getByRole('button', { name: 'File the claim' }));

    await waitFor(() => expect(fake.calls('POST /api/claims')).toHaveLength(1));
    expect(fake.calls('POST /api/claims')[0]?.body).toEqual({
      text: 'Warming stopped in 2016.',
      summary: 'Global warming stopped in 2016',
      topics: [],
      legalReview: false,
      claimant: { name: 'Hesketh Barrow', kind: 'private_individual' },
    });
  });

  it('checks the fields before sending anything', async () => {
    const fake = mockApi(asReporter);
    const { user } = renderApp('/claims/new');
    const form = await screen.findByRole('form', { name: 'File a claim' });
    await user.type(within(form).getByLabelText('Topics'), 'Sea level!');
    await user.type(within(form).getByLabelText('Outlet or platform'), 'Marrowby Courier');
    await user.click(within(form).getByRole('button', { name: 'File the claim' }));

    expect(
      await within(form).findByText('Choose who made the claim, or describe someone new'),
    ).toBeInTheDocument();
    expect(within(form).getByLabelText('The claim as it was said')).toHaveAccessibleDescription(
      expect.stringContaining('Required'),
    );
    expect(within(form).getByLabelText('Topics')).toHaveAttribute('aria-invalid', 'true');
    expect(within(form).getByLabelText('Web address')).toHaveAttribute('aria-invalid', 'true');
    expect(fake.calls('POST /api/claims')).toHaveLength(0);
  });

  it("shows the API's 422 field error under the named field", async () => {
    const fake = mockApi({
      ...asReporter,
      'GET /api/claimants': { status: 200, body: [weatherClub] },
      'POST /api/claims': apiError(422, 'firstAppearance.url must be a URL address', {
        'firstAppearance.url': 'isUrl',
      }),
    });
    const { user, location } = renderApp('/claims/new');

    const form = await fillTheClaim(user);
    await user.click(within(form).getByRole('button', { name: 'File the claim' }));

    const url = within(form).getByLabelText('Web address');
    await waitFor(() => expect(url).toHaveAttribute('aria-invalid', 'true'));
    expect(url).toHaveAccessibleDescription(
      'Enter a web address starting with http:// or https://',
    );
    expect(url).toHaveFocus();
    expect(fake.calls('POST /api/claims')).toHaveLength(1);
    expect(location()).toBe('/claims/new');
  });

  it('keeps the claim filed and says why when the capture is refused (415)', async () => {
    const fake = mockApi({
      ...asReporter,
      'GET /api/claimants': { status: 200, body: [weatherClub] },
      'POST /api/claims': { status: 201, body: filed },
      [`POST /api/claims/${newClaimId}/attachments`]: apiError(
        415,
        'This file is not one the desk accepts',
        { file: 'unsupportedType' },
      ),
      [`GET /api/claims/${newClaimId}`]: { status: 200, body: filed },
    });
    const { user, location } = renderApp('/claims/new');

    const form = await fillTheClaim(user);
    const disguised = new File(['MZ\x90\x00'], 'capture.pdf', { type: 'application/pdf' });
    await user.upload(within(form).getByLabelText('Capture of the page (optional)'), disguised);
    await user.click(within(form).getByRole('button', { name: 'File the claim' }));

    expect(
      await screen.findByText(
        /The claim is filed, but its capture was not attached: The desk takes PDF/,
      ),
    ).toBeInTheDocument();
    // The toast is up before the claim page has loaded: wait for the page's open tab.
    expect(
      await screen.findByRole('tab', { name: /Appearances/, selected: true }),
    ).toBeInTheDocument();
    expect(location()).toBe(`/claims/${newClaimId}`);
    expect(fake.calls(`PATCH /api/claims/${newClaimId}/appearances/${appearanceId}`)).toHaveLength(
      0,
    );
  });

  it('tells the copy desk that filing is not for their role', async () => {
    mockApi({ 'POST /api/auth/refresh': { status: 200, body: sessionFor('copy_desk') } });
    renderApp('/claims/new');
    expect(
      await screen.findByRole('heading', { level: 1, name: "You don't have access" }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'File a claim' })).not.toBeInTheDocument();
  });
});
