import { describe, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { equilibriumWarming } from './equilibrium-warming.js';
import { planckResponse } from './planck-response.js';
import { transientWarming } from './transient-warming.js';

describe('warming from a forcing', () => {
  it('gives the ECS for the forcing of doubled CO2, by the definition of ECS', () => {
    // IPCC AR6 WG1 section 7.5 (Forster et al. 2021): ECS is the equilibrium warming for doubled CO2; best estimate 3 °C
    expectClose(equilibriumWarming({ forcing: 3.93, sensitivity: 3, doublingForcing: 3.93 }), 3, {
      rel: 1e-12,
    });
    // IPCC AR6 WG1 section 7.5: TCR best estimate 1.8 °C, the transient warming for doubled CO2
    expectClose(transientWarming({ forcing: 3.93, sensitivity: 1.8, doublingForcing: 3.93 }), 1.8, {
      rel: 1e-12,
    });
  });

  it('gives about 1.2 K with the Planck response alone for doubled CO2', () => {
    // common practice, no source: with AR6's λ_P = −3.22 W/m²/K (Table 7.10) and F₂ₓ = 3.93 W/m², the no-feedback warming is about 1.2 K
    expectClose(planckResponse(3.93, -3.22), 1.2, { abs: 0.03 });
  });

  it('is linear in the forcing', () => {
    const half = equilibriumWarming({ forcing: 1.36, sensitivity: 3, doublingForcing: 3.93 });
    const whole = equilibriumWarming({ forcing: 2.72, sensitivity: 3, doublingForcing: 3.93 });
    expectClose(whole, 2 * half, { rel: 1e-12 });
  });

  it('refuses a positive Planck feedback and other inputs out of range', () => {
    expectCalcInputError(() => planckResponse(3.93, 3.22), 'planckFeedback', /between/);
    expectCalcInputError(
      () => equilibriumWarming({ forcing: 3.93, sensitivity: 3, doublingForcing: 0 }),
      'doublingForcing',
    );
    expectCalcInputError(
      () => equilibriumWarming({ forcing: 99, sensitivity: 3, doublingForcing: 3.93 }),
      'forcing',
    );
  });
});
