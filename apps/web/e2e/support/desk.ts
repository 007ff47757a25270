import { type Locator, type Page } from 'playwright-core';

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

/** Signs in and opens the filing form from the desk's navigation. */
export async function openFilingForm(
  page: Page,
  baseUrl: string,
  email: string = demo.reporter.email,
): Promise<Locator> {
  await signIn(page, baseUrl, email);
  await page
    .getByRole('navigation', { name: 'Desk sections' })
    .getByRole('link', { name: 'File a claim' })
    .click();
  return page.getByRole('form', { name: 'File a claim' });
}

export async function navLinks(page: Page): Promise<string[]> {
  return page.getByRole('navigation', { name: 'Desk sections' }).getByRole('link').allInnerTexts();
}

/**
 * The desk's API as one of the demo people, outside the browser's own session: for the
 * steps of a flow that a test sets up rather than walks through.
 */
export async function deskApi(baseUrl: string, email: string, password = demoPassword) {
  const accessToken = await deskToken(baseUrl, email, password);
  return async <T>(method: 'GET' | 'POST' | 'PATCH' | 'DELETE', path: string, body?: unknown) => {
    const response = await fetch(`${baseUrl}/api${path}`, {
      method,
      headers: { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' },
      ...(body === undefined ? {} : { body: JSON.stringify(body) }),
    });
    if (!response.ok) {
      throw new Error(`${method} ${path} as ${email}: ${response.status} ${await response.text()}`);
    }
    return (await response.json()) as T;
  };
}

/** An access token for one of the demo people, for requests deskApi does not make (uploads). */
export async function deskToken(
  baseUrl: string,
  email: string,
  password = demoPassword,
): Promise<string> {
  const signedIn = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!signedIn.ok) throw new Error(`signing in as ${email} failed: ${signedIn.status}`);
  return ((await signedIn.json()) as { accessToken: string }).accessToken;
}
