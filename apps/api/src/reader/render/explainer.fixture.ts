// An invented published explainer of the fictional Marrowby Gazette, for the reader
// pages' tests. The workings are real runs of @skyledger/calc; the sources are real
// published science (as in the demo seed); the claimant, the claim, the outlet and every
// address are invented.
import {
  calculators,
  displayUnit,
  formatNumber,
  references,
  runCalculator,
  type AnyCalculatorResult,
  type NormalisedRange,
} from '@skyledger/calc';
import {
  type ReaderCorrection,
  type ReaderExplainer,
  type ReaderExplainerSummary,
  type ReaderRating,
  type ReaderSite,
  type ReaderWorking,
  updateNoteKindLabels,
} from '@skyledger/contracts';

export const site: ReaderSite = {
  name: 'Marrowby Gazette',
  origin: 'https://gazette.marrowby.example',
  organisation: 'the Marrowby Gazette',
  timeZone: 'Europe/London',
};

// Numbered upwards, as the desk's scale is: holds up is 5, the best for ClaimReview.
const scale = { bestRating: 5, worstRating: 1 };
export const ratings: ReaderRating[] = [
  {
    id: 'holds-up',
    number: 5,
    label: 'Holds up',
    description: 'The best evidence supports the claim as it was said.',
    isRating: true,
    ...scale,
  },
  {
    id: 'holds-with-caveats',
    number: 4,
    label: 'Holds up with caveats',
    description: 'Broadly right, but it needs context or a qualification to be fair.',
    isRating: true,
    ...scale,
  },
  {
    id: 'stretched',
    number: 3,
    label: 'Stretched',
    description: 'It starts from something true and takes it further than the evidence goes.',
    isRating: true,
    ...scale,
  },
  {
    id: 'unfounded',
    number: 2,
    label: 'Unfounded',
    description: 'No good evidence supports it, though none directly disproves it.',
    isRating: true,
    ...scale,
  },
  {
    id: 'contradicted',
    number: 1,
    label: 'Contradicted by evidence',
    description: 'The best evidence shows the claim is wrong.',
    isRating: true,
    ...scale,
  },
  {
    id: 'not-checkable',
    number: null,
    label: 'Not checkable',
    description: 'An opinion, a forecast, or a statement with nothing testable in it.',
    isRating: false,
    ...scale,
  },
];
export const contradicted = ratings[4]!;

const shortCitation = (key: string) => {
  const citation = references.find((reference) => reference.key === key)?.citation ?? key;
  return citation.slice(0, citation.indexOf(')') + 1);
};

function inputText(value: unknown, unit: string): string {
  const shownUnit = displayUnit(unit);
  const withUnit = (text: string) => (shownUnit ? `${text} ${shownUnit}` : text);
  if (typeof value === 'number') return withUnit(formatNumber(value));
  if (Array.isArray(value)) {
    const points = value as Array<{ t: number }>;
    return `${points.length} yearly values, ${points[0]?.t}–${points[points.length - 1]?.t}`;
  }
  if (value && typeof value === 'object') {
    const range = value as NormalisedRange;
    return `${withUnit(`${formatNumber(range.low)} – ${formatNumber(range.high)}`)} (${range.distribution})`;
  }
  return String(value);
}

/** A run of the library as the reader pages get it. */
export function readerWorking(
  id: string,
  result: AnyCalculatorResult,
  note: string | null,
): ReaderWorking {
  const info = calculators.find((calculator) => calculator.id === result.calculatorId)!;
  const recorded = result.inputs as Record<string, unknown>;
  const outputs = result.outputs as Record<
    string,
    {
      kind: string;
      value: unknown;
      unit: string;
      band?: { p5: unknown; p50: unknown; p95: unknown };
      columns?: Array<{ key: string; label: string; unit: string }>;
    }
  >;
  return {
    id,
    calculatorId: result.calculatorId,
    title: info.title,
    libraryVersion: result.libraryVersion,
    note,
    inputs: info.inputs
      .filter((spec) => recorded[spec.name] !== undefined && recorded[spec.name] !== '')
      .map((spec) => {
        const value = recorded[spec.name];
        const atDefault = value === spec.default;
        return {
          name: spec.name,
          label: spec.label,
          value: inputText(value, spec.unit),
          source: atDefault && spec.source ? shortCitation(spec.source) : null,
        };
      }),
    steps: result.steps.map((step) => ({ ...step })),
    outputs: info.outputs.flatMap((spec) => {
      const output = outputs[spec.name];
      if (!output) return [];
      const band = output.band;
      return {
        name: spec.name,
        label: spec.label,
        kind: spec.kind,
        value: output.value,
        unit: output.unit,
        band:
          output.kind === 'number' && band
            ? { p5: band.p5 as number, p50: band.p50 as number, p95: band.p95 as number }
            : null,
        columns: output.columns ? output.columns.map((column) => ({ ...column })) : null,
      };
    }),
    cautions: [...result.cautions],
  };
}

/** An invented yearly series: 0.18 K per decade with a wobble (labelled synthetic). */
export const syntheticAnomalies = Array.from({ length: 47 }, (_, index) => {
  const t = 1979 + index;
  return {
    t,
    y: 0.018 * index - 0.1 + 0.09 * Math.sin(index * 0.7) + 0.05 * Math.sin(index * 2.9),
  };
});

export const workingIds = {
  energy: '7d4c2f10-31aa-4c5e-9d1b-0a7e5b2c9e01',
  trend: '7d4c2f10-31aa-4c5e-9d1b-0a7e5b2c9e02',
  heat: '7d4c2f10-31aa-4c5e-9d1b-0a7e5b2c9e03',
};

export const workings: ReaderWorking[] = [
  readerWorking(
    workingIds.energy,
    runCalculator('energy-balance', { albedo: { low: 0.28, high: 0.32 } }),
    'How much sunlight the planet absorbs, with the albedo spread over its measured range.',
  ),
  readerWorking(
    workingIds.trend,
    runCalculator('trend', { series: syntheticAnomalies, seriesUnit: 'K' }),
    'Trend of the Marrowby station’s yearly anomalies (a synthetic demo series).',
  ),
  readerWorking(
    workingIds.heat,
    runCalculator('heat-flux-compare', { globalPower: { low: 44, high: 50, unit: 'TW' } }),
    null,
  ),
];

export const sourceIds = {
  heatFlux: '5a0b6c3e-0c0f-4b7e-8a2d-3f1e9c7b2a01',
  ar6: '5a0b6c3e-0c0f-4b7e-8a2d-3f1e9c7b2a02',
  station: '5a0b6c3e-0c0f-4b7e-8a2d-3f1e9c7b2a03',
};

const cite = (id: string, number: number) =>
  `<a class="citation" data-source-id="${id}" href="#source-${id}">[${number}]</a>`;

const origin = site.origin;
const slug = 'heat-from-the-earths-core-is-warming-the-planet';
export const explainerUrl = `${origin}/explainers/${slug}`;

export const correctionNote = {
  kind: 'correction' as const,
  kindLabel: updateNoteKindLabels.correction,
  text: 'We first gave the heat flow from the interior as 0.9 W/m²; it is 0.09 W/m². The rating does not change.',
  at: '2026-03-06T10:15:00.000Z',
  sequence: 2,
  url: `${explainerUrl}/v/2`,
};

export const explainer: ReaderExplainer = {
  slug,
  url: explainerUrl,
  versionUrl: explainerUrl,
  sequence: 2,
  isLatest: true,
  claim: {
    text: 'It’s the heat coming up from the Earth’s core that is warming this planet, not carbon dioxide. The ground is cooking us from below.',
    summary: 'Heat from the Earth’s core is what is warming the planet',
    topics: ['geothermal heat', 'greenhouse gases'],
  },
  claimant: {
    name: 'Councillor Ambrose Fennick',
    displayName: 'Councillor Ambrose Fennick',
    kind: 'public_figure',
    affiliation: 'Marrowby Borough Council',
  },
  appearances: [
    {
      outlet: 'Marrowby Borough Council, full council meeting (video)',
      seenAt: '2026-02-11T19:40:00.000Z',
      seenTimeZone: 'Europe/London',
      isFirstKnown: true,
      url: 'https://council.marrowby.example/meetings/2026-02-11/recording?part=3',
      captureUrl: `${origin}/captures/9b1f0c2e4d`,
    },
    {
      outlet: 'The Fennick Letter (newsletter)',
      seenAt: '2026-02-14T08:05:00.000Z',
      seenTimeZone: 'America/New_York',
      isFirstKnown: false,
      url: 'https://fennick-letter.example/posts/core-truth',
      captureUrl: null,
    },
  ],
  rating: contradicted,
  bottomLine:
    'Heat from the Earth’s interior reaches the surface at about 0.09 W/m², some thirty times less than the extra heat greenhouse gases now hold in, and it has not changed in centuries. The warming since 1979 follows the greenhouse gases, not the core.',
  bodyHtml:
    '<h2>What the evidence shows</h2>' +
    `<p>The interior of the Earth loses about 47 TW of heat${cite(sourceIds.heatFlux, 1)}, spread over the whole surface: <strong>less than a tenth of a watt per square metre</strong>. Greenhouse gases added since 1750 hold in about 2.7 W/m²${cite(sourceIds.ar6, 2)}.</p>` +
    `<figure class="working-embed" data-working-id="${workingIds.heat}">Working</figure>` +
    '<h2>Why it misleads</h2>' +
    '<p>Deep mines and boreholes are warm, which makes the core feel like a big heater. But what matters for the climate is how much heat crosses each square metre of the surface, and that flow is small and steady.</p>' +
    `<figure data-working-id="${workingIds.energy}" class="working-embed">Working</figure>` +
    '<h3>What the local record shows</h3>' +
    `<p>The Marrowby station has warmed steadily since 1979${cite(sourceIds.station, 3)}, in step with the global record and not with anything beneath our feet.</p>` +
    `<figure class="working-embed" data-working-id="${workingIds.trend}">Working</figure>` +
    '<p>Read the <a href="https://www.ipcc.ch/report/ar6/wg1/" rel="noopener noreferrer">IPCC assessment</a> for the full picture.</p>',
  workings,
  sources: [
    {
      number: 1,
      id: sourceIds.heatFlux,
      title: 'Earth’s surface heat flux',
      authors: 'Davies, J. H., Davies, D. R.',
      publisher: 'Solid Earth (European Geosciences Union)',
      year: 2010,
      doi: '10.5194/se-1-5-2010',
      url: null,
      kind: 'peer_reviewed_paper',
      kindLabel: 'Peer-reviewed paper',
      grade: 'strong',
      gradeLabel: 'Strong',
      gradeReason: 'Peer-reviewed global compilation of heat-flow measurements.',
    },
    {
      number: 2,
      id: sourceIds.ar6,
      title:
        'The Earth’s Energy Budget, Climate Feedbacks, and Climate Sensitivity (AR6 WG1, chapter 7)',
      authors: 'Forster, P., Storelvmo, T., Armour, K., et al.',
      publisher: 'Cambridge University Press',
      year: 2021,
      doi: '10.1017/9781009157896.009',
      url: 'https://www.ipcc.ch/report/ar6/wg1/chapter/chapter-7/',
      kind: 'assessment_report',
      kindLabel: 'Assessment report',
      grade: 'strong',
      gradeLabel: 'Strong',
      gradeReason:
        'The current international assessment of forcing, reviewed by governments and experts.',
    },
    {
      number: 3,
      id: sourceIds.station,
      title: 'Marrowby station yearly mean temperature, 1979–2025 (synthetic demo series)',
      authors: null,
      publisher: 'Marrowby Weather Watchers (invented)',
      year: 2026,
      doi: null,
      url: 'https://weather-watchers.marrowby.test/station/yearly.csv',
      kind: 'agency_dataset',
      kindLabel: 'Agency dataset',
      grade: 'adequate',
      gradeLabel: 'Adequate',
      gradeReason: 'A checked local record; one station says little about the globe on its own.',
    },
  ],
  firstPublishedAt: '2026-03-02T09:00:00.000Z',
  publishedAt: correctionNote.at,
  modifiedAt: correctionNote.at,
  updateNotes: [correctionNote],
  retracted: false,
  publications: [
    {
      sequence: 1,
      publishedAt: '2026-03-02T09:00:00.000Z',
      url: `${explainerUrl}/v/1`,
      noteKind: null,
    },
    {
      sequence: 2,
      publishedAt: correctionNote.at,
      url: `${explainerUrl}/v/2`,
      noteKind: 'correction',
    },
  ],
};

export const retractionNote = {
  kind: 'retraction' as const,
  kindLabel: updateNoteKindLabels.retraction,
  text: 'The station series we relied on turned out to mix two sites; we are withdrawing the explainer while we redo the working.',
  at: '2026-04-01T16:30:00.000Z',
  sequence: 3,
  url: `${explainerUrl}/v/3`,
};

/** The same explainer after a retraction: notes newest first, the page kept. */
export const retractedExplainer: ReaderExplainer = {
  ...explainer,
  sequence: 3,
  publishedAt: retractionNote.at,
  modifiedAt: retractionNote.at,
  updateNotes: [retractionNote, correctionNote],
  retracted: true,
  publications: [
    ...explainer.publications,
    {
      sequence: 3,
      publishedAt: retractionNote.at,
      url: retractionNote.url,
      noteKind: 'retraction',
    },
  ],
};

/** The JSON-LD the controller would pass, with a hostile string to prove it stays inert. */
export const claimReview = {
  '@context': 'https://schema.org',
  '@type': 'ClaimReview',
  url: explainer.url,
  claimReviewed: `${explainer.claim.text} </script><script>alert(1)</script>`,
  datePublished: explainer.firstPublishedAt,
  dateModified: explainer.modifiedAt,
  author: { '@type': 'Organization', name: 'Marrowby Gazette', url: origin },
  reviewRating: {
    '@type': 'Rating',
    ratingValue: 1,
    bestRating: 5,
    worstRating: 1,
    alternateName: 'Contradicted by evidence',
  },
  itemReviewed: {
    '@type': 'Claim',
    author: { '@type': 'Person', name: 'Councillor Ambrose Fennick' },
    datePublished: '2026-02-11',
    appearance: [{ '@type': 'CreativeWork', url: `${origin}/captures/9b1f0c2e4d` }],
    firstAppearance: { '@type': 'CreativeWork', url: `${origin}/captures/9b1f0c2e4d` },
  },
  correction: {
    '@type': 'CorrectionComment',
    text: correctionNote.text,
    datePublished: correctionNote.at,
  },
};

export const share = {
  title: 'Contradicted by evidence: the Earth’s core is not what is warming the planet',
  description: explainer.bottomLine,
  url: explainer.url,
};

export function summaryOf(value: ReaderExplainer): ReaderExplainerSummary {
  return {
    slug: value.slug,
    url: value.url,
    summary: value.claim.summary,
    claimantDisplayName: value.claimant.displayName,
    rating: value.rating,
    bottomLine: value.bottomLine,
    topics: value.claim.topics,
    firstPublishedAt: value.firstPublishedAt,
    modifiedAt: value.modifiedAt,
    retracted: value.retracted,
  };
}

const secondClaim: ReaderExplainerSummary = {
  slug: 'the-sun-is-getting-brighter',
  url: `${origin}/explainers/the-sun-is-getting-brighter`,
  summary: 'The sun has been getting brighter and that explains the warming',
  claimantDisplayName: 'Wenlow Energy Association',
  rating: ratings[2]!,
  bottomLine:
    'The sun’s output has gone up and down with its 11-year cycle since satellites began measuring it, with no upward trend since the 1980s, while temperatures kept rising.',
  topics: ['solar'],
  firstPublishedAt: '2026-02-20T12:00:00.000Z',
  modifiedAt: null,
  retracted: false,
};

const privateClaim: ReaderExplainerSummary = {
  slug: 'warming-stopped-in-2016',
  url: `${origin}/explainers/warming-stopped-in-2016`,
  summary: 'Warming stopped in 2016',
  claimantDisplayName: 'A private individual',
  rating: ratings[5]!,
  bottomLine:
    'Picking a record-warm year as the start makes any short trend look flat; over any period long enough to measure, warming continues.',
  topics: ['temperature records'],
  firstPublishedAt: '2026-01-28T08:30:00.000Z',
  modifiedAt: null,
  retracted: false,
};

export const summaries: ReaderExplainerSummary[] = [
  summaryOf(retractedExplainer),
  secondClaim,
  privateClaim,
];

export const corrections: ReaderCorrection[] = [
  { slug, url: explainerUrl, summary: explainer.claim.summary, note: correctionNote },
  { slug, url: explainerUrl, summary: explainer.claim.summary, note: retractionNote },
];
