import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { convertQuantity } from './convert-quantity.js';
import { displayUnit } from './display-unit.js';

const target = (declaredUnit: string, temperatureDifference = false) => ({
  field: 'x',
  where: 'test',
  declaredUnit,
  temperatureDifference,
});

describe('convertQuantity', () => {
  it('converts physical units with mathjs', () => {
    expectClose(convertQuantity(1.361, 'kW/m^2', target('W/m^2')), 1361, { rel: 1e-12 });
    // NIST SP 811: T(K) = t(°C) + 273.15
    expectClose(convertQuantity(15, 'degC', target('K')), 288.15, { rel: 1e-12 });
    expectClose(convertQuantity(1, 'ZJ', target('J')), 1e21, { rel: 1e-12 });
    expectClose(convertQuantity(24, 'month', target('year')), 2, { rel: 1e-12 });
    expectClose(convertQuantity(2, 'yr', target('year')), 2, { rel: 1e-12 });
    expectClose(convertQuantity(30, 'degC/km', target('K/km')), 30, { rel: 1e-12 });
  });

  it('reads temperature differences without the offset', () => {
    expectClose(convertQuantity(3, 'degC', target('K', true)), 3, { rel: 1e-12 });
    // NIST SP 811: a difference of 1 °F is 5/9 K
    expectClose(convertQuantity(9, 'degF', target('K', true)), 5, { rel: 1e-12 });
  });

  it('converts the library’s own units', () => {
    expectClose(convertQuantity(410000, 'ppb', target('ppm')), 410, { rel: 1e-12 });
    expectClose(convertQuantity(30, '%', target('')), 0.3, { rel: 1e-12 });
    // Friedlingstein et al. 2022: 1 GtC = 3.664 GtCO2
    expectClose(convertQuantity(1, 'GtC', target('GtCO2')), 3.664, { rel: 1e-4 });
    // IPCC 2021 SPM D.1.1: 1.65 °C per 1000 PgC is 0.45 °C per 1000 GtCO2
    expectClose(convertQuantity(1.65, 'K per 1000 PgC', target('K per 1000 GtCO2')), 0.45, {
      abs: 0.005,
    });
  });

  it('gives the same value back in its own unit', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), (value) => {
        expect(convertQuantity(value, 'W/m^2', target('W/m^2'))).toBe(value);
      }),
    );
  });

  it('refuses incompatible and unknown units', () => {
    expectCalcInputError(
      () => convertQuantity(1, 'kg', target('W/m^2')),
      'x',
      /measures something else/,
    );
    expectCalcInputError(
      () => convertQuantity(1, 'ppm', target('K')),
      'x',
      /measures something else/,
    );
    expectCalcInputError(
      () => convertQuantity(1, 'K', target('ppm')),
      'x',
      /measures something else/,
    );
    expectCalcInputError(
      () => convertQuantity(1, 'GtC', target('ppm')),
      'x',
      /measures something else/,
    );
    expectCalcInputError(() => convertQuantity(1, 'W/furlong', target('W/m^2')), 'x', /not a unit/);
    expectCalcInputError(() => convertQuantity(1, 'm', target('')), 'x', /no unit/);
  });
});

describe('displayUnit', () => {
  it('writes powers as superscripts', () => {
    expect(displayUnit('W/(m^2 K^4)')).toBe('W/(m² K⁴)');
    expect(displayUnit('W m^-2')).toBe('W m⁻²');
    expect(displayUnit('degC')).toBe('°C');
  });
});
