import { convertQuantity, displayUnit, type NumberInputSpec } from '@skyledger/calc';

// Units a person is likely to have a figure in, by declared unit (the declared one first).
// The library converts each of them; anything else can still be typed into the worksheet.
const compatibleUnits: Readonly<Record<string, readonly string[]>> = {
  'W/m^2': ['W/m^2', 'kW/m^2', 'mW/m^2'],
  TW: ['TW', 'GW', 'PW', 'W'],
  ppm: ['ppm', 'ppb'],
  ppb: ['ppb', 'ppm'],
  GtC: ['GtC', 'PgC', 'MtC'],
  GtCO2: ['GtCO2', 'MtCO2', 'GtC'],
  'K per 1000 GtCO2': ['K per 1000 GtCO2', 'K per 1000 PgC'],
  ZJ: ['ZJ', 'EJ', 'J'],
  year: ['year', 'month', 'day'],
  m: ['m', 'km', 'ft'],
  'K/km': ['K/km', 'K/m'],
};

/** The units offered for a number input; one entry means there is nothing to choose. */
export function unitChoices(spec: NumberInputSpec): readonly string[] {
  if (spec.unit === 'K') {
    // A warming of 3 °C is one of 3 K; °F as a difference would only confuse.
    return spec.temperatureDifference ? ['K', 'degC'] : ['K', 'degC', 'degF'];
  }
  if (spec.unit === '' && spec.integer !== true && spec.min >= -1 && spec.max <= 1) {
    return ['', '%'];
  }
  return compatibleUnits[spec.unit] ?? [spec.unit];
}

/** A unit as readers write it: `W/m²`, `°C`; a plain share is a "fraction". */
export function unitLabel(unit: string): string {
  return unit === '' ? 'fraction' : displayUnit(unit);
}

/**
 * A value of `spec` given in unit `from`, in unit `to` instead. The library converts only
 * into the declared unit, and every conversion it makes is linear (offsets included), so
 * the way back is read off two points: u ↦ convert(u, to) at 0 and at 1.
 *
 * @example convertBetween(1360.8, 'W/m^2', 'kW/m^2', solarIrradianceSpec) // => 1.3608
 */
export function convertBetween(
  value: number,
  from: string,
  to: string,
  spec: NumberInputSpec,
): number {
  if (from === to) return value;
  const target = {
    field: spec.name,
    where: 'workbench',
    declaredUnit: spec.unit,
    temperatureDifference: spec.temperatureDifference === true,
  };
  const declared = convertQuantity(value, from, target);
  const zero = convertQuantity(0, to, target);
  const one = convertQuantity(1, to, target);
  // Twelve significant digits hide the binary noise of the round trip (1.3608000000000002).
  return Number(((declared - zero) / (one - zero)).toPrecision(12));
}
