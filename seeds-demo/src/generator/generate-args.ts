import { parseArgs } from 'node:util';

export const generateUsage =
  'Usage: npm run generate -w seeds-demo -- --claims <count> [--explainers <count>] [--seed <n>] [--until YYYY-MM-DD] [--append]';

export interface GenerateArgs {
  claims: number;
  explainers?: number;
  seed?: number;
  until?: Date;
  append: boolean;
}

function wholeNumber(name: string, value: string, min: number, max: number): number {
  const number = Number(value);
  if (!/^\d+$/.test(value) || number < min || number > max) {
    throw new Error(`--${name} must be a whole number from ${min} to ${max}, not “${value}”`);
  }
  return number;
}

/** The generator's command line; throws an error naming the option and its rule. */
export function parseGenerateArgs(argv: readonly string[]): GenerateArgs {
  const { values } = parseArgs({
    args: [...argv],
    options: {
      claims: { type: 'string' },
      explainers: { type: 'string' },
      seed: { type: 'string' },
      until: { type: 'string' },
      append: { type: 'boolean', default: false },
    },
    strict: true,
    allowPositionals: false,
  });
  if (values.claims === undefined) throw new Error('--claims is required');
  const args: GenerateArgs = {
    claims: wholeNumber('claims', values.claims, 1, 10_000_000),
    append: values.append,
  };
  if (values.explainers !== undefined) {
    // Claims drawn as published, about two in three, are where explainers come from.
    const most = Math.floor(args.claims / 2);
    args.explainers = wholeNumber('explainers', values.explainers, 0, most);
  }
  if (values.seed !== undefined) args.seed = wholeNumber('seed', values.seed, 0, 0xffff_ffff);
  if (values.until !== undefined) {
    const until = new Date(`${values.until}T00:00:00Z`);
    if (!/^\d{4}-\d{2}-\d{2}$/.test(values.until) || Number.isNaN(until.getTime())) {
      throw new Error(`--until must be a date as YYYY-MM-DD, not “${values.until}”`);
    }
    args.until = until;
  }
  return args;
}
