import { z } from 'zod';
import { boundedText, uuidSchema, versionSchema, type PersonRef } from './common.js';

/**
 * A series input read from a dataset on the desk, given in place of the points:
 * `{ dataset, column }` for a `series` input, a list of them for a `seriesList` input.
 */
export const datasetSeriesRefSchema = z.object({
  dataset: uuidSchema,
  column: boundedText(120),
  name: boundedText(60, { required: false }).optional(),
});
export type DatasetSeriesRef = z.infer<typeof datasetSeriesRefSchema>;

const inputsSchema = z.record(z.string().max(64), z.unknown());

/**
 * Run a calculator on a claim and keep the run. Only the calculator and its inputs are
 * read: the server computes everything else, whatever else the body carries.
 */
export const createWorkingSchema = z.object({
  calculatorId: z.string().trim().min(1).max(64),
  inputs: inputsSchema,
  note: boundedText(2000, { required: false }).optional(),
});
export type CreateWorkingRequest = z.infer<typeof createWorkingSchema>;

/** Only the note of a saved working changes; other inputs make a new working. */
export const updateWorkingSchema = z.object({
  note: boundedText(2000, { required: false }).optional(),
  version: versionSchema,
});
export type UpdateWorkingRequest = z.infer<typeof updateWorkingSchema>;

export const rerunWorkingSchema = z.object({ version: versionSchema });
export type RerunWorkingRequest = z.infer<typeof rerunWorkingSchema>;

/** Run a calculator without saving anything. */
export const runCalculatorSchema = z.object({ inputs: inputsSchema });
export type RunCalculatorRequest = z.infer<typeof runCalculatorSchema>;

/** An output as @skyledger/calc gives it: number, list, text or table, with its unit. */
export interface WorkingOutput {
  kind: 'number' | 'list' | 'text' | 'table';
  value: unknown;
  unit: string;
  band?: unknown;
  columns?: Array<{ key: string; label: string; unit: string }>;
}

export interface WorkingStep {
  text: string;
  formula: string;
  result: string;
}

export interface WorkingView {
  id: string;
  calculatorId: string;
  libraryVersion: string;
  inputs: Record<string, unknown>;
  datasetRefs: Record<string, DatasetSeriesRef[]> | null;
  outputs: Record<string, WorkingOutput>;
  steps: WorkingStep[];
  cautions: string[];
  monteCarlo: { samples: number; seed: number; rangedInputs: string[] } | null;
  note: string | null;
  ranBy: PersonRef;
  ranAt: string;
  checkedAt: string | null;
  version: number;
}

/** What running a working again with the library now in use changed. */
export interface WorkingRerunResponse {
  /** The working as stored after the re-run (as it was, when `keptBy` is set). */
  working: WorkingView;
  previousLibraryVersion: string;
  /** The library the re-run used. */
  libraryVersion: string;
  /**
   * The number of the verdict version, sent for sign-off, that uses this working: it is
   * kept as it was, so the new result is shown and not stored. Null when it was stored.
   */
  keptBy: number | null;
  changed: boolean;
  /** The outputs whose value, unit or band differ, before and after. */
  differences: Array<{ output: string; before: WorkingOutput | null; after: WorkingOutput | null }>;
}

/** A calculator run that nothing keeps: what `POST /api/calculators/:id/run` answers. */
export interface CalculatorRunView {
  calculatorId: string;
  libraryVersion: string;
  inputs: Record<string, unknown>;
  outputs: Record<string, WorkingOutput>;
  steps: WorkingStep[];
  cautions: string[];
  monteCarlo: { samples: number; seed: number; rangedInputs: string[] } | null;
}
