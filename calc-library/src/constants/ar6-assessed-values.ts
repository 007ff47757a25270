import { type PhysicalConstant } from './physical-constant.js';

// IPCC AR6 WG1 assessed figures. Ranges use the IPCC calibrated language: likely 66–100 %,
// very likely 90–100 % (the 5–95 % range for ERF).

export const ar6Co2DoublingForcing: PhysicalConstant = {
  key: 'ar6_co2_doubling_erf',
  name: 'Effective radiative forcing of a doubling of CO2 (AR6)',
  value: 3.93,
  unit: 'W/m^2',
  uncertainty: { kind: 'plusMinus', value: 0.47, meaning: '5–95 % range' },
  source: 'Forster2021',
  note: 'AR6 WG1 section 7.3.2.1: 3.93 ± 0.47 W/m².',
};

export const ar6TotalAnthropogenicForcing: PhysicalConstant = {
  key: 'ar6_total_anthropogenic_erf',
  name: 'Total anthropogenic effective radiative forcing, 1750–2019 (AR6)',
  value: 2.72,
  unit: 'W/m^2',
  uncertainty: { kind: 'assessedRange', veryLikely: [1.96, 3.48] },
  source: 'Forster2021',
  note: 'AR6 WG1 section 7.3.5 and Table 7.8: 2.72 [1.96 to 3.48] W/m².',
};

export const ar6Co2Forcing1750To2019: PhysicalConstant = {
  key: 'ar6_co2_erf_1750_2019',
  name: 'CO2 effective radiative forcing, 1750–2019 (AR6)',
  value: 2.16,
  unit: 'W/m^2',
  uncertainty: { kind: 'assessedRange', veryLikely: [1.9, 2.41] },
  source: 'Forster2021',
  note: 'AR6 WG1 Table 7.8 (range from memory).',
};

export const ar6Ch4Forcing1750To2019: PhysicalConstant = {
  key: 'ar6_ch4_erf_1750_2019',
  name: 'CH4 effective radiative forcing, 1750–2019 (AR6)',
  value: 0.54,
  unit: 'W/m^2',
  uncertainty: { kind: 'assessedRange', veryLikely: [0.43, 0.65] },
  source: 'Forster2021',
  note: 'AR6 WG1 Table 7.8 (range from memory).',
};

export const ar6N2oForcing1750To2019: PhysicalConstant = {
  key: 'ar6_n2o_erf_1750_2019',
  name: 'N2O effective radiative forcing, 1750–2019 (AR6)',
  value: 0.21,
  unit: 'W/m^2',
  uncertainty: { kind: 'assessedRange', veryLikely: [0.18, 0.24] },
  source: 'Forster2021',
  note: 'AR6 WG1 Table 7.8 (range from memory).',
};

export const ar6EarthEnergyImbalance: PhysicalConstant = {
  key: 'ar6_earth_energy_imbalance_2006_2018',
  name: "Earth's energy imbalance, 2006–2018 (AR6)",
  value: 0.79,
  unit: 'W/m^2',
  uncertainty: { kind: 'assessedRange', veryLikely: [0.52, 1.06] },
  source: 'Forster2021',
  note: 'From memory: AR6 WG1 section 7.2.2 and Table 7.1, 0.79 [0.52 to 1.06] W/m².',
};

export const ar6EquilibriumClimateSensitivity: PhysicalConstant = {
  key: 'ar6_ecs',
  name: 'Equilibrium climate sensitivity (AR6 best estimate)',
  value: 3,
  unit: 'K',
  uncertainty: { kind: 'assessedRange', likely: [2.5, 4], veryLikely: [2, 5] },
  source: 'Forster2021',
  note: 'AR6 WG1 section 7.5.5 and SPM A.4.4: best 3 °C, likely 2.5–4 °C, very likely 2–5 °C.',
};

export const ar6TransientClimateResponse: PhysicalConstant = {
  key: 'ar6_tcr',
  name: 'Transient climate response (AR6 best estimate)',
  value: 1.8,
  unit: 'K',
  uncertainty: { kind: 'assessedRange', likely: [1.4, 2.2], veryLikely: [1.2, 2.4] },
  source: 'Forster2021',
  note: 'AR6 WG1 section 7.5.5: best 1.8 °C, likely 1.4–2.2 °C, very likely 1.2–2.4 °C (very likely range from memory).',
};

export const ar6PlanckFeedback: PhysicalConstant = {
  key: 'ar6_planck_feedback',
  name: 'Planck feedback parameter (AR6)',
  value: -3.22,
  unit: 'W/m^2/K',
  uncertainty: { kind: 'assessedRange', veryLikely: [-3.4, -3.0] },
  source: 'Forster2021',
  note: 'AR6 WG1 Table 7.10: −3.22 [−3.4 to −3.0] W m⁻² K⁻¹.',
};

export const ar6TcrePerPetagramCarbon: PhysicalConstant = {
  key: 'ar6_tcre_per_1000_pgc',
  name: 'Transient climate response to cumulative CO2 emissions, per 1000 PgC (AR6)',
  value: 1.65,
  unit: 'K per 1000 PgC',
  uncertainty: { kind: 'assessedRange', likely: [1.0, 2.3] },
  source: 'IPCC2021',
  note: 'AR6 WG1 SPM D.1.1: best 1.65 °C per 1000 PgC, likely 1.0–2.3 °C.',
};

export const ar6TroposphericAdjustmentCo2: PhysicalConstant = {
  key: 'ar6_adjustment_factor_co2',
  name: 'ERF/SARF factor for CO2: tropospheric adjustments +5 % (AR6)',
  value: 1.05,
  unit: '',
  source: 'Forster2021',
  note: 'AR6 WG1 section 7.3.2; AR6 applies it to the Meinshausen et al. (2020) expressions (7.SM.1.3).',
};

export const ar6TroposphericAdjustmentCh4: PhysicalConstant = {
  key: 'ar6_adjustment_factor_ch4',
  name: 'ERF/SARF factor for CH4: tropospheric adjustments −14 % (AR6)',
  value: 0.86,
  unit: '',
  source: 'Forster2021',
  note: 'AR6 WG1 section 7.3.2.',
};

export const ar6TroposphericAdjustmentN2o: PhysicalConstant = {
  key: 'ar6_adjustment_factor_n2o',
  name: 'ERF/SARF factor for N2O: tropospheric adjustments +7 % (AR6)',
  value: 1.07,
  unit: '',
  source: 'Forster2021',
  note: 'AR6 WG1 section 7.3.2.',
};

export const ar6CumulativeCo2Emissions: PhysicalConstant = {
  key: 'ar6_cumulative_co2_1850_2019',
  name: 'Historical cumulative CO2 emissions 1850–2019 (AR6)',
  value: 2390,
  unit: 'GtCO2',
  uncertainty: { kind: 'plusMinus', value: 240, meaning: 'likely range' },
  source: 'IPCC2021',
  note: 'From memory: AR6 WG1 SPM D.1.1, 2390 ± 240 GtCO2.',
};
