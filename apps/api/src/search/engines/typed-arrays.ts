type NumberArray = Float64Array | Int32Array | Uint32Array | Uint16Array;

/**
 * `array` when it holds `needed` numbers already, else a copy of it `size` long (the new
 * places zero): the index's per-slot columns and postings grow by doubling.
 */
export function withRoom<T extends NumberArray>(array: T, needed: number, size = needed * 2): T {
  if (array.length >= needed) return array;
  const wider = new (array.constructor as new (length: number) => T)(size);
  wider.set(array);
  return wider;
}
