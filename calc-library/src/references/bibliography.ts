/**
 * The bibliography of the library: every constant, default and formula cites one of these
 * keys (AuthorYear). `REFERENCES.md` is generated from this list
 * (`npm run references -w calc-library`) and a test keeps the two equal.
 */
export interface Reference {
  /** AuthorYear key, e.g. `Myhre1998`. */
  readonly key: string;
  /** Full citation in author–year style. */
  readonly citation: string;
  /** DOI without the resolver prefix, where the work has one. */
  readonly doi?: string;
  /** A stable web address, where the work has no DOI or the DOI does not lead to the text. */
  readonly url?: string;
}

const referenceList = [
  {
    key: 'Abramowitz1964',
    citation:
      'Abramowitz, M., & Stegun, I. A. (Eds.) (1964). Handbook of Mathematical Functions with Formulas, Graphs, and Mathematical Tables. National Bureau of Standards, Applied Mathematics Series 55.',
  },
  {
    key: 'Archer2012',
    citation:
      'Archer, D. (2012). Global Warming: Understanding the Forecast (2nd ed.), chapter 3 "The Layer Model". Wiley.',
  },
  {
    key: 'Ballantyne2012',
    citation:
      'Ballantyne, A. P., Alden, C. B., Miller, J. B., Tans, P. P., & White, J. W. C. (2012). Increase in observed net carbon dioxide uptake by land and oceans during the past 50 years. Nature, 488, 70–72.',
    doi: '10.1038/nature11299',
  },
  {
    key: 'Box1958',
    citation:
      'Box, G. E. P., & Muller, M. E. (1958). A note on the generation of random normal deviates. The Annals of Mathematical Statistics, 29(2), 610–611.',
    doi: '10.1214/aoms/1177706645',
  },
  {
    key: 'Davies2010',
    citation:
      "Davies, J. H., & Davies, D. R. (2010). Earth's surface heat flux. Solid Earth, 1, 5–24.",
    doi: '10.5194/se-1-5-2010',
  },
  {
    key: 'Eakins2010',
    citation:
      "Eakins, B. W., & Sharman, G. F. (2010). Volumes of the World's Oceans from ETOPO1. NOAA National Geophysical Data Center, Boulder, CO.",
    url: 'https://www.ngdc.noaa.gov/mgg/global/etopo1_ocean_volumes.html',
  },
  {
    key: 'Etminan2016',
    citation:
      'Etminan, M., Myhre, G., Highwood, E. J., & Shine, K. P. (2016). Radiative forcing of carbon dioxide, methane, and nitrous oxide: A significant revision of the methane radiative forcing. Geophysical Research Letters, 43, 12,614–12,623.',
    doi: '10.1002/2016GL071930',
  },
  {
    key: 'Forster2021',
    citation:
      "Forster, P., Storelvmo, T., Armour, K., Collins, W., Dufresne, J.-L., Frame, D., Lunt, D. J., Mauritsen, T., Palmer, M. D., Watanabe, M., Wild, M., & Zhang, H. (2021). The Earth's Energy Budget, Climate Feedbacks, and Climate Sensitivity. In Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the IPCC (chapter 7, pp. 923–1054). Cambridge University Press.",
    doi: '10.1017/9781009157896.009',
  },
  {
    key: 'Friedlingstein2022',
    citation:
      'Friedlingstein, P., O’Sullivan, M., Jones, M. W., Andrew, R. M., Gregor, L., Hauck, J., et al. (2022). Global Carbon Budget 2022. Earth System Science Data, 14, 4811–4900.',
    doi: '10.5194/essd-14-4811-2022',
  },
  {
    key: 'Gray2010',
    citation:
      'Gray, L. J., Beer, J., Geller, M., Haigh, J. D., Lockwood, M., Matthes, K., et al. (2010). Solar influences on climate. Reviews of Geophysics, 48, RG4001.',
    doi: '10.1029/2009RG000282',
  },
  {
    key: 'Gulev2021',
    citation:
      'Gulev, S. K., Thorne, P. W., Ahn, J., Dentener, F. J., Domingues, C. M., Gerland, S., et al. (2021). Changing State of the Climate System. In Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the IPCC (chapter 2, pp. 287–422). Cambridge University Press.',
    doi: '10.1017/9781009157896.004',
  },
  {
    key: 'Hyndman1996',
    citation:
      'Hyndman, R. J., & Fan, Y. (1996). Sample quantiles in statistical packages. The American Statistician, 50(4), 361–365.',
    doi: '10.1080/00031305.1996.10473566',
  },
  {
    key: 'IOC2010',
    citation:
      'IOC, SCOR, & IAPSO (2010). The international thermodynamic equation of seawater – 2010: Calculation and use of thermodynamic properties (TEOS-10). Intergovernmental Oceanographic Commission, Manuals and Guides No. 56. UNESCO.',
    url: 'https://www.teos-10.org/pubs/TEOS-10_Manual.pdf',
  },
  {
    key: 'IPCC2021',
    citation:
      'IPCC (2021). Summary for Policymakers. In Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the IPCC (pp. 3–32). Cambridge University Press.',
    doi: '10.1017/9781009157896.001',
  },
  {
    key: 'Kopp2011',
    citation:
      'Kopp, G., & Lean, J. L. (2011). A new, lower value of total solar irradiance: Evidence and climate significance. Geophysical Research Letters, 38, L01706.',
    doi: '10.1029/2010GL045777',
  },
  {
    key: 'Marsaglia2003',
    citation: 'Marsaglia, G. (2003). Xorshift RNGs. Journal of Statistical Software, 8(14), 1–6.',
    doi: '10.18637/jss.v008.i14',
  },
  {
    key: 'Meinshausen2020',
    citation:
      'Meinshausen, M., Nicholls, Z. R. J., Lewis, J., Gidden, M. J., Vogel, E., Freund, M., et al. (2020). The shared socio-economic pathway (SSP) greenhouse gas concentrations and their extensions to 2500. Geoscientific Model Development, 13, 3571–3605.',
    doi: '10.5194/gmd-13-3571-2020',
  },
  {
    key: 'Moritz2000',
    citation: 'Moritz, H. (2000). Geodetic Reference System 1980. Journal of Geodesy, 74, 128–133.',
    doi: '10.1007/s001900050278',
  },
  {
    key: 'Myhre1998',
    citation:
      'Myhre, G., Highwood, E. J., Shine, K. P., & Stordal, F. (1998). New estimates of radiative forcing due to well mixed greenhouse gases. Geophysical Research Letters, 25(14), 2715–2718.',
    doi: '10.1029/98GL01908',
  },
  {
    key: 'Myhre2013',
    citation:
      'Myhre, G., Shindell, D., Bréon, F.-M., Collins, W., Fuglestvedt, J., Huang, J., et al. (2013). Anthropogenic and Natural Radiative Forcing. In Climate Change 2013: The Physical Science Basis. Contribution of Working Group I to the Fifth Assessment Report of the IPCC (chapter 8). Cambridge University Press.',
    doi: '10.1017/CBO9781107415324.018',
  },
  {
    key: 'NIST2012',
    citation:
      "NIST/SEMATECH (2012). e-Handbook of Statistical Methods, section 1.3.6.7.2: Critical values of the Student's t distribution. National Institute of Standards and Technology.",
    url: 'https://www.itl.nist.gov/div898/handbook/eda/section3/eda3672.htm',
  },
  {
    key: 'Olver2010',
    citation:
      'Olver, F. W. J., Lozier, D. W., Boisvert, R. F., & Clark, C. W. (Eds.) (2010). NIST Handbook of Mathematical Functions (online as the NIST Digital Library of Mathematical Functions, DLMF). Cambridge University Press.',
    url: 'https://dlmf.nist.gov/',
  },
  {
    key: 'Pierrehumbert2010',
    citation:
      'Pierrehumbert, R. T. (2010). Principles of Planetary Climate. Cambridge University Press.',
    doi: '10.1017/CBO9780511780783',
  },
  {
    key: 'Pollack1993',
    citation:
      "Pollack, H. N., Hurter, S. J., & Johnson, J. R. (1993). Heat flow from the Earth's interior: Analysis of the global data set. Reviews of Geophysics, 31(3), 267–280.",
    doi: '10.1029/93RG01249',
  },
  {
    key: 'Press2007',
    citation:
      'Press, W. H., Teukolsky, S. A., Vetterling, W. T., & Flannery, B. P. (2007). Numerical Recipes: The Art of Scientific Computing (3rd ed.), sections 2.2 (Gaussian elimination), 5.2 (modified Lentz method) and 6.4 (incomplete beta function). Cambridge University Press.',
  },
  {
    key: 'Prohaska2022',
    citation:
      'Prohaska, T., Irrgeher, J., Benefield, J., Böhlke, J. K., Chesson, L. A., Coplen, T. B., et al. (2022). Standard atomic weights of the elements 2021 (IUPAC Technical Report). Pure and Applied Chemistry, 94(5), 573–600.',
    doi: '10.1515/pac-2019-0603',
  },
  {
    key: 'Ramaswamy2001',
    citation:
      'Ramaswamy, V., Boucher, O., Haigh, J., Hauglustaine, D., Haywood, J., Myhre, G., et al. (2001). Radiative Forcing of Climate Change. In Climate Change 2001: The Scientific Basis. Contribution of Working Group I to the Third Assessment Report of the IPCC (chapter 6). Cambridge University Press.',
    url: 'https://www.ipcc.ch/report/ar3/wg1/',
  },
  {
    key: 'Santer2000',
    citation:
      'Santer, B. D., Wigley, T. M. L., Boyle, J. S., Gaffen, D. J., Hnilo, J. J., Nychka, D., Parker, D. E., & Taylor, K. E. (2000). Statistical significance of trends and trend differences in layer-average atmospheric temperature time series. Journal of Geophysical Research, 105(D6), 7337–7356.',
    doi: '10.1029/1999JD901105',
  },
  {
    key: 'Santer2008',
    citation:
      'Santer, B. D., Thorne, P. W., Haimberger, L., Taylor, K. E., Wigley, T. M. L., Lanzante, J. R., et al. (2008). Consistency of modelled and observed temperature trends in the tropical troposphere. International Journal of Climatology, 28, 1703–1722.',
    doi: '10.1002/joc.1756',
  },
  {
    key: 'Satterthwaite1946',
    citation:
      'Satterthwaite, F. E. (1946). An approximate distribution of estimates of variance components. Biometrics Bulletin, 2(6), 110–114.',
    doi: '10.2307/3002019',
  },
  {
    key: 'Smith2021',
    citation:
      "Smith, C., Nicholls, Z. R. J., Armour, K., Collins, W., Forster, P., Meinshausen, M., Palmer, M. D., & Watanabe, M. (2021). The Earth's Energy Budget, Climate Feedbacks, and Climate Sensitivity Supplementary Material (7.SM). In Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the IPCC.",
    url: 'https://www.ipcc.ch/report/ar6/wg1/',
  },
  {
    key: 'Stephens2015',
    citation:
      "Stephens, G. L., O'Brien, D., Webster, P. J., Pilewski, P., Kato, S., & Li, J.-L. (2015). The albedo of Earth. Reviews of Geophysics, 53, 141–163.",
    doi: '10.1002/2014RG000449',
  },
  {
    key: 'Tiesinga2021',
    citation:
      'Tiesinga, E., Mohr, P. J., Newell, D. B., & Taylor, B. N. (2021). CODATA recommended values of the fundamental physical constants: 2018. Reviews of Modern Physics, 93, 025010.',
    doi: '10.1103/RevModPhys.93.025010',
  },
  {
    key: 'Turcotte2014',
    citation:
      'Turcotte, D. L., & Schubert, G. (2014). Geodynamics (3rd ed.), chapter 4 "Heat transfer". Cambridge University Press.',
  },
  {
    key: 'Wilkins1989',
    citation:
      'Wilkins, G. A. (1989). The IAU Style Manual (1989): The Preparation of Astronomical Papers and Reports. Transactions of the International Astronomical Union, XXB.',
    url: 'https://www.iau.org/static/publications/stylemanual1989.pdf',
  },
  {
    key: 'Williams2024',
    citation:
      'Williams, D. R. (2024). Planetary Fact Sheets (Earth, Venus, Mars). NASA Goddard Space Flight Center, NSSDCA. The pages are revised from time to time.',
    url: 'https://nssdc.gsfc.nasa.gov/planetary/factsheet/',
  },
] as const satisfies readonly Reference[];

/** Every key of the bibliography. */
export type ReferenceKey = (typeof referenceList)[number]['key'];

/** The bibliography, sorted by key. */
export const references: readonly Reference[] = referenceList;

/** True when `key` is a key of the bibliography. */
export function isReferenceKey(key: string): key is ReferenceKey {
  return references.some((reference) => reference.key === key);
}
