import { beforeEach, describe, expect, it } from 'vitest';
import {
  desktop,
  expectAccessible,
  openBrowser,
  useBrowser,
  phone,
  screenshot,
  type Browser,
} from './support/browser';
import { demo, demoPassword, navLinks, signIn } from './support/desk';
import { linkTo, waitForMail } from './support/mailbox';
import { pickOption } from './support/screens';

describe('people and invitations', () => {
  const openedBrowser = useBrowser();
  let browser: Browser;
  beforeEach(() => {
    browser = openedBrowser();
  });

  it('shows the desk chief a sortable People table on a wide screen that passes axe', async () => {
    const page = await browser.newPage(desktop);
    await signIn(page, browser.baseUrl, demo.desk_chief.email);
    await page.getByRole('link', { name: 'People' }).click();
    const row = page.getByRole('row', { name: new RegExp(demo.reporter.name) });
    await row.getByRole('cell', { name: demo.reporter.email }).waitFor();
    await row.getByText('Active').waitFor();
    expect(await page.getByRole('list', { name: 'People on the desk' }).isVisible()).toBe(false);
    await page.getByRole('button', { name: 'E-mail' }).click();
    await page.waitForURL(/sort=email&order=asc/);
    await expectAccessible(page);
    await screenshot(page, 'people-desktop');
    await page.close();
  });

  it('gives a phone the people as cards, sorted by a choice, with each card’s actions', async () => {
    const page = await browser.newPage(phone);
    await signIn(page, browser.baseUrl, demo.desk_chief.email);
    await page.goto(`${browser.baseUrl}/people`);
    const cards = page.getByRole('list', { name: 'People on the desk' });
    const cardOf = (name: string) => cards.getByRole('listitem').filter({ hasText: name });
    const reporter = cardOf(demo.reporter.name);
    await reporter.getByText(demo.reporter.email).waitFor();
    await reporter.getByText('Active').waitFor();
    expect(
      await reporter.getByRole('combobox', { name: `Role of ${demo.reporter.name}` }).innerText(),
    ).toBe('Reporter');
    await reporter.getByRole('button', { name: `Disable ${demo.reporter.name}` }).waitFor();
    await cardOf(demo.desk_chief.name).getByText('That is you').waitFor();
    expect(await page.getByRole('table').isVisible()).toBe(false);
    await expectAccessible(page);
    await screenshot(page, 'people-phone');

    await pickOption(page, 'Sort by', 'E-mail, Z to A');
    await page.waitForURL(/sort=email&order=desc/);
    // Each card's e-mail is a line of its own; the API sorted them, Z to A.
    const emails = () =>
      cards
        .getByRole('listitem')
        .evaluateAll((items) =>
          items.map((item) => (item as HTMLElement).innerText.match(/^\S+@\S+$/m)?.[0] ?? ''),
        );
    await expect.poll(async () => (await emails())[0]).toBe(demo.reporter.email);
    const shown = await emails();
    expect(shown).toEqual([...shown].sort().reverse());

    // Someone newly invited: their card changes their role and sends the invitation again.
    const email = 'edda.marl@marrowby-gazette.test';
    await page.getByRole('button', { name: 'Invite someone' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Name').fill('Edda Marl');
    await dialog.getByLabel('E-mail').fill(email);
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${email}`).waitFor();
    const invited = cardOf('Edda Marl');
    await invited.getByText('Invited').waitFor();
    await invited.getByText('Never').waitFor();

    await invited.getByRole('combobox', { name: 'Role of Edda Marl' }).click();
    await page.getByRole('option', { name: 'Copy desk', exact: true }).click();
    await page.getByText('Edda Marl is now Copy desk.').waitFor();
    await expect
      .poll(() => invited.getByRole('combobox', { name: 'Role of Edda Marl' }).innerText())
      .toBe('Copy desk');

    await invited.getByRole('button', { name: 'Resend the invitation to Edda Marl' }).click();
    await page.getByText(`A fresh invitation link went to ${email}.`).waitFor();
    await waitForMail(email, /invited to the Skyledger desk/, 15_000, 2);
    await screenshot(page, 'people-phone-actions');
    await page.close();
  });

  it('lets the desk chief invite someone, whose mailed link sets a password', async () => {
    const chief = await browser.newPage();
    await signIn(chief, browser.baseUrl, demo.desk_chief.email);
    await chief.getByRole('link', { name: 'People' }).click();
    await chief.getByRole('button', { name: 'Invite someone' }).click();
    const dialog = chief.getByRole('dialog');
    await dialog.getByLabel('Name').fill('Oskar Venn');
    await dialog.getByLabel('E-mail').fill('oskar.venn@marrowby-gazette.test');
    await pickOption(chief, 'Role', 'Science editor');
    await expectAccessible(chief);
    await screenshot(chief, 'people-invite-dialog');
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await chief.getByText('Invitation sent to oskar.venn@marrowby-gazette.test').waitFor();
    const row = chief.getByRole('row', { name: /Oskar Venn/ });
    await row.getByText('Invited').waitFor();

    const mail = await waitForMail(
      'oskar.venn@marrowby-gazette.test',
      /invited to the Skyledger desk/,
    );
    const link = linkTo(mail, '/accept-invite');
    expect(link.startsWith(browser.baseUrl)).toBe(true);

    // The invited person opens the link in a browser of their own.
    const other = await openBrowser();
    try {
      const invitee = await other.newPage();
      await invitee.goto(link);
      await invitee.getByText('oskar.venn@marrowby-gazette.test').waitFor();
      await invitee.getByText('Science editor').first().waitFor();
      await expectAccessible(invitee);
      await screenshot(invitee, 'accept-invite');
      await invitee.getByLabel('New password', { exact: true }).fill('a good long passphrase');
      await invitee.getByLabel('New password again').fill('a good long passphrase');
      await invitee.getByRole('button', { name: 'Set my password' }).click();
      await invitee.getByText('Your password is set, Oskar Venn').waitFor();
      await invitee.getByRole('link', { name: 'Sign in' }).click();
      await invitee.getByRole('button', { name: 'Sign in' }).waitFor();
      await signIn(
        invitee,
        other.baseUrl,
        'oskar.venn@marrowby-gazette.test',
        'a good long passphrase',
      );
      expect(await navLinks(invitee)).toEqual([
        'Desk',
        'Claims',
        'File a claim',
        'Search',
        'Datasets',
        'Workbench',
        'Rating scale',
        'Account',
      ]);
      await invitee.getByText('Oskar Venn').first().waitFor();
    } finally {
      await other.close();
    }

    await chief.reload();
    await chief
      .getByRole('row', { name: /Oskar Venn/ })
      .getByText('Active')
      .waitFor();
    await chief.close();
  });

  it('tells a reporter who opens People that it is not for their role', async () => {
    const page = await browser.newPage();
    await signIn(page, browser.baseUrl, demo.reporter.email);
    await page.goto(`${browser.baseUrl}/people`);
    await page.getByText(/open to these roles only/).waitFor();
    await expectAccessible(page);
    await page.close();
  });

  it('resets a forgotten password through the mailed link', async () => {
    const page = await browser.newPage();
    await page.goto(`${browser.baseUrl}/sign-in`);
    await page.getByRole('link', { name: /forgot/i }).click();
    await page.getByLabel('E-mail').fill(demo.copy_desk.email);
    await page.getByRole('button', { name: /send|reset/i }).click();
    await page.getByText(/if an account exists/i).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'forgot-password-sent');

    const mail = await waitForMail(demo.copy_desk.email, /Reset your Skyledger password/);
    await page.goto(linkTo(mail, '/reset-password'));
    // Set back to the demo password, so the other tests can still sign in as the copy desk.
    await page.getByLabel('New password', { exact: true }).fill(demoPassword);
    await page.getByLabel('New password again').fill(demoPassword);
    await page.getByRole('button', { name: 'Set the new password' }).click();
    await page.getByText('Your new password is set').waitFor();
    await page.getByRole('link', { name: 'Sign in' }).click();
    await signIn(page, browser.baseUrl, demo.copy_desk.email, demoPassword);
    expect(await navLinks(page)).toEqual([
      'Desk',
      'Claims',
      'Awaiting sign-off',
      'Cleared to publish',
      'Search',
      'Datasets',
      'Workbench',
      'Rating scale',
      'Account',
    ]);
    await page.close();
  });
});
