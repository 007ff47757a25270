import fc from 'fast-check';
import jStat from 'jstat';
import { describe, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { logGamma } from './log-gamma.js';
import { regularizedIncompleteBeta } from './regularized-incomplete-beta.js';
import { studentTCumulative, studentTDensity, studentTQuantile } from './student-t-distribution.js';

describe('logGamma', () => {
  it('matches exact values', () => {
    // DLMF 5.4.1: Γ(n) = (n − 1)!, so ln Γ(10) = ln 362 880
    expectClose(logGamma(10), Math.log(362880), { rel: 1e-14 });
    // DLMF 5.4.6: Γ(1/2) = √π
    expectClose(logGamma(0.5), 0.5 * Math.log(Math.PI), { rel: 1e-13 });
    // DLMF 5.4.1: Γ(1) = Γ(2) = 1
    expectClose(logGamma(1), 0, { abs: 1e-14 });
    expectClose(logGamma(2), 0, { abs: 1e-14 });
  });

  it('agrees with jstat.gammaln', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1e6, noNaN: true }), (argument) => {
        // jstat 1.9.6 gammaln, general-purpose reference library
        expectClose(logGamma(argument), jStat.gammaln(argument), { rel: 1e-10, abs: 1e-10 });
      }),
    );
  });

  it('refuses non-positive arguments', () => {
    expectCalcInputError(() => logGamma(0), 'argument');
  });
});

describe('regularizedIncompleteBeta', () => {
  it('matches the elementary closed forms', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        (x, shape) => {
          // DLMF 8.17.1 with B(a, 1) = 1/a: I_x(a, 1) = xᵃ
          expectClose(regularizedIncompleteBeta(x, shape, 1), x ** shape, { abs: 1e-12 });
          // DLMF 8.17.4 symmetry with the line above: I_x(1, b) = 1 − (1 − x)ᵇ
          expectClose(regularizedIncompleteBeta(x, 1, shape), 1 - (1 - x) ** shape, { abs: 1e-12 });
        },
      ),
    );
  });

  it('agrees with jstat.ibeta', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.001, max: 0.999, noNaN: true }),
        fc.double({ min: 0.2, max: 200, noNaN: true }),
        fc.double({ min: 0.2, max: 200, noNaN: true }),
        (x, a, b) => {
          // jstat 1.9.6 ibeta, general-purpose reference library. Its continued fraction stops
          // when a step changes the result by less than 3e-7 relative (jstat src/special.js,
          // betacf), so it is compared at that accuracy, not ours.
          expectClose(regularizedIncompleteBeta(x, a, b), jStat.ibeta(x, a, b), {
            rel: 1e-6,
            abs: 1e-9,
          });
        },
      ),
    );
  });

  it('refuses x outside 0–1', () => {
    expectCalcInputError(() => regularizedIncompleteBeta(1.5, 1, 1), 'x');
  });
});

describe("Student's t distribution", () => {
  it('matches the closed forms for 1 and 2 degrees of freedom', () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 50, noNaN: true }), (tValue) => {
        // ν = 1 is the Cauchy distribution: F(t) = ½ + arctan(t)/π
        expectClose(studentTCumulative(tValue, 1), 0.5 + Math.atan(tValue) / Math.PI, {
          abs: 1e-13,
        });
        // ν = 2: F(t) = ½ + t / (2 √(2 + t²))
        expectClose(
          studentTCumulative(tValue, 2),
          0.5 + tValue / (2 * Math.sqrt(2 + tValue * tValue)),
          { abs: 1e-13 },
        );
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), (probability) => {
        // ν = 1: t = tan(π (p − ½))
        expectClose(studentTQuantile(probability, 1), Math.tan(Math.PI * (probability - 0.5)), {
          rel: 1e-9,
          abs: 1e-12,
        });
        // ν = 2: t = (2p − 1) / √(2 p (1 − p))
        expectClose(
          studentTQuantile(probability, 2),
          (2 * probability - 1) / Math.sqrt(2 * probability * (1 - probability)),
          { rel: 1e-9, abs: 1e-12 },
        );
      }),
    );
    // ν = 1 density at 0 is 1/π
    expectClose(studentTDensity(0, 1), 1 / Math.PI, { rel: 1e-13 });
  });

  it('reproduces the NIST table of critical values', () => {
    // NIST/SEMATECH e-Handbook 1.3.6.7.2, upper critical values t(0.975, ν): ν = 1: 12.706
    expectClose(studentTQuantile(0.975, 1), 12.706, { abs: 0.0005 });
    // NIST/SEMATECH e-Handbook 1.3.6.7.2: ν = 2: 4.303
    expectClose(studentTQuantile(0.975, 2), 4.303, { abs: 0.0005 });
    // NIST/SEMATECH e-Handbook 1.3.6.7.2: ν = 5: 2.571
    expectClose(studentTQuantile(0.975, 5), 2.571, { abs: 0.0005 });
    // NIST/SEMATECH e-Handbook 1.3.6.7.2: ν = 10: 2.228
    expectClose(studentTQuantile(0.975, 10), 2.228, { abs: 0.0005 });
    // NIST/SEMATECH e-Handbook 1.3.6.7.2: ν = 30: 2.042
    expectClose(studentTQuantile(0.975, 30), 2.042, { abs: 0.0005 });
    // NIST/SEMATECH e-Handbook 1.3.6.7.2: ν = 100: 1.984
    expectClose(studentTQuantile(0.975, 100), 1.984, { abs: 0.0005 });
    // NIST/SEMATECH e-Handbook 1.3.6.7.2, t(0.95, 10) = 1.812
    expectClose(studentTQuantile(0.95, 10), 1.812, { abs: 0.0005 });
  });

  it('agrees with jstat.studentt.inv, also for fractional degrees of freedom', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 5000, noNaN: true }),
        fc.double({ min: 0.001, max: 0.49, noNaN: true }),
        (degreesOfFreedom, tail) => {
          for (const probability of [tail, 1 - tail]) {
            // jstat 1.9.6 studentt.inv, general-purpose reference library (accurate to about 1e-8)
            expectClose(
              studentTQuantile(probability, degreesOfFreedom),
              jStat.studentt.inv(probability, degreesOfFreedom),
              { rel: 1e-6 },
            );
          }
        },
      ),
    );
    // jstat 1.9.6 studentt.inv at a fractional ν as used by n_eff − 2
    expectClose(studentTQuantile(0.975, 7.5), jStat.studentt.inv(0.975, 7.5), { rel: 1e-7 });
  });

  it('agrees with jstat.studentt.cdf', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -20, max: 20, noNaN: true }),
        fc.double({ min: 0.5, max: 1000, noNaN: true }),
        (tValue, degreesOfFreedom) => {
          // jstat 1.9.6 studentt.cdf, general-purpose reference library
          expectClose(
            studentTCumulative(tValue, degreesOfFreedom),
            jStat.studentt.cdf(tValue, degreesOfFreedom),
            { abs: 1e-7 },
          );
        },
      ),
    );
  });

  it('inverts its own distribution function', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 1e5, noNaN: true }),
        fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }),
        (degreesOfFreedom, probability) => {
          expectClose(
            studentTCumulative(studentTQuantile(probability, degreesOfFreedom), degreesOfFreedom),
            probability,
            { abs: 1e-11 },
          );
        },
      ),
    );
  });

  it('refuses probabilities outside (0, 1) and non-positive ν', () => {
    expectCalcInputError(() => studentTQuantile(1, 10), 'probability');
    expectCalcInputError(() => studentTQuantile(0.5, 0), 'degreesOfFreedom');
    expectCalcInputError(() => studentTCumulative(Number.NaN, 3), 't');
  });
});
