import type { DatasetDetail } from '@skyledger/contracts';
import type { Notice } from '@/components/ui/live-notice';

interface DatasetPageState {
  notice: Notice;
}

/** What the import hands the dataset page, so it can say the import went through. */
export function importedNotice(dataset: DatasetDetail): DatasetPageState {
  return {
    notice: {
      tone: 'success',
      text: `Imported ${dataset.rowCount} rows of ${dataset.columns.length === 1 ? 'one column' : `${dataset.columns.length} columns`}.`,
    },
  };
}

/** The notice in a navigation's state, if it carries one. */
export function datasetPageNotice(state: unknown): Notice | null {
  if (typeof state !== 'object' || state === null || !('notice' in state)) return null;
  const { notice } = state as Partial<DatasetPageState>;
  return notice && typeof notice.text === 'string' ? notice : null;
}
