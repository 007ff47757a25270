import type { DatasetDetail, DatasetSummary, DatasetUploadView } from '@skyledger/contracts';
import { deskPeople } from './fixtures';

// Invented, SYNTHETIC series for the fictional Marrowby Gazette desk.
const editor = {
  id: deskPeople.science_editor.id,
  displayName: deskPeople.science_editor.displayName,
};

export const stationDatasetId = '9a1d3c55-7e20-4b1a-8c3f-5e0000000001';

export const stationDataset: DatasetDetail = {
  id: stationDatasetId,
  name: 'SYNTHETIC Marrowby station annual anomalies',
  description:
    'SYNTHETIC: invented for the desk’s tests, not a measurement. A line with noise and a warm spike in 2016.',
  timeColumn: 'year',
  columns: [{ key: 'anomaly_k', label: 'Station anomaly', unit: 'K' }],
  rowCount: 5,
  timeRange: { from: 2014, to: 2018 },
  attachmentId: '2c8e4f10-1b2a-4c3d-9e4f-6a0000000001',
  createdBy: editor,
  createdAt: '2026-11-19T10:00:00.000Z',
  version: 1,
  rows: [
    [2014, 0.31],
    [2015, 0.42],
    [2016, 0.87],
    [2017, 0.55],
    [2018, -0.12],
  ],
};

export const dayNightDataset: DatasetSummary = {
  id: '9a1d3c55-7e20-4b1a-8c3f-5e0000000002',
  name: 'SYNTHETIC day and night temperature anomalies',
  description: 'SYNTHETIC: nights warm faster than days.',
  timeColumn: 'date',
  columns: [
    { key: 'night_min_k', label: 'Night (minimum)', unit: 'K' },
    { key: 'day_max_k', label: 'Day (maximum)', unit: 'K' },
  ],
  rowCount: 564,
  timeRange: { from: 1979 + 0.5 / 12, to: 2025 + 11.5 / 12 },
  attachmentId: '2c8e4f10-1b2a-4c3d-9e4f-6a0000000002',
  createdBy: editor,
  createdAt: '2026-11-18T09:00:00.000Z',
  version: 1,
};

const { rows: _rows, ...stationSummary } = stationDataset;
export const datasetList: DatasetSummary[] = [stationSummary, dayNightDataset];

/** What `POST /api/datasets/uploads` answers for a small station CSV. */
export function uploadOf(name: string, rows: string[][]): DatasetUploadView {
  return {
    attachment: {
      id: '2c8e4f10-1b2a-4c3d-9e4f-6a00000000f1',
      originalName: name,
      mediaType: 'text/csv',
      size: 120,
      sha256: 'b'.repeat(64),
      uploadedBy: editor,
      uploadedAt: '2026-11-20T08:00:00.000Z',
    },
    columns: ['station_id', 'year', 'anomaly_k'],
    previewRows: rows,
    rowCount: rows.length,
  };
}
