import { type CalculatorId } from '@skyledger/calc';
import { type ReliabilityGrade, type SourceKind } from '@skyledger/contracts';

/**
 * What generated claims are made of: claim patterns on the PRODUCT.md topics, invented
 * names, places, publishers and sources. Generated rows are for scale tests and the
 * benchmark, never the demo.
 */
/** One way of putting a kind of claim: what was said, and the desk's one-line summary of it. */
export interface Phrasing {
  summary: string;
  text: string;
}

export interface ClaimPattern {
  /**
   * The ways it is put, each as likely. A kind of claim recurs in different words, and a
   * search index over one sentence copied thousands of times measures nothing a desk sees.
   */
  phrasings: readonly Phrasing[];
  topics: readonly string[];
  /** How often this kind of claim turns up, relative to the others. */
  weight: number;
  /** The workings a researched claim of this kind gets, in order (keys of `calculations`). */
  calculations: readonly CalculationKey[];
  verdict: PatternVerdict;
}

/** The levels of the default rating scale, as the API's Verdicts migration writes them. */
export const defaultRatingIds = [
  'holds-up',
  'holds-with-caveats',
  'stretched',
  'unfounded',
  'contradicted',
  'not-checkable',
] as const;
export type RatingLevelId = (typeof defaultRatingIds)[number];

/** What the desk concludes about a kind of claim: the verdict of each generated one. */
export interface PatternVerdict {
  /** Levels of the default rating scale, with how often each is given. */
  ratings: Readonly<Partial<Record<RatingLevelId, number>>>;
  /** The fact the explainer leads with. */
  fact: string;
  bottomLine: string;
  /** Why the claim misleads, after the claim itself. */
  misleads: string;
}

/**
 * The handful of calculator runs generated workings are made of. Each is run once by
 * @skyledger/calc and its result reused, so every generated working holds real outputs
 * that the server's recomputation gives again.
 */
export const calculations = {
  'geothermal-flux': {
    calculatorId: 'heat-flux-compare',
    inputs: {},
    note: 'The global geothermal heat flow set against the forcing, with the library’s defaults.',
  },
  'solar-change': {
    calculatorId: 'solar-change',
    inputs: { irradianceChange: 0.1 },
    note: 'A change of solar irradiance as large as a solar cycle’s, against the greenhouse forcing.',
  },
  sensitivity: {
    calculatorId: 'warming-from-forcing',
    inputs: { ecs: { low: 2, high: 5 } },
    note: 'Warming for today’s forcing across the very likely range of climate sensitivity.',
  },
  'co2-forcing': {
    calculatorId: 'ghg-forcing',
    inputs: {},
    note: 'Forcing of the measured rise of CO2, CH4 and N2O by the AR6 expressions.',
  },
  'greenhouse-layer': {
    calculatorId: 'layer-atmosphere',
    inputs: { layerEmissivity: 0.78 },
    note: 'One gray layer of air that absorbs most of the outgoing infrared.',
  },
  'carbon-units': {
    calculatorId: 'carbon-units',
    inputs: {},
    note: 'Cumulative emissions as a change of concentration, with the library’s defaults.',
  },
  'energy-balance': {
    calculatorId: 'energy-balance',
    inputs: {},
    note: 'The planet’s emission temperature from the sunlight it absorbs.',
  },
  'ocean-heat': {
    calculatorId: 'ocean-heat',
    inputs: {},
    note: 'The measured gain of ocean heat as a mean flux over the planet.',
  },
} as const satisfies Record<
  string,
  { calculatorId: CalculatorId; inputs: Readonly<Record<string, unknown>>; note: string }
>;
export type CalculationKey = keyof typeof calculations;

/** What an update note to a generated explainer says, by its kind. */
export const updateNotes = {
  correction:
    'An earlier version gave the wrong year for the record it quoted; the figure is now right and the rating is unchanged.',
  clarification: 'We made clearer which measurements the working uses.',
  update: 'Updated with the latest year of measurements; the finding stands.',
} as const;

/** `{place}` and `{year}` are filled in per claim. */
export const claimPatterns: readonly ClaimPattern[] = [
  {
    phrasings: [
      {
        summary: 'Heat from the Earth’s core is what warms {place}',
        text: 'The ground under {place} is warming us from below; the core is getting hotter.',
      },
      {
        summary: 'Warming in {place} comes up from the ground, not the sky',
        text: 'The heat is rising out of the rock under {place}; the planet is cooking from the inside.',
      },
      {
        summary: 'Geothermal heat explains the milder winters around {place}',
        text: 'Molten rock close to the surface near {place} is why our winters have gone mild since {year}.',
      },
      {
        summary: 'The planet’s hot interior, not gases, drives the warming',
        text: 'Forget the gases: the Earth’s interior gives off far more heat than any chimney ever could.',
      },
    ],
    topics: ['geothermal', 'energy-budget'],
    weight: 6,
    calculations: ['geothermal-flux'],
    verdict: {
      ratings: { contradicted: 8, stretched: 1 },
      fact: 'Heat rising from the Earth’s interior averages under a tenth of a watt per square metre, and it has not changed in centuries.',
      bottomLine:
        'The Earth’s interior does leak heat, but about thirty times less than the extra heat greenhouse gases now trap, and that leak has not grown.',
      misleads:
        'It takes a real flow of heat and gives it a size it does not have; the working sets the two fluxes side by side.',
    },
  },
  {
    phrasings: [
      {
        summary: 'The sun has been getting brighter since {year}',
        text: 'Since {year} the sun has simply been putting out more heat, and that is all warming is.',
      },
      {
        summary: 'Solar output explains every degree of recent warming',
        text: 'It is the sun. Solar activity climbed after {year} and the temperatures simply followed it.',
      },
      {
        summary: 'A stronger sun, not carbon dioxide, warmed {place}',
        text: 'Sunshine hours in {place} are up since {year}; a stronger sun is the whole story.',
      },
      {
        summary: 'Sunspot cycles control our temperatures',
        text: 'Count the sunspots and you can predict the temperature; every warm spell follows a busy solar cycle.',
      },
    ],
    topics: ['solar', 'attribution'],
    weight: 8,
    calculations: ['solar-change'],
    verdict: {
      ratings: { contradicted: 7, unfounded: 2 },
      fact: 'Satellites have measured the sun’s output since 1978; it has not risen, while the planet has kept warming.',
      bottomLine:
        'The sun has not brightened over the satellite era, and a brighter sun would warm the upper atmosphere too, which is cooling instead.',
      misleads:
        'It points at the one source of heat that has been measured to stay flat; the working sets a change of sunlight against the greenhouse forcing.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Global warming stopped in {year}',
        text: 'There has been no warming since {year}; the record has been flat ever since.',
      },
      {
        summary: 'There has been a pause in warming since {year}',
        text: 'Temperatures have gone sideways since {year}; the so-called crisis paused years ago.',
      },
      {
        summary: 'The planet has been cooling since {year}',
        text: 'Global temperatures peaked in {year} and have been sliding downwards ever since.',
      },
      {
        summary: 'Thermometers around {place} show no rise since {year}',
        text: 'Our readings in {place} have not budged since {year}, whatever the headlines say.',
      },
    ],
    topics: ['temperature-record', 'trends'],
    weight: 10,
    calculations: ['sensitivity'],
    verdict: {
      ratings: { contradicted: 8, stretched: 1 },
      fact: 'Each of the last four decades was warmer than the one before it, in every major record of global temperature.',
      bottomLine:
        'Starting from an unusually hot year makes any short stretch look flat; over decades the warming has not paused.',
      misleads:
        'A trend needs many years, and a start year chosen after the fact says more about the choice than about the climate.',
    },
  },
  {
    phrasings: [
      {
        summary: 'CO2 is too small a share of the air to matter',
        text: 'Carbon dioxide is only 0.04 per cent of the atmosphere, far too little to change anything.',
      },
      {
        summary: 'A trace gas cannot heat a whole planet',
        text: 'Four molecules in every ten thousand cannot possibly control the climate of an entire planet.',
      },
      {
        summary: 'Carbon dioxide is too dilute to trap meaningful heat',
        text: 'There is so little carbon dioxide up there that its effect on heat must be negligible.',
      },
      {
        summary: 'Human CO2 is a tiny fraction of a tiny fraction',
        text: 'Humans make three per cent of a gas that is 0.04 per cent of the air; that is nothing.',
      },
    ],
    topics: ['carbon-dioxide', 'greenhouse-effect'],
    weight: 9,
    calculations: ['co2-forcing'],
    verdict: {
      ratings: { contradicted: 8 },
      fact: 'Carbon dioxide absorbs infrared radiation that nitrogen and oxygen, the bulk of the air, let straight through.',
      bottomLine:
        'A small share of the air can still matter: the rise of CO2 since 1750 adds about two watts per square metre of forcing.',
      misleads:
        'It treats an effect as if it grew with the amount of gas alone; the working computes the forcing from the measured rise.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Water vapour, not CO2, does all the greenhouse warming',
        text: 'Water vapour is the real greenhouse gas; carbon dioxide is a rounding error.',
      },
      {
        summary: 'Humidity, not carbon dioxide, controls the temperature',
        text: 'Humidity drives the temperature; blaming carbon dioxide ignores ninety-five per cent of the effect.',
      },
      {
        summary: 'Moisture outweighs any effect of CO2',
        text: 'Moisture in the air around {place} does the real work of holding heat in, not carbon.',
      },
      {
        summary: 'Carbon dioxide’s role is swamped by water vapour',
        text: 'Steam from the sea dwarfs every tonne of carbon dioxide that people have ever emitted.',
      },
    ],
    topics: ['water-vapour', 'greenhouse-effect'],
    weight: 5,
    calculations: ['greenhouse-layer'],
    verdict: {
      ratings: { stretched: 5, contradicted: 3 },
      fact: 'Water vapour is the largest greenhouse gas, but how much of it the air holds is set by temperature, so it follows warming rather than starting it.',
      bottomLine:
        'Water vapour amplifies the warming CO2 starts; it cannot drive a lasting warming itself, because extra vapour rains out within days.',
      misleads:
        'It turns a feedback into a cause; the working shows how an absorbing layer of air warms the surface.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Volcanoes put out more CO2 than people do',
        text: 'One eruption near {place} released more carbon dioxide than all our cars in a year.',
      },
      {
        summary: 'Undersea eruptions emit more carbon than industry',
        text: 'Thousands of hidden volcanoes under the oceans pump out more carbon than every factory on Earth.',
      },
      {
        summary: 'A single volcano undoes all our emissions cuts',
        text: 'The {year} eruption cancelled out every emissions cut the council in {place} ever made.',
      },
      {
        summary: 'Natural vents outgas far more CO2 than humanity',
        text: 'Vents and fissures leak more carbon dioxide each year than all human activity put together.',
      },
    ],
    topics: ['volcanoes', 'carbon-dioxide'],
    weight: 5,
    calculations: ['carbon-units'],
    verdict: {
      ratings: { contradicted: 9 },
      fact: 'The world’s volcanoes, on land and under the sea, emit well under a billion tonnes of CO2 a year, about one per cent of what human activity emits.',
      bottomLine:
        'Human emissions are around a hundred times those of all the world’s volcanoes, year after year.',
      misleads:
        'One large eruption is dramatic but brief; the working turns emissions into the change of concentration they cause.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Cosmic rays set the climate through the clouds',
        text: 'Cosmic rays seed the clouds, and the clouds decide the temperature, not us.',
      },
      {
        summary: 'Galactic particles drive cloud cover and the climate',
        text: 'Particles from exploding stars make clouds, and cloud cover is what really controls the climate.',
      },
      {
        summary: 'A weaker solar wind lets in rays that change the weather',
        text: 'When the solar wind weakens, more cosmic rays arrive, more clouds form and the weather shifts.',
      },
      {
        summary: 'Fewer cosmic rays since {year} explain the warming',
        text: 'Fewer cosmic rays since {year} means fewer clouds over {place} and more sunshine getting through.',
      },
    ],
    topics: ['cosmic-rays', 'clouds'],
    weight: 3,
    calculations: ['energy-balance'],
    verdict: {
      ratings: { unfounded: 6, contradicted: 3 },
      fact: 'The flux of cosmic rays reaching the Earth shows no trend over the decades in which the planet warmed.',
      bottomLine:
        'Cosmic rays may nudge cloud formation slightly, but their flux has not changed in a way that could explain the warming.',
      misleads:
        'A possible mechanism is not a measured cause; the working shows how the planet’s temperature follows the sunlight it absorbs.',
    },
  },
  {
    phrasings: [
      {
        summary: 'The oceans are heated by undersea volcanoes',
        text: 'The sea off {place} is warming because of volcanoes on the seabed.',
      },
      {
        summary: 'Seabed vents are heating the bay off {place}',
        text: 'Hot springs on the seabed explain why the bay off {place} is warmer every summer.',
      },
      {
        summary: 'Ocean warming comes from below, not from the air',
        text: 'The oceans are warming from the bottom up, which no amount of carbon dioxide could do.',
      },
      {
        summary: 'Hidden eruptions are behind marine heatwaves',
        text: 'The marine heatwave of {year} was caused by eruptions nobody bothered to monitor.',
      },
    ],
    topics: ['ocean-heat', 'volcanoes'],
    weight: 3,
    calculations: ['ocean-heat', 'geothermal-flux'],
    verdict: {
      ratings: { contradicted: 8 },
      fact: 'The oceans are warming from the top down, the pattern of heat arriving from the air above rather than from the seabed.',
      bottomLine:
        'The oceans have gained far more heat than all the heat flowing up through the seafloor could supply.',
      misleads:
        'It blames a steady, small flow of heat for a large and growing gain; the working turns the measured gain into a flux.',
    },
  },
  {
    phrasings: [
      {
        summary: 'The {year} cold snap in {place} disproves global warming',
        text: 'We had snow in {place} in {year}. So much for global warming.',
      },
      {
        summary: 'A harsh winter in {place} shows the planet is not warming',
        text: 'The frost in {place} lasted for weeks in {year}; tell me again about the warming planet.',
      },
      {
        summary: 'Record cold in {year} proves climate models wrong',
        text: 'Record lows across the county in {year} prove the climate models have it backwards.',
      },
      {
        summary: 'Snowfall in {place} rules out global warming',
        text: 'If the world were heating up, {place} would not have been buried in snow in {year}.',
      },
    ],
    topics: ['temperature-record', 'weather-vs-climate'],
    weight: 7,
    calculations: [],
    verdict: {
      ratings: { contradicted: 7, 'not-checkable': 1 },
      fact: 'Global temperature is the average over the whole planet and many years; one cold spell in one town is weather.',
      bottomLine:
        'A cold snap in one place says nothing about the global trend, which is measured over decades and over the whole planet.',
      misleads: 'It swaps weather for climate.',
    },
  },
  {
    phrasings: [
      {
        summary: 'The {place} weather station was moved to make it warmer',
        text: 'They moved the {place} station next to a car park in {year} and called it warming.',
      },
      {
        summary: 'The {place} thermometer sits beside a heat source',
        text: 'The thermometer in {place} is right beside an air-conditioning vent, so of course it reads high.',
      },
      {
        summary: 'Temperature records at {place} were adjusted upwards',
        text: 'The records for {place} were quietly adjusted in {year} to manufacture a warming trend.',
      },
      {
        summary: 'Relocated stations explain the warming in {place}',
        text: 'Half the stations near {place} were relocated to airfields, where tarmac makes them warmer.',
      },
    ],
    topics: ['station-data', 'urban-heat'],
    weight: 4,
    calculations: [],
    verdict: {
      ratings: { stretched: 5, unfounded: 3 },
      fact: 'Station moves are found and adjusted for, and satellites and untouched rural stations show the same warming.',
      bottomLine:
        'Moving a station can shift its readings, which is why records are adjusted, but the warming does not rest on any one station.',
      misleads: 'It takes a known and corrected problem and treats it as the whole of the record.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Sea level at {place} has not risen since {year}',
        text: 'The harbour wall at {place} has the same high-water mark as in {year}.',
      },
      {
        summary: 'Tide gauges at {place} show no sea-level rise',
        text: 'The tide gauge in {place} shows the sea exactly where it stood in {year}.',
      },
      {
        summary: 'The sea at {place} is falling, not rising',
        text: 'Boats at {place} moor lower than they did in {year}; the sea is dropping.',
      },
      {
        summary: 'Flooding at {place} has nothing to do with the sea',
        text: 'The quay at {place} floods because the land is sinking, not because the sea is rising.',
      },
    ],
    topics: ['sea-level'],
    weight: 5,
    calculations: [],
    verdict: {
      ratings: { contradicted: 6, stretched: 2 },
      fact: 'Tide gauges and satellites show global sea level rising by a few millimetres a year.',
      bottomLine:
        'A mark on a harbour wall cannot show a rise of a few millimetres a year, and the land itself can move; measured sea level is rising.',
      misleads: 'One unmeasured mark stands in for a century of careful records.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Arctic sea ice has recovered to its {year} extent',
        text: 'The Arctic ice is back where it was in {year}; the melt has reversed.',
      },
      {
        summary: 'Polar ice is growing again',
        text: 'The polar ice caps are growing again, and the scientists have gone quiet about it.',
      },
      {
        summary: 'Sea ice in {year} was the thickest in decades',
        text: 'Satellite pictures show the ice in {year} was thicker than it has been for decades.',
      },
      {
        summary: 'Antarctic gains cancel out Arctic losses',
        text: 'Whatever melts in the north freezes back in the south; overall the ice is holding steady.',
      },
    ],
    topics: ['sea-ice', 'trends'],
    weight: 4,
    calculations: [],
    verdict: {
      ratings: { contradicted: 7 },
      fact: 'The Arctic’s late-summer ice extent has fallen by about an eighth per decade since satellite records began in 1979.',
      bottomLine:
        'Arctic ice recovers a little in some years, but the summer minimum is far below where it was in the 1980s and still falling.',
      misleads: 'It compares one good year with another and leaves out the trend between them.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Climate has always changed, so today’s change is natural',
        text: 'The climate changed long before factories, so this is just another natural cycle.',
      },
      {
        summary: 'Ice ages came and went without people',
        text: 'Ice ages came and went without a single car, so people cannot be the cause now.',
      },
      {
        summary: 'Medieval vineyards show it was warmer before factories',
        text: 'There were vineyards near {place} in the Middle Ages; it was warmer then without any factories.',
      },
      {
        summary: 'Today’s warming is the top of a natural cycle',
        text: 'Warm and cold periods follow each other naturally; we are simply at the top of a cycle.',
      },
    ],
    topics: ['attribution', 'paleoclimate'],
    weight: 7,
    calculations: ['co2-forcing'],
    verdict: {
      ratings: { stretched: 6, contradicted: 3 },
      fact: 'Past changes of climate had causes, such as orbital cycles and volcanoes; today’s warming is traced to greenhouse gases by its pattern and its pace.',
      bottomLine:
        'That the climate changed before does not make this change natural, any more than past forest fires prove every fire natural.',
      misleads:
        'It takes natural change in the past as proof of a natural cause now; the working computes the forcing of the greenhouse gases measured today.',
    },
  },
  {
    phrasings: [
      {
        summary: 'The 1930s were hotter than today',
        text: 'The 1930s were the hottest decade on record, hotter than anything since.',
      },
      {
        summary: 'The hottest summers were decades ago',
        text: 'The summers of my childhood in {place} were far hotter than anything we get now.',
      },
      {
        summary: 'Old heat records still stand unbeaten',
        text: 'Most of the county’s heat records were set before {year} and still have not been broken.',
      },
      {
        summary: 'The drought years of the thirties beat modern heat',
        text: 'The drought years of the thirties were hotter than today, and there was far less carbon then.',
      },
    ],
    topics: ['temperature-record'],
    weight: 4,
    calculations: [],
    verdict: {
      ratings: { contradicted: 7, stretched: 2 },
      fact: 'The 1930s were hot in parts of North America, but the world as a whole is now around a degree warmer than it was then.',
      bottomLine:
        'A decade of regional heatwaves is not a global record; every recent decade has been warmer worldwide than the 1930s.',
      misleads: 'It mixes up one region with the whole globe.',
    },
  },
  {
    phrasings: [
      {
        summary: 'More CO2 only greens the planet, it cannot warm it',
        text: 'Carbon dioxide is plant food; more of it makes {place} greener, not warmer.',
      },
      {
        summary: 'Extra carbon dioxide is good for farming',
        text: 'Growers around {place} pump carbon dioxide into glasshouses; more in the air means bigger harvests.',
      },
      {
        summary: 'A greening Earth shows CO2 is harmless',
        text: 'The planet has got greener since {year}, which proves extra carbon dioxide is a benefit.',
      },
      {
        summary: 'Plants need more CO2, not less',
        text: 'Cutting carbon dioxide would starve the crops; plants grow best at three times today’s level.',
      },
    ],
    topics: ['carbon-dioxide', 'ecosystems'],
    weight: 3,
    calculations: ['co2-forcing'],
    verdict: {
      ratings: { stretched: 6, contradicted: 2 },
      fact: 'Extra CO2 does help many plants grow, and the same extra CO2 traps heat; both happen at once.',
      bottomLine:
        'Greening and warming are not alternatives: the same rise of CO2 does both, and the warming is measured.',
      misleads:
        'It offers a choice between two effects that happen together; the working computes the forcing of the added CO2.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Heat pumps in {place} raise emissions',
        text: 'Every heat pump fitted in {place} since {year} has raised emissions, not cut them.',
      },
      {
        summary: 'Heat pumps burn more fuel than gas boilers',
        text: 'A heat pump in {place} runs on electricity from gas-fired power stations, so it burns more than a boiler.',
      },
      {
        summary: 'Heat pumps do not work in cold winters',
        text: 'In a {place} winter a heat pump just blows cold air and the bills go through the roof.',
      },
      {
        summary: 'Electric heating is dirtier than gas',
        text: 'Switching {place} homes to electric heating since {year} has made the air dirtier, not cleaner.',
      },
    ],
    topics: ['energy', 'emissions'],
    weight: 3,
    calculations: [],
    verdict: {
      ratings: { contradicted: 6, stretched: 2 },
      fact: 'A heat pump delivers three or more units of heat for each unit of electricity it uses.',
      bottomLine:
        'Replacing a gas boiler with a heat pump cuts emissions on all but the most coal-heavy electricity grids.',
      misleads:
        'It counts the electricity a heat pump uses and forgets the gas it no longer burns.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Warming since {year} is all from urban heat islands',
        text: 'Towns like {place} grew around the thermometers; that is the whole of the warming.',
      },
      {
        summary: 'Thermometers in towns measure concrete, not climate',
        text: 'Put a thermometer in {place} town centre and you measure the concrete, not the climate.',
      },
      {
        summary: 'Rural stations show no warming since {year}',
        text: 'The countryside stations near {place} show no warming since {year}; only the towns have warmed.',
      },
      {
        summary: 'Town growth, not greenhouse gases, explains the record',
        text: 'Every new estate around {place} adds a tenth of a degree to the record; that is all it is.',
      },
    ],
    topics: ['urban-heat', 'station-data'],
    weight: 4,
    calculations: [],
    verdict: {
      ratings: { contradicted: 6, stretched: 3 },
      fact: 'Towns do run warmer than the countryside, and records remove that effect; the oceans and rural stations have warmed too.',
      bottomLine:
        'Urban heat is real locally but cannot explain a warming that is also measured over the open ocean and in the countryside.',
      misleads: 'It takes a local effect for a global one.',
    },
  },
  {
    phrasings: [
      {
        summary: 'Climate sensitivity is too low for CO2 to matter',
        text: 'Doubling carbon dioxide would warm us by a fraction of a degree at most.',
      },
      {
        summary: 'Doubling CO2 would barely change the temperature',
        text: 'Even if carbon dioxide doubled, the temperature would hardly notice; the effect is saturated.',
      },
      {
        summary: 'The greenhouse effect of CO2 is already saturated',
        text: 'Carbon dioxide already absorbs all the heat it can, so adding more changes nothing.',
      },
      {
        summary: 'Climate models run far too hot',
        text: 'The models assume a sensitivity three times too high; real warming will be trivial.',
      },
    ],
    topics: ['climate-sensitivity', 'carbon-dioxide'],
    weight: 3,
    calculations: ['sensitivity'],
    verdict: {
      ratings: { contradicted: 7, unfounded: 2 },
      fact: 'A doubling of CO2 very likely (90–100 %) warms the planet by 2 to 5 °C once it settles, with a best estimate of 3 °C.',
      bottomLine:
        'Measurements, past climates and physics together rule out a warming of only a fraction of a degree for doubled CO2.',
      misleads:
        'It quotes the warming without feedbacks and leaves out the feedbacks that are measured; the working carries the assessed range through.',
    },
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

/** Places the claims are made about: a few named ones and invented compounds. */
const namedPlaces = [
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

const placeHeads = [
  'Brisk',
  'Caddle',
  'Furl',
  'Hask',
  'Lorrow',
  'Marl',
  'Nidder',
  'Ossel',
  'Pell',
  'Quell',
  'Rundle',
  'Sallow',
  'Skerrow',
  'Tarn',
  'Treck',
  'Umber',
  'Vell',
  'Wendle',
  'Yeld',
];
const placeTails = [
  'by',
  'combe',
  'ford',
  'holt',
  'ley',
  'mouth',
  'stead',
  'thorpe',
  'well',
  'wick',
];

export const places: readonly string[] = [
  ...namedPlaces,
  ...placeHeads.flatMap((head) => placeTails.map((tail) => head + tail)),
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
