import AxeBuilder from '@axe-core/playwright';
import { tmpDir } from '@skyledger/devstack';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, expect, inject } from 'vitest';

export const desktop = { width: 1280, height: 860 };
export const phone = { width: 375, height: 740 };
/** The two widths every screen is checked at, named for screenshots. */
export const bothWidths = [
  ['desktop', desktop],
  ['phone', phone],
] as const;
export const screenshotDir = join(tmpDir, 'screens');

export interface Browser {
  context: BrowserContext;
  baseUrl: string;
  newPage(viewport?: { width: number; height: number }): Promise<Page>;
  close(): Promise<void>;
}

export interface BrowserOptions {
  /** False to read pages as a browser with JavaScript turned off would. */
  javaScriptEnabled?: boolean;
  /** True to ignore every page's Content-Security-Policy, as if the server sent none. */
  bypassCSP?: boolean;
  /** Another stack than the shared one (a suite that starts its own). */
  baseUrl?: string;
}

/** Debian's Chromium, headless, with a fresh profile under the project's ignored tmp/. */
export async function openBrowser(options: BrowserOptions = {}): Promise<Browser> {
  const { baseUrl = inject('baseUrl'), ...contextOptions } = options;
  mkdirSync(tmpDir, { recursive: true });
  mkdirSync(screenshotDir, { recursive: true });
  const profile = mkdtempSync(join(tmpDir, 'chr-'));
  const context = await chromium.launchPersistentContext(profile, {
    ...contextOptions,
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    context,
    baseUrl,
    async newPage(viewport = desktop) {
      const page = await context.newPage();
      await page.setViewportSize(viewport);
      page.on('pageerror', (error) => {
        throw new Error(`script error on ${page.url()}: ${error.message}`);
      });
      return page;
    },
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** No serious or critical axe violation on the page as it is now. */
export async function expectAccessible(page: Page): Promise<void> {
  const results = await new AxeBuilder({ page }).analyze();
  const bad = results.violations.filter((violation) =>
    ['serious', 'critical'].includes(violation.impact ?? ''),
  );
  expect(
    bad.map(
      (violation) =>
        `${violation.id}: ${violation.help} (${violation.nodes.map((node) => node.target.join(' ')).join(', ')})`,
    ),
  ).toEqual([]);
}

export async function screenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}

/** Opens one browser for the enclosing suite and closes it after; call inside `describe`. */
export function useBrowser(options?: BrowserOptions): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await openBrowser(options);
  });
  afterAll(() => browser?.close());
  return () => {
    if (!browser) throw new Error('the browser is not open yet');
    return browser;
  };
}
