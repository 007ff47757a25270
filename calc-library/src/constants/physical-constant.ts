import { type ReferenceKey } from '../references/bibliography.js';

/** How well a constant is known, as its source states it. */
export type ConstantUncertainty =
  /** Exact by definition (the 2019 SI defining constants and what follows from them). */
  | { readonly kind: 'exact' }
  /** A symmetric uncertainty, with what it means (one standard deviation, a 5–95 % range, …). */
  | { readonly kind: 'plusMinus'; readonly value: number; readonly meaning: string }
  /**
   * An IPCC assessed range in the calibrated language: likely = 66–100 % probability,
   * very likely = 90–100 %.
   */
  | {
      readonly kind: 'assessedRange';
      readonly likely?: readonly [number, number];
      readonly veryLikely?: readonly [number, number];
    };

/** One entry of the constants table: a value with its unit, uncertainty and source. */
export interface PhysicalConstant {
  /** snake_case key, also the name of the constant in the worksheet. */
  readonly key: string;
  /** What the constant is, in plain words. */
  readonly name: string;
  readonly value: number;
  /** Unit in mathjs notation where mathjs knows it (`W/(m^2 K^4)`), otherwise a plain label. */
  readonly unit: string;
  readonly uncertainty?: ConstantUncertainty;
  /** Bibliography key of the source, or `common-practice` for a conventional round value. */
  readonly source: ReferenceKey | 'common-practice';
  /** For a derived constant: the keys it is computed from. */
  readonly derivedFrom?: readonly string[];
  /** For a derived constant: how it is computed. */
  readonly formula?: string;
  /** Where in the source, and anything a reader should know (e.g. a value recalled from memory). */
  readonly note?: string;
}
