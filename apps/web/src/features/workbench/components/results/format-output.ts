import type { NumberOutput } from '@skyledger/calc';
import { bandText, quantityText } from '@/features/workings/format-values';

/** A number output in words: its value, or its band and median when it has one. */
export function outputText(output: NumberOutput): string {
  return output.band ? bandText(output.band, output.unit) : quantityText(output.value, output.unit);
}

/** The bar of a number output: its median and band when it has one, else its value. */
export function barOf(output: NumberOutput): { value: number; low?: number; high?: number } {
  return output.band
    ? { value: output.band.p50, low: output.band.p5, high: output.band.p95 }
    : { value: output.value };
}
