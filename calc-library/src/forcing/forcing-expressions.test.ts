import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { etminan2016Ch4Forcing } from './etminan2016-ch4-forcing.js';
import { etminan2016Co2Forcing } from './etminan2016-co2-forcing.js';
import { etminan2016N2oForcing } from './etminan2016-n2o-forcing.js';
import { meinshausen2020Ch4Forcing } from './meinshausen2020-ch4-forcing.js';
import { meinshausen2020Co2Forcing } from './meinshausen2020-co2-forcing.js';
import { meinshausen2020N2oForcing } from './meinshausen2020-n2o-forcing.js';
import { methaneNitrousOxideOverlap } from './methane-nitrous-oxide-overlap.js';
import { myhre1998Ch4Forcing } from './myhre1998-ch4-forcing.js';
import { myhre1998Co2Forcing } from './myhre1998-co2-forcing.js';
import { myhre1998N2oForcing } from './myhre1998-n2o-forcing.js';

// Published forcings are printed to 0.01 W/m²; the expressions must reproduce them to
// half of that last digit.
const printedPrecision = { abs: 0.005 } as const;

describe('Myhre et al. (1998) simplified expressions', () => {
  it('gives 3.71 W/m² for doubled CO2', () => {
    // Myhre et al. 1998, GRL 25(14), 2715: ΔF(2×CO2) = 5.35 ln 2 = 3.71 W/m²
    expectClose(myhre1998Co2Forcing(556, 278), 3.71, printedPrecision);
  });

  it('reproduces the IPCC TAR forcings for 1750–1998', () => {
    // from memory: IPCC TAR WG1 ch. 6 (Ramaswamy et al. 2001), Table 6.1: CO2 1.46 W/m² for 278 → 365 ppm
    expectClose(myhre1998Co2Forcing(365, 278), 1.46, printedPrecision);
    // from memory: IPCC TAR Table 6.1: CH4 0.48 W/m² for 700 → 1745 ppb (N2O 270 ppb in 1750)
    expectClose(
      myhre1998Ch4Forcing({ ch4: 1745, ch4Reference: 700, n2oReference: 270 }),
      0.48,
      printedPrecision,
    );
    // from memory: IPCC TAR Table 6.1: N2O 0.15 W/m² for 270 → 314 ppb (CH4 700 ppb in 1750)
    expectClose(
      myhre1998N2oForcing({ n2o: 314, n2oReference: 270, ch4Reference: 700 }),
      0.15,
      printedPrecision,
    );
  });

  it('reproduces the IPCC AR5 CO2 forcing for 1750–2011', () => {
    // from memory: IPCC AR5 WG1 ch. 8 (Myhre et al. 2013), section 8.3.2: CO2 RF 1.82 W/m² for 278 → 390.5 ppm
    expectClose(myhre1998Co2Forcing(390.5, 278), 1.82, printedPrecision);
  });

  it('has no overlap without one of the gases', () => {
    expect(methaneNitrousOxideOverlap(0, 300)).toBe(0);
    expect(methaneNitrousOxideOverlap(1800, 0)).toBe(0);
  });
});

describe('Etminan et al. (2016) expressions', () => {
  it('reproduces the revised methane forcing for 1750–2011', () => {
    // from memory: Etminan et al. 2016, GRL 43, abstract: CH4 RF 1750–2011 is 0.61 W/m² (25 % above AR5's 0.48), for 722 → 1803 ppb CH4, 270 → 324 ppb N2O
    expectClose(
      etminan2016Ch4Forcing({ ch4: 1803, ch4Reference: 722, n2o: 324, n2oReference: 270 }),
      0.61,
      printedPrecision,
    );
  });

  it('stays close to AR5 for N2O today', () => {
    // from memory: IPCC AR5 WG1 ch. 8, section 8.3.2: N2O RF 1750–2011 0.17 W/m² (Etminan et al. 2016 find little change)
    expectClose(
      etminan2016N2oForcing({
        n2o: 324,
        n2oReference: 270,
        co2: 390.5,
        co2Reference: 278,
        ch4: 1803,
        ch4Reference: 722,
      }),
      0.17,
      printedPrecision,
    );
  });
});

describe('Meinshausen et al. (2020) expressions with the AR6 adjustments', () => {
  const year1750 = { co2: 278.3, ch4: 729.2, n2o: 270.1 };
  const year2019 = { co2: 409.9, ch4: 1866.3, n2o: 332.1 };

  it('reproduces the AR6 effective radiative forcings 1750–2019', () => {
    const co2 =
      1.05 *
      meinshausen2020Co2Forcing({
        co2: year2019.co2,
        co2Reference: year1750.co2,
        n2o: year2019.n2o,
      });
    const ch4 =
      0.86 *
      meinshausen2020Ch4Forcing({
        ch4: year2019.ch4,
        ch4Reference: year1750.ch4,
        n2o: year2019.n2o,
      });
    const n2o =
      1.07 *
      meinshausen2020N2oForcing({
        n2o: year2019.n2o,
        n2oReference: year1750.n2o,
        co2: year2019.co2,
        ch4: year2019.ch4,
      });
    // IPCC AR6 WG1 (Forster et al. 2021) Table 7.8: CO2 ERF 1750–2019 = 2.16 W/m²
    expectClose(co2, 2.16, printedPrecision);
    // IPCC AR6 WG1 Table 7.8: CH4 ERF 1750–2019 = 0.54 W/m²
    expectClose(ch4, 0.54, printedPrecision);
    // IPCC AR6 WG1 Table 7.8: N2O ERF 1750–2019 = 0.21 W/m²
    expectClose(n2o, 0.21, printedPrecision);
  });

  it('gives the AR6 forcing of doubled CO2', () => {
    const stratosphericAdjusted = meinshausen2020Co2Forcing({
      co2: 2 * year1750.co2,
      co2Reference: year1750.co2,
      n2o: year1750.n2o,
    });
    // IPCC AR6 WG1 section 7.3.2.1: ERF of 2×CO2 = 3.93 ± 0.47 W/m²
    expectClose(1.05 * stratosphericAdjusted, 3.93, printedPrecision);
    // from memory: IPCC AR6 WG1 section 7.3.2.1: SARF of 2×CO2 = 3.75 W/m²
    expectClose(stratosphericAdjusted, 3.75, printedPrecision);
  });

  it('keeps α′ continuous where the CO2 quadratic saturates', () => {
    const reference = 278.3;
    const saturation = reference - 7.5906e-4 / (2 * -2.4785e-7);
    const justBelow = meinshausen2020Co2Forcing({
      co2: saturation - 1e-6,
      co2Reference: reference,
      n2o: 270,
    });
    const justAbove = meinshausen2020Co2Forcing({
      co2: saturation + 1e-6,
      co2Reference: reference,
      n2o: 270,
    });
    expectClose(justAbove, justBelow, { rel: 1e-8 });
  });
});

describe('every method: forcing grows with concentration and is zero at the reference', () => {
  const co2Methods = [
    (co2: number, co2Reference: number) => myhre1998Co2Forcing(co2, co2Reference),
    (co2: number, co2Reference: number) =>
      etminan2016Co2Forcing({ co2, co2Reference, n2o: 323, n2oReference: 270 }),
    (co2: number, co2Reference: number) =>
      meinshausen2020Co2Forcing({ co2, co2Reference, n2o: 323 }),
  ];
  const ch4Methods = [
    (ch4: number, ch4Reference: number) =>
      myhre1998Ch4Forcing({ ch4, ch4Reference, n2oReference: 270 }),
    (ch4: number, ch4Reference: number) =>
      etminan2016Ch4Forcing({ ch4, ch4Reference, n2o: 323, n2oReference: 270 }),
    (ch4: number, ch4Reference: number) =>
      meinshausen2020Ch4Forcing({ ch4, ch4Reference, n2o: 323 }),
  ];
  const n2oMethods = [
    (n2o: number, n2oReference: number) =>
      myhre1998N2oForcing({ n2o, n2oReference, ch4Reference: 722 }),
    (n2o: number, n2oReference: number) =>
      etminan2016N2oForcing({
        n2o,
        n2oReference,
        co2: 400,
        co2Reference: 278,
        ch4: 1800,
        ch4Reference: 722,
      }),
    (n2o: number, n2oReference: number) =>
      meinshausen2020N2oForcing({ n2o, n2oReference, co2: 400, ch4: 1800 }),
  ];

  it('is monotonic in CO2 over 180–2000 ppm', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 180, max: 1990, noNaN: true }),
        fc.double({ min: 1, max: 300, noNaN: true }),
        (low, step) => {
          const high = Math.min(2000, low + step);
          for (const forcing of co2Methods) {
            expect(forcing(high, 278)).toBeGreaterThan(forcing(low, 278));
            expect(forcing(low, low)).toBe(0);
          }
        },
      ),
    );
  });

  it('is monotonic in CH4 over 340–3500 ppb', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 340, max: 3490, noNaN: true }),
        fc.double({ min: 1, max: 500, noNaN: true }),
        (low, step) => {
          const high = Math.min(3500, low + step);
          for (const forcing of ch4Methods) {
            expect(forcing(high, 722)).toBeGreaterThan(forcing(low, 722));
            expect(forcing(low, low)).toBe(0);
          }
        },
      ),
    );
  });

  it('is monotonic in N2O over 200–525 ppb', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 200, max: 520, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (low, step) => {
          const high = Math.min(525, low + step);
          for (const forcing of n2oMethods) {
            expect(forcing(high, 270)).toBeGreaterThan(forcing(low, 270));
            expect(forcing(low, low)).toBe(0);
          }
        },
      ),
    );
  });

  it('refuses non-positive concentrations', () => {
    expectCalcInputError(() => myhre1998Co2Forcing(0, 278), 'co2');
    expectCalcInputError(
      () => etminan2016Co2Forcing({ co2: 400, co2Reference: -1, n2o: 300, n2oReference: 270 }),
      'co2Reference',
    );
    expectCalcInputError(
      () => meinshausen2020Ch4Forcing({ ch4: Number.NaN, ch4Reference: 700, n2o: 300 }),
      'ch4',
      /finite/,
    );
  });
});
