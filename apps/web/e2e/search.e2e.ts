import { beforeEach, describe, expect, it } from 'vitest';
import {
  expectAccessible,
  screenshot,
  useBrowser,
  type Browser,
  bothWidths,
} from './support/browser';
import { demo, openFilingForm, signIn } from './support/desk';

// The demo desk holds two phrasings of one recurring claim (seeds-demo/src/claims-desk/claims.ts).
const first = 'Global warming stopped in 2016';
const second = 'Warming has paused since 2016, says a reshared podcast clip';

describe('desk search', () => {
  const openedBrowser = useBrowser();
  let browser: Browser;
  beforeEach(() => {
    browser = openedBrowser();
  });

  it('finds both phrasings, filters by a status facet through the URL, and passes axe at both widths', async () => {
    for (const [name, viewport] of bothWidths) {
      const page = await browser.newPage(viewport);
      await signIn(page, browser.baseUrl, demo.science_editor.email);
      await page
        .getByRole('navigation', { name: 'Desk sections' })
        .getByRole('link', { name: 'Search' })
        .click();
      await page.getByLabel('Search for').fill('warming 2016');
      await page.getByRole('button', { name: 'Search', exact: true }).click();

      const results = page.getByRole('list', { name: 'Results for “warming 2016”' });
      const firstLink = results.getByRole('link', { name: first });
      await firstLink.waitFor();
      await results.getByRole('link', { name: second }).waitFor();
      expect(new URL(page.url()).search).toBe('?q=warming+2016');
      expect(await firstLink.locator('mark').allInnerTexts()).toEqual(['warming', '2016']);
      await expectAccessible(page);
      await screenshot(page, `search-${name}`);

      await page.getByRole('button', { name: /^Set aside \d+$/ }).click();
      await firstLink.waitFor({ state: 'detached' });
      const url = new URL(page.url());
      expect(url.pathname).toBe('/search');
      expect(Object.fromEntries(url.searchParams)).toEqual({
        q: 'warming 2016',
        status: 'set_aside',
      });
      await page.getByRole('button', { name: /^Set aside \d+$/, pressed: true }).waitFor();
      const items = await results.getByRole('listitem').allInnerTexts();
      expect(items.length).toBeGreaterThan(0);
      for (const item of items) expect(item).toContain('Set aside');
      expect(items.some((item) => item.includes(second))).toBe(true);
      await expectAccessible(page);
      await screenshot(page, `search-set-aside-${name}`);

      // The address alone brings back the same filtered search.
      const shared = await browser.newPage(viewport);
      await shared.goto(url.toString());
      await shared
        .getByRole('list', { name: 'Results for “warming 2016”' })
        .getByRole('link', { name: second })
        .waitFor();
      expect(await shared.getByRole('link', { name: first }).count()).toBe(0);
      await shared.close();
      await page.close();
    }
  });

  it('lets the desk chief rebuild the index and says what it did', async () => {
    const page = await browser.newPage();
    await signIn(page, browser.baseUrl, demo.desk_chief.email);
    await page.goto(`${browser.baseUrl}/search?q=warming+2016`);
    await page.getByRole('list', { name: 'Results for “warming 2016”' }).waitFor();
    await page.getByRole('button', { name: 'Rebuild the index' }).click();
    await page.getByText(/^The index is rebuilt: [\d,]+ documents in [\d.]+ m?s\.$/).waitFor();
    await page.getByRole('link', { name: first }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'search-rebuilt');
    await page.close();
  });

  it('shows a reporter filing a claim the published check of it, rated, with its explainer, at both widths', async () => {
    for (const [name, viewport] of bothWidths) {
      const page = await browser.newPage(viewport);
      const form = await openFilingForm(page, browser.baseUrl);
      await form
        .getByLabel('The claim as it was said')
        .fill('The heat of the Earth’s molten core is what is warming the planet.');
      const similar = form.getByRole('region', { name: 'Already on the desk?' });
      // The demo desk published this claim's explainer, rated contradicted, and corrected it.
      const item = similar
        .getByRole('listitem')
        .filter({ hasText: 'Earth’s core, not greenhouse gases, is warming the planet' });
      await item.getByText(/^Rated \d · /).waitFor();
      expect(await item.getByText('Published').count()).toBeGreaterThan(0);
      const explainer = item.getByRole('link', { name: 'Read the explainer (opens in a new tab)' });
      const href = await explainer.getAttribute('href');
      expect(href).toMatch(/\/explainers\/[a-z0-9-]+$/);
      await expectAccessible(page);
      await screenshot(page, `similar-claims-published-${name}`);

      await page.goto(href!);
      await page
        .getByRole('heading', { level: 1, name: /Earth’s core, not greenhouse gases/ })
        .waitFor();
      await page.close();
    }
  });

  it('offers a reporter no rebuild', async () => {
    const page = await browser.newPage();
    await signIn(page, browser.baseUrl, demo.reporter.email);
    await page.goto(`${browser.baseUrl}/search?q=warming+2016`);
    await page.getByRole('link', { name: first }).waitFor();
    expect(await page.getByRole('button', { name: 'Rebuild the index' }).count()).toBe(0);
    await page.close();
  });
});
