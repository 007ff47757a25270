import { type Page } from 'playwright-core';

export const demoPassword = 'skyledger-demo';

export const demo = {
  desk_chief: {
    email: 'chief@marrowby-gazette.test',
    name: 'Morwenna Hale',
    roleLabel: 'Desk chief',
  },
  science_editor: {
    email: 'editor@marrowby-gazette.test',
    name: 'Tamsin Ferrow',
    roleLabel: 'Science editor',
  },
  copy_desk: { email: 'copy@marrowby-gazette.test', name: 'Declan Ashby', roleLabel: 'Copy desk' },
  reporter: {
    email: 'reporter@marrowby-gazette.test',
    name: 'Priya Lindqvist',
    roleLabel: 'Reporter',
  },
} as const;

/** Signs in through the sign-in page, as a person would, and waits for the desk. */
export async function signIn(
  page: Page,
  baseUrl: string,
  email: string,
  password = demoPassword,
): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Desk sections' }).waitFor();
}

export async function navLinks(page: Page): Promise<string[]> {
  return page.getByRole('navigation', { name: 'Desk sections' }).getByRole('link').allInnerTexts();
}
