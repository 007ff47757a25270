import { type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { desktop, expectAccessible, openBrowser, type Browser } from './support/browser';
import { demo, signIn } from './support/desk';
import { linkTo, waitForMail } from './support/mailbox';
import {
  explainWithWorking,
  insertInExplainer,
  literal,
  openTab,
  pickOption,
  replaceParagraph,
  saveAndSubmitDraft,
  screenshotBothWidths,
  wallClock,
} from './support/screens';

/*
 * The whole life of one new claim, walked through the desk's screens by each role in turn,
 * then read by a reader. Only the mails are read outside the browser (the mail catcher's
 * API, as a person would open their inbox); nothing is set up through the desk's API.
 * Everything written here is invented, like the rest of the Marrowby Gazette.
 */

// A third phrasing of the recurring claim (seeds-demo/src/claims-desk/claims.ts has two).
const claimText =
  'Warming stopped in 2016 and the planet has not warmed since; the council is still spending on it.';
const summary = 'No warming since 2016, says a ratepayers’ leaflet';
const claimant = 'Hallow Fell Ratepayers’ Alliance (invented)';
const earlierPhrasings = [
  'Global warming stopped in 2016',
  'Warming has paused since 2016, says a reshared podcast clip',
];
const deskZone = 'Europe/London';

const source = {
  title: 'Annual statement on the global climate, 2025 (demo agency statement)',
  reason: 'The agency’s own yearly statement of the global record, with its methods published.',
};
const trendTitle = 'Trend with an honest interval';
const oceanTitle = 'Ocean heat: energy, flux and warming';
const stationDataset = 'SYNTHETIC Marrowby station annual anomalies, 1979–2025';
const bottomLine =
  'The planet kept gaining heat after 2016, and a trend started at the 2016 peak is too short to tell from year-to-year noise.';
const revisedBottomLine =
  'The planet kept gaining heat after 2016: a trend started at the hot 2016 peak is too short to tell from noise, and the heat the Earth takes in has not stopped growing.';
const factParagraph =
  'Earth kept taking in heat after 2016: the heat it gained from 2006 to 2018 is an imbalance of about 0.79 watts on every square metre of the planet';
const correctedFactParagraph =
  'Earth kept taking in heat after 2016: the heat it gained from 2006 to 2018, about 152 zettajoules, is an imbalance of about 0.79 watts on every square metre of the planet';
const sendBackNote = 'Give the size of the heat gain in zettajoules as well as the flux.';
const correctionNote =
  'An earlier version gave the imbalance without the heat gain behind it; the 152 zettajoules are now stated.';
const reader = `walk-reader-${Date.now()}@example.test`;

let claimId = '';
let readerUrl = '';

async function deskPage(browser: Browser, email: string): Promise<Page> {
  const page = await browser.newPage(desktop);
  await signIn(page, browser.baseUrl, email);
  return page;
}

/** Loads the claim page afresh (a move to the same address and hash would not reload it). */
async function openClaim(page: Page, baseUrl: string, hash = ''): Promise<void> {
  const url = `${baseUrl}/claims/${claimId}${hash ? `#${hash}` : ''}`;
  if (page.url() === url) await page.reload();
  else await page.goto(url);
  await page.getByRole('heading', { level: 1, name: summary }).waitFor();
}

/** The sign-off link of the nth "For sign-off" mail about the claim, as the copy desk opens it. */
async function signoffMail(nth: number) {
  const mail = await waitForMail(
    demo.copy_desk.email,
    new RegExp(`^For sign-off: ${literal(summary)}`),
    20_000,
    nth,
  );
  const link = (mail.text ?? '').match(/https?:\/\/\S+\/claims\/[0-9a-f-]{36}\/signoff/)?.[0];
  expect(link, 'the sign-off link in the mail').toBeTruthy();
  return { mail, link: link! };
}

/** The reader page shows the claim, the rating in words, the bottom line and the body. */
async function expectReaderPage(page: Page, body: string, line: string): Promise<void> {
  expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe(summary);
  expect((await page.locator('section.claim blockquote').textContent())?.trim()).toBe(claimText);
  expect(await page.locator('section.claim figcaption').textContent()).toContain(
    `Said by ${claimant}`,
  );
  expect(await page.locator('.verdict .rating strong').textContent()).toBe(
    'Contradicted by evidence',
  );
  expect(await page.locator('.verdict .bottom-line').textContent()).toBe(
    `The bottom line: ${line}`,
  );
  const text = (await page.locator('main .body').textContent()) ?? '';
  expect(text).toContain(body);
  // The embedded working, as a table of its inputs with their sources.
  expect(await page.locator('main .body figure table').count()).toBeGreaterThan(0);
  expect(await page.locator('section.sources li').allTextContents()).toEqual(
    expect.arrayContaining([expect.stringContaining(source.title)]),
  );
}

describe('the newsroom walk: one claim from filing to a published correction', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(() => browser?.close());

  it('lets the reporter file a third phrasing, seeing both earlier ones while typing', async () => {
    const page = await deskPage(browser, demo.reporter.email);
    await page
      .getByRole('navigation', { name: 'Desk sections' })
      .getByRole('link', { name: 'File a claim' })
      .click();
    await page.getByText('Log a claim you met on the beat', { exact: false }).first().waitFor();
    const form = page.getByRole('form', { name: 'File a claim' });
    await form.getByLabel('The claim as it was said').fill(claimText);
    const similar = form.getByRole('region', { name: 'Already on the desk?' });
    for (const phrasing of earlierPhrasings) {
      await similar.getByRole('link', { name: new RegExp(`^${literal(phrasing)}`) }).waitFor();
    }
    await screenshotBothWidths(page, 'walk-01-similar-claims');

    await form.getByLabel('Neutral summary').fill(summary);
    await form.getByLabel('Topics').fill('temperature-record, trends');
    await form.getByRole('button', { name: 'Someone new: describe the claimant' }).click();
    await form.getByLabel("Claimant's name").fill(claimant);
    await pickOption(page, 'Kind of claimant', 'Organisation');
    await form.getByLabel('Web address').fill('https://hallowfell-ratepayers.test/leaflets/autumn');
    await form.getByLabel('Outlet or platform').fill('Ratepayers’ Alliance leaflet (web copy)');
    // The desk's own zone is offered first for the time it was seen.
    expect(
      await form.getByRole('combobox', { name: 'Seen at: time zone' }).textContent(),
    ).toContain('Europe/London');
    await form
      .getByLabel('Seen at (date and time)')
      .fill(wallClock(new Date(Date.now() - 86_400_000), deskZone));
    await expectAccessible(page);
    await form.getByRole('button', { name: 'File the claim' }).click();

    await page.getByRole('heading', { level: 1, name: summary }).waitFor();
    await page.getByText('The claim is filed.').waitFor();
    claimId = new URL(page.url()).pathname.split('/').pop() ?? '';
    expect(claimId).toMatch(/^[0-9a-f-]{36}$/);
    await page.getByText('Nobody is researching this claim yet.').waitFor();
    await page.getByText('Filed', { exact: true }).first().waitFor();
    await screenshotBothWidths(page, 'walk-02-filed');
    await page.close();
  });

  it('lets the desk chief give it to the science editor, who is told by mail', async () => {
    const page = await deskPage(browser, demo.desk_chief.email);
    await page.getByRole('link', { name: 'Claims', exact: true }).click();
    await page.getByRole('link', { name: /^Filed/ }).click();
    await page.waitForURL(/status=filed/);
    await page.getByRole('table').getByRole('link', { name: summary }).click();
    await page.getByRole('heading', { level: 1, name: summary }).waitFor();

    const assign = page.getByRole('form', { name: 'Assign the claim' });
    await pickOption(page, 'Give it to', `${demo.science_editor.name} (science editor)`);
    await assign.getByRole('button', { name: 'Assign' }).click();
    await page.getByText(`${demo.science_editor.name} is now researching this claim.`).waitFor();
    await page
      .getByText(new RegExp(`^Researched by ${literal(demo.science_editor.name)}$`))
      .waitFor();
    await page.getByText('In research').first().waitFor();
    await screenshotBothWidths(page, 'walk-03-assigned');

    const mail = await waitForMail(
      demo.science_editor.email,
      new RegExp(`^Claim for you: ${literal(summary)}`),
    );
    expect(mail.text).toContain(`${browser.baseUrl}/claims/${claimId}`);
    await page.close();
  });

  it('lets the science editor trace it, grade a source and log the reply attempt', async () => {
    const page = await deskPage(browser, demo.science_editor.email);
    await openClaim(page, browser.baseUrl);
    await page.getByText(`Researched by ${demo.science_editor.name} (you)`).waitFor();

    // An earlier appearance, traced back: it takes the first-known mark from the filing's.
    await openTab(page, /Appearances/);
    await page.getByRole('button', { name: 'Add an appearance' }).click();
    const appearance = page.getByRole('dialog', { name: 'Add an appearance' });
    await appearance
      .getByLabel('Web address')
      .fill('https://thelongweather.test/posts/nobody-wants-to-talk-about-2016');
    await appearance.getByLabel('Outlet or platform').fill('The Long Weather blog');
    await appearance
      .getByLabel('Seen at (date and time)')
      .fill(wallClock(new Date(Date.now() - 5 * 86_400_000), deskZone));
    await appearance.getByRole('checkbox', { name: 'This is the first known appearance' }).click();
    await screenshotBothWidths(page, 'walk-04-appearance-dialog');
    await appearance.getByRole('button', { name: 'Add the appearance' }).click();
    await page.getByText('Appearance on The Long Weather blog added.').waitFor();
    const appearances = page.getByRole('list', { name: 'Appearances, earliest first' });
    const firstKnown = appearances
      .locator(':scope > li')
      .filter({ has: page.getByText('First known', { exact: true }) });
    await expect.poll(() => firstKnown.count()).toBe(1);
    expect(await firstKnown.textContent()).toContain('The Long Weather blog');
    expect(await appearances.locator(':scope > li').count()).toBe(2);
    await screenshotBothWidths(page, 'walk-05-appearances');

    await openTab(page, /Sources/);
    await page.getByRole('button', { name: 'Cite a source' }).click();
    const cite = page.getByRole('dialog', { name: 'Cite a source' });
    await cite.getByRole('tab', { name: /A new source/ }).click();
    await cite.getByLabel('Title').fill(source.title);
    await cite.getByLabel('Year (optional)').fill('2026');
    await pickOption(page, 'Kind of source', 'Agency statement');
    await cite.getByLabel('Web address').fill('https://climate-agency.example.test/statement-2025');
    await pickOption(page, 'Reliability grade', 'Strong');
    await cite.getByLabel('Reason for the grade').fill(source.reason);
    await cite.getByRole('button', { name: 'Cite the new source' }).click();
    const sources = page.getByRole('list', { name: 'Sources cited' });
    const cited = sources.getByRole('listitem').filter({ hasText: source.title });
    await cited.getByText('Grade: Strong').waitFor();
    await cited.getByText('Agency statement', { exact: true }).waitFor();
    await cited.getByText(source.reason).waitFor();
    await screenshotBothWidths(page, 'walk-06-source-graded');

    await openTab(page, /Right of reply/);
    await page.getByRole('button', { name: 'Log a reply attempt' }).click();
    const reply = page.getByRole('dialog', { name: 'Log a reply attempt' });
    await reply.getByLabel('Who was contacted').fill('The alliance’s press officer');
    await reply
      .getByLabel('Contacted at (date and time)')
      .fill(wallClock(new Date(Date.now() - 3_600_000), deskZone));
    await pickOption(page, 'How', 'E-mail');
    await pickOption(page, 'Outcome', 'Awaiting a reply');
    await reply.getByRole('button', { name: 'Log the attempt' }).click();
    const attempts = page.getByRole('list', { name: 'Reply attempts' });
    await attempts.getByText('The alliance’s press officer').waitFor();
    await screenshotBothWidths(page, 'walk-07-reply-logged');
    await page.close();
  });

  it('lets the science editor run two workings in the workbench and save them to the claim', async () => {
    const page = await deskPage(browser, demo.science_editor.email);
    await openClaim(page, browser.baseUrl, 'workings');
    await page.getByText('No workings on this claim yet.').waitFor();
    await page.getByRole('link', { name: 'Run a calculator for this claim' }).click();
    await page.getByRole('heading', { level: 1, name: 'Workbench' }).waitFor();
    expect(new URL(page.url()).searchParams.get('claim')).toBe(claimId);

    // The trend of a SYNTHETIC station series from its 2016 spike: too short to tell.
    await page.getByRole('link', { name: trendTitle }).click();
    await page.getByRole('heading', { level: 1, name: trendTitle }).waitFor();
    await pickOption(page, 'Dataset', stationDataset);
    await page.getByRole('textbox', { name: 'From (decimal year)' }).fill('2016');
    await page.getByText(/the interval includes no change at all/).waitFor();
    const panel = page.getByRole('region', { name: 'Save to a claim' });
    await panel.getByText(summary).first().waitFor();
    await panel
      .getByRole('textbox', { name: 'Note (optional)' })
      .fill('From the 2016 spike on, the trend is lost in the noise (synthetic series).');
    await panel.getByRole('button', { name: 'Save the working' }).click();
    await panel.getByText(`Saved to “${summary}”`, { exact: false }).waitFor();
    await screenshotBothWidths(page, 'walk-08-trend-saved');

    // Earth's heat gain with the library's defaults: 152 ZJ over 2006–2018.
    await page.getByRole('link', { name: 'All calculators' }).click();
    await page.getByRole('link', { name: oceanTitle }).click();
    await page.getByRole('heading', { level: 1, name: oceanTitle }).waitFor();
    // 152 ZJ over 12 years spread over Earth's surface is a mean imbalance of 0.79 W/m²,
    // as AR6 gives for 2006–2018 (Forster et al. 2021, IPCC AR6 WG1 ch. 7, sec. 7.2.2).
    await page
      .getByRole('table', { name: 'Outputs' })
      .first()
      .getByRole('row')
      .filter({ hasText: 'Mean flux over the area' })
      .filter({ hasText: /0\.78\d* W\/m²|0\.79\d* W\/m²/ })
      .waitFor();
    await panel.getByText(summary).first().waitFor();
    await panel
      .getByRole('textbox', { name: 'Note (optional)' })
      .fill('Earth’s heat gain 2006–2018 (AR6 default) as a mean flux: the planet kept warming.');
    await panel.getByRole('button', { name: 'Save the working' }).click();
    await panel.getByText(`Saved to “${summary}”`, { exact: false }).waitFor();
    await screenshotBothWidths(page, 'walk-09-ocean-heat-saved');

    await panel.getByRole('link', { name: 'See it on the claim' }).click();
    await page.waitForURL(/#workings$/);
    const workings = page.getByRole('list', { name: 'Workings, oldest first' });
    await expect.poll(() => workings.locator(':scope > li').count()).toBe(2);
    await workings.getByText(trendTitle).first().waitFor();
    await workings.getByText(oceanTitle).first().waitFor();
    await screenshotBothWidths(page, 'walk-10-workings-on-claim');
    await page.close();
  });

  it('lets the science editor draft the verdict with a working and a citation, and submit it', async () => {
    const page = await deskPage(browser, demo.science_editor.email);
    await openClaim(page, browser.baseUrl);
    await page.getByRole('link', { name: 'Verdict and explainer' }).click();
    await page.getByRole('heading', { level: 1, name: 'Verdict' }).waitFor();
    await page.getByRole('button', { name: 'Start the verdict from the template' }).click();
    await page.getByRole('heading', { name: 'Draft of version 1' }).waitFor();
    const editor = page.getByRole('textbox', { name: 'Explainer' });
    await editor.getByText('What the evidence shows').waitFor();

    // The scale numbers its levels: “5 · Contradicted by evidence”.
    await pickOption(page, 'Rating', /Contradicted by evidence$/);
    await pickOption(
      page,
      'Primary source for the central finding',
      new RegExp(`^${literal(source.title)}`),
    );
    await page.getByLabel('Bottom line').fill(bottomLine);
    await replaceParagraph(
      page,
      'State the fact plainly, with its source and how sure the science is.',
      factParagraph,
    );
    await insertInExplainer(page, 'Cite source', source.title);
    await editor.getByText('[1]').waitFor();
    await page.keyboard.type('.');
    await replaceParagraph(
      page,
      `Who said it (${claimant}), where and when.`,
      'The alliance’s autumn leaflet, which copied a blog post of five days before.',
    );
    await explainWithWorking(
      page,
      'A trend started at the hot 2016 peak covers too few years to tell warming from year-to-year noise:',
      trendTitle,
    );
    await page.getByText('Unsaved changes: save them before submitting.').waitFor();
    await screenshotBothWidths(page, 'walk-11-verdict-draft');

    await saveAndSubmitDraft(page, 1);
    const latest = page.getByRole('region', { name: 'Version 1: awaiting sign-off' });
    await latest.getByRole('link', { name: '[1]' }).waitFor();
    await latest.getByRole('figure', { name: 'Working' }).getByText(trendTitle).waitFor();
    await screenshotBothWidths(page, 'walk-12-verdict-submitted');
    const { mail } = await signoffMail(1);
    expect(mail.text).toContain('version 1');
    await page.close();
  });

  it('lets the copy desk send it back with a note, which reaches the editor by mail', async () => {
    const page = await deskPage(browser, demo.copy_desk.email);
    await page.getByRole('link', { name: 'Awaiting sign-off' }).click();
    await page.getByRole('table').getByRole('link', { name: summary }).waitFor();
    await page.goto((await signoffMail(1)).link);
    await page.getByRole('heading', { name: 'Version 1, awaiting sign-off' }).waitFor();
    const checklist = page.getByRole('list', { name: 'Sign-off checklist' });
    for (const item of [
      'Primary source',
      'Right of reply',
      'Every working recomputed by the server',
      'Legal-review flag cleared',
    ]) {
      await checklist.getByRole('listitem').filter({ hasText: item }).getByText('Done').waitFor();
    }
    await screenshotBothWidths(page, 'walk-13-signoff');
    await page.getByRole('button', { name: 'Send back with notes' }).click();
    await page.getByLabel('Notes for the author').fill(sendBackNote);
    await page.getByRole('button', { name: 'Send back with notes' }).click();
    await page.getByText('Version 1 is sent back with your notes').waitFor();
    await page.getByRole('heading', { name: 'No version is waiting for sign-off' }).waitFor();
    await screenshotBothWidths(page, 'walk-14-sent-back');

    const sentBack = await waitForMail(
      demo.science_editor.email,
      new RegExp(`^Sent back: ${literal(summary)}`),
    );
    expect(sentBack.text).toContain(sendBackNote);
    await page.close();
  });

  it('lets the editor revise and resubmit, and the copy desk clear it', async () => {
    const editorPage = await deskPage(browser, demo.science_editor.email);
    await editorPage.goto(`${browser.baseUrl}/claims/${claimId}/verdict`);
    const versions = editorPage.getByRole('list', {
      name: 'Versions of the verdict, newest first',
    });
    await versions.getByText(sendBackNote).waitFor();
    await editorPage.getByRole('button', { name: 'Start version 2 from version 1' }).click();
    await editorPage.getByRole('heading', { name: 'Draft of version 2' }).waitFor();
    await editorPage.getByLabel('Bottom line').fill(revisedBottomLine);
    await saveAndSubmitDraft(editorPage, 2);
    await screenshotBothWidths(editorPage, 'walk-15-resubmitted');
    await editorPage.close();

    const { link } = await signoffMail(2);
    const page = await deskPage(browser, demo.copy_desk.email);
    await page.goto(link);
    await page.getByRole('heading', { name: 'Version 2, awaiting sign-off' }).waitFor();
    const changes = page.getByRole('region', { name: 'Changes since version 1' });
    await changes.locator('ins', { hasText: 'the heat the Earth takes in' }).waitFor();
    const clear = page.getByRole('button', { name: 'Clear version 2' });
    await expect.poll(() => clear.isEnabled()).toBe(true);
    await screenshotBothWidths(page, 'walk-16-signoff-second');
    await clear.click();
    await page.getByText('Version 2 is cleared; the author is told by e-mail.').waitFor();
    const cleared = await waitForMail(
      demo.science_editor.email,
      new RegExp(`^Cleared: ${literal(summary)}`),
    );
    expect(cleared.text).toContain('version 2');
    await page.close();
  });

  it(
    'lets the copy desk schedule it a little ahead, and the scheduler publishes it',
    { timeout: 300_000 },
    async () => {
      const page = await deskPage(browser, demo.copy_desk.email);
      await openClaim(page, browser.baseUrl, 'publishing');
      await page.getByText(/Cleared: ready to publish/).waitFor();
      await page.getByRole('button', { name: 'Schedule…' }).click();
      const dialog = page.getByRole('dialog', { name: 'Schedule the explainer' });
      // The desk's zone is the dialog's own; the API wants a time at least a minute ahead,
      // and the field takes whole minutes: the first whole minute 75 s or more from now.
      expect(
        await dialog.getByRole('combobox', { name: 'Publish at: time zone' }).textContent(),
      ).toContain('Europe/London');
      const at = new Date(Math.ceil((Date.now() + 75_000) / 60_000) * 60_000);
      await dialog.getByLabel('Publish at (date and time)').fill(wallClock(at, deskZone));
      await screenshotBothWidths(page, 'walk-17-schedule-dialog');
      await dialog.getByRole('button', { name: 'Schedule it' }).click();
      await page.getByText(/^Scheduled: it is published on .* \(Europe\/London\)\./).waitFor();
      await page.getByText(/Scheduled to publish on .* \(Europe\/London\)\./).waitFor();
      expect(await page.getByRole('link', { name: /View as readers see it/ }).count()).toBe(0);
      await screenshotBothWidths(page, 'walk-18-scheduled');

      // The scheduler (PUBLISH_POLL_MS) lifts the embargo on its own; the desk mails the
      // copy desk, who scheduled it, when it has.
      await waitForMail(
        demo.copy_desk.email,
        new RegExp(`^Scheduled publication done: ${literal(summary)}`),
        Math.max(0, at.getTime() - Date.now()) + 60_000,
      );
      await openClaim(page, browser.baseUrl, 'publishing');
      await page.getByText(/Published: readers can read the explainer/).waitFor();
      const view = page.getByRole('link', { name: /View as readers see it/ });
      readerUrl = (await view.getAttribute('href')) ?? '';
      expect(readerUrl).toMatch(/\/explainers\/[a-z0-9-]+$/);
      await screenshotBothWidths(page, 'walk-19-published');
      await page.close();
    },
  );

  it('shows readers the explainer with JavaScript off and on, and takes a subscription', async () => {
    const noScript = await openBrowser({ javaScriptEnabled: false });
    try {
      const page = await noScript.newPage(desktop);
      const response = await page.goto(readerUrl);
      expect(response?.status()).toBe(200);
      await expectReaderPage(page, factParagraph, revisedBottomLine);
      await screenshotBothWidths(page, 'walk-20-reader-no-script');
    } finally {
      await noScript.close();
    }

    const page = await browser.newPage(desktop);
    await page.goto(readerUrl);
    await expectReaderPage(page, factParagraph, revisedBottomLine);
    await expectAccessible(page);
    await page.getByLabel('Your e-mail address').fill(reader);
    await page.getByRole('button', { name: 'Send me updates' }).click();
    expect(await page.getByRole('status').textContent()).toBe(
      `We have sent a link to ${reader}. Nothing more is sent unless you open it.`,
    );
    await screenshotBothWidths(page, 'walk-21-reader-subscribed');
    const confirm = await waitForMail(
      reader,
      new RegExp(`^Confirm: updates to “${literal(summary)}”`),
    );
    await page.goto(linkTo(confirm, '/subscription/confirm'));
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe(
      'Subscription confirmed',
    );
    await screenshotBothWidths(page, 'walk-22-reader-confirmed');
    await page.close();
  });

  it('puts a correction through the desk, and the reader gets its mail and can leave', async () => {
    // The science editor reopens the published claim and revises the verdict.
    const editorPage = await deskPage(browser, demo.science_editor.email);
    await openClaim(editorPage, browser.baseUrl, 'publishing');
    await editorPage.getByRole('button', { name: 'Start a correction' }).click();
    await editorPage
      .getByRole('alertdialog', { name: 'Start a correction?' })
      .getByRole('button', { name: 'Start the correction' })
      .click();
    await editorPage.getByText(/The claim is back in research for a correction/).waitFor();
    await editorPage.getByText(/A correction is under way/).waitFor();
    await screenshotBothWidths(editorPage, 'walk-23-correction-started');
    await editorPage.goto(`${browser.baseUrl}/claims/${claimId}/verdict`);
    await editorPage.getByRole('button', { name: 'Start version 3 from version 2' }).click();
    await editorPage.getByRole('heading', { name: 'Draft of version 3' }).waitFor();
    const editor = editorPage.getByRole('textbox', { name: 'Explainer' });
    // The caret goes just after “2018” (Home and End keys move by wrapped line, not by
    // paragraph), and the missing words are typed there.
    await editor.getByText(factParagraph, { exact: false }).click();
    await editor.evaluate((root, anchor) => {
      const walker = document.createTreeWalker(root, NodeFilter.SHOW_TEXT);
      for (let node = walker.nextNode(); node; node = walker.nextNode()) {
        const at = node.textContent?.indexOf(anchor) ?? -1;
        if (at < 0) continue;
        const caret = document.createRange();
        caret.setStart(node, at + anchor.length);
        getSelection()?.removeAllRanges();
        getSelection()?.addRange(caret);
        return;
      }
      throw new Error(`no “${anchor}” in the explainer`);
    }, 'from 2006 to 2018');
    await editorPage.keyboard.type(', about 152 zettajoules,');
    await editor.getByText(correctedFactParagraph, { exact: false }).waitFor();
    await saveAndSubmitDraft(editorPage, 3);
    await editorPage.close();

    // The copy desk clears it, then publishes it with a correction note.
    const { link } = await signoffMail(3);
    const page = await deskPage(browser, demo.copy_desk.email);
    await page.goto(link);
    await page.getByRole('heading', { name: 'Version 3, awaiting sign-off' }).waitFor();
    await page
      .getByRole('region', { name: 'Changes since version 2' })
      .locator('ins', { hasText: '152 zettajoules' })
      .waitFor();
    const clear = page.getByRole('button', { name: 'Clear version 3' });
    await expect.poll(() => clear.isEnabled()).toBe(true);
    await clear.click();
    await page.getByText('Version 3 is cleared; the author is told by e-mail.').waitFor();
    await openClaim(page, browser.baseUrl, 'publishing');
    await page.getByText(/The corrected version is cleared/).waitFor();
    await page.getByRole('button', { name: 'Publish now' }).click();
    const dialog = page.getByRole('dialog', { name: 'Publish the corrected explainer now?' });
    await pickOption(page, 'Kind of change', 'Correction');
    await dialog.getByLabel('Update note for readers').fill(correctionNote);
    await screenshotBothWidths(page, 'walk-24-correction-dialog');
    await dialog.getByRole('button', { name: 'Publish now' }).click();
    await page.getByText('Published: readers can read it now.').waitFor();
    await page
      .getByRole('list', { name: 'Publications, latest first' })
      .getByText(`Correction: ${correctionNote}`)
      .waitFor();
    await screenshotBothWidths(page, 'walk-25-correction-published');
    await page.close();

    // The reader's mail, the corrected page, and a one-click way out.
    const update = await waitForMail(reader, new RegExp(`^Correction: ${literal(summary)}`));
    expect(update.text).toContain(correctionNote);
    const readerPage = await browser.newPage(desktop);
    await readerPage.goto(readerUrl);
    // This browser read the page before; reader pages may be kept for a minute.
    await readerPage.reload();
    await expectReaderPage(readerPage, correctedFactParagraph, revisedBottomLine);
    expect(await readerPage.locator('section.notes').textContent()).toContain(correctionNote);
    // The corrected paragraph whole, with its citation, and nothing of the old left over.
    expect(
      await readerPage.locator('main .body p').filter({ hasText: '152 zettajoules' }).textContent(),
    ).toBe(`${correctedFactParagraph}[1].`);
    await screenshotBothWidths(readerPage, 'walk-26-reader-corrected');
    await readerPage.goto(linkTo(update, '/subscription/unsubscribe'));
    expect(await readerPage.getByRole('heading', { level: 1 }).textContent()).toBe('Unsubscribed');
    expect(await readerPage.locator('main').textContent()).toContain(
      'your address has been deleted',
    );
    await screenshotBothWidths(readerPage, 'walk-27-reader-unsubscribed');
    await readerPage.close();
  });
});
