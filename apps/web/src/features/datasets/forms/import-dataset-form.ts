import {
  createDatasetSchema,
  DATASET_MAX_COLUMNS,
  datasetValueColumnSchema,
  type CreateDatasetRequest,
  type DatasetUploadView,
} from '@skyledger/contracts';
import { z } from 'zod';
import { optionalText } from '@/features/claims/forms/form-rules';

const columnChoiceSchema = z.object({
  /** The CSV header. */
  column: z.string(),
  use: z.boolean(),
  unit: z.string(),
  label: z.string(),
});

/** The import form as typed: every column of the file, each with whether to import it. */
export const importDatasetFormSchema = z
  .object({
    timeColumn: z.string().min(1, { error: 'Choose the column that holds the time' }),
    columns: z.array(columnChoiceSchema),
    name: createDatasetSchema.shape.name,
    description: createDatasetSchema.shape.description,
  })
  .superRefine((form, ctx) => {
    const chosen = valueColumnIndexes(form);
    if (chosen.length === 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['columns'],
        message: 'Choose at least one column of values besides the time',
      });
    } else if (chosen.length > DATASET_MAX_COLUMNS) {
      ctx.addIssue({
        code: 'custom',
        path: ['columns'],
        message: `A dataset holds at most ${DATASET_MAX_COLUMNS} columns of values`,
      });
    }
    for (const index of chosen) {
      const choice = form.columns[index]!;
      if (!choice.unit.trim()) {
        ctx.addIssue({
          code: 'custom',
          path: ['columns', index, 'unit'],
          message: 'Give the unit of this column, e.g. K or ppm',
        });
      }
      for (const field of ['unit', 'label'] as const) {
        const checked = datasetValueColumnSchema.shape[field].safeParse(choice[field]);
        if (!checked.success && choice[field].trim()) {
          ctx.addIssue({
            code: 'custom',
            path: ['columns', index, field],
            message: checked.error.issues[0]!.message,
          });
        }
      }
    }
  });
export type ImportDatasetForm = z.input<typeof importDatasetFormSchema>;

/** The form fields an API error can be shown under. */
export const importDatasetFormFields = ['timeColumn', 'name', 'description'] as const;

/** The columns chosen for values: ticked, and not the time column. */
function valueColumnIndexes(form: Pick<ImportDatasetForm, 'timeColumn' | 'columns'>): number[] {
  return form.columns.flatMap((choice, index) =>
    choice.use && choice.column !== form.timeColumn ? [index] : [],
  );
}

/** A header that names a time: `year`, `Date`, `decimal_year`, `time (UTC)`... */
const timeHeader = /year|date|time|^t$/i;

/** Choices for a freshly uploaded file: the time column guessed, every other column ticked. */
export function columnChoicesFor(
  upload: DatasetUploadView,
): Pick<ImportDatasetForm, 'timeColumn' | 'columns'> {
  const timeColumn = upload.columns.find((column) => timeHeader.test(column)) ?? '';
  return {
    timeColumn,
    columns: upload.columns.map((column) => ({ column, use: true, unit: '', label: '' })),
  };
}

export const emptyImportDatasetForm: ImportDatasetForm = {
  timeColumn: '',
  columns: [],
  name: '',
  description: '',
};

export function toCreateDatasetRequest(
  form: ImportDatasetForm,
  attachmentId: string,
): CreateDatasetRequest {
  return {
    attachmentId,
    name: form.name.trim(),
    description: form.description.trim(),
    timeColumn: form.timeColumn,
    valueColumns: valueColumnIndexes(form).map((index) => {
      const { column, unit, label } = form.columns[index]!;
      return { column, unit: unit.trim(), label: optionalText(label) };
    }),
  };
}
