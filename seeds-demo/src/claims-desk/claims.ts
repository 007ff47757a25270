import { type SeedClaim } from '@skyledger/api/seeding';
import { captures } from './captures';
import { claimants } from './claimants';
import { desk } from './desk';
import { sources } from './sources';
import { demoVerdicts } from './verdicts';
import { demoWorkings } from './workings';

const london = 'Europe/London';

/** An independent expert the desk talked to; the people and institutions are invented. */
const geophysicist = {
  name: 'Dr Ilse Marchbank',
  affiliation: 'Department of Earth Sciences, University of Wenlow (invented)',
  field: 'Geothermal heat flow',
};
const statistician = {
  name: 'Dr Nadia Okafor-Lyle',
  affiliation: 'Centre for Environmental Statistics, Wenlow Polytechnic (invented)',
  field: 'Time-series statistics of climate records',
};
const atmosphericPhysicist = {
  name: 'Prof. Hamish Tregarthen',
  affiliation: 'Institute for Atmospheric Physics, University of Wenlow (invented)',
  field: 'Radiative transfer',
};

/**
 * The demo claims, in every state of the claim life: filed, in research (with the science
 * editor Tamsin Ferrow), awaiting sign-off, sent back, cleared and scheduled, published
 * (one corrected, one retracted) and set aside. Everything said, replied and quoted here
 * is invented.
 */
export const demoClaims: SeedClaim[] = [
  {
    summary: 'Earth’s core, not greenhouse gases, is warming the planet',
    text: 'Everybody forgets the planet has a molten core. That heat is coming up through the ground, and that is what is warming us, not the cars on the bypass.',
    topics: ['geothermal', 'energy-budget', 'attribution'],
    claimant: claimants.councillor,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://webcasts.marrowby-council.test/transport-committee/2026-11-12#item-6',
        outlet: 'Marrowby Borough Council webcast',
        seenAt: '2026-11-12T19:42:00+00:00',
        seenTimeZone: london,
        capture: captures.councilWebcast,
      },
      {
        url: 'https://www.marrowby-courier.test/news/2026/11/bypass-row',
        outlet: 'The Marrowby Courier (invented)',
        seenAt: '2026-11-13T08:10:00+00:00',
        seenTimeZone: london,
      },
    ],
    assignee: { email: desk.editor, by: desk.editor },
    workings: demoWorkings.core,
    sources: [
      { source: sources.heatFlux, by: desk.editor },
      { source: sources.heatFlowDataSet, by: desk.editor },
      { source: sources.ar6EnergyBudget, by: desk.editor },
      { source: sources.ar6, by: desk.editor },
      { source: sources.geophysicistInterview, by: desk.editor },
    ],
    replyAttempts: [
      {
        contacted: 'Councillor Threlkeld’s council office',
        contactedAt: '2026-11-16T10:05:00+00:00',
        channel: 'email',
        deadline: '2026-11-19T17:00:00+00:00',
        outcome: 'replied',
        reply:
          'The councillor stands by his remarks and says the council should pay for a study of ground heat under Marrowby.',
        by: desk.editor,
      },
    ],
    consultations: [
      {
        ...geophysicist,
        quote:
          'The heat flowing up from the interior averages under a tenth of a watt per square metre. The extra energy greenhouse gases now trap is around thirty times larger, and it has grown while the flow from below has not changed measurably.',
        consultedOn: '2026-11-18',
        declaredConflicts: 'None declared',
        independentOfClaimant: true,
        by: desk.editor,
      },
    ],
    comments: [
      {
        body: 'Working to do: about 47 TW spread over the Earth’s 5.1 × 10¹⁴ m² is roughly 0.09 W/m², against an effective radiative forcing of about 2.7 W/m² (AR6, 1750–2019). heat-flux-compare covers it.',
        by: desk.editor,
      },
      {
        body: 'He said it twice in the meeting; the webcast timestamp is in the capture.',
        by: desk.reporter,
      },
    ],
    verdict: demoVerdicts.core,
  },
  {
    summary: 'The sun has grown brighter, and that explains recent warming',
    text: 'The sun is brighter than it has been for centuries, and that is the simple reason our summers are warmer.',
    topics: ['solar', 'attribution'],
    claimant: claimants.forum,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://www.wenlow-energy-forum.test/news/the-sun-not-your-boiler',
        outlet: 'Wenlow Energy Forum website',
        seenAt: '2026-11-13T11:30:00+00:00',
        seenTimeZone: london,
        capture: captures.forumRelease,
      },
    ],
    assignee: { email: desk.editor, by: desk.chief },
    workings: demoWorkings.sun,
    sources: [
      { source: sources.forumRelease, by: desk.reporter },
      { source: sources.solarIrradiance, by: desk.editor },
      { source: sources.solarInfluences, by: desk.editor },
      { source: sources.ar6EnergyBudget, by: desk.editor },
    ],
    replyAttempts: [
      {
        contacted: 'Wenlow Energy Forum press office',
        contactedAt: '2026-11-30T09:15:00+00:00',
        channel: 'email',
        deadline: '2026-12-07T17:00:00+00:00',
        outcome: 'awaiting',
        by: desk.editor,
      },
    ],
    comments: [
      {
        body: 'Satellites have measured the sun since 1978 and its output has not risen; if the sun were the cause, the upper atmosphere would warm too, and it is cooling. solar-change shows both.',
        by: desk.editor,
      },
    ],
    verdict: demoVerdicts.sun,
  },
  {
    summary: 'Global warming stopped in 2016',
    text: 'Warming stopped in 2016. Nine years, no new record worth the name.',
    topics: ['temperature-record', 'trends'],
    claimant: claimants.podcaster,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://thelongweather.test/posts/nobody-wants-to-talk-about-2016',
        outlet: 'The Long Weather newsletter (invented)',
        seenAt: '2026-11-19T07:05:00+00:00',
        seenTimeZone: london,
        capture: captures.newsletterPost,
      },
    ],
    assignee: { email: desk.editor, by: desk.editor },
    workings: demoWorkings.pause,
    sources: [
      { source: sources.newsletterPost, by: desk.reporter },
      { source: sources.stationSeries, by: desk.editor },
      { source: sources.ar6StateOfClimate, by: desk.editor },
      { source: sources.trendMethod, by: desk.editor },
    ],
    replyAttempts: [
      {
        contacted: 'Rufus Kettleby, via the newsletter’s contact form',
        contactedAt: '2026-11-20T12:00:00+00:00',
        channel: 'social_message',
        deadline: '2026-11-25T12:00:00+00:00',
        outcome: 'no_reply',
        by: desk.editor,
      },
    ],
    consultations: [
      {
        ...statistician,
        quote:
          'Start a line at the hottest year of a strong El Niño and almost any short stretch looks flat. Over any window long enough for the trend to stand out from the year-to-year noise, the warming carries on.',
        consultedOn: '2026-11-24',
        declaredConflicts:
          'Has advised the Wenlow Regional Climate Service on data quality (unpaid).',
        independentOfClaimant: true,
        by: desk.editor,
      },
    ],
    verdict: demoVerdicts.pause,
  },
  {
    summary: 'CO2 is too small a share of the air to change the climate',
    text: 'Carbon dioxide is four hundredths of one per cent of the air. I do not see how something so small can change the weather of a whole planet.',
    topics: ['carbon-dioxide', 'greenhouse-effect'],
    // A private individual's letter: legal review as a matter of course.
    legalReview: true,
    claimant: claimants.resident,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://www.marrowby-gazette.test/letters/2026-11-20',
        outlet: 'Marrowby Gazette letters page',
        seenAt: '2026-11-20T09:00:00+00:00',
        seenTimeZone: london,
        capture: captures.residentLetter,
      },
    ],
    assignee: { email: desk.editor, by: desk.editor },
    workings: demoWorkings.co2,
    sources: [
      { source: sources.ghgForcing, by: desk.editor },
      { source: sources.ar6EnergyBudget, by: desk.editor },
    ],
    replyAttempts: [
      {
        contacted: 'The letter writer, at the address on the letter',
        contactedAt: '2026-11-23T14:20:00+00:00',
        channel: 'email',
        deadline: '2026-11-30T17:00:00+00:00',
        outcome: 'replied',
        reply:
          'He meant that the share is too small to change much, and asked that the explainer give the percentage so readers can judge.',
        by: desk.editor,
      },
    ],
    consultations: [
      {
        ...atmosphericPhysicist,
        quote:
          'Nitrogen and oxygen barely absorb infrared at all, so the small gases do the work. What matters is how strongly a gas absorbs the heat the surface gives off, not its share of the air.',
        consultedOn: '2026-11-25',
        declaredConflicts: 'None declared',
        independentOfClaimant: true,
        by: desk.editor,
      },
    ],
    comments: [
      {
        body: 'Private individual: keep his name off anything public. ghg-forcing gives about 2.2 W/m² from 280 to 420 ppm with the Myhre expression (5.35 ln C/C0).',
        by: desk.chief,
      },
    ],
    verdict: demoVerdicts.co2,
  },
  {
    summary: 'Volcanoes emit more CO2 than all human activity',
    text: 'One decent eruption puts out more carbon dioxide than every car and factory on Earth.',
    topics: ['volcanoes', 'carbon-dioxide'],
    claimant: claimants.candidate,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://radio.marrowby-community.test/hustings-2026-11-26',
        outlet: 'Marrowby Community Radio hustings (invented)',
        seenAt: '2026-11-26T19:20:00+00:00',
        seenTimeZone: london,
      },
    ],
    comments: [
      { body: 'Said in answer to an audience question, about 38 minutes in.', by: desk.reporter },
    ],
  },
  {
    summary: 'Water vapour, not CO2, is the main greenhouse gas, so CO2 is irrelevant',
    text: 'Water vapour does most of the greenhouse effect, so worrying about carbon dioxide is a distraction.',
    topics: ['water-vapour', 'greenhouse-effect', 'carbon-dioxide'],
    claimant: claimants.forum,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://www.wenlow-energy-forum.test/news/facts-about-water-vapour',
        outlet: 'Wenlow Energy Forum website',
        seenAt: '2026-11-27T10:00:00+00:00',
        seenTimeZone: london,
      },
    ],
    sources: [{ source: sources.ar6EnergyBudget, by: desk.reporter }],
  },
  {
    summary: 'Cosmic rays, through cloud cover, drive the Earth’s temperature',
    text: 'It is cosmic rays that make the clouds, and the clouds that set the temperature. The sun’s magnetic field decides how many get through.',
    topics: ['cosmic-rays', 'clouds', 'solar'],
    claimant: claimants.podcaster,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://thelongweather.test/episodes/113',
        outlet: 'The Long Weather podcast (invented)',
        seenAt: '2026-11-28T20:30:00+00:00',
        seenTimeZone: london,
      },
    ],
    sources: [
      { source: sources.cloudPreprint, by: desk.reporter },
      { source: sources.solarInfluences, by: desk.editor },
    ],
    assignee: { email: desk.editor, by: desk.chief },
    replyAttempts: [
      {
        contacted: 'Rufus Kettleby, by the podcast’s contact form',
        contactedAt: '2026-11-29T16:00:00+00:00',
        channel: 'social_message',
        deadline: '2026-12-04T17:00:00+00:00',
        outcome: 'awaiting',
        by: desk.editor,
      },
    ],
    verdict: demoVerdicts.cosmicRays,
  },
  {
    summary: 'The oceans are warming from undersea volcanoes, not the air',
    text: 'The sea is not warming from the air. It is the volcanoes on the seabed cooking it from below.',
    topics: ['ocean-heat', 'volcanoes', 'geothermal'],
    claimant: claimants.councillor,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://www.marrowby-courier.test/news/2026/11/seabed-volcanoes',
        outlet: 'The Marrowby Courier (invented)',
        seenAt: '2026-11-23T07:45:00+00:00',
        seenTimeZone: london,
      },
    ],
    assignee: { email: desk.editor, by: desk.editor },
    workings: demoWorkings.oceans,
    sources: [
      { source: sources.courierReport, by: desk.reporter },
      { source: sources.heatFlowDataSet, by: desk.editor },
      { source: sources.heatFlux, by: desk.editor },
      { source: sources.ar6StateOfClimate, by: desk.editor },
    ],
    comments: [
      {
        body: 'ocean-heat: the upper 2000 m gained hundreds of zettajoules since 1971; the whole geothermal flow under the oceans (about 32 TW) would take some 350 years to supply that, and it has not grown.',
        by: desk.editor,
      },
    ],
    replyAttempts: [
      {
        contacted: 'Councillor Threlkeld’s office',
        contactedAt: '2026-11-24T10:30:00+00:00',
        channel: 'phone',
        outcome: 'declined',
        reply: 'The councillor’s office said he stands by his words and will not comment further.',
        by: desk.editor,
      },
    ],
    verdict: demoVerdicts.oceans,
  },
  {
    summary: 'Marrowby’s station readings were nudged up to fake local warming',
    text: 'The Marrowby station keeper has been nudging the readings up for years. That is your warming: one volunteer and a pencil.',
    topics: ['station-data', 'temperature-record'],
    // Names an identifiable private individual (the volunteer keeper).
    legalReview: true,
    claimant: claimants.podcaster,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://thelongweather.test/episodes/114',
        outlet: 'The Long Weather podcast (invented)',
        seenAt: '2026-11-25T20:30:00+00:00',
        seenTimeZone: london,
        capture: captures.podcastPage,
      },
    ],
    assignee: { email: desk.editor, by: desk.editor },
    sources: [
      { source: sources.stationStatement, by: desk.editor },
      { source: sources.stationSeries, by: desk.editor },
    ],
    replyAttempts: [
      {
        contacted: 'Rufus Kettleby, through his producer',
        contactedAt: '2026-11-27T11:00:00+00:00',
        channel: 'spokesperson',
        deadline: '2026-12-04T17:00:00+00:00',
        outcome: 'declined',
        by: desk.editor,
      },
    ],
    comments: [
      {
        body: 'Legal review: the claim points at the station’s volunteer keeper. Counsel sees the draft before anything goes out, and the keeper gets a right of reply of their own.',
        by: desk.chief,
      },
      {
        body: 'Noted for the copy check: no name for the keeper anywhere in the copy.',
        by: desk.copy,
      },
    ],
  },
  {
    summary: 'Warming has paused since 2016, says a reshared podcast clip',
    text: 'The planet has not warmed since 2016 — the pause is back, and nobody will say so.',
    topics: ['temperature-record', 'trends'],
    claimant: claimants.podcaster,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://thelongweather.test/posts/nobody-wants-to-talk-about-2016?shared=1',
        outlet: 'The Long Weather newsletter (invented)',
        seenAt: '2026-11-21T18:40:00+00:00',
        seenTimeZone: london,
        capture: captures.newsletterPost,
      },
    ],
    setAside: {
      reason: 'duplicate',
      note: 'The same claim as “Global warming stopped in 2016”, from a reshared copy of the same post; the research continues there.',
      by: desk.chief,
    },
  },
  {
    summary: 'Climate will decide the next Marrowby council election',
    text: 'Mark my words, the climate is what will decide who runs this council next May.',
    topics: ['local-politics'],
    claimant: claimants.candidate,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://radio.marrowby-community.test/hustings-2026-11-26',
        outlet: 'Marrowby Community Radio hustings (invented)',
        seenAt: '2026-11-26T19:55:00+00:00',
        seenTimeZone: london,
      },
    ],
    setAside: {
      reason: 'not_checkable',
      note: 'A forecast about voters, with nothing in it the evidence can test.',
      by: desk.chief,
    },
  },
  {
    summary: 'The new recycling bins cost Marrowby more than they save',
    text: 'These new bins cost more in diesel to empty than they will ever save in landfill.',
    topics: ['local-politics', 'waste'],
    claimant: claimants.councillor,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://webcasts.marrowby-council.test/full-council/2026-11-19#item-3',
        outlet: 'Marrowby Borough Council webcast',
        seenAt: '2026-11-19T18:15:00+00:00',
        seenTimeZone: london,
      },
    ],
    assignee: { email: desk.editor, by: desk.editor },
    comments: [
      {
        body: 'This is council budgets, not climate science: passing it to the local government reporter.',
        by: desk.editor,
      },
    ],
    setAside: {
      reason: 'out_of_scope',
      note: 'About council spending rather than climate science; handed to the local government desk.',
      by: desk.chief,
    },
  },
  {
    summary: 'The 1930s were hotter worldwide than any decade since',
    text: 'Our grandparents had it hotter. The 1930s beat anything we have had since, all over the world.',
    topics: ['temperature-record'],
    claimant: claimants.weatherClub,
    filedBy: desk.reporter,
    appearances: [
      {
        url: 'https://marrowby-weather-watchers.test/newsletter/2026-11',
        outlet: 'Marrowby Weather Watchers newsletter (invented)',
        seenAt: '2026-11-30T16:00:00+00:00',
        seenTimeZone: london,
      },
    ],
  },
];
