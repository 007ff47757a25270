import { HttpStatus } from '@nestjs/common';
import { type NamedSeries } from '@skyledger/calc';
import { type DatasetSeriesRef } from '@skyledger/contracts';
import { type EntityManager } from 'typeorm';
import { ApiError } from '../common/errors/api-error';
import { Dataset } from './entities/dataset.entity';

/**
 * One value column of a dataset as a calculator series, named by `ref.name`, else the
 * column's label. `field` is the request field to name when the reference is wrong.
 */
export async function seriesOfDataset(
  manager: EntityManager,
  ref: DatasetSeriesRef,
  field: string,
): Promise<NamedSeries> {
  const dataset = await manager.findOne(Dataset, { where: { id: ref.dataset } });
  if (!dataset) {
    throw new ApiError(HttpStatus.UNPROCESSABLE_ENTITY, 'No such dataset on the desk', {
      [field]: 'unknownDataset',
    });
  }
  const index = dataset.columns.findIndex((column) => column.key === ref.column);
  if (index < 0) {
    throw ApiError.unprocessable(
      `The dataset "${dataset.name}" has no column "${ref.column}" (it has ${dataset.columns
        .map((column) => `"${column.key}"`)
        .join(', ')})`,
      { [field]: 'unknownColumn' },
    );
  }
  return {
    name: ref.name ?? dataset.columns[index]!.label,
    points: dataset.rows.map((row) => ({ t: row[0], y: row[index + 1]! })),
  };
}
