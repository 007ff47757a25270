import { type Locator, type Page } from 'playwright-core';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  desktop,
  expectAccessible,
  phone,
  screenshot,
  useBrowser,
  type Browser,
  bothWidths,
} from './support/browser';
import { demo, signIn } from './support/desk';
import { pickOption } from './support/screens';

// The demo seed's SYNTHETIC station series (seeds-demo/src/datasets/demo-datasets.ts).
const stationDataset = 'SYNTHETIC Marrowby station annual anomalies, 1979–2025';

async function openCalculator(page: Page, title: string) {
  await page
    .getByRole('navigation', { name: 'Desk sections' })
    .getByRole('link', { name: 'Workbench' })
    .click();
  await page.getByRole('link', { name: title }).click();
  await page.getByRole('heading', { level: 1, name: title }).waitFor();
}

/** Waits until the live result's row for `output` reads `value`. */
async function outputReads(page: Page, output: string, value: string | RegExp) {
  await page
    .getByRole('table', { name: 'Outputs' })
    .first()
    .getByRole('row')
    .filter({ hasText: output })
    .filter({ hasText: value })
    .waitFor();
}

/** Picks a claim in the save panel's list, paging on until it shows. */
async function pickClaim(panel: Locator, summary: RegExp) {
  const choices = panel.getByRole('radiogroup', { name: 'Claim to save it to' });
  await choices.waitFor();
  for (let page = 0; page < 10; page += 1) {
    const radio = choices.getByRole('radio', { name: summary });
    if ((await radio.count()) > 0) {
      await radio.click();
      return;
    }
    await panel.getByRole('button', { name: 'Next page' }).click();
    await panel.getByText(new RegExp(`^Claims ${(page + 1) * 8 + 1}–`)).waitFor();
    // The pager moves at once; the list keeps the previous page's rows until the next arrive.
    await panel.locator('[role="radiogroup"]:not([aria-busy="true"])').waitFor();
  }
  throw new Error(`no claim ${summary} in the save panel`);
}

describe('the workbench', () => {
  const openedBrowser = useBrowser();
  let browser: Browser;
  beforeEach(() => {
    browser = openedBrowser();
  });

  it('runs the layer model live as the emissivity changes, saves it to a claim and shows it there', async () => {
    const page = await browser.newPage(desktop);
    await signIn(page, browser.baseUrl, demo.science_editor.email);
    await openCalculator(page, 'Layer model of the greenhouse effect');

    // One black layer: Tₛ = 2^¼ Tₑ = 303.8 K with Tₑ = 255.47 K (Archer 2012, ch. 3).
    await outputReads(page, 'Surface temperature', '303.8 K');
    const emissivity = page.getByRole('textbox', { name: 'Layer emissivity ε', exact: true });
    await emissivity.fill('0.8');
    // Tₛ = Tₑ (2 / (2 − ε))^¼: 290.3 K at ε = 0.8, 279.3 K at ε = 0.6.
    await outputReads(page, 'Surface temperature', '290.3 K');
    await emissivity.fill('0.6');
    await outputReads(page, 'Surface temperature', '279.3 K');
    await page.getByRole('figure', { name: /Temperature of the surface and the layer/ }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'workbench-layer-desktop');

    const panel = page.getByRole('region', { name: 'Save to a claim' });
    await pickClaim(panel, /^Water vapour, not CO2, is the main greenhouse gas/);
    await panel.getByRole('button', { name: 'Choose another claim' }).waitFor();
    expect(new URL(page.url()).searchParams.get('claim')).toMatch(/^[0-9a-f-]{36}$/);
    const note = `One gray layer at ε = 0.6 already holds the surface 24 K above Tₑ (${Date.now()}).`;
    await panel.getByRole('textbox', { name: 'Note (optional)' }).fill(note);
    await panel.getByRole('button', { name: 'Save the working' }).click();

    await panel.getByText(/^Saved to “Water vapour, not CO2/).waitFor();
    // The server ran the library again and kept its own result, the same number.
    await panel.getByText('279.3 K').first().waitFor();
    await expectAccessible(page);
    await screenshot(page, 'workbench-layer-saved-desktop');

    await panel.getByRole('link', { name: 'See it on the claim' }).click();
    await page.waitForURL(/\/claims\/[0-9a-f-]{36}#workings$/);
    await page.getByText(note).waitFor();
    await screenshot(page, 'workbench-layer-on-claim-desktop');
    await page.close();
  });

  it('runs a trend on a SYNTHETIC dataset from 2016 and saves it, at desktop and phone widths', async () => {
    for (const [name, viewport] of bothWidths) {
      const page = await browser.newPage(viewport);
      await signIn(page, browser.baseUrl, demo.science_editor.email);
      await openCalculator(page, 'Trend with an honest interval');
      await page
        .getByText(/^Choose a dataset and a column, or paste points, for Time series/)
        .waitFor();

      await pickOption(page, 'Dataset', stationDataset);
      // The dataset has one column: it is chosen, and its unit labels the trend.
      expect(await page.getByRole('combobox', { name: 'Column' }).innerText()).toContain(
        'Station anomaly (K)',
      );
      await outputReads(page, 'Trend per decade', /K\/decade/);
      await page.getByRole('textbox', { name: 'From (decimal year)' }).fill('2016');
      await outputReads(page, 'Number of points n', /^Number of points n\s*10$/);
      // The seed's series is flat after its 2016 spike: the interval spans zero.
      await page.getByText(/the interval includes no change at all/).waitFor();
      await page.getByRole('figure', { name: 'Trend by start year, to the same end' }).waitFor();
      await expectAccessible(page);
      await screenshot(page, `workbench-trend-${name}`);

      const panel = page.getByRole('region', { name: 'Save to a claim' });
      await pickClaim(panel, /^Global warming stopped in 2016/);
      await panel
        .getByRole('textbox', { name: 'Note (optional)' })
        .fill('From the 2016 spike on, the trend is lost in the noise (synthetic series).');
      await panel.getByRole('button', { name: 'Save the working' }).click();
      await panel.getByText(/^Saved to “Global warming stopped in 2016/).waitFor();
      await panel
        .getByText(/K\/decade/)
        .first()
        .waitFor();
      await expectAccessible(page);
      await screenshot(page, `workbench-trend-saved-${name}`);
      await page.close();
    }
  });

  it('lets the copy desk run a calculator at phone width, with no way to save', async () => {
    const page = await browser.newPage(phone);
    await signIn(page, browser.baseUrl, demo.copy_desk.email);
    await openCalculator(page, 'Heat flow compared with a forcing');
    // 47 TW over Earth's 5.1 × 10¹⁴ m² (Davies & Davies 2010): 0.092 W/m².
    await outputReads(page, 'Mean flux', '0.09214 W/m²');
    await page.getByRole('figure', { name: /Heat flow against the reference flux/ }).waitFor();
    expect(await page.getByRole('button', { name: 'Save the working' }).count()).toBe(0);
    await expectAccessible(page);
    await screenshot(page, 'workbench-heat-flux-phone');
    await page.close();
  });
});
