import { describe, expect, it } from 'vitest';
import { expectClose } from '../../test/expect-close.js';
import { isReferenceKey } from '../references/bibliography.js';
import { constants } from './constants-table.js';

function constant(key: string): number {
  const found = constants.find((entry) => entry.key === key);
  if (found === undefined) throw new Error(`no constant ${key}`);
  return found.value;
}

describe('derived constants against their published values', () => {
  it('computes σ from h, k and c as CODATA 2018 lists it', () => {
    // Tiesinga et al. 2021 (CODATA 2018), Rev. Mod. Phys. 93, 025010: σ = 5.670 374 419… × 10⁻⁸ W m⁻² K⁻⁴ (exact)
    expectClose(constant('stefan_boltzmann'), 5.670374419e-8, { rel: 1e-9 });
  });

  it('gives the area of the GRS80 Earth from its mean radius', () => {
    // from memory: Moritz 2000, J. Geodesy 74, 128, GRS80 derived constants: surface area 5.100 656 22 × 10¹⁴ m²
    expectClose(constant('earth_surface_area'), 5.1006562e14, { rel: 1e-5 });
  });

  it('has a Julian year of 31 557 600 s', () => {
    // Wilkins 1989, IAU Style Manual: the Julian year is 365.25 days of 86 400 s = 31 557 600 s
    expectClose(constant('seconds_per_year'), 31557600, { abs: 1e-6 });
  });

  it('gives the CO2/C mass ratio the Global Carbon Budget uses', () => {
    // Friedlingstein et al. 2022, ESSD 14, 4811, section 2.1: 1 kg of carbon = 3.664 kg of CO2
    expectClose(constant('gtco2_per_gtc'), 3.664, { rel: 1e-4 });
  });

  it('gives the molar mass of CO2', () => {
    // from memory: NIST Chemistry WebBook, carbon dioxide, molecular weight 44.0095 g/mol
    expectClose(constant('molar_mass_co2'), 44.0095, { abs: 0.001 });
  });

  it('gives the AR6 TCRE per 1000 GtCO2 and its likely range', () => {
    const tcre = constants.find((entry) => entry.key === 'ar6_tcre');
    // IPCC 2021 SPM D.1.1: 0.45 °C per 1000 GtCO2 (best estimate), likely 0.27 to 0.63 °C
    expectClose(tcre?.value ?? Number.NaN, 0.45, { abs: 0.005 });
    const uncertainty = tcre?.uncertainty;
    expect(uncertainty?.kind).toBe('assessedRange');
    if (uncertainty?.kind !== 'assessedRange') return;
    // IPCC 2021 SPM D.1.1: likely range 0.27–0.63 °C per 1000 GtCO2
    expectClose(uncertainty.likely?.[0] ?? Number.NaN, 0.27, { abs: 0.005 });
    // IPCC 2021 SPM D.1.1 (as above)
    expectClose(uncertainty.likely?.[1] ?? Number.NaN, 0.63, { abs: 0.005 });
  });

  it('gives the mass of CO2 in one ppm', () => {
    // common practice, no source: 1 ppm of atmospheric CO2 is about 7.8 GtCO2
    expectClose(constant('gtco2_per_ppm'), 7.8, { abs: 0.05 });
  });
});

describe('the constants table', () => {
  it('has unique keys, finite values, units and known sources', () => {
    const keys = constants.map((entry) => entry.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const entry of constants) {
      expect(Number.isFinite(entry.value), entry.key).toBe(true);
      expect(typeof entry.unit).toBe('string');
      expect(entry.key).toMatch(/^[a-z0-9_]+$/);
      expect(entry.source === 'common-practice' || isReferenceKey(entry.source), entry.key).toBe(
        true,
      );
    }
  });

  it('names existing constants as the sources of derived ones', () => {
    const keys = new Set(constants.map((entry) => entry.key));
    const derived = constants.filter((entry) => entry.derivedFrom !== undefined);
    expect(derived.length).toBeGreaterThanOrEqual(6);
    for (const entry of derived) {
      expect(entry.formula, entry.key).toBeTypeOf('string');
      for (const parent of entry.derivedFrom ?? []) expect(keys.has(parent), parent).toBe(true);
    }
  });
});
