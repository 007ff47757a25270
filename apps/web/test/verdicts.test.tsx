import type { Role, VerdictVersionView } from '@skyledger/contracts';
import { render, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { apiError, mockApi, type Routes } from './api-mock';
import { coreClaim, deskPeopleList } from './claim-fixtures';
import { deskPeople, sessionFor } from './fixtures';
import { ClaimVerdictLinks } from '@/features/verdicts/components/claim-verdict-links';
import { renderApp } from './render-app';
import {
  awaitingClaim,
  checklist,
  draftVersion,
  ratingLevels,
  sentBackVersion,
  signoffPath,
  signoffView,
  submittedVersion,
  transitionsPath,
  verdictPath,
  verdictWith,
} from './verdict-fixtures';
import { calculatorCatalogue, claimWorkingsPath, layerWorking } from './working-fixtures';

const draftPath = `${verdictPath}/versions/${draftVersion.id}`;

function verdictRoutes(role: Role, claim = coreClaim): Routes {
  return {
    'POST /api/auth/refresh': { status: 200, body: sessionFor(role) },
    'GET /api/people': { status: 200, body: deskPeopleList },
    [`GET /api/claims/${claim.id}`]: { status: 200, body: claim },
    'GET /api/rating-levels': { status: 200, body: ratingLevels },
    'GET /api/calculators': { status: 200, body: calculatorCatalogue },
    [`GET ${claimWorkingsPath}`]: { status: 200, body: [layerWorking] },
  };
}

describe('the verdict editor', { timeout: 20_000 }, () => {
  it('sends the chosen rating by its id, with the version the draft started from', async () => {
    const saved: VerdictVersionView = { ...draftVersion, ratingId: 'contradicted', version: 4 };
    const fake = mockApi({
      ...verdictRoutes('science_editor'),
      [`GET ${verdictPath}`]: { status: 200, body: verdictWith(draftVersion) },
      [`PATCH ${draftPath}`]: { status: 200, body: saved },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}/verdict`);

    expect(await screen.findByRole('heading', { name: 'Draft of version 1' })).toBeInTheDocument();
    expect(screen.getByText('All changes saved.')).toBeInTheDocument();
    await user.click(screen.getByRole('combobox', { name: 'Rating' }));
    await user.click(screen.getByRole('option', { name: '5 · Contradicted by evidence' }));
    // The level's meaning shows beside it, in words.
    expect(screen.getByText('Reliable evidence shows the claim is wrong.')).toBeInTheDocument();
    expect(screen.getByText('Unsaved changes: save them before submitting.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Submit for sign-off' })).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Save the draft' }));
    expect(await screen.findByText('The draft of version 1 is saved.')).toBeInTheDocument();
    const [request] = fake.calls(`PATCH ${draftPath}`);
    expect(request?.body).toMatchObject({
      version: draftVersion.version,
      ratingId: 'contradicted',
      bottomLine: draftVersion.bottomLine,
      primarySourceId: null,
      body: { type: 'doc' },
    });
    expect(screen.getByText('All changes saved.')).toBeInTheDocument();
  });

  it('shows both texts when another save got there first, and saves over it when asked', async () => {
    const theirs: VerdictVersionView = {
      ...draftVersion,
      bottomLine: 'The desk chief’s bottom line: the core is a steady, tiny source of heat.',
      lastEditedBy: {
        id: deskPeople.desk_chief.id,
        displayName: deskPeople.desk_chief.displayName,
      },
      version: 4,
    };
    const fake = mockApi({
      ...verdictRoutes('science_editor'),
      [`GET ${verdictPath}`]: { status: 200, body: verdictWith(draftVersion) },
      [`PATCH ${draftPath}`]: apiError(
        409,
        'This draft was changed by someone else meanwhile (now version 4); reload and try again',
        { version: 'stale' },
      ),
    });
    const { user } = renderApp(`/claims/${coreClaim.id}/verdict`);
    const bottomLine = await screen.findByLabelText('Bottom line');
    await user.clear(bottomLine);
    await user.type(bottomLine, 'My bottom line: the interior’s heat is thirty times too small.');
    fake.use({ [`GET ${verdictPath}`]: { status: 200, body: verdictWith(theirs) } });
    await user.click(screen.getByRole('button', { name: 'Save the draft' }));

    const mine = await screen.findByRole('region', { name: 'Your unsaved text' });
    expect(mine).toHaveTextContent(
      'My bottom line: the interior’s heat is thirty times too small.',
    );
    const saved = screen.getByRole('region', { name: 'The saved version' });
    expect(saved).toHaveTextContent('Saved by Mara Quill');
    expect(saved).toHaveTextContent(theirs.bottomLine);
    expect(screen.getByRole('alert')).toHaveTextContent(
      'Mara Quill saved this draft while you were editing, so your text was not saved.',
    );

    await user.click(screen.getByRole('button', { name: 'Keep my text and merge' }));
    expect(
      screen.getByRole('heading', { name: 'Merging with the saved text' }),
    ).toBeInTheDocument();
    fake.use({
      [`PATCH ${draftPath}`]: { status: 200, body: { ...theirs, version: 5 } },
    });
    await user.click(screen.getByRole('button', { name: 'Save the draft' }));
    expect(await screen.findByText('The draft of version 1 is saved.')).toBeInTheDocument();
    const requests = fake.calls(`PATCH ${draftPath}`);
    expect(requests.map((request) => (request.body as { version: number }).version)).toEqual([
      3, 4,
    ]);
    expect(requests[1]?.body).toMatchObject({
      bottomLine: 'My bottom line: the interior’s heat is thirty times too small.',
    });
  });

  it('takes the saved version in place of the editor’s own when chosen', async () => {
    const theirs: VerdictVersionView = {
      ...draftVersion,
      bottomLine: 'Theirs: a steady, tiny source of heat.',
      version: 4,
    };
    const fake = mockApi({
      ...verdictRoutes('desk_chief'),
      [`GET ${verdictPath}`]: { status: 200, body: verdictWith(draftVersion) },
      [`PATCH ${draftPath}`]: apiError(409, 'stale', { version: 'stale' }),
    });
    const { user } = renderApp(`/claims/${coreClaim.id}/verdict`);
    const bottomLine = await screen.findByLabelText('Bottom line');
    await user.type(bottomLine, ' Mine.');
    fake.use({ [`GET ${verdictPath}`]: { status: 200, body: verdictWith(theirs) } });
    await user.click(screen.getByRole('button', { name: 'Save the draft' }));
    await user.click(await screen.findByRole('button', { name: 'Take the saved version' }));
    expect(screen.getByLabelText('Bottom line')).toHaveValue(theirs.bottomLine);
    expect(screen.queryByRole('region', { name: 'Your unsaved text' })).not.toBeInTheDocument();
    expect(screen.getByText('All changes saved.')).toBeInTheDocument();
  });

  it('asks before leaving the page with unsaved changes', async () => {
    mockApi({
      ...verdictRoutes('science_editor'),
      [`GET ${verdictPath}`]: { status: 200, body: verdictWith(draftVersion) },
    });
    const { user, location } = renderApp(`/claims/${coreClaim.id}/verdict`);
    await user.type(await screen.findByLabelText('Bottom line'), ' More.');
    await user.click(screen.getByRole('link', { name: 'Back to the claim' }));
    const ask = await screen.findByRole('alertdialog', { name: 'Leave without saving?' });
    expect(ask).toHaveTextContent('your changes to the draft will be lost');
    await user.click(within(ask).getByRole('button', { name: 'Stay on the page' }));
    expect(location()).toBe(`/claims/${coreClaim.id}/verdict`);
    expect(screen.getByLabelText('Bottom line')).toHaveValue(`${draftVersion.bottomLine} More.`);

    await user.click(screen.getByRole('link', { name: 'Back to the claim' }));
    await user.click(
      within(await screen.findByRole('alertdialog')).getByRole('button', {
        name: 'Leave without saving',
      }),
    );
    await waitFor(() => expect(location()).toBe(`/claims/${coreClaim.id}`));
  });

  it('says in the API’s words why submitting was refused', async () => {
    const fake = mockApi({
      ...verdictRoutes('science_editor'),
      [`GET ${verdictPath}`]: { status: 200, body: verdictWith(draftVersion) },
      [`POST ${transitionsPath}`]: apiError(
        422,
        'The verdict needs a rating, a bottom line and an explainer',
        { verdict: 'incomplete' },
      ),
    });
    const { user } = renderApp(`/claims/${coreClaim.id}/verdict`);
    await user.click(await screen.findByRole('button', { name: 'Submit for sign-off' }));
    expect(
      await screen.findByText('The verdict needs a rating, a bottom line and an explainer'),
    ).toBeInTheDocument();
    expect(fake.calls(`POST ${transitionsPath}`)[0]?.body).toEqual({
      to: 'awaiting_signoff',
      version: coreClaim.version,
    });
  });

  it('shows others the latest version read-only, and the notes on the version they refer to', async () => {
    mockApi({
      ...verdictRoutes('reporter', awaitingClaim),
      [`GET ${verdictPath}`]: {
        status: 200,
        body: verdictWith(submittedVersion, sentBackVersion),
      },
    });
    renderApp(`/claims/${coreClaim.id}/verdict`);
    const latest = await screen.findByRole('region', { name: 'Version 2: awaiting sign-off' });
    expect(within(latest).getByText('5 · Contradicted by evidence')).toBeInTheDocument();
    expect(within(latest).getByRole('link', { name: '[1]' })).toHaveAttribute(
      'href',
      `#source-${coreClaim.sources[0]!.id}`,
    );
    expect(
      within(latest).getByRole('list', { name: 'Sources cited in the explainer' }),
    ).toHaveTextContent(coreClaim.sources[0]!.title);
    expect(screen.queryByRole('textbox', { name: 'Explainer' })).not.toBeInTheDocument();
    const history = screen.getByRole('list', { name: 'Versions of the verdict, newest first' });
    const [second, first] = within(history).getAllByRole('listitem');
    expect(second).not.toHaveTextContent('Say how sure the science is.');
    expect(first).toHaveTextContent('Sent back by Ines Calder');
    expect(first).toHaveTextContent('Say how sure the science is.');
  });

  it('draws an embedded working in the editor from the stored working', async () => {
    const withWorking: VerdictVersionView = {
      ...draftVersion,
      body: {
        type: 'doc',
        content: [
          {
            type: 'paragraph',
            content: [
              { type: 'text', text: 'Heat from the interior is tiny' },
              { type: 'sourceCitation', attrs: { sourceId: coreClaim.sources[0]!.id } },
            ],
          },
          { type: 'workingEmbed', attrs: { workingId: layerWorking.id } },
        ],
      },
    };
    mockApi({
      ...verdictRoutes('science_editor'),
      [`GET ${verdictPath}`]: { status: 200, body: verdictWith(withWorking) },
    });
    renderApp(`/claims/${coreClaim.id}/verdict`);
    const editor = await screen.findByRole('textbox', { name: 'Explainer' });
    const embed = await within(editor).findByRole('figure', { name: 'Working' });
    expect(
      await within(embed).findByText('Layer model of the greenhouse effect'),
    ).toBeInTheDocument();
    // The surface temperature and its band, as the server stored them (working-fixtures.ts).
    expect(embed).toHaveTextContent('Surface temperature: 287.3 K');
    expect(embed).toHaveTextContent('284.8 to 290 K (5th to 95th percentile)');
    expect(within(editor).getByText('[1]', { exact: false })).toBeInTheDocument();
    expect(screen.getByRole('list', { name: 'Sources cited in the explainer' })).toHaveTextContent(
      coreClaim.sources[0]!.title,
    );
  });
});

describe('the sign-off view', { timeout: 20_000 }, () => {
  function signoffRoutes(role: Role, view = signoffView()): Routes {
    return {
      ...verdictRoutes(role, awaitingClaim),
      [`GET ${signoffPath}`]: { status: 200, body: view },
    };
  }

  it('keeps both decisions closed, saying why, when the person may not decide', async () => {
    mockApi(
      signoffRoutes(
        'copy_desk',
        signoffView({
          mayDecide: false,
          whyNot: 'You edited this version last: someone else signs it off',
        }),
      ),
    );
    renderApp(`/claims/${coreClaim.id}/signoff`);
    expect(
      await screen.findByRole('heading', { name: 'Version 2, awaiting sign-off' }),
    ).toBeInTheDocument();
    expect(
      screen.getByText('You edited this version last: someone else signs it off'),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Clear version 2' })).toBeDisabled();
    expect(screen.getByRole('button', { name: 'Send back with notes' })).toBeDisabled();
    expect(screen.getByLabelText('Notes for the author')).toBeDisabled();
  });

  it('shows the checklist, what changed since the last version and the reminder on workings', async () => {
    mockApi(signoffRoutes('copy_desk', signoffView({ checklist: checklist(['legalReview']) })));
    renderApp(`/claims/${coreClaim.id}/signoff`);
    const items = within(
      await screen.findByRole('list', { name: 'Sign-off checklist' }),
    ).getAllByRole('listitem');
    expect(items).toHaveLength(5);
    expect(items[0]).toHaveTextContent('Rating, bottom line and explainer writtenDone');
    expect(items[4]).toHaveTextContent('Legal-review flag clearedOpen');
    expect(screen.getByRole('button', { name: 'Clear version 2' })).toBeDisabled();
    expect(
      screen.getByText(
        /Clearing waits for an open item on the checklist: legal-review flag cleared/,
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send back with notes' })).toBeEnabled();

    const changes = screen.getByRole('region', { name: 'Changes since version 1' });
    expect(
      within(changes).getByText('Rating: unchanged (5 · Contradicted by evidence)'),
    ).toBeInTheDocument();
    // Each change also says in words what it is, for those who cannot see the marks.
    const marked = (tag: string) =>
      [...changes.querySelectorAll(tag)].map((node) => node.textContent).join(' ');
    expect(marked('ins')).toContain('[added: about thirty times]');
    expect(marked('del')).toContain('[removed: far]');
    expect(marked('ins')).toContain('very likely (90–100 %)');
    expect(screen.getByText(/Workings are back-of-envelope estimates/)).toBeInTheDocument();
  });

  it('shows how a correction changes the claim readers are shown, against the cleared one', async () => {
    const cleared = {
      text: awaitingClaim.text,
      summary: 'The core, not greenhouse gases, warms the planet',
      claimantName: 'A Marrowby caller',
    };
    mockApi(
      signoffRoutes(
        'copy_desk',
        signoffView({
          previous: { ...sentBackVersion, state: 'published', claimAsCleared: cleared },
        }),
      ),
    );
    renderApp(`/claims/${coreClaim.id}/signoff`);

    const changes = await screen.findByRole('region', { name: 'Changes since version 1' });
    expect(
      within(changes).getByRole('heading', { name: 'The claim readers are shown' }),
    ).toBeInTheDocument();
    expect(
      within(changes).getByText(`Who said it: A Marrowby caller → ${awaitingClaim.claimant.name}`),
    ).toBeInTheDocument();
    const summary = within(changes).getByRole('heading', { name: 'Summary' }).parentElement!;
    expect(summary).toHaveTextContent('3 words added, 2 removed.');
    expect(summary).toHaveTextContent('[removed: warms][added: is warming]');
    const said = within(changes).getByRole('heading', { name: 'What was said' }).parentElement!;
    expect(said).toHaveTextContent('Unchanged.');
  });

  it('compares no claim when the version before was never cleared', async () => {
    mockApi(signoffRoutes('copy_desk'));
    renderApp(`/claims/${coreClaim.id}/signoff`);
    const changes = await screen.findByRole('region', { name: 'Changes since version 1' });
    expect(within(changes).getByRole('heading', { name: 'Explainer' })).toBeInTheDocument();
    expect(
      within(changes).queryByRole('heading', { name: 'The claim readers are shown' }),
    ).not.toBeInTheDocument();
  });

  it('asks for notes before sending back, then sends them with the claim’s version', async () => {
    const fake = mockApi({
      ...signoffRoutes('copy_desk'),
      [`POST ${transitionsPath}`]: { status: 200, body: { ...awaitingClaim, status: 'sent_back' } },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}/signoff`);
    await user.click(await screen.findByRole('button', { name: 'Send back with notes' }));
    expect(
      await screen.findByText('Say what needs changing: the notes go to the author'),
    ).toBeInTheDocument();
    expect(fake.calls(`POST ${transitionsPath}`)).toHaveLength(0);

    fake.use({ [`GET ${signoffPath}`]: { status: 200, body: signoffView({ version: null }) } });
    await user.type(screen.getByLabelText('Notes for the author'), 'Give the figure’s source.');
    await user.click(screen.getByRole('button', { name: 'Send back with notes' }));
    expect(
      await screen.findByText(
        'Version 2 is sent back with your notes; the author is told by e-mail.',
      ),
    ).toBeInTheDocument();
    expect(fake.calls(`POST ${transitionsPath}`)[0]?.body).toEqual({
      to: 'sent_back',
      note: 'Give the figure’s source.',
      version: awaitingClaim.version,
    });
    expect(
      await screen.findByRole('heading', { name: 'No version is waiting for sign-off' }),
    ).toBeInTheDocument();
  });

  it('shows the API’s refusal in its own words when clearing is refused', async () => {
    mockApi({
      ...signoffRoutes('copy_desk'),
      [`POST ${transitionsPath}`]: apiError(
        403,
        'You drafted this version: someone else signs it off',
      ),
    });
    const { user } = renderApp(`/claims/${coreClaim.id}/signoff`);
    await user.click(await screen.findByRole('button', { name: 'Clear version 2' }));
    expect(
      await screen.findByText('You drafted this version: someone else signs it off'),
    ).toBeInTheDocument();
  });

  it('lets a desk chief waive an open right of reply, with a reason', async () => {
    const fake = mockApi({
      ...signoffRoutes('desk_chief', signoffView({ checklist: checklist(['rightOfReply']) })),
      [`PUT /api/claims/${coreClaim.id}/reply-waiver`]: { status: 204 },
    });
    const { user } = renderApp(`/claims/${coreClaim.id}/signoff`);
    await user.click(await screen.findByRole('button', { name: 'Waive right of reply' }));
    const dialog = await screen.findByRole('dialog', { name: 'Waive the right of reply' });
    await user.click(within(dialog).getByRole('button', { name: 'Waive it' }));
    expect(await within(dialog).findByText('Required')).toBeInTheDocument();
    await user.type(within(dialog).getByLabelText('Why'), 'The post is anonymous.');
    await user.click(within(dialog).getByRole('button', { name: 'Waive it' }));
    expect(await screen.findByText('The right of reply is waived.')).toBeInTheDocument();
    await waitFor(() =>
      expect(fake.calls(`PUT /api/claims/${coreClaim.id}/reply-waiver`)[0]?.body).toEqual({
        reason: 'The post is anonymous.',
        version: awaitingClaim.version,
      }),
    );
  });

  it('offers the waiver to a desk chief only', async () => {
    mockApi(signoffRoutes('copy_desk', signoffView({ checklist: checklist(['rightOfReply']) })));
    renderApp(`/claims/${coreClaim.id}/signoff`);
    await screen.findByRole('list', { name: 'Sign-off checklist' });
    expect(screen.queryByRole('button', { name: 'Waive right of reply' })).not.toBeInTheDocument();
  });
});

describe('the links from a claim page', () => {
  it('lead to the verdict, and to the sign-off while a version waits', () => {
    const { rerender } = render(
      <MemoryRouter>
        <ClaimVerdictLinks claim={coreClaim} />
      </MemoryRouter>,
    );
    expect(screen.getByRole('link', { name: 'Verdict and explainer' })).toHaveAttribute(
      'href',
      `/claims/${coreClaim.id}/verdict`,
    );
    expect(screen.queryByRole('link', { name: 'Sign-off' })).not.toBeInTheDocument();
    rerender(
      <MemoryRouter>
        <ClaimVerdictLinks claim={awaitingClaim} />
      </MemoryRouter>,
    );
    expect(screen.getByRole('link', { name: 'Sign-off' })).toHaveAttribute(
      'href',
      `/claims/${coreClaim.id}/signoff`,
    );
  });
});
