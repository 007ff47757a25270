import { Transform } from 'class-transformer';

/** Trims surrounding white space of a string field before it is validated. */
export const Trim = () =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));
