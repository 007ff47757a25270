import { roles, type Role } from '@skyledger/contracts';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  expectAccessible,
  useBrowser,
  phone,
  screenshot,
  type Browser,
  bothWidths,
} from './support/browser';
import { demo, navLinks, signIn } from './support/desk';

describe('signing in to the desk', () => {
  const openedBrowser = useBrowser();
  let browser: Browser;
  beforeEach(() => {
    browser = openedBrowser();
  });

  it('sends a signed-out visitor to the sign-in page, which passes axe at both widths', async () => {
    for (const [name, viewport] of bothWidths) {
      const page = await browser.newPage(viewport);
      await page.goto(`${browser.baseUrl}/people`);
      await page.getByRole('button', { name: 'Sign in' }).waitFor();
      expect(new URL(page.url()).pathname).toBe('/sign-in');
      expect(await page.title()).toMatch(/Sign in · Skyledger/);
      await expectAccessible(page);
      await screenshot(page, `sign-in-${name}`);
      await page.close();
    }
  });

  it('says plainly when the password is wrong', async () => {
    const page = await browser.newPage();
    await page.goto(`${browser.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(demo.reporter.email);
    await page.getByLabel('Password', { exact: true }).fill('not the password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is wrong').waitFor();
    await expectAccessible(page);
    await screenshot(page, 'sign-in-error');
    await page.close();
  });

  const expectedNav = {
    desk_chief: [
      'Desk',
      'Claims',
      'Awaiting sign-off',
      'Cleared to publish',
      'File a claim',
      'Search',
      'Datasets',
      'Workbench',
      'Rating scale',
      'People',
      'Outbox',
      'Audit trail',
      'Account',
    ],
    science_editor: [
      'Desk',
      'Claims',
      'File a claim',
      'Search',
      'Datasets',
      'Workbench',
      'Rating scale',
      'Account',
    ],
    copy_desk: [
      'Desk',
      'Claims',
      'Awaiting sign-off',
      'Cleared to publish',
      'Search',
      'Datasets',
      'Workbench',
      'Rating scale',
      'Account',
    ],
    reporter: [
      'Desk',
      'Claims',
      'File a claim',
      'Search',
      'Datasets',
      'Workbench',
      'Rating scale',
      'Account',
    ],
  } as const;

  it.each(roles)('shows a %s the navigation of their role', async (role: Role) => {
    const person = demo[role];
    const page = await browser.newPage();
    await signIn(page, browser.baseUrl, person.email);
    expect(await navLinks(page)).toEqual(expectedNav[role]);
    await page.getByText(person.name).first().waitFor();
    await page.getByText(person.roleLabel).first().waitFor();
    await screenshot(page, `desk-home-${role}`);

    // The session survives a reload: the refresh cookie brings it back.
    await page.reload();
    await page.getByRole('navigation', { name: 'Desk sections' }).waitFor();
    expect(await navLinks(page)).toEqual(expectedNav[role]);

    await page.getByRole('button', { name: /sign out/i }).click();
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.goto(`${browser.baseUrl}/account`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.close();
  });

  it('lays the desk out for a phone', async () => {
    const page = await browser.newPage(phone);
    await signIn(page, browser.baseUrl, demo.science_editor.email);
    await expectAccessible(page);
    await screenshot(page, 'desk-home-phone');
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - window.innerWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
    await page.close();
  });
});
