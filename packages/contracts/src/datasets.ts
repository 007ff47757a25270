import { z } from 'zod';
import { type AttachmentView } from './attachments.js';
import { boundedText, uuidSchema, type PersonRef } from './common.js';

export const DATASET_MAX_ROWS = 50_000;
export const DATASET_MAX_COLUMNS = 12;

export const datasetValueColumnSchema = z.object({
  /** The CSV header of the column. */
  column: boundedText(120),
  /** The unit of its values, e.g. `K`, `degC`, `ppm`, `W/m^2`. */
  unit: boundedText(40),
  label: boundedText(120, { required: false }).optional(),
});
export type DatasetValueColumn = z.infer<typeof datasetValueColumnSchema>;

/**
 * Import an uploaded CSV as a dataset: which column holds the time (decimal years such as
 * `1998` or `1998.5`, or dates such as `1998-07` or `1998-07-15`) and which hold values.
 */
export const createDatasetSchema = z.object({
  attachmentId: uuidSchema,
  name: boundedText(160),
  description: boundedText(2000),
  timeColumn: boundedText(120),
  valueColumns: z
    .array(datasetValueColumnSchema)
    .min(1, { error: 'Choose at least one column of values' })
    .max(DATASET_MAX_COLUMNS, { error: `At most ${DATASET_MAX_COLUMNS} columns` }),
});
export type CreateDatasetRequest = z.infer<typeof createDatasetSchema>;

/** An uploaded CSV before it is imported: its columns and first rows, as text. */
export interface DatasetUploadView {
  attachment: AttachmentView;
  columns: string[];
  previewRows: string[][];
  /** Data rows below the header. */
  rowCount: number;
}

export interface DatasetColumn {
  key: string;
  label: string;
  unit: string;
}

export interface DatasetSummary {
  id: string;
  name: string;
  description: string;
  timeColumn: string;
  columns: DatasetColumn[];
  rowCount: number;
  /** First and last time, as decimal years. */
  timeRange: { from: number; to: number };
  attachmentId: string;
  createdBy: PersonRef;
  createdAt: string;
  version: number;
}

/** A dataset with its rows: `[t, value of columns[0], value of columns[1], ...]`. */
export interface DatasetDetail extends DatasetSummary {
  rows: number[][];
}
