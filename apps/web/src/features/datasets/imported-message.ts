import type { DatasetDetail } from '@skyledger/contracts';

/** What the dataset page's toast says once an import went through. */
export function importedMessage(dataset: DatasetDetail): string {
  const columns = dataset.columns.length === 1 ? 'one column' : `${dataset.columns.length} columns`;
  return `Imported ${dataset.rowCount} rows of ${columns}.`;
}
