import { type Page } from 'playwright-core';
import { desktop, phone, screenshot } from './browser';

/** Opens a Radix select by its label and picks one option, as a person with a mouse would. */
export async function pickOption(page: Page, combobox: string, option: string | RegExp) {
  await page.getByRole('combobox', { name: combobox }).click();
  await page
    .getByRole(
      'option',
      typeof option === 'string' ? { name: option, exact: true } : { name: option },
    )
    .click();
  // Closed for good, so nothing after (axe, a screenshot) meets the list on its way out.
  await page.getByRole('listbox').waitFor({ state: 'detached' });
}

/** Opens one tab of the claim page (Radix also renders a hidden copy of each label). */
export async function openTab(page: Page, name: RegExp) {
  await page.getByRole('tab', { name }).click();
}

/** Puts the caret at the end of a paragraph of the explainer and replaces its words. */
export async function replaceParagraph(page: Page, paragraph: string, words: string) {
  const editor = page.getByRole('textbox', { name: 'Explainer' });
  await editor.getByText(paragraph, { exact: true }).click();
  await page.keyboard.press('End');
  await page.keyboard.press('Shift+Home');
  await page.keyboard.type(words);
}

/** The page as it is now, whole, at 1280 and at 375 px; the viewport is put back after. */
export async function screenshotBothWidths(page: Page, name: string): Promise<void> {
  const viewport = page.viewportSize() ?? desktop;
  await page.setViewportSize(desktop);
  await screenshot(page, `${name}-1280`);
  await page.setViewportSize(phone);
  await screenshot(page, `${name}-375`);
  await page.setViewportSize(viewport);
}

/**
 * An instant as a `datetime-local` value on a clock in `timeZone`, e.g. "2026-12-02T09:30":
 * what a person in that zone types into a date-and-time field.
 */
export function wallClock(instant: Date, timeZone: string): string {
  const parts = Object.fromEntries(
    new Intl.DateTimeFormat('en-GB', {
      timeZone,
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
    })
      .formatToParts(instant)
      .map((part) => [part.type, part.value]),
  );
  return `${parts.year}-${parts.month}-${parts.day}T${parts.hour}:${parts.minute}`;
}

/** A string matched literally inside a RegExp. */
export function literal(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** At the caret in the explainer: cites a source ("Cite source") or embeds a working ("Insert working"). */
export async function insertInExplainer(
  page: Page,
  button: 'Cite source' | 'Insert working',
  title: string,
): Promise<void> {
  await page.getByRole('button', { name: button }).click();
  await page
    .getByRole('dialog')
    .getByRole('button', { name: `${button === 'Cite source' ? 'Cite' : 'Insert'} ${title}` })
    .click();
  await page.getByRole('dialog').waitFor({ state: 'detached' });
}

/** Writes the template's "why it misleads" paragraph and embeds a working under it. */
export async function explainWithWorking(page: Page, words: string, workingTitle: string) {
  await replaceParagraph(
    page,
    'Explain the error or the missing context, and show the working.',
    words,
  );
  await page.keyboard.press('Enter');
  await insertInExplainer(page, 'Insert working', workingTitle);
  await page.getByRole('textbox', { name: 'Explainer' }).getByText(workingTitle).waitFor();
}

/** Saves the open draft of a verdict version and submits it for sign-off, as its author. */
export async function saveAndSubmitDraft(page: Page, version: number): Promise<void> {
  await page.getByRole('button', { name: 'Save the draft' }).click();
  await page.getByText(`The draft of version ${version} is saved.`).waitFor();
  await page.getByText('All changes saved.').waitFor();
  await page.getByRole('button', { name: 'Submit for sign-off' }).click();
  await page.getByText(`Version ${version} is submitted for sign-off`).waitFor();
}
