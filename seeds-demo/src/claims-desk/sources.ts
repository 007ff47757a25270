import { type CreateSourceRequest } from '@skyledger/contracts';

/**
 * The demo's sources. The published science is real and cited with its real DOI (the
 * same entries as calc-library/REFERENCES.md); everything on a `.test` address is
 * invented for the demo and says so.
 */
export const sources = {
  ar6: {
    title:
      'Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the IPCC',
    authors: 'IPCC; Masson-Delmotte, V., Zhai, P., Pirani, A., et al. (eds.)',
    publisher: 'Cambridge University Press',
    year: 2021,
    doi: '10.1017/9781009157896',
    accessedOn: '2026-11-16',
    kind: 'assessment_report',
    grade: 'strong',
    gradeReason:
      'The current international assessment of the physical science, reviewed by governments and thousands of experts; the reference for forcing and attribution.',
  },
  ar6EnergyBudget: {
    title:
      'The Earth’s Energy Budget, Climate Feedbacks, and Climate Sensitivity (AR6 WG1, chapter 7)',
    authors: 'Forster, P., Storelvmo, T., Armour, K., et al.',
    publisher: 'Cambridge University Press',
    year: 2021,
    doi: '10.1017/9781009157896.009',
    accessedOn: '2026-11-17',
    kind: 'assessment_report',
    grade: 'strong',
    gradeReason:
      'Assesses the effective radiative forcing of each agent, solar included, and the water-vapour feedback: the primary source for the sizes we compare.',
  },
  ar6StateOfClimate: {
    title: 'Changing State of the Climate System (AR6 WG1, chapter 2)',
    authors: 'Gulev, S. K., Thorne, P. W., Ahn, J., et al.',
    publisher: 'Cambridge University Press',
    year: 2021,
    doi: '10.1017/9781009157896.004',
    accessedOn: '2026-11-19',
    kind: 'assessment_report',
    grade: 'strong',
    gradeReason:
      'Assesses the observed temperature and ocean-heat records across all the major datasets, with their uncertainties.',
  },
  heatFlux: {
    title: 'Earth’s surface heat flux',
    authors: 'Davies, J. H., Davies, D. R.',
    publisher: 'Solid Earth (European Geosciences Union)',
    year: 2010,
    doi: '10.5194/se-1-5-2010',
    accessedOn: '2026-11-16',
    kind: 'peer_reviewed_paper',
    grade: 'strong',
    gradeReason:
      'Peer-reviewed global compilation of heat-flow measurements; gives the total flow from the interior (about 47 TW) used in the working.',
  },
  heatFlowDataSet: {
    title: 'Heat flow from the Earth’s interior: analysis of the global data set',
    authors: 'Pollack, H. N., Hurter, S. J., Johnson, J. R.',
    publisher: 'Reviews of Geophysics',
    year: 1993,
    doi: '10.1029/93RG01249',
    accessedOn: '2026-11-24',
    kind: 'peer_reviewed_paper',
    grade: 'strong',
    gradeReason:
      'The classic peer-reviewed estimate of the oceanic and continental heat flow, independent of Davies & Davies and in agreement with it.',
  },
  ghgForcing: {
    title: 'New estimates of radiative forcing due to well mixed greenhouse gases',
    authors: 'Myhre, G., Highwood, E. J., Shine, K. P., Stordal, F.',
    publisher: 'Geophysical Research Letters',
    year: 1998,
    doi: '10.1029/98GL01908',
    accessedOn: '2026-11-21',
    kind: 'peer_reviewed_paper',
    grade: 'strong',
    gradeReason:
      'Peer-reviewed source of the logarithmic CO2 forcing expression (5.35 ln C/C0 W/m²); superseded in detail by AR6 but right in size.',
  },
  solarIrradiance: {
    title: 'A new, lower value of total solar irradiance: Evidence and climate significance',
    authors: 'Kopp, G., Lean, J. L.',
    publisher: 'Geophysical Research Letters',
    year: 2011,
    doi: '10.1029/2010GL045777',
    accessedOn: '2026-11-17',
    kind: 'peer_reviewed_paper',
    grade: 'strong',
    gradeReason:
      'Peer-reviewed measurement of the level of total solar irradiance and of its small swing over the solar cycle.',
  },
  solarInfluences: {
    title: 'Solar influences on climate',
    authors: 'Gray, L. J., Beer, J., Geller, M., et al.',
    publisher: 'Reviews of Geophysics',
    year: 2010,
    doi: '10.1029/2009RG000282',
    accessedOn: '2026-11-17',
    kind: 'peer_reviewed_paper',
    grade: 'adequate',
    gradeReason:
      'A peer-reviewed review of how the sun affects climate; older than AR6, so check its figures against chapter 7.',
  },
  trendMethod: {
    title: 'Consistency of modelled and observed temperature trends in the tropical troposphere',
    authors: 'Santer, B. D., Thorne, P. W., Haimberger, L., et al.',
    publisher: 'International Journal of Climatology',
    year: 2008,
    doi: '10.1002/joc.1756',
    accessedOn: '2026-11-20',
    kind: 'peer_reviewed_paper',
    grade: 'adequate',
    gradeReason:
      'Cited for its method only: the trend interval corrected for autocorrelation that the trend working uses.',
  },
  stationSeries: {
    title: 'Marrowby station monthly mean temperature, 1921–2025 (synthetic demo series)',
    authors: 'Wenlow Regional Climate Service (invented)',
    publisher: 'Wenlow Regional Climate Service (invented)',
    year: 2026,
    url: 'https://data.wenlow-climate.test/stations/marrowby/monthly-mean-temperature',
    accessedOn: '2026-11-20',
    kind: 'agency_dataset',
    grade: 'adequate',
    gradeReason:
      'Demo item: a synthetic series standing in for a station record. One station, so it shows local detail but says little about the globe.',
  },
  stationStatement: {
    title: 'How readings at the Marrowby station are checked (demo statement)',
    authors: 'Wenlow Regional Climate Service (invented)',
    publisher: 'Wenlow Regional Climate Service (invented)',
    year: 2026,
    url: 'https://www.wenlow-climate.test/news/marrowby-station-quality-control',
    accessedOn: '2026-11-26',
    kind: 'agency_statement',
    grade: 'adequate',
    gradeReason:
      'Demo item. The agency describes its own checks, so it is not independent of the record it defends; pair it with the neighbouring stations.',
  },
  forumRelease: {
    title: 'The sun, not your boiler, is warming Wenlow (press release)',
    authors: 'Wenlow Energy Forum (invented)',
    publisher: 'Wenlow Energy Forum (invented)',
    year: 2026,
    url: 'https://www.wenlow-energy-forum.test/news/the-sun-not-your-boiler',
    accessedOn: '2026-11-14',
    kind: 'press_release',
    grade: 'unreliable',
    gradeReason:
      'Demo item. Published by an interested party; cites no measurement of solar output. Cited only as the origin of the claim.',
  },
  newsletterPost: {
    title: 'Nobody wants to talk about 2016 (newsletter post)',
    authors: 'Rufus Kettleby (invented)',
    publisher: 'The Long Weather (invented)',
    year: 2026,
    url: 'https://thelongweather.test/posts/nobody-wants-to-talk-about-2016',
    accessedOn: '2026-11-20',
    kind: 'blog_or_social_post',
    grade: 'unreliable',
    gradeReason:
      'Demo item. Starts the chart at the 2016 El Niño peak and shows no uncertainty; cited only as where the claim appeared.',
  },
  courierReport: {
    title: 'Councillor: seabed volcanoes are cooking the sea (news report)',
    authors: 'Marrowby Courier staff (invented)',
    publisher: 'The Marrowby Courier (invented)',
    year: 2026,
    url: 'https://www.marrowby-courier.test/news/2026/11/seabed-volcanoes',
    accessedOn: '2026-11-24',
    kind: 'news_report',
    grade: 'weak',
    gradeReason:
      'Demo item. A second-hand report of the remarks: useful for the wording and the date, not as evidence for the claim.',
  },
  cloudPreprint: {
    title: 'Cosmic-ray flux and low cloud over the Wenlow uplands, 2009–2025 (demo preprint)',
    authors: 'Ellery, M., Fenn, T. (invented)',
    publisher: 'Wenlow Uplands Research Institute preprints (invented)',
    year: 2026,
    url: 'https://preprints.wenlow-uplands.test/2026/0412',
    accessedOn: '2026-11-27',
    kind: 'preprint',
    grade: 'weak',
    gradeReason:
      'Demo item. Not yet peer reviewed; one region and a short record, and the authors say the link is not significant.',
  },
  geophysicistInterview: {
    title: 'Interview with Dr Ilse Marchbank on geothermal heat flow',
    authors: 'Tamsin Ferrow (Marrowby Gazette)',
    publisher: 'Marrowby Gazette science desk',
    year: 2026,
    accessedOn: '2026-11-18',
    kind: 'expert_interview',
    grade: 'adequate',
    gradeReason:
      'Our own interview with an independent geophysicist who checked the arithmetic; expert judgement, not a publication. Invented for the demo.',
  },
} satisfies Record<string, CreateSourceRequest>;
