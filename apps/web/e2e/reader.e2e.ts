import type { ClaimDetail, ClaimQueueResponse, PublicationView } from '@skyledger/contracts';
import { type Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  desktop,
  expectAccessible,
  phone,
  screenshot,
  useBrowser,
  type Browser,
} from './support/browser';
import { demo, deskApi, signIn } from './support/desk';
import { linkTo, waitForMail } from './support/mailbox';
import { pickOption } from './support/screens';

// The demo's published explainers (seeds-demo/src/claims-desk/claims.ts and verdicts.ts).
const core = {
  summary: 'Earth’s core, not greenhouse gases, is warming the planet',
  text: 'Everybody forgets the planet has a molten core. That heat is coming up through the ground, and that is what is warming us, not the cars on the bypass.',
  claimant: 'Councillor Aldous Threlkeld',
  rating: 'Contradicted by evidence',
  bottomLine:
    'The heat coming out of the Earth’s interior is about thirty times smaller than the extra heat greenhouse gases now hold in, and it has not grown: it cannot explain the warming.',
  firstBody: 'Heat does flow out of the Earth’s interior: about 47 terawatts in all',
  correctedBody:
    'Heat does flow out of the Earth’s interior: two independent surveys put it at 44 terawatts',
  note: 'An earlier version gave the heat flow as the result of a single survey. Two surveys give 44 and 47 terawatts; the conclusion does not change.',
  sources: [
    'Earth’s surface heat flux',
    'Heat flow from the Earth’s interior: analysis of the global data set',
  ],
};
const sun = {
  summary: 'The sun has grown brighter, and that explains recent warming',
  retraction:
    'We attributed these words to the Wenlow Energy Forum. The forum has shown us they came from a member’s post it republished without approval, so we withdraw this check of the forum. The science it sets out stands.',
};
// Its claimant is a private individual the desk chief has not allowed to be named.
const co2 = {
  summary: 'CO2 is too small a share of the air to change the climate',
  privateName: 'Gareth Pennock',
  letterUrl: 'https://www.marrowby-gazette.test/letters/2026-11-20',
};
// Cleared and scheduled three days after the seed ran: under embargo for this whole run.
const oceans = {
  summary: 'The oceans are warming from undersea volcanoes, not the air',
  slug: 'the-oceans-are-warming-from-undersea-volcanoes-not-the-air',
};

const clarification =
  'We now say plainly that the 44 and 47 terawatt figures come from two separate global compilations.';
const subscriber = `reader-${Date.now()}@example.test`;

interface ClaimReview {
  '@type': string;
  url: string;
  claimReviewed: string;
  datePublished: string;
  dateModified?: string;
  author: { '@type': string; name: string };
  reviewRating: {
    alternateName: string;
    ratingValue?: number;
    bestRating?: number;
    worstRating?: number;
    ratingExplanation: string;
  };
  itemReviewed: {
    '@type': string;
    author: { '@type': string; name: string };
    datePublished?: string;
    firstAppearance?: { url: string; datePublished: string };
    appearance: Array<{ url: string; datePublished: string }>;
  };
  correction?: Array<{ text: string; datePublished: string }>;
}

interface AtomFeed {
  rootName: string;
  namespace: string | null;
  id: string | null;
  title: string | null;
  updated: string | null;
  author: string | null;
  entries: Array<{
    id: string | null;
    title: string | null;
    updated: string | null;
    published: string | null;
    link: string | null;
    summary: string | null;
  }>;
}

/** Opens a reader page and checks the status it was sent with. */
async function open(page: Page, url: string, status = 200): Promise<void> {
  const response = await page.goto(url);
  expect(response?.status(), url).toBe(status);
}

async function mainText(page: Page): Promise<string> {
  return (await page.locator('main').textContent()) ?? '';
}

/** The page's one ClaimReview block, parsed. */
async function claimReviewOf(page: Page): Promise<ClaimReview> {
  const scripts = page.locator('script[type="application/ld+json"]');
  expect(await scripts.count()).toBe(1);
  return JSON.parse((await scripts.textContent()) ?? '') as ClaimReview;
}

/**
 * Reader pages may be cached for a minute (Cache-Control: max-age=60): after a change, load
 * the page again as a reader pressing reload would, which asks the server whether it changed.
 */
async function openFresh(page: Page, url: string): Promise<void> {
  await open(page, url);
  const response = await page.reload();
  expect(response?.status(), url).toBe(200);
}

/** The header's dates: when the explainer was first published, and when last updated. */
async function headerDates(page: Page): Promise<{ published: string; updated?: string }> {
  const meta = page.locator('article > header .meta');
  expect(await meta.textContent()).toMatch(/^Published .+?(; last updated .+)? · /);
  const [published, updated] = await meta
    .locator('time')
    .evaluateAll((times) => times.map((time) => time.getAttribute('datetime') ?? ''));
  return { published: published!, ...(updated ? { updated } : {}) };
}

/** Every value the ClaimReview states, compared with what the page itself shows. */
async function expectClaimReviewMatchesPage(page: Page, review: ClaimReview): Promise<void> {
  expect(review['@type']).toBe('ClaimReview');
  expect(review.claimReviewed).toBe(
    (await page.locator('section.claim blockquote').textContent())?.trim(),
  );
  expect(review.reviewRating.alternateName).toBe(
    await page.locator('.verdict .rating strong').textContent(),
  );
  const { ratingValue, bestRating, worstRating } = review.reviewRating;
  expect(typeof ratingValue).toBe('number');
  expect(await page.locator('.verdict .rating').textContent()).toContain(
    `${ratingValue} of ${Math.max(bestRating!, worstRating!)} on our scale, where ${bestRating} means the evidence supports the claim and ${worstRating} means it contradicts it`,
  );
  expect(await page.locator('.verdict .bottom-line').textContent()).toBe(
    `The bottom line: ${review.reviewRating.ratingExplanation}`,
  );
  expect(await page.locator('section.claim figcaption').textContent()).toMatch(
    new RegExp(`^Said by ${review.itemReviewed.author.name}`),
  );
  const first = page.locator('section.claim li').filter({ hasText: 'the first known appearance' });
  expect(await first.count()).toBe(1);
  // The archived capture where there is one, else the address as the page prints it; neither
  // where they could identify a private individual.
  const capture = first.getByRole('link', { name: /Archived copy/ });
  const address = first.locator('.url');
  const url = (await capture.count())
    ? await capture.getAttribute('href')
    : (await address.count())
      ? await address.textContent()
      : null;
  expect(review.itemReviewed.firstAppearance).toEqual({
    '@type': 'CreativeWork',
    ...(url === null ? {} : { url }),
    datePublished: await first.locator('time').getAttribute('datetime'),
  });
  expect(review.itemReviewed.appearance.length).toBe(
    await page.locator('section.claim li').count(),
  );
  const dates = await headerDates(page);
  expect(review.datePublished).toBe(dates.published);
  expect(review.dateModified).toBe(dates.updated);
  expect(review.author).toMatchObject({ '@type': 'Organization', name: 'Marrowby Gazette' });
  expect(review.url).toBe(page.url());
}

/** The update notes shown at the top of the page, newest first, as ClaimReview words them. */
async function notesShown(page: Page): Promise<Array<{ text: string; datePublished: string }>> {
  return page.locator('section.notes li').evaluateAll((items) =>
    items.map((item) => {
      const kind = item.querySelector('strong')?.textContent ?? '';
      const time = item.querySelector('time');
      // "<kind>, <time>: <text> Version n as published"
      const after = (item.textContent ?? '').slice(
        (item.textContent ?? '').indexOf(time?.textContent ?? '') +
          (time?.textContent ?? '').length +
          2,
      );
      const text = after.slice(0, after.lastIndexOf(' Version ')).trim();
      return { text: `${kind}: ${text}`, datePublished: time?.getAttribute('datetime') ?? '' };
    }),
  );
}

/** The Atom feed as the browser's own XML parser reads it; throws if it is not well-formed. */
async function readFeed(page: Page, baseUrl: string): Promise<AtomFeed> {
  // Fetched from here, not by the page: reader pages allow no connections of their own
  // (their Content-Security-Policy), and this way no browser cache keeps an older feed.
  const response = await fetch(`${baseUrl}/feeds/explainers.atom`);
  expect(response.headers.get('content-type')).toBe('application/atom+xml; charset=utf-8');
  const source = await response.text();
  await open(page, `${baseUrl}/explainers`);
  return page.evaluate((feedXml) => {
    const xml = new DOMParser().parseFromString(feedXml, 'application/xml');
    const error = xml.getElementsByTagName('parsererror')[0];
    if (error) throw new Error(`the feed is not well-formed XML: ${error.textContent}`);
    const atom = 'http://www.w3.org/2005/Atom';
    const child = (parent: Element, name: string) =>
      [...parent.children].find((node) => node.namespaceURI === atom && node.localName === name);
    const text = (parent: Element, name: string) => child(parent, name)?.textContent ?? null;
    const root = xml.documentElement;
    return {
      rootName: root.localName,
      namespace: root.namespaceURI,
      id: text(root, 'id'),
      title: text(root, 'title'),
      updated: text(root, 'updated'),
      author: child(root, 'author') ? text(child(root, 'author')!, 'name') : null,
      entries: [...root.children]
        .filter((node) => node.namespaceURI === atom && node.localName === 'entry')
        .map((entry) => ({
          id: text(entry, 'id'),
          title: text(entry, 'title'),
          updated: text(entry, 'updated'),
          published: text(entry, 'published'),
          link: child(entry, 'link')?.getAttribute('href') ?? null,
          summary: text(entry, 'summary'),
        })),
    };
  }, source);
}

/** The required RFC 4287 elements of the feed and of each entry. */
function expectAtom(feed: AtomFeed): void {
  expect(feed.rootName).toBe('feed');
  expect(feed.namespace).toBe('http://www.w3.org/2005/Atom');
  expect(feed.id).toBeTruthy();
  expect(feed.title).toBe('Marrowby Gazette');
  expect(Date.parse(feed.updated ?? '')).not.toBeNaN();
  expect(feed.author).toBe('Marrowby Gazette');
  for (const entry of feed.entries) {
    expect(entry.id).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/explainers\/[a-z0-9-]+$/);
    expect(entry.title).toBeTruthy();
    expect(Date.parse(entry.updated ?? '')).not.toBeNaN();
    expect(entry.link).toBe(entry.id);
  }
}

/** Headings that skip a level or a page without exactly one h1, in words. */
async function headingProblems(page: Page): Promise<string[]> {
  const headings = await page
    .locator('h1, h2, h3, h4, h5, h6')
    .evaluateAll((nodes) =>
      nodes.map((node) => ({ level: Number(node.tagName[1]), text: node.textContent ?? '' })),
    );
  const problems = headings.flatMap((heading, index) => {
    const previous = headings[index - 1];
    return previous && heading.level > previous.level + 1
      ? [`h${heading.level} “${heading.text}” follows h${previous.level} “${previous.text}”`]
      : [];
  });
  if (headings[0]?.level !== 1) problems.push('the first heading is not an h1');
  if (headings.filter((heading) => heading.level === 1).length !== 1) {
    problems.push('the page has not exactly one h1');
  }
  return problems;
}

function slugOf(url: string): string {
  const slug = /\/explainers\/([a-z0-9-]+)$/.exec(url)?.[1];
  if (!slug) throw new Error(`not an explainer address: ${url}`);
  return slug;
}

/** The claim ids of the demo's claims, by summary, as the desk chief's queue lists them. */
async function claimIds(baseUrl: string): Promise<Map<string, string>> {
  const chief = await deskApi(baseUrl, demo.desk_chief.email);
  const queue = await chief<ClaimQueueResponse>('GET', '/claims?pageSize=100');
  return new Map(queue.items.map((item) => [item.summary, item.id]));
}

let coreSlug = '';
let sunSlug = '';
let co2Slug = '';

describe('reader pages, read with JavaScript turned off', () => {
  const openedBrowser = useBrowser({ javaScriptEnabled: false });
  let browser: Browser;
  let page: Page;
  beforeAll(async () => {
    browser = openedBrowser();
    page = await browser.newPage(desktop);
    // The browser really runs no script: this one would set the title.
    await page.setContent('<title>before</title><script>document.title = "ran"</script>');
    expect(await page.title()).toBe('before');
  });

  it('lists the published explainers, newest first, and finds them by search', async () => {
    await open(page, `${browser.baseUrl}/explainers`);
    const titles = page.locator('main ol.items > li h2 a');
    const listed = await titles.allTextContents();
    expect(listed).toEqual(expect.arrayContaining([core.summary, sun.summary, co2.summary]));
    expect(listed).not.toContain(oceans.summary);
    const hrefOf = async (summary: string) =>
      (await titles.filter({ hasText: summary }).getAttribute('href')) ?? '';
    coreSlug = slugOf(await hrefOf(core.summary));
    sunSlug = slugOf(await hrefOf(sun.summary));
    co2Slug = slugOf(await hrefOf(co2.summary));
    const item = page.locator('main ol.items > li').filter({ hasText: core.summary });
    expect(await item.locator('.rating strong').textContent()).toBe(core.rating);
    expect(await item.textContent()).toContain(core.bottomLine);
    const retracted = page.locator('main ol.items > li').filter({ hasText: sun.summary });
    expect(await retracted.locator('.tag-alert').textContent()).toBe('Retracted');
    expect(
      await page.locator('main ol.items > li').filter({ hasText: co2.summary }).textContent(),
    ).not.toContain(co2.privateName);

    // The search form works without script: a GET form.
    await page.getByLabel('Search the explainers').fill('molten core');
    await page.getByRole('button', { name: 'Search' }).click();
    await page.waitForURL(/\/explainers\?q=molten\+core/);
    expect(await page.locator('main ol.items > li h2 a').allTextContents()).toContain(core.summary);
  });

  it('shows the corrected explainer whole, with a ClaimReview that matches the page', async () => {
    await open(page, `${browser.baseUrl}/explainers/${coreSlug}`);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe(core.summary);
    const text = await mainText(page);
    expect(text).toContain(core.text);
    expect(text).toContain(`Said by ${core.claimant}`);
    expect(await page.locator('.verdict .rating strong').textContent()).toBe(core.rating);
    expect(text).toContain(`The bottom line: ${core.bottomLine}`);
    expect(text).toContain(core.correctedBody);
    expect(text).not.toContain(core.firstBody);
    // The working embedded in the body, as a table of inputs with their sources.
    expect(await page.locator('main .body figure table').count()).toBeGreaterThan(0);
    const sources = await page.locator('section.sources li').allTextContents();
    for (const title of core.sources) {
      expect(sources.some((source) => source.includes(title))).toBe(true);
    }
    const notes = page.locator('section.notes');
    expect(await notes.getByRole('heading').textContent()).toBe('This explainer has been updated');
    expect(await notes.textContent()).toContain(`Correction, `);
    expect(await notes.textContent()).toContain(core.note);
    // Where the claim was seen links only to our archived capture, never to the claim itself.
    const capture = page.getByRole('link', { name: /Archived copy/ }).first();
    expect(await capture.getAttribute('rel')).toBe('nofollow');
    expect(await capture.getAttribute('href')).toMatch(/\/captures\/[0-9a-f-]{36}$/);
    expect(await page.locator('main a[href*="webcasts.marrowby-council.test"]').count()).toBe(0);

    const review = await claimReviewOf(page);
    await expectClaimReviewMatchesPage(page, review);
    expect(review.reviewRating.alternateName).toBe(core.rating);
    expect(review.claimReviewed).toBe(core.text);
    expect(review.itemReviewed.author).toEqual({ '@type': 'Person', name: core.claimant });
    expect(review.dateModified).toBeDefined();
    expect(review.correction).toEqual(
      (await notesShown(page)).map((note) => ({ '@type': 'CorrectionComment', ...note })),
    );
    expect(review.correction?.[0]?.text).toBe(`Correction: ${core.note}`);
    expect(await page.locator('link[rel="canonical"]').getAttribute('href')).toBe(review.url);
    // The share card states the verdict, never the claim alone.
    expect(await page.locator('meta[property="og:title"]').getAttribute('content')).toBe(
      `${core.rating}: ${core.summary}`,
    );
  });

  it('keeps the first publication readable at its own address', async () => {
    await open(page, `${browser.baseUrl}/explainers/${coreSlug}/v/1`);
    const text = await mainText(page);
    expect(text).toContain('You are reading version 1 of this explainer');
    expect(text).toContain(core.firstBody);
    expect(text).not.toContain(core.correctedBody);
    expect(await page.locator('section.notes').count()).toBe(0);
    const review = await claimReviewOf(page);
    await expectClaimReviewMatchesPage(page, review);
    expect(review.url).toBe(`${browser.baseUrl}/explainers/${coreSlug}/v/1`);
    expect(review.dateModified).toBeUndefined();
    expect(review.correction).toBeUndefined();
    expect(await page.locator('link[rel="canonical"]').getAttribute('href')).toBe(
      `${browser.baseUrl}/explainers/${coreSlug}`,
    );
    await page.getByRole('link', { name: 'read the latest version' }).click();
    await page.waitForURL(`${browser.baseUrl}/explainers/${coreSlug}`);
  });

  it('keeps a retracted explainer up, saying so first', async () => {
    await open(page, `${browser.baseUrl}/explainers/${sunSlug}`);
    const retracted = page.locator('article > header').getByRole('note');
    expect(await retracted.textContent()).toContain(`Retracted.`);
    expect(await retracted.textContent()).toContain(sun.retraction);
    expect(await page.locator('.verdict .rating').textContent()).toContain(
      'Our rating, now withdrawn',
    );
    expect(await page.locator('section.sources li').count()).toBeGreaterThan(0);
    const review = await claimReviewOf(page);
    await expectClaimReviewMatchesPage(page, review);
    expect(review.correction).toEqual(
      (await notesShown(page)).map((note) => ({ '@type': 'CorrectionComment', ...note })),
    );
    expect(review.correction?.[0]?.text).toBe(`Retraction: ${sun.retraction}`);
    expect(review.itemReviewed.author).toEqual({
      '@type': 'Organization',
      name: 'Wenlow Energy Forum',
    });
    expect(await page.locator('meta[property="og:title"]').getAttribute('content')).toBe(
      `Retracted: ${sun.summary}`,
    );
  });

  it('does not name a private individual', async () => {
    await open(page, `${browser.baseUrl}/explainers/${co2Slug}`);
    expect(await page.content()).not.toContain(co2.privateName);
    expect(await page.locator('section.claim figcaption').textContent()).toBe(
      'Said by A private individual',
    );
    // Nor where his letter is, nor a copy of it: either would name him.
    expect(await page.locator('section.claim').textContent()).toContain(
      'We do not give its address or a copy: they could identify a private individual.',
    );
    expect(await page.content()).not.toContain(co2.letterUrl);
    expect(await page.getByRole('link', { name: /Archived copy/ }).count()).toBe(0);
    const review = await claimReviewOf(page);
    await expectClaimReviewMatchesPage(page, review);
    expect(review.itemReviewed.author.name).toBe('A private individual');
  });

  it('lists every update note on the corrections page, and explains the method', async () => {
    await open(page, `${browser.baseUrl}/corrections`);
    const items = page.locator('main ol.items > li');
    const core1 = items.filter({ hasText: core.summary });
    expect(await core1.textContent()).toContain(core.note);
    expect(await core1.getByRole('link', { name: core.summary }).getAttribute('href')).toBe(
      `${browser.baseUrl}/explainers/${coreSlug}`,
    );
    expect(await items.filter({ hasText: sun.summary }).textContent()).toContain(sun.retraction);

    await open(page, `${browser.baseUrl}/methodology`);
    const text = await mainText(page);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe(
      'How we check climate claims',
    );
    for (const label of ['Holds up', 'Stretched', 'Unfounded', core.rating, 'Not checkable']) {
      expect(text).toContain(label);
    }
    expect(await page.locator('main h2').allTextContents()).toEqual(
      expect.arrayContaining(['Which claims we check']),
    );
    expect(text).toMatch(/correct/i);
  });

  it('shows nothing of the embargoed explainer anywhere', async () => {
    const base = `${browser.baseUrl}/explainers/${oceans.slug}`;
    for (const url of [base, `${base}/v/1`, `${base}/card`]) {
      await open(page, url, 404);
      expect(await page.content()).not.toContain(oceans.summary);
    }
    await open(page, `${browser.baseUrl}/explainers?q=${encodeURIComponent('undersea volcanoes')}`);
    expect(await mainText(page)).not.toContain(oceans.summary);
    await open(page, `${browser.baseUrl}/explainers?topic=ocean-heat`);
    expect(await mainText(page)).not.toContain(oceans.summary);
    const oembed = await page.request.get(
      `${browser.baseUrl}/oembed?url=${encodeURIComponent(base)}`,
    );
    expect(oembed.status()).toBe(404);
    const feed = await (await page.request.get(`${browser.baseUrl}/feeds/explainers.atom`)).text();
    expect(feed).toContain(core.summary);
    expect(feed).not.toContain(oceans.summary);
    expect(feed).not.toContain(oceans.slug);
  });

  it('takes a subscription from the form, confirmed from the mail', async () => {
    await open(page, `${browser.baseUrl}/explainers/${coreSlug}`);
    await page.getByLabel('Your e-mail address').fill(subscriber);
    await page.getByRole('button', { name: 'Send me updates' }).click();
    expect(await page.getByRole('status').textContent()).toBe(
      `We have sent a link to ${subscriber}. Nothing more is sent unless you open it.`,
    );
    const mail = await waitForMail(subscriber, /^Confirm: updates to “Earth’s core/);
    await open(page, linkTo(mail, '/subscription/confirm'));
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe(
      'Subscription confirmed',
    );
  });
});

describe('reader pages: accessible, readable at 320 px, and kept corrected by the desk', () => {
  const openedBrowser = useBrowser();
  let browser: Browser;
  beforeAll(() => {
    browser = openedBrowser();
  });

  // Each reader page by name, its address (the slugs are read from the index above) and status.
  const readerPages: Array<[string, () => string, number]> = [
    ['index', () => '/explainers', 200],
    ['search', () => '/explainers?q=core', 200],
    ['corrected', () => `/explainers/${coreSlug}`, 200],
    ['first-version', () => `/explainers/${coreSlug}/v/1`, 200],
    ['retracted', () => `/explainers/${sunSlug}`, 200],
    ['private-claimant', () => `/explainers/${co2Slug}`, 200],
    ['corrections', () => '/corrections', 200],
    ['methodology', () => '/methodology', 200],
    ['not-found', () => `/explainers/${oceans.slug}`, 404],
  ];

  it.each(readerPages)(
    'the %s page passes axe, keeps its headings in order and fits 320 px',
    async (name, path, status) => {
      const page = await browser.newPage();
      for (const width of [320, 1280]) {
        await page.setViewportSize({ width, height: 800 });
        await open(page, `${browser.baseUrl}${path()}`, status);
        await expectAccessible(page);
        expect(await headingProblems(page), path()).toEqual([]);
        const overflow = await page.evaluate(
          () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
        );
        expect(overflow, `${path()} scrolls sideways at ${width} px`).toBeLessThanOrEqual(0);
        await screenshot(page, `reader-e2e-${name}-${width}`);
      }
      await page.close();
    },
  );

  it('serves a well-formed Atom feed with the required elements', async () => {
    const page = await browser.newPage();
    const feed = await readFeed(page, browser.baseUrl);
    expectAtom(feed);
    const entry = feed.entries.find((candidate) => candidate.title?.endsWith(core.summary));
    expect(entry).toMatchObject({
      id: `${browser.baseUrl}/explainers/${coreSlug}`,
      title: `${core.rating}: ${core.summary}`,
      summary: core.bottomLine,
    });
    await open(page, `${browser.baseUrl}/explainers/${coreSlug}`);
    // An entry is updated only by an update note: its `updated` is the note's date.
    expect(Date.parse(entry!.updated!)).toBe(Date.parse((await claimReviewOf(page)).dateModified!));
    expect(feed.entries.find((candidate) => candidate.title?.includes(sun.summary))?.title).toBe(
      `Retracted: ${sun.summary}`,
    );
    expect(feed.entries.some((candidate) => candidate.title?.includes(oceans.summary))).toBe(false);
    await page.close();
  });

  it('lets the copy desk cancel an embargo and set it again on another zone’s clock', async () => {
    const oceansId = (await claimIds(browser.baseUrl)).get(oceans.summary)!;
    const page = await browser.newPage();
    await signIn(page, browser.baseUrl, demo.copy_desk.email);
    await page.goto(`${browser.baseUrl}/claims/${oceansId}#publishing`);
    await page.getByRole('heading', { level: 3, name: 'Publications' }).waitFor();
    await page.getByText(/Scheduled to publish on .* \(Europe\/London\)\./).waitFor();
    expect(await page.getByRole('link', { name: /View as readers see it/ }).count()).toBe(0);
    await expectAccessible(page);
    await screenshot(page, 'publishing-scheduled-desktop');

    await page.getByRole('button', { name: 'Cancel the schedule' }).click();
    await page
      .getByRole('alertdialog', { name: 'Cancel the scheduled publication?' })
      .getByRole('button', { name: 'Cancel the schedule' })
      .click();
    await page
      .getByText('The schedule is cancelled: nothing will be published on its own.')
      .waitFor();
    await page
      .getByRole('list', { name: 'Publications, latest first' })
      .getByText('Schedule cancelled')
      .waitFor();

    // 09:00 on a Tokyo clock three days from now: Japan keeps UTC+9 all year, so 00:00 UTC.
    const day = new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10);
    await page.getByRole('button', { name: 'Schedule…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Schedule the explainer' });
    await dialog.getByLabel('Publish at (date and time)').fill(`${day}T09:00`);
    await pickOption(page, 'Publish at: time zone', 'Asia/Tokyo');
    await expectAccessible(page);
    await screenshot(page, 'publishing-schedule-dialog-desktop');
    await dialog.getByRole('button', { name: 'Schedule it' }).click();
    await page.getByText(/^Scheduled: it is published on .*, 09:00 .* \(Asia\/Tokyo\)\./).waitFor();

    const copy = await deskApi(browser.baseUrl, demo.copy_desk.email);
    const [latest] = await copy<PublicationView[]>('GET', `/claims/${oceansId}/publications`);
    expect(latest).toMatchObject({
      state: 'scheduled',
      scheduledFor: `${day}T00:00:00.000Z`,
      scheduledTimeZone: 'Asia/Tokyo',
      publishedAt: null,
    });
    // Still under embargo for readers.
    expect((await page.request.get(`${browser.baseUrl}/explainers/${oceans.slug}`)).status()).toBe(
      404,
    );
    await page.setViewportSize(phone);
    await screenshot(page, 'publishing-scheduled-phone');
    await page.close();
  });

  it('puts a correction through the desk, mails the subscriber, and lets them leave', async () => {
    const coreId = (await claimIds(browser.baseUrl)).get(core.summary)!;
    const editor = await deskApi(browser.baseUrl, demo.science_editor.email);
    const copy = await deskApi(browser.baseUrl, demo.copy_desk.email);
    const version = async () => (await editor<ClaimDetail>('GET', `/claims/${coreId}`)).version;
    const readerUrl = `${browser.baseUrl}/explainers/${coreSlug}`;
    const page = await browser.newPage();
    await open(page, readerUrl);
    const before = await claimReviewOf(page);

    // The science editor reopens it from the claim page.
    await signIn(page, browser.baseUrl, demo.science_editor.email);
    await page.goto(`${browser.baseUrl}/claims/${coreId}#publishing`);
    await page.getByText(/Published: readers can read the explainer/).waitFor();
    await page.getByRole('button', { name: 'Start a correction' }).click();
    const reopen = page.getByRole('alertdialog', { name: 'Start a correction?' });
    await reopen.getByText(/readers keep seeing the explainer as it was published/).waitFor();
    await reopen.getByRole('button', { name: 'Start the correction' }).click();
    await page.getByText(/The claim is back in research for a correction/).waitFor();
    await page.getByText(/A correction is under way/).waitFor();
    await screenshot(page, 'publishing-correction-under-way-desktop');
    await page.getByRole('button', { name: /sign out/i }).click();
    await page.getByRole('button', { name: 'Sign in' }).waitFor();

    // Until the corrected version is published, readers see the page as it was.
    await openFresh(page, readerUrl);
    expect(await claimReviewOf(page)).toEqual(before);

    // A new version, through sign-off (set up through the API).
    await editor('POST', `/claims/${coreId}/verdict/versions`, {});
    await editor('POST', `/claims/${coreId}/transitions`, {
      to: 'awaiting_signoff',
      version: await version(),
    });
    await copy('POST', `/claims/${coreId}/transitions`, {
      to: 'cleared',
      version: await version(),
    });

    // The copy desk publishes it with its note from the claim page.
    await signIn(page, browser.baseUrl, demo.copy_desk.email);
    await page.goto(`${browser.baseUrl}/claims/${coreId}#publishing`);
    await page.getByText(/The corrected version is cleared/).waitFor();
    await page.getByRole('button', { name: 'Publish now' }).click();
    const dialog = page.getByRole('dialog', { name: 'Publish the corrected explainer now?' });
    await dialog.getByRole('button', { name: 'Publish now' }).click();
    await dialog.getByText('Choose what kind of change this is').waitFor();
    await dialog.getByText('Say what changed: readers see this note on the page').waitFor();
    await pickOption(page, 'Kind of change', 'Clarification');
    await dialog.getByLabel('Update note for readers').fill(clarification);
    await expectAccessible(page);
    await screenshot(page, 'publishing-note-dialog-desktop');
    await dialog.getByRole('button', { name: 'Publish now' }).click();
    await page.getByText('Published: readers can read it now.').waitFor();
    const publications = page.getByRole('list', { name: 'Publications, latest first' });
    await publications.getByText(`Clarification: ${clarification}`).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'publishing-published-desktop');

    const [readerTab] = await Promise.all([
      page.context().waitForEvent('page'),
      page.getByRole('link', { name: /View as readers see it/ }).click(),
    ]);
    await readerTab!.waitForLoadState();
    expect(readerTab!.url()).toBe(readerUrl);
    // This browser read the page moments ago, and may keep it for a minute: reload it.
    await readerTab!.reload();
    const notes = await notesShown(readerTab!);
    expect(notes.map((note) => note.text)).toEqual([
      `Clarification: ${clarification}`,
      `Correction: ${core.note}`,
    ]);
    const after = await claimReviewOf(readerTab!);
    await expectClaimReviewMatchesPage(readerTab!, after);
    expect(after.dateModified).toBe(notes[0]!.datePublished);
    expect(Date.parse(after.dateModified!)).toBeGreaterThan(Date.parse(before.dateModified!));
    expect(after.datePublished).toBe(before.datePublished);
    expect(after.correction).toHaveLength(2);
    await readerTab!.close();

    const feed = await readFeed(page, browser.baseUrl);
    const entry = feed.entries.find((candidate) => candidate.title?.endsWith(core.summary));
    expect(Date.parse(entry!.updated!)).toBe(Date.parse(after.dateModified!));
    await openFresh(page, `${browser.baseUrl}/corrections`);
    const newest = page.locator('main ol.items > li').first();
    expect(await newest.textContent()).toContain(clarification);
    expect(await newest.getByRole('link', { name: core.summary }).count()).toBe(1);

    // The subscriber hears of it, and leaves with one click from the mail.
    const update = await waitForMail(subscriber, /^Clarification: Earth’s core/);
    expect(update.text).toContain(clarification);
    await open(page, linkTo(update, '/subscription/unsubscribe'));
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe('Unsubscribed');
    expect(await mainText(page)).toContain('your address has been deleted');
    await page.close();
  });
});
