import { type Page } from 'playwright-core';
import { beforeEach, describe, expect, it } from 'vitest';
import { desktop, screenshot, useBrowser, type Browser } from './support/browser';
import { demo, demoPassword } from './support/desk';

/*
 * Filing a claim with the keyboard alone: Tab, Shift+Tab, Enter, Space, arrow keys and
 * typing, never a click. After every key that moves focus, the focused element must show
 * a visible ring, and land where a keyboard user expects it.
 */

// Invented for this test, like everything at the Marrowby Gazette.
const claimText =
  'Those new heat pumps on the Brackenridge estate are cooling the whole town in winter, so the weather station reads low.';
const summary = 'Heat pumps on one estate cool the whole town, says a resident';

interface Focused {
  /** The focused element's role, or its tag when it has none. */
  role: string;
  /** Its accessible name, as the browser computes it from labels and text. */
  name: string;
  /** Whether it, an ancestor close by, or its ::before draws a visible outline. */
  ringVisible: boolean;
  inViewport: boolean;
}

/** What has the keyboard's focus now, and whether a sighted person can see where it is. */
async function focused(page: Page): Promise<Focused> {
  return page.evaluate(() => {
    const element = document.activeElement as HTMLElement | null;
    if (!element || element === document.body) {
      return { role: 'body', name: '', ringVisible: false, inViewport: false };
    }
    const hasOutline = (style: CSSStyleDeclaration) =>
      style.outlineStyle !== 'none' &&
      parseFloat(style.outlineWidth) >= 1 &&
      style.outlineColor !== 'transparent' &&
      !style.outlineColor.endsWith(', 0)');
    let ringVisible = hasOutline(getComputedStyle(element, '::before'));
    for (let node: HTMLElement | null = element, up = 0; node && up < 3 && !ringVisible; up++) {
      ringVisible = hasOutline(getComputedStyle(node));
      node = node.parentElement;
    }
    const labelled = element.getAttribute('aria-labelledby');
    const name =
      element.getAttribute('aria-label') ??
      (labelled
        ? labelled
            .split(' ')
            .map((id) => document.getElementById(id)?.textContent ?? '')
            .join(' ')
        : null) ??
      // innerText leaves out what is not shown, like the hidden copy Radix keeps of a tab's label.
      ((element as HTMLInputElement).labels?.[0]?.innerText ||
        element.innerText ||
        (element as HTMLInputElement).placeholder ||
        '');
    const box = element.getBoundingClientRect();
    return {
      role: element.getAttribute('role') ?? element.tagName.toLowerCase(),
      name: name.trim().replace(/\s+/g, ' '),
      ringVisible,
      inViewport: box.bottom > 0 && box.top < window.innerHeight && box.width > 0,
    };
  });
}

/** Presses a key that moves focus, and checks the focus can be seen where it landed. */
async function press(page: Page, key: string): Promise<Focused> {
  await page.keyboard.press(key);
  const now = await focused(page);
  expect(now.role, `after ${key}, focus is lost`).not.toBe('body');
  expect(
    now.ringVisible,
    `after ${key}, the focus on ${now.role} “${now.name}” is not visible`,
  ).toBe(true);
  expect(now.inViewport, `after ${key}, ${now.role} “${now.name}” is off screen`).toBe(true);
  return now;
}

/** Tabs on until the focused element's name matches, checking each stop; fails after `limit`. */
async function tabTo(page: Page, name: RegExp, limit = 25, key = 'Tab'): Promise<Focused> {
  const passed: string[] = [];
  for (let step = 0; step < limit; step++) {
    const now = await press(page, key);
    if (name.test(now.name)) return now;
    passed.push(`${now.role} “${now.name}”`);
  }
  throw new Error(`${key} never reached ${name}; it passed ${passed.join(', ')}`);
}

async function expectFocusOn(page: Page, role: string, name: RegExp): Promise<void> {
  await expect.poll(async () => (await focused(page)).role).toBe(role);
  expect((await focused(page)).name).toMatch(name);
}

describe('the desk by keyboard alone', () => {
  const openedBrowser = useBrowser();
  let browser: Browser;
  beforeEach(() => {
    browser = openedBrowser();
  });

  it('lets a reporter sign in and file a claim with Tab, Shift+Tab, Enter, Space and arrows', async () => {
    const page = await browser.newPage(desktop);
    await page.goto(`${browser.baseUrl}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();

    // Sign in: the page puts focus in its first field, or Tab reaches it.
    if (!/^E-mail/.test((await focused(page)).name)) await tabTo(page, /^E-mail/);
    await page.keyboard.type(demo.reporter.email);
    await tabTo(page, /^Password/, 3);
    await page.keyboard.type(demoPassword);
    await page.keyboard.press('Enter');
    await page.getByRole('navigation', { name: 'Desk sections' }).waitFor();

    // Signed in, focus is on the desk's heading; back up the page, the desk's sections come
    // before it and the skip link first of all. Enter follows a link.
    await expectFocusOn(page, 'h1', /^Welcome to the desk/);
    await tabTo(page, /^Skip to the page$/, 25, 'Shift+Tab');
    await screenshot(page, 'keyboard-skip-link');
    await tabTo(page, /^File a claim$/);
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/claims\/new$/);
    // Focus moves to the new page's heading, where reading starts.
    await expectFocusOn(page, 'h1', /^File a claim$/);

    await tabTo(page, /^The claim as it was said/);
    await page.keyboard.type(claimText);
    const form = page.getByRole('form', { name: 'File a claim' });
    await form.getByText(/similar claims? on the desk|No similar claims/).waitFor();
    await tabTo(page, /^Neutral summary/);
    // Shift+Tab goes back to where it came from, past anything the similar-claims panel added.
    await tabTo(page, /^The claim as it was said/, 6, 'Shift+Tab');
    await tabTo(page, /^Neutral summary/);
    await page.keyboard.type(summary);
    const topics = await press(page, 'Tab');
    expect(topics.name).toMatch(/^Topics/);
    await page.keyboard.type('energy, local-weather');

    // Space ticks a checkbox and unticks it.
    const legal = await press(page, 'Tab');
    expect(legal).toMatchObject({
      role: 'checkbox',
      name: expect.stringMatching(/Needs legal review/),
    });
    const box = form.getByRole('checkbox', { name: 'Needs legal review' });
    await page.keyboard.press('Space');
    expect(await box.getAttribute('aria-checked')).toBe('true');
    await page.keyboard.press('Space');
    expect(await box.getAttribute('aria-checked')).toBe('false');

    // A claimant described anew: focus goes on to the fields that appear.
    await tabTo(page, /^Someone new: describe the claimant$/, 4);
    await page.keyboard.press('Enter');
    await expectFocusOn(page, 'input', /^Claimant's name/);
    await page.keyboard.type('A Brackenridge resident (invented)');
    await screenshot(page, 'keyboard-claimant');

    // A Radix select: Enter opens it, arrows move, Enter chooses.
    const kind = await press(page, 'Tab');
    expect(kind).toMatchObject({
      role: 'combobox',
      name: expect.stringMatching(/Kind of claimant/),
    });
    await page.keyboard.press('Enter');
    await page.getByRole('listbox').waitFor();
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Enter');
    await page.getByRole('listbox').waitFor({ state: 'detached' });
    await expectFocusOn(page, 'combobox', /Kind of claimant/);
    const chosen =
      (await form.getByRole('combobox', { name: 'Kind of claimant' }).textContent()) ?? '';
    expect(['Public figure', 'Organisation', 'Private individual']).toContain(chosen.trim());

    // Where it was seen: a web address, an outlet, and a date typed segment by segment.
    await tabTo(page, /^Web address/, 6);
    await page.keyboard.type('https://brackenridge-residents.test/forum/heat-pumps');
    await tabTo(page, /^Outlet or platform/, 2);
    await page.keyboard.type('Brackenridge residents’ forum');
    await tabTo(page, /^Seen at \(date and time\)/, 2);
    // Chromium's en-US date-time field: month, day, year, hour, minute, AM/PM.
    await page.keyboard.type('11302026');
    await page.keyboard.press('ArrowRight');
    await page.keyboard.type('0930A');
    expect(await form.getByLabel('Seen at (date and time)').inputValue()).toBe('2026-11-30T09:30');
    await screenshot(page, 'keyboard-filled');

    await tabTo(page, /^File the claim$/, 12);
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { level: 1, name: summary }).waitFor();
    expect(page.url()).toMatch(/\/claims\/[0-9a-f-]{36}$/);
    await expectFocusOn(page, 'h1', new RegExp(`^${summary}$`));
    await page.getByText('The claim is filed.').waitFor();

    // The claim page's tabs: arrows move between them, and the tab's panel follows.
    await tabTo(page, /^Summary$/, 15);
    await page.keyboard.press('ArrowRight');
    await expectFocusOn(page, 'tab', /^Appearances \(1\)$/);
    expect((await focused(page)).ringVisible).toBe(true);
    await page
      .getByRole('list', { name: 'Appearances, earliest first' })
      .getByText('Brackenridge residents’ forum')
      .waitFor();
    await screenshot(page, 'keyboard-filed');
    await page.close();
  });
});
