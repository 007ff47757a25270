import { type INestApplicationContext } from '@nestjs/common';
import { type DatasetValueColumn } from '@skyledger/contracts';
import { Readable } from 'node:stream';
import { DataSource } from 'typeorm';
import { stageStream, stagingDirectory } from '../attachments/staged-upload';
import { storageConfig, type StorageConfig } from '../config/configuration';
import { DatasetsService } from '../datasets/datasets.service';
import { Dataset } from '../datasets/entities/dataset.entity';
import { seedActor } from './seed-actor';

/** A dataset the demo imports as a person would: its CSV uploaded, then its columns chosen. */
export interface SeedDataset {
  /** The natural key: a dataset with this name already there is left alone. */
  name: string;
  description: string;
  fileName: string;
  csv: string;
  timeColumn: string;
  valueColumns: DatasetValueColumn[];
  /** Who imports it, by e-mail. */
  by: string;
}

export async function seedDataset(
  context: INestApplicationContext,
  spec: SeedDataset,
): Promise<{ id: string; created: boolean }> {
  const existing = await context
    .get(DataSource)
    .manager.findOne(Dataset, { where: { name: spec.name } });
  if (existing) return { id: existing.id, created: false };
  const actor = await seedActor(context, spec.by);
  const datasets = context.get(DatasetsService, { strict: false });
  const staged = await stageStream(Readable.from([Buffer.from(spec.csv, 'utf8')]), {
    directory: stagingDirectory(context.get<StorageConfig>(storageConfig.KEY)),
    maxBytes: Number.MAX_SAFE_INTEGER,
    originalName: spec.fileName,
  });
  const upload = await datasets.upload(actor, staged);
  const dataset = await datasets.create(actor, {
    attachmentId: upload.attachment.id,
    name: spec.name,
    description: spec.description,
    timeColumn: spec.timeColumn,
    valueColumns: spec.valueColumns,
  });
  return { id: dataset.id, created: true };
}
