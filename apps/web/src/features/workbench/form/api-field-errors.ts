import { isApiError } from '@/lib/api-client';
import { fieldErrorMessage } from '@/lib/api-error-messages';

const datasetCodes = {
  unknownDataset: 'This dataset is no longer on the desk; choose another',
  unknownColumn: 'This dataset has no such column any more; choose another',
};

/**
 * The API's refusal of a working's inputs, by input name: `inputs.albedo` and
 * `inputs.series.1` name inputs; the library's refusals carry their rule in words.
 */
export function inputErrorsOf(error: unknown): Record<string, string> {
  if (!isApiError(error) || error.status !== 422) return {};
  const errors: Record<string, string> = {};
  for (const [field, code] of Object.entries(error.body.fields ?? {})) {
    const [prefix, name] = field.split('.');
    if (prefix !== 'inputs' || !name) continue;
    const inWords = code.includes(' ') ? code : undefined;
    errors[name] =
      inWords ??
      fieldErrorMessage(name, code, error.message, {
        [name]: datasetCodes,
      });
  }
  return errors;
}
