import { type DatasetDetail, type DatasetSummary } from '@skyledger/contracts';
import { toPersonRef } from '../common/views/person-ref';
import { type Dataset } from './entities/dataset.entity';

/** Needs `createdBy` loaded. */
export function toDatasetSummary(dataset: Dataset): DatasetSummary {
  return {
    id: dataset.id,
    name: dataset.name,
    description: dataset.description,
    timeColumn: dataset.timeColumn,
    columns: dataset.columns,
    rowCount: dataset.rowCount,
    timeRange: {
      from: dataset.rows[0]?.[0] ?? 0,
      to: dataset.rows[dataset.rows.length - 1]?.[0] ?? 0,
    },
    attachmentId: dataset.attachmentId,
    createdBy: toPersonRef(dataset.createdBy),
    createdAt: dataset.createdAt.toISOString(),
    version: dataset.version,
  };
}

export function toDatasetDetail(dataset: Dataset): DatasetDetail {
  return { ...toDatasetSummary(dataset), rows: dataset.rows };
}
