import { formatNumber } from '@skyledger/calc';
import { type ReaderExplainer } from '@skyledger/contracts';
import {
  claimReview,
  correctionNote,
  explainer,
  retractedExplainer,
  retractionNote,
  share,
  site,
  sourceIds,
  workingIds,
  workings,
} from './explainer.fixture';
import { quantityText } from './format';
import {
  attr,
  byClass,
  byId,
  byTag,
  headingLevels,
  headingsInOrder,
  metaContent,
  only,
  orderOf,
  parseHtml,
  runnableScripts,
  scriptAttributes,
  textOf,
  type ParsedPage,
} from './html.fixture';
import { readerStylesheet, renderExplainerPage, type ExplainerPageInput } from './index';

function render(overrides: Partial<ExplainerPageInput> = {}) {
  const html = renderExplainerPage({ site, explainer, jsonLd: claimReview, share, ...overrides });
  return { html, page: parseHtml(html) };
}

const workingSection = (page: ParsedPage, id: string) => byId(page.document, `working-${id}`);

describe('renderExplainerPage', () => {
  const { html, page } = render();
  const body = only(byTag(page.document, 'body'));

  it('is one well-formed HTML document in English', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(page.errors).toEqual([]);
    expect(attr(only(byTag(page.document, 'html')), 'lang')).toBe('en');
    const head = only(byTag(page.document, 'head'));
    expect(textOf(only(byTag(head, 'title')))).toBe(`${share.title} · ${site.name}`);
  });

  it('leads with the rating in words and its number, then the bottom line, before the claim', () => {
    const h1 = only(byTag(page.document, 'h1'));
    expect(textOf(h1)).toBe(explainer.claim.summary);
    const verdict = only(byClass(page.document, 'verdict'));
    const verdictText = textOf(verdict);
    expect(verdictText).toContain('Contradicted by evidence');
    expect(verdictText).toContain(
      '1 of 5 on our scale, where 5 means the evidence supports the claim and 1 means it contradicts it',
    );
    expect(verdictText).toContain(explainer.bottomLine);
    const quote = only(byTag(page.document, 'blockquote'));
    expect(orderOf(page, h1)).toBeLessThan(orderOf(page, verdict));
    expect(orderOf(page, verdict)).toBeLessThan(orderOf(page, quote));
  });

  it('quotes the claim with who said it, where and when, in each place’s own time zone', () => {
    expect(textOf(only(byTag(page.document, 'blockquote')))).toBe(explainer.claim.text);
    const claim = only(byClass(page.document, 'claim'));
    expect(textOf(only(byTag(claim, 'figcaption')))).toBe(
      'Said by Councillor Ambrose Fennick, Marrowby Borough Council',
    );
    const times = byTag(claim, 'time');
    expect(times.map((time) => [attr(time, 'datetime'), textOf(time)])).toEqual([
      ['2026-02-11T19:40:00.000Z', '11 February 2026 at 19:40 GMT (Europe/London)'],
      // New York is five hours behind UTC in February (EST).
      ['2026-02-14T08:05:00.000Z', '14 February 2026 at 03:05 GMT-5 (America/New_York)'],
    ]);
    expect(textOf(claim)).toContain('Marrowby Borough Council, full council meeting (video)');
    expect(textOf(claim)).toContain('(the first known appearance)');
  });

  it('links an appearance only through its archived copy, with rel="nofollow"', () => {
    const [first, second] = explainer.appearances;
    const claim = only(byClass(page.document, 'claim'));
    const capture = only(byTag(claim, 'a', { href: first!.captureUrl! }));
    expect(attr(capture, 'rel')).toBe('nofollow');
    expect(textOf(capture)).toContain('Archived copy');
    // The original addresses are shown as text, never linked.
    expect(textOf(claim)).toContain(first!.url);
    expect(textOf(claim)).toContain(second!.url);
    expect(byTag(page.document, 'a').filter((link) => attr(link, 'href') === first!.url)).toEqual(
      [],
    );
    expect(textOf(claim)).toContain('No archived copy.');
  });

  it('shows the body with each working in the place of its placeholder', () => {
    expect(textOf(body)).toContain('Deep mines and boreholes are warm');
    expect(html).not.toContain('working-embed');
    const headings = byTag(page.document, 'h2');
    const evidence = headings.find((heading) => textOf(heading) === 'What the evidence shows')!;
    const misleads = headings.find((heading) => textOf(heading) === 'Why it misleads')!;
    const heat = workingSection(page, workingIds.heat);
    const energy = workingSection(page, workingIds.energy);
    const trend = workingSection(page, workingIds.trend);
    expect(orderOf(page, evidence)).toBeLessThan(orderOf(page, heat));
    expect(orderOf(page, heat)).toBeLessThan(orderOf(page, misleads));
    expect(orderOf(page, misleads)).toBeLessThan(orderOf(page, energy));
    expect(orderOf(page, energy)).toBeLessThan(orderOf(page, trend));
    expect(textOf(body)).not.toContain('The workings behind this explainer');
  });

  it.each(workings.map((working) => [working.calculatorId, working] as const))(
    'renders the %s working: inputs with sources, steps, outputs, cautions and a chart',
    (_id, working) => {
      const section = workingSection(page, working.id);
      expect(textOf(only(byTag(section, 'h3')))).toBe(`Working: ${working.title}`);
      const [inputs] = byTag(section, 'table');
      for (const input of working.inputs) {
        const row = byTag(inputs!, 'tr').find((tr) => textOf(tr).startsWith(input.label))!;
        expect(textOf(row)).toBe(
          `${input.label} ${input.value} ${input.source ?? 'Set by the desk for this check'}`,
        );
      }
      const steps = byTag(only(byClass(section, 'steps')), 'li');
      expect(steps.map(textOf)).toEqual(
        working.steps.map((step) => `${step.text}: ${step.formula} = ${step.result}`),
      );
      for (const output of working.outputs.filter((candidate) => candidate.kind === 'number')) {
        const shown = output.band
          ? `${quantityText(output.band.p50, output.unit)} (median)`
          : quantityText(output.value as number, output.unit);
        expect(textOf(section)).toContain(`${output.label} ${shown}`);
      }
      const cautions = only(byClass(section, 'caution'));
      expect(attr(cautions, 'role')).toBe('note');
      expect(byTag(cautions, 'li').map(textOf)).toEqual(working.cautions);
      const svgs = byTag(section, 'svg');
      expect(svgs.length).toBeGreaterThan(0);
      for (const svg of svgs) {
        expect(attr(svg, 'role')).toBe('img');
        const title = only(byTag(svg, 'title'));
        expect(attr(svg, 'aria-labelledby')).toBe(attr(title, 'id'));
        expect(textOf(title).length).toBeGreaterThan(40);
        // The chart's numbers sit beside it, as a table in the same figure.
        const figure = byTag(section, 'figure').find(
          (candidate) => byTag(candidate, 'svg')[0] === svg,
        )!;
        expect(byTag(figure, 'table')).toHaveLength(1);
      }
    },
  );

  it('gives a banded output its median and 5th to 95th percentile', () => {
    const energy = workings.find((working) => working.id === workingIds.energy)!;
    const absorbed = energy.outputs.find((output) => output.name === 'absorbedFlux')!;
    // S(1 − α)/4 with S = 1361 W/m² (Kopp & Lean 2011) and α = 0.3: 238.2 W/m² at the middle of the range.
    expect(absorbed.band!.p50).toBeCloseTo(238.2, 0);
    const section = workingSection(page, workingIds.energy);
    const row = byTag(section, 'tr').find((tr) => textOf(tr).startsWith('Absorbed sunlight'))!;
    expect(textOf(row)).toBe(
      `Absorbed sunlight ${quantityText(absorbed.band!.p50, 'W/m^2')} (median) ` +
        `${quantityText(absorbed.band!.p5, 'W/m^2')} to ${quantityText(absorbed.band!.p95, 'W/m^2')}`,
    );
    expect(textOf(section)).toContain('5th to 95th percentile');
  });

  it('draws the trend’s start-year table as a line, with every row in its data table', () => {
    const trend = workings.find((working) => working.id === workingIds.trend)!;
    const table = trend.outputs.find((output) => output.name === 'startYearSensitivity')!;
    const rows = table.value as Array<{ start: number; slope: number }>;
    const section = workingSection(page, workingIds.trend);
    const figure = byTag(section, 'figure').find((candidate) =>
      textOf(candidate).startsWith(table.label),
    )!;
    expect(byTag(figure, 'polyline')).toHaveLength(1);
    const bodyRows = byTag(only(byTag(figure, 'tbody')), 'tr');
    expect(bodyRows).toHaveLength(rows.length);
    expect(textOf(bodyRows[0]!)).toContain(`${rows[0]!.start} ${formatNumber(rows[0]!.slope)}`);
    // Shown once, as the chart's table, not again under the results.
    expect(byTag(section, 'caption').filter((caption) => textOf(caption) === table.label)).toEqual(
      [],
    );
  });

  it('numbers the sources with ids that the citations jump to', () => {
    const items = byTag(only(byClass(page.document, 'sources')), 'li');
    expect(items.map((item) => [attr(item, 'id'), attr(item, 'value')])).toEqual(
      explainer.sources.map((source) => [`source-${source.id}`, String(source.number)]),
    );
    const citations = byClass(page.document, 'citation');
    expect(citations.length).toBeGreaterThan(0);
    for (const citation of citations) {
      expect(byId(page.document, attr(citation, 'href')!.slice(1))).toBeDefined();
    }
    const first = byId(page.document, `source-${sourceIds.heatFlux}`);
    expect(textOf(first)).toBe(
      'Davies, J. H., Davies, D. R. (2010). Earth’s surface heat flux. Solid Earth (European Geosciences Union). ' +
        'doi:10.5194/se-1-5-2010. Peer-reviewed paper. Reliability: Strong — Peer-reviewed global compilation of heat-flow measurements.',
    );
    expect(attr(only(byTag(first, 'a')), 'href')).toBe('https://doi.org/10.5194/se-1-5-2010');
    const station = byId(page.document, `source-${sourceIds.station}`);
    expect(attr(only(byTag(station, 'a')), 'href')).toBe(explainer.sources[2]!.url);
  });

  it('shows the update notes at the top, dated, with a link to their publication', () => {
    const notes = only(byClass(page.document, 'notes'));
    expect(orderOf(page, notes)).toBeLessThan(orderOf(page, only(byClass(page.document, 'claim'))));
    const item = only(byTag(notes, 'li'));
    expect(textOf(item)).toBe(
      `Correction, 6 March 2026 at 10:15 GMT: ${correctionNote.text} Version 2 as published`,
    );
    expect(attr(only(byTag(item, 'time')), 'datetime')).toBe(correctionNote.at);
    expect(attr(only(byTag(item, 'a')), 'href')).toBe(correctionNote.url);
    const meta = only(
      byTag(page.document, 'header').filter((header) => byTag(header, 'h1').length),
    );
    expect(textOf(meta)).toContain(
      'Published 2 March 2026 at 09:00 GMT; last updated 6 March 2026 at 10:15 GMT',
    );
  });

  it('lists every version and marks the one being read', () => {
    const versions = byTag(page.document, 'a').filter((link) => /^Version \d$/.test(textOf(link)));
    expect(versions.map((link) => [attr(link, 'href'), attr(link, 'aria-current')])).toEqual([
      [explainer.publications[0]!.url, undefined],
      [explainer.publications[1]!.url, 'page'],
    ]);
  });

  it('carries canonical, oEmbed and feed links and share cards that state the verdict', () => {
    const links = byTag(page.document, 'link');
    const href = (rel: string, type?: string) =>
      links
        .filter(
          (link) =>
            attr(link, 'rel') === rel && (type === undefined || attr(link, 'type') === type),
        )
        .map((link) => attr(link, 'href'));
    expect(href('canonical')).toEqual([explainer.url]);
    expect(href('alternate', 'application/json+oembed')).toEqual([
      `${site.origin}/oembed?url=${encodeURIComponent(explainer.url)}&format=json`,
    ]);
    expect(href('alternate', 'application/atom+xml')).toEqual(['/feeds/explainers.atom']);
    expect(href('stylesheet')).toEqual([readerStylesheet.path]);
    expect(metaContent(page)).toMatchObject({
      description: share.description,
      'og:type': 'article',
      'og:site_name': site.name,
      'og:title': share.title,
      'og:description': share.description,
      'og:url': share.url,
      'twitter:card': 'summary',
      'twitter:title': share.title,
      'twitter:description': share.description,
      'article:published_time': explainer.firstPublishedAt,
      'article:modified_time': explainer.modifiedAt,
    });
    expect(metaContent(page)['og:image']).toBeUndefined();
    const withImage = render({ share: { ...share, imageUrl: `${site.origin}/cards/x.png` } });
    expect(metaContent(withImage.page)['og:image']).toBe(`${site.origin}/cards/x.png`);
  });

  it('writes the JSON-LD in one inert script that parses back to the object given', () => {
    const script = only(byTag(page.document, 'script'));
    expect(attr(script, 'type')).toBe('application/ld+json');
    expect(JSON.parse(textOf(script))).toEqual(claimReview);
    expect(html).not.toContain('</script><script>');
    expect(html).toContain('\\u003c/script>\\u003cscript>alert(1)\\u003c/script>');
  });

  it('runs no script at all', () => {
    expect(runnableScripts(page)).toEqual([]);
    expect(scriptAttributes(page)).toEqual([]);
  });

  it('has one h1 and headings that never skip a level', () => {
    expect(headingsInOrder(headingLevels(page.document))).toBe(true);
    expect(headingLevels(page.document)).toContain(4);
  });

  it('has landmarks and a skip link to the main content', () => {
    const skip = byTag(page.document, 'a')[0]!;
    expect(attr(skip, 'href')).toBe('#main');
    expect(attr(only(byTag(page.document, 'main')), 'id')).toBe('main');
    expect(byTag(body, 'header').length).toBeGreaterThan(0);
    expect(byTag(body, 'footer')).toHaveLength(1);
    expect(attr(byTag(body, 'nav')[0]!, 'aria-label')).toBe('Reader pages');
  });

  it('posts the subscription form to the explainer, with a labelled e-mail field', () => {
    const form = only(byTag(page.document, 'form'));
    expect([attr(form, 'method'), attr(form, 'action')]).toEqual([
      'post',
      `${explainer.url}/subscribe`,
    ]);
    const input = only(byTag(form, 'input'));
    expect([attr(input, 'type'), attr(input, 'name')]).toEqual(['email', 'email']);
    expect(attr(only(byTag(form, 'label')), 'for')).toBe(attr(input, 'id'));
    expect(attr(input, 'aria-invalid')).toBeUndefined();
  });

  it('says how a subscription went, marking the field when the address was refused', () => {
    const invalid = render({
      subscription: { status: 'invalid', message: 'Enter an e-mail address.' },
    });
    const input = only(byTag(invalid.page.document, 'input'));
    expect(attr(input, 'aria-invalid')).toBe('true');
    const result = byId(invalid.page.document, attr(input, 'aria-describedby')!);
    expect(textOf(result)).toBe('Enter an e-mail address.');
    const sent = render({ subscription: { status: 'sent', message: 'Check your inbox.' } });
    expect(textOf(byId(sent.page.document, 'subscribe-result'))).toBe('Check your inbox.');
    expect(attr(only(byTag(sent.page.document, 'input')), 'aria-invalid')).toBeUndefined();
  });
});

describe('renderExplainerPage after a retraction', () => {
  // Notes given oldest first: the page still shows the newest first.
  const { page } = render({
    explainer: {
      ...retractedExplainer,
      updateNotes: [...retractedExplainer.updateNotes].reverse(),
    },
  });

  it('keeps the page and says prominently that it was retracted, when and why', () => {
    const banner = only(byClass(page.document, 'retracted'));
    expect(textOf(banner)).toBe(
      `Retracted. On 1 April 2026 at 17:30 BST we withdrew this explainer: ${retractionNote.text} The page stays up so that the record is complete.`,
    );
    const verdict = only(byClass(page.document, 'verdict'));
    expect(orderOf(page, banner)).toBeLessThan(orderOf(page, verdict));
    expect(textOf(verdict)).toContain('Our rating, now withdrawn');
    expect(textOf(page.document)).toContain('Deep mines and boreholes are warm');
  });

  it('lists the notes newest first', () => {
    const items = byTag(only(byClass(page.document, 'notes')), 'li');
    expect(items.map((item) => textOf(item).split(',')[0])).toEqual(['Retraction', 'Correction']);
  });
});

describe('renderExplainerPage for an earlier version', () => {
  const earlier: ReaderExplainer = {
    ...explainer,
    isLatest: false,
    sequence: 1,
    versionUrl: explainer.publications[0]!.url,
    publishedAt: explainer.firstPublishedAt,
    updateNotes: [],
    modifiedAt: null,
  };
  const { page } = render({ explainer: earlier });

  it('says a newer version exists and links to it', () => {
    const notice = only(byClass(page.document, 'notice'));
    expect(textOf(notice)).toContain('You are reading version 1 of this explainer');
    expect(attr(only(byTag(notice, 'a')), 'href')).toBe(explainer.url);
    expect(byClass(page.document, 'notes')).toEqual([]);
    const current = byTag(page.document, 'a', { 'aria-current': 'page' }).filter((link) =>
      textOf(link).startsWith('Version'),
    );
    expect(current.map((link) => attr(link, 'href'))).toEqual([explainer.publications[0]!.url]);
  });
});

describe('renderExplainerPage for a private individual', () => {
  const { page } = render({
    explainer: {
      ...explainer,
      claimant: {
        name: null,
        displayName: 'A private individual',
        kind: 'private_individual',
        affiliation: 'Marrowby allotment society',
      },
      // As ReaderService gives them: an address or a capture could identify them too.
      appearances: explainer.appearances.map((appearance) => ({
        ...appearance,
        url: null,
        captureUrl: null,
      })),
    },
  });

  it('names nobody and leaves out an affiliation that could identify them', () => {
    const claim = only(byClass(page.document, 'claim'));
    expect(textOf(only(byTag(claim, 'figcaption')))).toBe('Said by A private individual');
    expect(textOf(page.document)).not.toContain('allotment');
  });

  it('says where and when they were seen, but gives no address and no copy', () => {
    const claim = only(byClass(page.document, 'claim'));
    expect(textOf(claim)).toContain('The Fennick Letter (newsletter)');
    expect(textOf(claim)).toContain(
      'We do not give its address or a copy: they could identify a private individual.',
    );
    expect(textOf(claim)).not.toContain('Address:');
    expect(byTag(claim, 'a').filter((link) => attr(link, 'href')?.includes('/captures/'))).toEqual(
      [],
    );
  });
});

describe('renderExplainerPage with placeholders that do not match the workings', () => {
  const heat = workings.find((working) => working.id === workingIds.heat);
  const energy = workings.find((working) => working.id === workingIds.energy);
  const { page } = render({
    explainer: {
      ...explainer,
      bodyHtml:
        '<h2>Body</h2><figure data-working-id="00000000-0000-4000-8000-000000000000" class="working-embed">Working</figure>' +
        `<figure class='working-embed' data-working-id='${heat!.id}'>Working</figure>`,
      workings: [heat!, energy!],
    },
  });

  it('drops a placeholder with no working and shows the workings no placeholder asked for after the body', () => {
    expect(textOf(page.document)).not.toContain('00000000-0000');
    const extra = byTag(page.document, 'h2').find(
      (heading) => textOf(heading) === 'The workings behind this explainer',
    )!;
    const energySection = workingSection(page, energy!.id);
    expect(orderOf(page, extra)).toBeLessThan(orderOf(page, energySection));
    expect(workingSection(page, heat!.id)).toBeDefined();
    expect(headingsInOrder(headingLevels(page.document))).toBe(true);
  });
});
