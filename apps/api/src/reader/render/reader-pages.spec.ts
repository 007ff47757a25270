import { updateNoteKindLabels, updateNoteKinds } from '@skyledger/contracts';
import { likelihoodTerms } from '@skyledger/explainer';
import { createHash } from 'node:crypto';
import { gzipSync } from 'node:zlib';
import {
  claimReview,
  correctionNote,
  corrections,
  explainer,
  ratings,
  retractionNote,
  share,
  site,
  summaries,
} from './explainer.fixture';
import {
  attr,
  byClass,
  byTag,
  headingLevels,
  headingsInOrder,
  metaContent,
  only,
  parseHtml,
  runnableScripts,
  scriptAttributes,
  textOf,
  type Element,
  type ParsedPage,
} from './html.fixture';
import {
  readerStylesheet,
  renderCorrectionsPage,
  renderEmbedCard,
  renderExplainerPage,
  renderIndexPage,
  renderMessagePage,
  renderMethodologyPage,
  type IndexPageInput,
} from './index';

const topics = ['geothermal heat', 'solar', 'temperature records'];
const indexInput: IndexPageInput = {
  site,
  items: summaries,
  query: {},
  total: 23,
  page: 1,
  pageSize: 3,
  topics,
  ratings,
};

const hrefs = (root: ParsedPage['document'] | Element) =>
  byTag(root, 'a').map((link) => attr(link, 'href'));

const pages: Record<string, string> = {
  index: renderIndexPage(indexInput),
  'empty search': renderIndexPage({ ...indexInput, items: [], total: 0, query: { q: 'volcano' } }),
  corrections: renderCorrectionsPage({ site, items: corrections }),
  methodology: renderMethodologyPage({ site, ratings }),
  'not found': renderMessagePage({
    site,
    title: 'Page not found',
    message: 'We have no explainer at this address.',
    status: 404,
  }),
  'subscription confirmed': renderMessagePage({
    site,
    title: 'You are subscribed',
    message: 'We will e-mail you when this explainer changes.',
    status: 200,
  }),
};

describe.each(Object.entries(pages))('the %s page', (_name, html) => {
  const page = parseHtml(html);

  it('is well-formed HTML with the reader frame: skip link, landmarks, nav, stylesheet', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(page.errors).toEqual([]);
    const body = only(byTag(page.document, 'body'));
    expect(attr(byTag(body, 'a')[0]!, 'href')).toBe('#main');
    expect(attr(only(byTag(body, 'main')), 'id')).toBe('main');
    expect(byTag(body, 'header').length).toBeGreaterThan(0);
    expect(byTag(body, 'footer')).toHaveLength(1);
    expect(byTag(body, 'nav').length).toBeGreaterThan(0);
    expect(
      byTag(page.document, 'link', { rel: 'stylesheet' }).map((link) => attr(link, 'href')),
    ).toEqual([readerStylesheet.path]);
  });

  it('has one h1, headings in order, and no script', () => {
    expect(headingsInOrder(headingLevels(page.document))).toBe(true);
    expect(byTag(page.document, 'script')).toEqual([]);
    expect(scriptAttributes(page)).toEqual([]);
  });
});

describe('renderIndexPage', () => {
  const page = parseHtml(pages.index!);
  const items = byTag(only(byClass(page.document, 'items')), 'li');

  it('lists the explainers in the order given, each with its rating in words and number', () => {
    expect(items.map((item) => textOf(byTag(item, 'h2')[0]!))).toEqual(
      summaries.map((summary) => summary.summary),
    );
    expect(items.map((item) => attr(byTag(item, 'a')[0]!, 'href'))).toEqual(
      summaries.map((summary) => summary.url),
    );
    expect(items.map((item) => textOf(only(byClass(item, 'rating'))))).toEqual([
      'Contradicted by evidence · 1 of 5 Retracted Updated',
      'Stretched · 3 of 5',
      'Not checkable · not a rating',
    ]);
    expect(textOf(items[0]!)).toContain(summaries[0]!.bottomLine);
    expect(textOf(items[0]!)).toContain(
      'Claim by Councillor Ambrose Fennick · Published 2 March 2026 · updated 1 April 2026',
    );
    expect(textOf(items[2]!)).toContain('Claim by A private individual');
  });

  it('searches and filters with a GET form that works without script', () => {
    const form = only(byTag(page.document, 'form'));
    expect([attr(form, 'method'), attr(form, 'action'), attr(form, 'role')]).toEqual([
      'get',
      '/explainers',
      'search',
    ]);
    const fields = [...byTag(form, 'input'), ...byTag(form, 'select')].map((field) =>
      attr(field, 'name'),
    );
    expect(fields.sort()).toEqual(['q', 'rating', 'topic']);
    for (const field of [...byTag(form, 'input'), ...byTag(form, 'select')]) {
      expect(byTag(form, 'label', { for: attr(field, 'id')! })).toHaveLength(1);
    }
    const topicOptions = byTag(only(byTag(form, 'select', { name: 'topic' })), 'option');
    expect(topicOptions.map((option) => attr(option, 'value'))).toEqual(['', ...topics]);
    const ratingOptions = byTag(only(byTag(form, 'select', { name: 'rating' })), 'option');
    expect(ratingOptions.map((option) => [attr(option, 'value'), textOf(option)])).toContainEqual([
      'contradicted',
      '1: Contradicted by evidence',
    ]);
  });

  it('keeps the search in the form and in the links to other pages', () => {
    const filtered = parseHtml(
      renderIndexPage({
        ...indexInput,
        query: { q: 'core heat', topic: 'solar', rating: 'stretched' },
        page: 2,
      }),
    );
    expect(attr(only(byTag(filtered.document, 'input', { name: 'q' })), 'value')).toBe('core heat');
    const selected = (name: string) =>
      byTag(only(byTag(filtered.document, 'select', { name })), 'option')
        .filter((option) => attr(option, 'selected') !== undefined)
        .map((option) => attr(option, 'value'));
    expect(selected('topic')).toEqual(['solar']);
    expect(selected('rating')).toEqual(['stretched']);
    const paging = only(byTag(filtered.document, 'nav', { 'aria-label': 'Pages of explainers' }));
    expect(hrefs(paging)).toEqual([
      '/explainers?q=core+heat&topic=solar&rating=stretched',
      '/explainers?q=core+heat&topic=solar&rating=stretched&page=3',
    ]);
    expect(textOf(paging)).toContain('Page 2 of 8');
    expect(textOf(filtered.document)).toContain(
      '4–6 of 23 explainers matching “core heat”, on solar, rated Stretched, newest first.',
    );
  });

  it('shows no paging for one page, and says so when nothing matches', () => {
    const one = parseHtml(renderIndexPage({ ...indexInput, total: 3 }));
    expect(byTag(one.document, 'nav', { 'aria-label': 'Pages of explainers' })).toEqual([]);
    const empty = parseHtml(pages['empty search']!);
    expect(textOf(empty.document)).toContain('No explainers matching “volcano”.');
    expect(hrefs(empty.document)).toContain('/explainers');
  });
});

describe('renderCorrectionsPage', () => {
  const page = parseHtml(pages.corrections!);

  it('lists every update note newest first, dated, linked to the explainer and to its version', () => {
    const items = byTag(only(byClass(page.document, 'items')), 'li');
    expect(items.map((item) => textOf(byTag(item, 'p')[0]!))).toEqual([
      `Retraction, 1 April 2026 at 17:30 BST · ${explainer.claim.summary}`,
      `Correction, 6 March 2026 at 10:15 GMT · ${explainer.claim.summary}`,
    ]);
    expect(items.map((item) => attr(only(byTag(item, 'time')), 'datetime'))).toEqual([
      retractionNote.at,
      correctionNote.at,
    ]);
    expect(hrefs(items[1]!)).toEqual([explainer.url, correctionNote.url]);
    expect(textOf(items[1]!)).toContain(correctionNote.text);
  });

  it('says so when nothing has been changed yet', () => {
    const empty = parseHtml(renderCorrectionsPage({ site, items: [] }));
    expect(textOf(only(byTag(empty.document, 'main')))).toContain(
      'We have not changed any published explainer yet.',
    );
  });
});

describe('renderMethodologyPage', () => {
  const page = parseHtml(pages.methodology!);
  const main = only(byTag(page.document, 'main'));
  const text = textOf(main);

  it('gives every rating with its number and meaning, the non-rating outcome without one', () => {
    const terms = byTag(byTag(main, 'dl')[0]!, 'dt').map(textOf);
    expect(terms).toEqual([
      '5 of 5: Holds up',
      '4 of 5: Holds up with caveats',
      '3 of 5: Stretched',
      '2 of 5: Unfounded',
      '1 of 5: Contradicted by evidence',
      'Not checkable (no number: not a rating)',
    ]);
    for (const rating of ratings) expect(text).toContain(rating.description);
  });

  it('gives the IPCC likelihood words with their ranges', () => {
    const table = only(byTag(main, 'table'));
    const rows = byTag(only(byTag(table, 'tbody')), 'tr').map(textOf);
    expect(rows).toEqual(
      likelihoodTerms.map((entry) => `${entry.term} ${entry.low}–${entry.high} %`),
    );
    // "likely" is 66–100 % (IPCC AR6 WGI SPM, footnote 4).
    expect(rows).toContain('likely 66–100 %');
  });

  it('states the corrections policy with every kind of note, and that nothing is deleted', () => {
    const kinds = byTag(byTag(main, 'dl')[1]!, 'dt').map(textOf);
    expect(kinds).toEqual(updateNoteKinds.map((kind) => updateNoteKindLabels[kind]));
    expect(text).toContain('Nothing we publish is deleted');
  });

  it('tells readers where to send a claim, and that workings are not climate-model output', () => {
    expect(hrefs(main)).toContain('mailto:claims@gazette.marrowby.example');
    expect(text).toContain('They are not the output of climate models.');
    expect(headingLevels(main)).toEqual([1, 2, 2, 2, 2, 2, 2, 2]);
  });
});

describe('renderMessagePage', () => {
  it('states the message under its title and keeps the page out of search engines', () => {
    const page = parseHtml(pages['not found']!);
    expect(textOf(only(byTag(page.document, 'h1')))).toBe('Page not found');
    expect(textOf(only(byTag(page.document, 'main')))).toContain(
      'We have no explainer at this address.',
    );
    expect(metaContent(page).robots).toBe('noindex');
    expect(hrefs(only(byTag(page.document, 'main')))).toContain('/explainers');
  });
});

describe('renderEmbedCard', () => {
  const html = renderEmbedCard({ site, item: summaries[1]! });
  const page = parseHtml(html);

  it('is a small document of its own: rating in words and number, the claim, a link', () => {
    expect(page.errors).toEqual([]);
    const main = only(byTag(page.document, 'main'));
    expect(textOf(only(byClass(main, 'rating')))).toBe('Stretched (3 of 5)');
    expect(textOf(only(byTag(main, 'h1')))).toBe(summaries[1]!.summary);
    const link = only(byTag(main, 'a'));
    expect([attr(link, 'href'), attr(link, 'target'), attr(link, 'rel')]).toEqual([
      summaries[1]!.url,
      '_blank',
      'noopener',
    ]);
    expect(byTag(page.document, 'link')).toEqual([]);
    expect(runnableScripts(page)).toEqual([]);
    expect(byTag(page.document, 'script')).toEqual([]);
    expect(Buffer.byteLength(html)).toBeLessThan(2048);
  });

  it('marks a retracted explainer', () => {
    const retracted = parseHtml(renderEmbedCard({ site, item: summaries[0]! }));
    expect(textOf(only(byClass(retracted.document, 'rating')))).toBe(
      'Contradicted by evidence (1 of 5) · Retracted',
    );
  });
});

describe('readerStylesheet', () => {
  it('is a small sheet served under a path that changes with its content', () => {
    const hash = createHash('sha256').update(readerStylesheet.css).digest('hex').slice(0, 10);
    expect(readerStylesheet.path).toBe(`/reader/reader.${hash}.css`);
    expect(gzipSync(readerStylesheet.css).length).toBeLessThan(4096);
    expect(readerStylesheet.css).toContain(':focus-visible');
    expect(readerStylesheet.css).not.toContain('@font-face');
  });

  it('with the explainer page, weighs well under 60 KB gzip', () => {
    const html = renderExplainerPage({ site, explainer, jsonLd: claimReview, share });
    const total = gzipSync(html).length + gzipSync(readerStylesheet.css).length;
    expect(total).toBeLessThan(30 * 1024);
  });
});
