// Coefficients of the CH4–N2O band overlap term, IPCC TAR Table 6.2 (after Myhre et al.
// 1998): f(M, N) = 0.47 ln[1 + 2.01 × 10⁻⁵ (M N)^0.75 + 5.31 × 10⁻¹⁵ M (M N)^1.52].
const overlapScale = 0.47;
const overlapFirstCoefficient = 2.01e-5;
const overlapFirstExponent = 0.75;
const overlapSecondCoefficient = 5.31e-15;
const overlapSecondExponent = 1.52;

/**
 * The overlap of the CH4 and N2O absorption bands, which both gases' forcing subtracts.
 *
 * Formula: f(M, N) = 0.47 ln[1 + 2.01 × 10⁻⁵ (M N)^0.75 + 5.31 × 10⁻¹⁵ M (M N)^1.52]
 *
 * @param methane M, CH4 concentration, in ppb (≥ 0)
 * @param nitrousOxide N, N2O concentration, in ppb (≥ 0)
 * @returns f in W/m²
 * @example
 * methaneNitrousOxideOverlap(0, 270) // => 0
 * @see Ramaswamy2001 (Table 6.2), Myhre1998
 */
export function methaneNitrousOxideOverlap(methane: number, nitrousOxide: number): number {
  const product = methane * nitrousOxide;
  return (
    overlapScale *
    Math.log(
      1 +
        overlapFirstCoefficient * product ** overlapFirstExponent +
        overlapSecondCoefficient * methane * product ** overlapSecondExponent,
    )
  );
}
