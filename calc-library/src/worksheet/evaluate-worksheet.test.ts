import { describe, expect, it } from 'vitest';
import { expectClose } from '../../test/expect-close.js';
import { evaluateWorksheet } from './evaluate-worksheet.js';

function okValue(line: string): { value: number; unit: string } {
  const [result] = evaluateWorksheet([line]);
  if (result === undefined || !result.ok)
    throw new Error(`line failed: ${result?.error ?? 'none'}`);
  return { value: result.value, unit: result.unit };
}

describe('evaluateWorksheet', () => {
  it('does arithmetic with units and named constants', () => {
    const emission = okValue('stefan_boltzmann * (288 K)^4');
    // σ T⁴ with σ from CODATA 2018 (Tiesinga et al. 2021): 5.670374419e-8 × 288⁴ W/m²
    expectClose(emission.value, 5.670374419e-8 * 288 ** 4, { rel: 1e-9 });
    expect(emission.unit).toBe('W/m^2');
    const geothermal = okValue('geothermal_heat_flow / earth_surface_area to mW/m^2');
    // from memory: Davies & Davies 2010: 47 TW is about 92 mW/m² over the Earth
    expectClose(geothermal.value, 92, { abs: 0.5 });
    expect(geothermal.unit).toBe('mW/m^2');
    expect(okValue('1 m + 2 cm to cm')).toEqual({ value: 102, unit: 'cm' });
    expectClose(okValue('sqrt(16) * log(e)').value, 4, { rel: 1e-15 });
  });

  it('carries names from line to line and skips notes', () => {
    const results = evaluateWorksheet([
      '# absorbed sunlight',
      'absorbed = 1361 W/m^2 * 0.7 / 4',
      '',
      '(absorbed / stefan_boltzmann)^(1/4)',
    ]);
    expect(results.map((result) => result.line)).toEqual([2, 4]);
    const last = results[1];
    expect(last?.ok).toBe(true);
    // common practice, no source: S = 1361 W/m², α = 0.3 gives 254.6 K
    if (last?.ok === true) expectClose(last.value, 254.58, { abs: 0.005 });
  });

  it('reports a bad line and goes on', () => {
    const results = evaluateWorksheet([
      '1 m + 1 s',
      'foo(2)',
      'zeros(1000000)',
      'stefan_boltzmann = 1',
      '[1, 2]',
      '2 * 3',
    ]);
    expect(results.slice(0, 5).every((result) => !result.ok)).toBe(true);
    expect(results[1]?.error).toMatch(/unknown function foo/);
    expect(results[2]?.error).toMatch(/unknown function zeros/);
    expect(results[3]?.error).toMatch(/named constant/);
    expect(results[4]?.error).toMatch(/not allowed/);
    expect(results[5]).toMatchObject({ ok: true, value: 6, unit: '' });
  });

  it('refuses results that are not finite', () => {
    const [result] = evaluateWorksheet(['1 / 0']);
    expect(result?.ok).toBe(false);
  });
});
