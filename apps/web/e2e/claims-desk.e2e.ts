import { beforeEach, describe, expect, it } from 'vitest';
// The demo seed's own PNG writer, so the capture is a real picture and not a stand-in.
import { encodePng, RgbImage } from '../../../seeds-demo/src/captures/png';
import { expectAccessible, phone, screenshot, useBrowser, type Browser } from './support/browser';
import { demo, openFilingForm, signIn } from './support/desk';
import { openTab, pickOption } from './support/screens';

// Invented for this test, like everything at the Marrowby Gazette.
const summary = 'Wind turbines make the local weather warmer';
const claimant = 'Friends of Hallow Fell (invented)';

function capturePng(): Buffer {
  const image = new RgbImage(240, 120, [246, 244, 236]);
  image.fillRect(0, 0, 240, 18, [40, 90, 70]);
  image.drawText('FELL NEWSLETTER', 8, 5, [255, 255, 255]);
  image.drawText('TURBINES WARM THE VALLEY', 8, 40, [30, 30, 30], 1);
  return encodePng(image);
}

describe('the claims desk', () => {
  const openedBrowser = useBrowser();
  let browser: Browser;
  beforeEach(() => {
    browser = openedBrowser();
  });

  it('lets a reporter file a claim with a PNG capture', async () => {
    const page = await browser.newPage();
    const form = await openFilingForm(page, browser.baseUrl);
    await form
      .getByLabel('The claim as it was said')
      .fill(
        'Those turbines on the fell are heating the valley. It has been warmer every winter since they went up.',
      );
    // Earlier claims like it show under the text; let that settle before the page moves on.
    await form.getByText(/similar claims? on the desk/).waitFor();
    await form.getByLabel('Neutral summary').fill(summary);
    await form.getByLabel('Topics').fill('wind, local-weather');
    await form.getByRole('button', { name: 'Someone new: describe the claimant' }).click();
    await form.getByLabel("Claimant's name").fill(claimant);
    await pickOption(page, 'Kind of claimant', 'Organisation');
    await form.getByLabel('Web address').fill('https://hallowfell-friends.test/newsletter/winter');
    await form.getByLabel('Outlet or platform').fill('Friends of Hallow Fell newsletter');
    await form.getByLabel('Seen at (date and time)').fill('2026-11-29T09:30');
    await pickOption(page, 'Seen at: time zone', 'Europe/London');
    await form.getByLabel('Capture of the page (optional)').setInputFiles({
      name: 'fell-newsletter.png',
      mimeType: 'image/png',
      buffer: capturePng(),
    });
    await expectAccessible(page);
    await screenshot(page, 'file-claim-desktop');
    await form.getByRole('button', { name: 'File the claim' }).click();

    await page.getByRole('heading', { level: 1, name: summary }).waitFor();
    await page.getByText('The claim is filed.').waitFor();
    expect(page.url()).toMatch(/\/claims\/[0-9a-f-]{36}$/);
    await openTab(page, /Appearances/);
    await page
      .getByRole('button', { name: 'Download the capture (fell-newsletter.png)' })
      .waitFor();
    await openTab(page, /Evidence files \(1\)/);
    const preview = page.getByRole('img', { name: 'Preview of fell-newsletter.png' });
    await preview.waitFor();
    await expect
      .poll(() => preview.evaluate((img: HTMLImageElement) => img.naturalWidth))
      .toBe(240);
    await expectAccessible(page);
    await screenshot(page, 'claim-files-desktop');
    await page.close();
  });

  it('lets a science editor take it, cite a graded source and log a reply attempt', async () => {
    const page = await browser.newPage();
    await signIn(page, browser.baseUrl, demo.science_editor.email);
    await page.getByRole('link', { name: 'Claims' }).click();
    const queue = page.getByRole('table');
    await queue.getByRole('link', { name: summary }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'queue-desktop');

    await page.getByRole('link', { name: /^Filed/ }).click();
    await page.waitForURL(/status=filed/);
    await queue.getByRole('link', { name: summary }).click();
    await page.getByRole('heading', { level: 1, name: summary }).waitFor();

    await page.getByRole('button', { name: 'Take this claim' }).click();
    await page.getByText('You are now researching this claim.').waitFor();
    await page.getByText('In research').first().waitFor();

    await openTab(page, /Sources/);
    await page.getByRole('button', { name: 'Cite a source' }).click();
    const dialog = page.getByRole('dialog', { name: 'Cite a source' });
    await dialog.getByRole('tab', { name: /A new source/ }).click();
    await dialog.getByLabel('Title').fill('Wind farms and near-surface temperature: a review');
    await dialog.getByLabel('Year (optional)').fill('2024');
    await pickOption(page, 'Kind of source', 'Peer-reviewed paper');
    await dialog
      .getByLabel('Web address')
      .fill('https://journal.example.test/wind-farm-temperature');
    await pickOption(page, 'Reliability grade', 'Adequate');
    await dialog
      .getByLabel('Reason for the grade')
      .fill('Reviewed and on point, but the local effect it measures is small and nocturnal.');
    await expectAccessible(page);
    await screenshot(page, 'cite-source-dialog');
    await dialog.getByRole('button', { name: 'Cite the new source' }).click();
    const sources = page.getByRole('list', { name: 'Sources cited' });
    await sources.getByText('Grade: Adequate').waitFor();
    await sources.getByText('Peer-reviewed paper').waitFor();

    await openTab(page, /Right of reply/);
    await page.getByRole('button', { name: 'Log a reply attempt' }).click();
    const reply = page.getByRole('dialog', { name: 'Log a reply attempt' });
    await reply.getByLabel('Who was contacted').fill('The group’s secretary');
    await reply.getByLabel('Contacted at (date and time)').fill('2026-11-30T10:15');
    await pickOption(page, 'How', 'E-mail');
    await reply.getByLabel('Deadline for a reply (optional)').fill('2026-12-02T17:00');
    await pickOption(page, 'Outcome', 'Awaiting a reply');
    await reply.getByRole('button', { name: 'Log the attempt' }).click();
    const attempts = page.getByRole('list', { name: 'Reply attempts' });
    await attempts.getByText('The group’s secretary').waitFor();
    await expectAccessible(page);
    await screenshot(page, 'claim-reply-desktop');

    await openTab(page, /History/);
    const history = page.getByRole('list', { name: 'History of the claim, oldest first' });
    await history.getByText(/logged a reply attempt|added a reply attempt/).waitFor();
    await expect.poll(() => history.getByRole('listitem').count()).toBeGreaterThanOrEqual(5);
    await screenshot(page, 'claim-history-desktop');
    await page.close();
  });

  it('reads well on a phone: queue, filing form and claim page pass axe at 375 px', async () => {
    const page = await browser.newPage(phone);
    await signIn(page, browser.baseUrl, demo.science_editor.email);
    await page.goto(`${browser.baseUrl}/claims`);
    // A phone gets the queue as a list of cards rather than a table.
    const cards = page.getByRole('list', { name: 'Claims in the queue' });
    await cards.getByRole('link', { name: summary }).waitFor();
    expect(await page.getByRole('table').isVisible()).toBe(false);
    await expectAccessible(page);
    await screenshot(page, 'queue-phone');

    await cards.getByRole('link', { name: summary }).click();
    await page.getByRole('heading', { level: 1, name: summary }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'claim-phone');
    await openTab(page, /Sources/);
    await page.getByRole('list', { name: 'Sources cited' }).waitFor();
    await screenshot(page, 'claim-sources-phone');

    await page.goto(`${browser.baseUrl}/claims/new`);
    await page.getByRole('form', { name: 'File a claim' }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'file-claim-phone');
    // Nothing pushes the page wider than the phone: wide tables scroll in their own box.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
      phone.width,
    );
    await page.close();
  });
});
