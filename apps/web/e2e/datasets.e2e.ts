import { type Page } from 'playwright-core';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  desktop,
  expectAccessible,
  phone,
  screenshot,
  useBrowser,
  type Browser,
} from './support/browser';
import { demo, signIn } from './support/desk';

// Invented for this test, like everything at the Marrowby Gazette: a SYNTHETIC series.
const name = 'SYNTHETIC Hallow Fell gauge anomalies (browser test)';
const header = 'gauge,year,anomaly_k';
const rows = [
  ['HF1', 2010, 0.12],
  ['HF1', 2011, 0.05],
  ['HF1', 2012, 0.21],
  ['HF1', 2013, 0.18],
  ['HF1', 2014, 0.3],
  ['HF1', 2015, 0.41],
  ['HF1', 2016, 0.66],
  ['HF1', 2017, 0.44],
];
const csv = (cells: (string | number)[][]) =>
  Buffer.from(`${header}\n${cells.map((row) => row.join(',')).join('\n')}\n`);
// Line 5 of the file (the header is line 1) holds a value that is not a number.
const badRows = rows.map((row, index) => (index === 3 ? ['HF1', 2013, 'n/a'] : row));

async function upload(page: Page, fileName: string, bytes: Buffer) {
  const form = page.getByRole('form', { name: 'Upload a CSV file' });
  await form
    .locator('input[type="file"]')
    .setInputFiles({ name: fileName, mimeType: 'text/csv', buffer: bytes });
  await form.getByRole('button', { name: 'Upload', exact: true }).click();
  await page.getByText(`Uploaded ${fileName}:`).waitFor();
}

describe('datasets', () => {
  const openedBrowser = useBrowser();
  let browser: Browser;
  beforeEach(() => {
    browser = openedBrowser();
  });

  it('lets a science editor import a CSV: a bad row is named, the fixed file imports and charts', async () => {
    const page = await browser.newPage(desktop);
    await signIn(page, browser.baseUrl, demo.science_editor.email);
    await page
      .getByRole('navigation', { name: 'Desk sections' })
      .getByRole('link', { name: 'Datasets' })
      .click();
    const table = page.getByRole('table', { name: 'Datasets on the desk, newest first' });
    await table
      .getByRole('link', { name: /^SYNTHETIC Marrowby station annual anomalies/ })
      .waitFor();
    await expectAccessible(page);
    await screenshot(page, 'datasets-desktop');

    await page.getByRole('link', { name: 'Import a dataset' }).click();
    await upload(page, 'hallow-fell-gauge.csv', csv(badRows));
    await page
      .getByRole('table', { name: /The first 8 of 8 rows of hallow-fell-gauge.csv/ })
      .waitFor();
    const form = page.getByRole('form', { name: 'Import the dataset' });
    expect(await form.getByRole('combobox', { name: 'Time column' }).innerText()).toBe('year');
    await form.getByRole('checkbox', { name: 'Import “gauge”' }).click();
    await form.getByLabel('Unit of “anomaly_k”').fill('K');
    await form.getByLabel('Label of “anomaly_k” (optional)').fill('Gauge anomaly');
    await form.getByLabel('Name', { exact: true }).fill(name);
    await form
      .getByLabel('Description')
      .fill('SYNTHETIC: typed in by the browser test; not a measurement from anywhere.');
    await form.getByRole('button', { name: 'Import the dataset' }).click();

    const problems = form.getByRole('list', { name: 'Problems in the file' });
    await problems.waitFor();
    expect(await problems.getByRole('listitem').allInnerTexts()).toEqual([
      'Line 5, column “anomaly_k”: "n/a" is not a number',
    ]);
    await expectAccessible(page);
    await screenshot(page, 'dataset-import-refused-desktop');

    // Nothing was imported (seen from a second tab, so the form keeps its choices).
    const list = await browser.newPage(desktop);
    await list.goto(`${browser.baseUrl}/datasets`);
    await list.getByRole('table', { name: 'Datasets on the desk, newest first' }).waitFor();
    expect(await list.getByRole('link', { name }).count()).toBe(0);
    await list.close();

    // The corrected file goes up in its place; every choice made stays, so it imports as is.
    await upload(page, 'hallow-fell-gauge-fixed.csv', csv(rows));
    expect(await problems.count()).toBe(0);
    expect(await form.getByLabel('Unit of “anomaly_k”').inputValue()).toBe('K');
    await form.getByRole('button', { name: 'Import the dataset' }).click();

    await page.getByRole('heading', { level: 1, name }).waitFor();
    expect(new URL(page.url()).pathname).toMatch(/^\/datasets\/[0-9a-f-]{36}$/);
    await page.getByText('Imported 8 rows of one column.').waitFor();
    const figure = page.getByRole('figure', { name: 'Gauge anomaly (K)' });
    // The line is drawn, and its words say what it shows.
    await figure.locator('svg .recharts-line-curve').waitFor();
    expect(await figure.innerText()).toContain(
      'Gauge anomaly from 2010 to 2017, 8 values: lowest 0.05 K (2011), highest 0.66 K (2016)',
    );
    await figure.getByText('Show the data as a table').click();
    // The table is built when the details open, after the click returns.
    const dataTable = figure.getByRole('table', { name: 'Gauge anomaly (K): data' });
    await dataTable.waitFor();
    expect(await dataTable.getByRole('row').count()).toBe(9);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the original CSV' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe(
      'synthetic-hallow-fell-gauge-anomalies-browser-test.csv',
    );
    await expectAccessible(page);
    await screenshot(page, 'dataset-desktop');
    await page.close();
  });

  it('reads well on a phone: the list, the import form and a dataset pass axe at 375 px', async () => {
    const page = await browser.newPage(phone);
    await signIn(page, browser.baseUrl, demo.desk_chief.email);
    await page.goto(`${browser.baseUrl}/datasets`);
    // A phone gets the datasets as a list of cards rather than a table.
    const list = page.getByRole('list', { name: 'Datasets on the desk, newest first' });
    await list.waitFor();
    await expectAccessible(page);
    await screenshot(page, 'datasets-phone');

    await list.getByRole('link', { name: /^SYNTHETIC day and night/ }).click();
    await page
      .getByRole('figure', { name: 'Night (minimum) (K)' })
      .locator('svg .recharts-line-curve')
      .waitFor();
    await expectAccessible(page);
    await screenshot(page, 'dataset-phone');

    await page.goto(`${browser.baseUrl}/datasets/new`);
    await upload(page, 'hallow-fell-gauge.csv', csv(badRows));
    await page.getByRole('form', { name: 'Import the dataset' }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'dataset-import-phone');
    await page.close();
  });
});
