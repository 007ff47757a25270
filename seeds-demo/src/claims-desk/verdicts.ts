import { type SeedVerdictStep } from '@skyledger/api/seeding';
import { desk } from './desk';

type Steps = SeedVerdictStep[];

const coreExplainer = (surveys: string) => [
  '## What the evidence shows',
  `Heat does flow out of the Earth’s interior: ${surveys} Spread over the whole surface of the planet, that is less than a tenth of a watt on each square metre.`,
  '[[working:heat-flux-compare]]',
  'Greenhouse gases added since 1750 now hold in about 2.7 watts on each square metre [[source:The Earth’s Energy Budget]], some thirty times more, and the interior’s flow has been steady for millions of years.',
  '## The claim',
  '> Everybody forgets the planet has a molten core. That heat is coming up through the ground, and that is what is warming us.',
  'Councillor Aldous Threlkeld said this at the borough council’s transport committee on 12 November.',
  '## Why it misleads',
  'The core is hot, but its heat seeps out slowly through kilometres of rock, at much the same rate for ages. A source that has not changed cannot explain a warming that began in the last century and a half.',
  '[[working:energy-balance]]',
];

/**
 * What the desk did with each researched demo claim after the research: verdicts drafted,
 * sent back, cleared, published, corrected and retracted, so every state of the claim life
 * is on the demo desk. All the wording is the demo desk's own.
 */
export const demoVerdicts = {
  core: [
    {
      by: desk.editor,
      draft: {
        ratingId: 'contradicted',
        bottomLine:
          'The heat coming out of the Earth’s interior is about thirty times smaller than the extra heat greenhouse gases now hold in, and it has not grown: it cannot explain the warming.',
        primarySource: 'Earth’s surface heat flux',
        explainer: coreExplainer('about 47 terawatts in all [[source:Earth’s surface heat flux]].'),
      },
    },
    { by: desk.editor, submit: true },
    { by: desk.copy, clear: true },
    { by: desk.copy, publish: {} },
    // Two readers ask to hear of updates (addresses on the reserved example domain).
    { readerSubscribes: 'reader.one@mail.example' },
    { readerSubscribes: 'reader.two@mail.example' },
    { by: desk.editor, reopen: true },
    {
      by: desk.editor,
      draft: {
        explainer: coreExplainer(
          'two independent surveys put it at 44 terawatts [[source:Heat flow from the Earth’s interior]] and 47 terawatts [[source:Earth’s surface heat flux]].',
        ),
      },
    },
    { by: desk.editor, submit: true },
    { by: desk.copy, clear: true },
    {
      by: desk.copy,
      publish: {
        note: {
          kind: 'correction',
          text: 'An earlier version gave the heat flow as the result of a single survey. Two surveys give 44 and 47 terawatts; the conclusion does not change.',
        },
      },
    },
  ],
  sun: [
    {
      by: desk.editor,
      draft: {
        ratingId: 'contradicted',
        bottomLine:
          'Satellites have measured the sun since 1978 and its output has not risen; the warming since then carries the marks of greenhouse gases, not of a brighter sun.',
        primarySource: 'A new, lower value of total solar irradiance',
        explainer: [
          '## What the evidence shows',
          'The sunlight reaching the Earth has been measured from space since 1978 and has not risen; it goes up and down by about a tenth of a per cent with the eleven-year cycle [[source:A new, lower value of total solar irradiance]].',
          '[[working:solar-change]]',
          'If the sun were the cause, the whole atmosphere would warm. Instead the upper atmosphere is cooling while the lower warms, as a stronger greenhouse effect predicts [[source:Solar influences on climate]].',
          '[[working:pattern-compare]]',
          '## The claim',
          '> The sun is brighter than it has been for centuries, and that is the simple reason our summers are warmer.',
          '## Why it misleads',
          'The sun does change the climate over long spans, but its output has been flat while the warming of recent decades happened.',
        ],
      },
    },
    { by: desk.editor, submit: true },
    { by: desk.copy, clear: true },
    { by: desk.copy, publish: {} },
    { by: desk.editor, reopen: true },
    { by: desk.editor, draft: {} },
    { by: desk.editor, submit: true },
    { by: desk.copy, clear: true },
    {
      by: desk.chief,
      publish: {
        note: {
          kind: 'retraction',
          text: 'We attributed these words to the Wenlow Energy Forum. The forum has shown us they came from a member’s post it republished without approval, so we withdraw this check of the forum. The science it sets out stands.',
        },
      },
    },
  ],
  pause: [
    {
      by: desk.editor,
      draft: {
        ratingId: 'contradicted',
        bottomLine:
          'Starting at the record-hot year of 2016 hides the trend in year-to-year noise; over any span long enough to measure it, the warming carries on.',
        primarySource: 'Changing State of the Climate System',
        explainer: [
          '## What the evidence shows',
          'Every year since 2015 has been among the warmest measured [[source:Changing State of the Climate System]].',
          '[[working:trend#2]]',
          '## The claim',
          '> Warming stopped in 2016. Nine years, no new record worth the name.',
          '## Why it misleads',
          'A line drawn from an unusually hot year starts high, so the years after it look flat. The interval around that short trend is so wide that it says almost nothing.',
          '[[working:trend]]',
        ],
      },
    },
    { by: desk.editor, submit: true },
    {
      by: desk.copy,
      sendBack:
        'Say in words how sure we are, with the IPCC term and its range, and put the start-year problem in the bottom line.',
    },
    {
      by: desk.editor,
      draft: {
        bottomLine:
          'A trend started at the record-hot year of 2016 is lost in the noise; over the whole record it is virtually certain (99–100 %) that the warming continues.',
      },
    },
    { by: desk.editor, submit: true },
  ],
  co2: [
    { by: desk.chief, clearLegalFlag: true },
    {
      by: desk.editor,
      draft: {
        ratingId: 'contradicted',
        bottomLine:
          'Carbon dioxide is a small share of the air, but it absorbs the heat the ground gives off, which nitrogen and oxygen hardly do; the rise since 1750 traps enough to warm the planet.',
        primarySource: 'New estimates of radiative forcing',
        explainer: [
          '## What the evidence shows',
          'What matters is not a gas’s share of the air but how strongly it absorbs the infrared heat the surface gives off [[source:New estimates of radiative forcing]].',
          '[[working:ghg-forcing]]',
          '[[working:layer-atmosphere]]',
          '[[working:warming-from-forcing]]',
          '## The claim',
          '> Carbon dioxide is four hundredths of one per cent of the air. I do not see how something so small can change the weather of a whole planet.',
          'A reader wrote this in a letter to the Gazette.',
          '## Why it misleads',
          'Small amounts can have large effects when they act on something the bulk does not. The 140 parts per million added since 1750 come to hundreds of billions of tonnes of carbon.',
          '[[working:carbon-units]]',
        ],
      },
    },
    { by: desk.editor, submit: true },
    { by: desk.copy, clear: true },
    { by: desk.copy, publish: {} },
  ],
  cosmicRays: [
    {
      by: desk.editor,
      draft: {
        ratingId: 'unfounded',
        bottomLine:
          'No study has shown that cosmic rays, through clouds, set the Earth’s temperature; the one offered is a regional preprint whose authors find no significant link.',
        primarySource: 'Solar influences on climate',
        explainer: [
          '## What the evidence shows',
          'The sun’s magnetic activity changes how many cosmic rays arrive, but studies of it find too small an effect on clouds to drive the climate [[source:Solar influences on climate]].',
          '## The claim',
          '> It is cosmic rays that make the clouds, and the clouds that set the temperature.',
          '## Why it misleads',
          'The study the podcast points to covers one upland region for sixteen years and has not been reviewed [[source:Cosmic-ray flux and low cloud]].',
        ],
      },
    },
    { by: desk.editor, submit: true },
    {
      by: desk.copy,
      sendBack:
        'The preprint’s own authors say the link is not significant: say so plainly, and ask the podcaster which study he meant before we run this.',
    },
  ],
  oceans: [
    {
      by: desk.editor,
      draft: {
        ratingId: 'contradicted',
        bottomLine:
          'The heat the oceans have gained in a decade is about a hundred times more than all the heat that flows up through the sea floor in that time.',
        primarySource: 'Earth’s surface heat flux',
        explainer: [
          '## What the evidence shows',
          'The upper two kilometres of the oceans have taken up heat at the rate shown below, far more than the sea floor gives off [[source:Earth’s surface heat flux]].',
          '[[working:ocean-heat]]',
          '## The claim',
          '> The sea is not warming from the air. It is the volcanoes on the seabed cooking it from below.',
          '## Why it misleads',
          'Heat from below would warm the deep water first; the measurements show the warming is greatest near the surface [[source:Changing State of the Climate System]].',
        ],
      },
    },
    { by: desk.editor, submit: true },
    { by: desk.copy, clear: true },
    { by: desk.copy, publish: { inDays: 3, timeZone: 'Europe/London' } },
  ],
} satisfies Record<string, Steps>;
