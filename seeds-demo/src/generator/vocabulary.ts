import { type ReliabilityGrade, type SourceKind } from '@skyledger/contracts';

/**
 * What generated claims are made of: claim patterns on the PRODUCT.md topics, invented
 * names, places, publishers and sources. Generated rows are for scale tests and the
 * benchmark, never the demo.
 */
export interface ClaimPattern {
  summary: string;
  text: string;
  topics: readonly string[];
  /** How often this kind of claim turns up, relative to the others. */
  weight: number;
}

/** `{place}` and `{year}` are filled in per claim. */
export const claimPatterns: readonly ClaimPattern[] = [
  {
    summary: 'Heat from the Earth’s core is what warms {place}',
    text: 'The ground under {place} is warming us from below; the core is getting hotter.',
    topics: ['geothermal', 'energy-budget'],
    weight: 6,
  },
  {
    summary: 'The sun has been getting brighter since {year}',
    text: 'Since {year} the sun has simply been putting out more heat, and that is all warming is.',
    topics: ['solar', 'attribution'],
    weight: 8,
  },
  {
    summary: 'Global warming stopped in {year}',
    text: 'There has been no warming since {year}; the record has been flat ever since.',
    topics: ['temperature-record', 'trends'],
    weight: 10,
  },
  {
    summary: 'CO2 is too small a share of the air to matter',
    text: 'Carbon dioxide is only 0.04 per cent of the atmosphere, far too little to change anything.',
    topics: ['carbon-dioxide', 'greenhouse-effect'],
    weight: 9,
  },
  {
    summary: 'Water vapour, not CO2, does all the greenhouse warming',
    text: 'Water vapour is the real greenhouse gas; carbon dioxide is a rounding error.',
    topics: ['water-vapour', 'greenhouse-effect'],
    weight: 5,
  },
  {
    summary: 'Volcanoes put out more CO2 than people do',
    text: 'One eruption near {place} released more carbon dioxide than all our cars in a year.',
    topics: ['volcanoes', 'carbon-dioxide'],
    weight: 5,
  },
  {
    summary: 'Cosmic rays set the climate through the clouds',
    text: 'Cosmic rays seed the clouds, and the clouds decide the temperature, not us.',
    topics: ['cosmic-rays', 'clouds'],
    weight: 3,
  },
  {
    summary: 'The oceans are heated by undersea volcanoes',
    text: 'The sea off {place} is warming because of volcanoes on the seabed.',
    topics: ['ocean-heat', 'volcanoes'],
    weight: 3,
  },
  {
    summary: 'The {year} cold snap in {place} disproves global warming',
    text: 'We had snow in {place} in {year}. So much for global warming.',
    topics: ['temperature-record', 'weather-vs-climate'],
    weight: 7,
  },
  {
    summary: 'The {place} weather station was moved to make it warmer',
    text: 'They moved the {place} station next to a car park in {year} and called it warming.',
    topics: ['station-data', 'urban-heat'],
    weight: 4,
  },
  {
    summary: 'Sea level at {place} has not risen since {year}',
    text: 'The harbour wall at {place} has the same high-water mark as in {year}.',
    topics: ['sea-level'],
    weight: 5,
  },
  {
    summary: 'Arctic sea ice has recovered to its {year} extent',
    text: 'The Arctic ice is back where it was in {year}; the melt has reversed.',
    topics: ['sea-ice', 'trends'],
    weight: 4,
  },
  {
    summary: 'Climate has always changed, so today’s change is natural',
    text: 'The climate changed long before factories, so this is just another natural cycle.',
    topics: ['attribution', 'paleoclimate'],
    weight: 7,
  },
  {
    summary: 'The 1930s were hotter than today',
    text: 'The 1930s were the hottest decade on record, hotter than anything since.',
    topics: ['temperature-record'],
    weight: 4,
  },
  {
    summary: 'More CO2 only greens the planet, it cannot warm it',
    text: 'Carbon dioxide is plant food; more of it makes {place} greener, not warmer.',
    topics: ['carbon-dioxide', 'ecosystems'],
    weight: 3,
  },
  {
    summary: 'Heat pumps in {place} raise emissions',
    text: 'Every heat pump fitted in {place} since {year} has raised emissions, not cut them.',
    topics: ['energy', 'emissions'],
    weight: 3,
  },
  {
    summary: 'Warming since {year} is all from urban heat islands',
    text: 'Towns like {place} grew around the thermometers; that is the whole of the warming.',
    topics: ['urban-heat', 'station-data'],
    weight: 4,
  },
  {
    summary: 'Climate sensitivity is too low for CO2 to matter',
    text: 'Doubling carbon dioxide would warm us by a fraction of a degree at most.',
    topics: ['climate-sensitivity', 'carbon-dioxide'],
    weight: 3,
  },
];

/** Extra tags a claim may carry besides its pattern's. */
export const extraTopics: readonly string[] = [
  'local',
  'politics',
  'health',
  'farming',
  'flooding',
  'energy-bills',
  'transport',
];

export const places: readonly string[] = [
  'Marrowby',
  'Wenlow',
  'Eastgate',
  'Fallowmere',
  'Brackenholt',
  'Saltry Cove',
  'Upper Wenlow',
  'Hollinsby',
  'Copperwick',
  'Dunstable Fen',
  'Greywater',
  'Ashcombe Vale',
];

export const givenNames: readonly string[] = [
  'Aldous',
  'Bryony',
  'Cedric',
  'Delphine',
  'Ewan',
  'Fenella',
  'Gideon',
  'Hester',
  'Ivo',
  'Juniper',
  'Kit',
  'Lavinia',
  'Magnus',
  'Nerys',
  'Oswin',
  'Perpetua',
  'Quentin',
  'Rosalind',
  'Silas',
  'Tabitha',
  'Ulric',
  'Verity',
  'Wystan',
  'Yolanda',
];

export const familyNames: readonly string[] = [
  'Ashdown',
  'Blackthorne',
  'Corrigan',
  'Dunmore',
  'Etherington',
  'Fairweather',
  'Gallimore',
  'Holloway',
  'Illingworth',
  'Jessop',
  'Kettlewell',
  'Larkspur',
  'Merriman',
  'Nettleford',
  'Ormerod',
  'Pendlebury',
  'Quarrington',
  'Rowntree',
  'Stainthorpe',
  'Thistlewood',
  'Underhill',
  'Varley',
  'Whitlock',
  'Yarrow',
];

export const organisationForms: readonly string[] = [
  '{place} Energy Forum',
  '{place} Motorists’ League',
  '{place} Heating Suppliers Association',
  'Friends of {place} Moor',
  '{place} Ratepayers’ Alliance',
  '{place} Farmers’ Union',
  '{place} Weather Society',
  '{place} Chamber of Commerce',
];

export const publicTitles: readonly string[] = [
  'Councillor',
  'Cllr',
  'Alderman',
  'Mayor',
  'Candidate',
  '',
];

/**
 * Kinds of generated sources: a title pattern on a topic (`{topic}`, `{place}`, `{year}`
 * filled in), who publishes that kind, and how the desk tends to grade it.
 */
export interface SourcePattern {
  kind: SourceKind;
  title: string;
  publishers: readonly string[];
  grades: Readonly<Partial<Record<ReliabilityGrade, number>>>;
  /** Whether it has a DOI (else a web address); expert interviews have neither. */
  cited: 'doi' | 'url' | 'none';
  weight: number;
}

export const sourcePatterns: readonly SourcePattern[] = [
  {
    kind: 'peer_reviewed_paper',
    title: 'A regional reassessment of {topic} around {place}, {year}',
    publishers: [
      'Fallowmere Journal of Atmospheric Physics',
      'Annals of the Wenlow Geophysical Society',
    ],
    grades: { strong: 6, adequate: 3, weak: 1 },
    cited: 'doi',
    weight: 8,
  },
  {
    kind: 'preprint',
    title: 'Revisiting {topic}: a preliminary analysis of the {place} record',
    publishers: ['Copperwick Open Preprints'],
    grades: { adequate: 3, weak: 4 },
    cited: 'doi',
    weight: 3,
  },
  {
    kind: 'assessment_report',
    title: 'The {year} assessment of {topic} for the northern counties',
    publishers: ['Northern Counties Climate Panel'],
    grades: { strong: 9, adequate: 1 },
    cited: 'doi',
    weight: 3,
  },
  {
    kind: 'agency_dataset',
    title: '{topic} observations, {place} station network, to {year}',
    publishers: ['Greywater Environment Agency', 'Eastgate Meteorological Service'],
    grades: { strong: 7, adequate: 3 },
    cited: 'url',
    weight: 6,
  },
  {
    kind: 'agency_statement',
    title: 'Statement on {topic} in {place} ({year})',
    publishers: ['Greywater Environment Agency', 'Eastgate Meteorological Service'],
    grades: { strong: 3, adequate: 6 },
    cited: 'url',
    weight: 4,
  },
  {
    kind: 'press_release',
    title: '{place} group says new figures on {topic} change the picture',
    publishers: ['Hollinsby Energy Forum', 'Saltry Cove Ratepayers’ Alliance'],
    grades: { weak: 6, unreliable: 4 },
    cited: 'url',
    weight: 3,
  },
  {
    kind: 'news_report',
    title: 'What the {year} figures on {topic} mean for {place}',
    publishers: ['Brackenholt Evening Courier', 'Ashcombe Vale Herald'],
    grades: { adequate: 5, weak: 5 },
    cited: 'url',
    weight: 4,
  },
  {
    kind: 'blog_or_social_post',
    title: 'Why I stopped believing the {topic} story ({place}, {year})',
    publishers: ['Upper Wenlow Notes (blog)'],
    grades: { weak: 3, unreliable: 7 },
    cited: 'url',
    weight: 2,
  },
  {
    kind: 'expert_interview',
    title: 'Interview on {topic} with a researcher at the University of Marrowby',
    publishers: ['Marrowby Gazette science desk'],
    grades: { strong: 2, adequate: 7, weak: 1 },
    cited: 'none',
    weight: 2,
  },
];

/** Why a generated source got its grade, per grade. */
export const gradeReasons: Readonly<Record<ReliabilityGrade, string>> = {
  strong: 'Primary, reviewed evidence that bears directly on the claim.',
  adequate: 'Credible and relevant, with limits the explainer should mention.',
  weak: 'Indirect or unreviewed; used only beside stronger sources.',
  unreliable: 'No traceable evidence behind it; cited only to show where the claim came from.',
};
