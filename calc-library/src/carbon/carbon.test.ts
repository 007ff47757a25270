import fc from 'fast-check';
import { describe, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { concentrationRiseFromEmissions } from './concentration-rise-from-emissions.js';
import { convertCarbonAmount } from './convert-carbon-amount.js';
import { warmingFromCumulativeEmissions } from './warming-from-cumulative-emissions.js';

describe('convertCarbonAmount', () => {
  it('uses the Global Carbon Budget factors', () => {
    // Friedlingstein et al. 2022, ESSD 14, 4811, section 2.1: 1 ppm = 2.124 GtC
    expectClose(convertCarbonAmount(1, 'ppm').gtc, 2.124, { rel: 1e-12 });
    // Friedlingstein et al. 2022, section 2.1: 1 GtC = 3.664 GtCO2
    expectClose(convertCarbonAmount(1, 'gtc').gtco2, 3.664, { rel: 1e-4 });
  });

  it('round-trips between every pair of units', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }), (amount) => {
        const fromPpm = convertCarbonAmount(amount, 'ppm');
        const back = convertCarbonAmount(fromPpm.gtco2, 'gtco2');
        expectClose(back.ppm, amount, { rel: 1e-12, abs: 1e-9 });
        expectClose(convertCarbonAmount(fromPpm.gtc, 'gtc').ppm, amount, { rel: 1e-12, abs: 1e-9 });
      }),
    );
  });

  it('refuses a non-finite amount', () => {
    expectCalcInputError(
      () => convertCarbonAmount(Number.POSITIVE_INFINITY, 'gtc'),
      'gtc',
      /finite/,
    );
  });
});

describe('emissions to concentration and warming', () => {
  it('gives 0.45 K per 1000 GtCO2 with the AR6 TCRE', () => {
    // IPCC 2021 SPM D.1.1: each 1000 GtCO2 of cumulative emissions causes 0.45 °C (best estimate)
    expectClose(warmingFromCumulativeEmissions(1000, 1.65 / 3.664), 0.45, { abs: 0.005 });
  });

  it('turns emissions into ppm with the airborne fraction', () => {
    // Friedlingstein et al. 2022 factors: all of 7.78 GtCO2 kept in the air is 1 ppm
    expectClose(concentrationRiseFromEmissions(2.124 * 3.664, 1), 1, { rel: 1e-4 });
  });

  it('refuses an airborne fraction above 1 and a negative TCRE', () => {
    expectCalcInputError(() => concentrationRiseFromEmissions(1000, 1.5), 'airborneFraction');
    expectCalcInputError(() => warmingFromCumulativeEmissions(1000, -0.1), 'tcre');
  });
});
