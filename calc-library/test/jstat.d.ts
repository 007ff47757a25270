// jstat ships no types; these cover the functions the tests use as references.
declare module 'jstat' {
  interface OlsModel {
    readonly coef: number[];
    readonly t: { readonly se: number[]; readonly interval95: [number, number][] };
  }
  const jStat: {
    studentt: {
      inv(probability: number, degreesOfFreedom: number): number;
      cdf(tValue: number, degreesOfFreedom: number): number;
    };
    normal: { inv(probability: number, mean: number, standardDeviation: number): number };
    gammaln(value: number): number;
    ibeta(x: number, a: number, b: number): number;
    models: { ols(endogenous: number[], exogenous: number[][]): OlsModel };
  };
  export default jStat;
}
