import type { ClaimQueueResponse } from '@skyledger/contracts';
import { type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  desktop,
  expectAccessible,
  openBrowser,
  phone,
  screenshot,
  type Browser,
} from './support/browser';
import { demo, deskApi, signIn } from './support/desk';

/*
 * Every desk screen as the role that uses it, and every reader page, at 1280 and 375 px:
 * axe finds nothing serious, nothing scrolls sideways on a phone, and each is saved as
 * tmp/screens/sweep-*.png to be looked at.
 */

type Role = keyof typeof demo;

interface Screen {
  name: string;
  role: Role | 'reader';
  /** The address, once the demo's ids are known. */
  path: (ids: DemoIds) => string;
  /** What shows once the screen is ready, beyond its h1. */
  ready?: (page: Page) => Promise<void>;
  /** A step into the screen before it is looked at (e.g. opening a draft). */
  prepare?: (page: Page) => Promise<void>;
  status?: number;
}

interface DemoIds {
  claims: Map<string, string>;
  datasets: Map<string, string>;
  explainers: Map<string, string>;
}

// Demo claims (seeds-demo/src/claims-desk/claims.ts) that other suites do not change.
const published = 'Earth’s core, not greenhouse gases, is warming the planet';
const awaitingSignoff = 'Global warming stopped in 2016';
const sentBack = 'Cosmic rays, through cloud cover, drive the Earth’s temperature';
const retracted = 'The sun has grown brighter, and that explains recent warming';
const stationDataset = 'SYNTHETIC Marrowby station annual anomalies, 1979–2025';

const claim = (ids: DemoIds, summary: string) => {
  const id = ids.claims.get(summary);
  if (!id) throw new Error(`no demo claim “${summary}”`);
  return id;
};

const claimTabs = [
  'summary',
  'appearances',
  'sources',
  'files',
  'workings',
  'reply',
  'experts',
  'comments',
  'publishing',
  'history',
];

const screens: Screen[] = [
  { name: 'desk-home', role: 'science_editor', path: () => '/' },
  {
    name: 'queue',
    role: 'science_editor',
    path: () => '/claims',
    // A table on a wide screen, cards on a phone: the one shown carries the claim's link.
    ready: (page) => page.getByRole('main').getByRole('link', { name: published }).waitFor(),
  },
  {
    name: 'queue-empty',
    role: 'science_editor',
    path: () => '/claims?status=cleared&topic=no-such-topic',
    ready: (page) => page.getByRole('heading', { name: 'No claims match these filters' }).waitFor(),
  },
  {
    name: 'file-claim',
    role: 'reporter',
    path: () => '/claims/new',
    ready: (page) => page.getByRole('form', { name: 'File a claim' }).waitFor(),
  },
  ...claimTabs.map((tab): Screen => ({
    name: `claim-${tab}`,
    role: 'science_editor',
    path: (ids) => `/claims/${claim(ids, published)}${tab === 'summary' ? '' : `#${tab}`}`,
    ready: (page) =>
      page
        .getByRole('tab', { selected: true })
        .filter({ hasText: new RegExp(tab === 'reply' ? 'reply' : tab, 'i') })
        .waitFor(),
  })),
  {
    name: 'search',
    role: 'science_editor',
    path: () => '/search?q=warming+2016',
    ready: (page) => page.getByRole('list', { name: 'Results for “warming 2016”' }).waitFor(),
  },
  { name: 'search-start', role: 'science_editor', path: () => '/search' },
  {
    name: 'workbench',
    role: 'science_editor',
    path: () => '/workbench',
    ready: (page) => page.getByRole('link', { name: 'Trend with an honest interval' }).waitFor(),
  },
  {
    name: 'workbench-layer-model',
    role: 'science_editor',
    path: () => '/workbench/layer-atmosphere',
    ready: (page) =>
      page.getByRole('figure', { name: /Temperature of the surface and the layer/ }).waitFor(),
  },
  {
    name: 'datasets',
    role: 'science_editor',
    path: () => '/datasets',
    ready: (page) => page.getByRole('link', { name: stationDataset }).first().waitFor(),
  },
  {
    name: 'dataset',
    role: 'science_editor',
    path: (ids) => `/datasets/${ids.datasets.get(stationDataset)}`,
    ready: (page) => page.locator('svg .recharts-line-curve').first().waitFor(),
  },
  {
    name: 'dataset-new',
    role: 'science_editor',
    path: () => '/datasets/new',
    ready: (page) => page.getByRole('form', { name: 'Upload a CSV file' }).waitFor(),
  },
  {
    name: 'verdict-editor',
    role: 'science_editor',
    path: (ids) => `/claims/${claim(ids, sentBack)}/verdict`,
    // The sent-back verdict, taken up again as its editor would: the editor opens.
    prepare: async (page) => {
      const start = page.getByRole('button', { name: 'Start version 2 from version 1' });
      const draft = page.getByRole('heading', { name: 'Draft of version 2' });
      await start.or(draft).first().waitFor();
      if (await start.isVisible()) await start.click();
      await draft.waitFor();
    },
    ready: (page) => page.getByRole('textbox', { name: 'Explainer' }).waitFor(),
  },
  {
    name: 'verdict-published',
    role: 'science_editor',
    path: (ids) => `/claims/${claim(ids, published)}/verdict`,
    ready: (page) =>
      page.getByRole('list', { name: 'Versions of the verdict, newest first' }).waitFor(),
  },
  {
    name: 'signoff',
    role: 'copy_desk',
    path: (ids) => `/claims/${claim(ids, awaitingSignoff)}/signoff`,
    ready: (page) => page.getByRole('list', { name: 'Sign-off checklist' }).waitFor(),
  },
  {
    name: 'rating-scale',
    role: 'desk_chief',
    path: () => '/rating-scale',
    ready: (page) => page.getByRole('list', { name: 'Levels of the scale' }).waitFor(),
  },
  {
    name: 'people',
    role: 'desk_chief',
    path: () => '/people',
    // A table on a wide screen, cards on a phone: whichever is shown names the reporter.
    ready: (page) =>
      page
        .getByRole('cell', { name: demo.reporter.email })
        .or(page.getByRole('list', { name: 'People on the desk' }).getByText(demo.reporter.email))
        .waitFor(),
  },
  {
    name: 'outbox',
    role: 'desk_chief',
    path: () => '/outbox',
    ready: (page) =>
      page
        .getByRole('region', { name: 'Mails' })
        .or(page.getByRole('list', { name: 'Mails' }))
        .waitFor(),
  },
  {
    name: 'audit',
    role: 'desk_chief',
    path: () => '/audit',
    ready: (page) => page.getByRole('region', { name: 'Audit events, newest first' }).waitFor(),
  },
  { name: 'account', role: 'reporter', path: () => '/account' },
  { name: 'no-access', role: 'reporter', path: () => '/people' },
  { name: 'reader-index', role: 'reader', path: () => '/explainers' },
  { name: 'reader-search', role: 'reader', path: () => '/explainers?q=molten+core' },
  {
    name: 'reader-explainer',
    role: 'reader',
    path: (ids) => `/explainers/${ids.explainers.get(published)}`,
  },
  {
    name: 'reader-first-version',
    role: 'reader',
    path: (ids) => `/explainers/${ids.explainers.get(published)}/v/1`,
  },
  {
    name: 'reader-retracted',
    role: 'reader',
    path: (ids) => `/explainers/${ids.explainers.get(retracted)}`,
  },
  { name: 'reader-corrections', role: 'reader', path: () => '/corrections' },
  { name: 'reader-methodology', role: 'reader', path: () => '/methodology' },
  { name: 'reader-not-found', role: 'reader', path: () => '/explainers/no-such-page', status: 404 },
];

/** Waits for the screen's heading and until nothing on it is still loading. */
async function settle(page: Page, screen: Screen): Promise<void> {
  await page.getByRole('heading', { level: 1 }).first().waitFor();
  await screen.ready?.(page);
  await expect
    .poll(() => page.locator('[aria-busy="true"], .rt-Spinner, .sl-progress').count(), {
      timeout: 20_000,
    })
    .toBe(0);
}

/** The demo's ids by name, as the desk chief's API and the reader index give them. */
async function demoIds(browser: Browser): Promise<DemoIds> {
  const chief = await deskApi(browser.baseUrl, demo.desk_chief.email);
  const queue = await chief<ClaimQueueResponse>('GET', '/claims?pageSize=100');
  const datasets = await chief<Array<{ id: string; name: string }>>('GET', '/datasets');
  const page = await browser.newPage(desktop);
  await page.goto(`${browser.baseUrl}/explainers`);
  const links = await page
    .locator('main ol.items > li h2 a')
    .evaluateAll((anchors) =>
      anchors.map((anchor) => [anchor.textContent ?? '', anchor.getAttribute('href') ?? '']),
    );
  await page.close();
  const explainers = new Map(
    links.map(([summary, href]) => [summary!, href!.split('/explainers/')[1] ?? ''] as const),
  );
  return {
    claims: new Map(queue.items.map((item) => [item.summary, item.id])),
    datasets: new Map(datasets.map((dataset) => [dataset.name, dataset.id])),
    explainers,
  };
}

describe('every screen, at 1280 and 375 px', () => {
  let ids: DemoIds;
  const browsers = new Map<Role | 'reader', Browser>();
  beforeAll(async () => {
    const reader = await openBrowser();
    browsers.set('reader', reader);
    ids = await demoIds(reader);
  });
  afterAll(async () => {
    for (const browser of browsers.values()) await browser.close();
  });

  /** One browser per role, signed in once: a browser's session is one person's. */
  async function browserFor(role: Role | 'reader'): Promise<Browser> {
    const open = browsers.get(role);
    if (open) return open;
    const browser = await openBrowser();
    const page = await browser.newPage(desktop);
    await signIn(page, browser.baseUrl, demo[role as Role].email);
    await page.close();
    browsers.set(role, browser);
    return browser;
  }

  it.each(screens.map((screen) => [screen.name, screen] as const))(
    '%s passes axe, fits a phone and is saved to look at',
    async (name, screen) => {
      const browser = await browserFor(screen.role);
      const page = await browser.newPage(desktop);
      for (const [width, viewport] of [
        [1280, desktop],
        [375, phone],
      ] as const) {
        await page.setViewportSize(viewport);
        const response = await page.goto(`${browser.baseUrl}${screen.path(ids)}`);
        if (screen.role === 'reader') expect(response?.status()).toBe(screen.status ?? 200);
        if (screen.prepare && width === 1280) await screen.prepare(page);
        await settle(page, screen);
        await expectAccessible(page);
        const overflow = await page.evaluate(
          () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
        );
        expect(overflow, `${name} scrolls sideways at ${width} px`).toBeLessThanOrEqual(0);
        await screenshot(page, `sweep-${name}-${width}`);
      }
      await page.close();
    },
  );
});
