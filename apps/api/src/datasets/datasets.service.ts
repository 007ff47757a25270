import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  type DatasetDetail,
  type DatasetSummary,
  type DatasetUploadView,
} from '@skyledger/contracts';
import { DataSource } from 'typeorm';
import { AttachmentsService } from '../attachments/attachments.service';
import { type StagedUpload } from '../attachments/staged-upload';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { toDatasetDetail, toDatasetSummary } from './dataset-views';
import { type CreateDatasetDto } from './dto/create-dataset.dto';
import { Dataset } from './entities/dataset.entity';
import { parseDatasetCsv, readCsv, type RowProblem } from './parse-dataset-csv';

const PREVIEW_ROWS = 10;
/** Problems listed in the message; all of them go in `fields`. */
const PROBLEMS_IN_MESSAGE = 5;

function describeProblems(problems: RowProblem[]): string {
  const listed = problems
    .slice(0, PROBLEMS_IN_MESSAGE)
    .map((p) => `line ${p.line}${p.column ? `, ${p.column}` : ''}: ${p.problem}`);
  const more = problems.length - listed.length;
  return `Nothing was imported. ${listed.join('; ')}${more > 0 ? `; and ${more} more` : ''}.`;
}

/** Datasets: CSV uploads checked row by row and kept whole, or refused whole. */
@Injectable()
export class DatasetsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly attachments: AttachmentsService,
    private readonly audit: AuditService,
  ) {}

  /** Keeps an uploaded CSV and shows its columns and first rows, so columns can be chosen. */
  async upload(actor: AuthenticatedUser, upload: StagedUpload): Promise<DatasetUploadView> {
    const attachment = await this.attachments.addDatasetFile(actor, upload);
    const { header, records } = readCsv(
      (await this.attachments.readAll(attachment.id)).bytes.toString('utf8'),
    );
    return {
      attachment,
      columns: header,
      previewRows: records.slice(0, PREVIEW_ROWS).map(({ record }) => record),
      rowCount: records.length,
    };
  }

  async create(actor: AuthenticatedUser, dto: CreateDatasetDto): Promise<DatasetDetail> {
    const { attachment, bytes } = await this.attachments.readAll(dto.attachmentId);
    if (attachment.claimId !== null || attachment.mediaType !== 'text/csv') {
      throw ApiError.unprocessable('Choose a CSV file uploaded for a dataset', {
        attachmentId: 'notADatasetFile',
      });
    }
    const parsed = parseDatasetCsv(bytes.toString('utf8'), dto);
    if (!parsed.ok) {
      throw ApiError.unprocessable(
        describeProblems(parsed.problems),
        Object.fromEntries(
          parsed.problems.map((p) => [
            `line ${p.line}${p.column ? `: ${p.column}` : ''}`,
            p.problem,
          ]),
        ),
      );
    }
    const id = await this.dataSource.transaction(async (manager) => {
      const dataset = await manager.save(
        manager.create(Dataset, {
          name: dto.name,
          description: dto.description,
          attachmentId: attachment.id,
          timeColumn: dto.timeColumn,
          columns: parsed.columns,
          rows: parsed.rows,
          rowCount: parsed.rows.length,
          createdById: actor.id,
        }),
      );
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'dataset.imported',
        entityType: 'dataset',
        entityId: dataset.id,
        summary: {
          name: dataset.name,
          rows: dataset.rowCount,
          columns: parsed.columns.map((column) => column.key),
        },
      });
      return dataset.id;
    });
    return this.detail(id);
  }

  async list(): Promise<DatasetSummary[]> {
    const datasets = await this.dataSource.manager.find(Dataset, {
      relations: { createdBy: true },
      order: { createdAt: 'DESC', id: 'ASC' },
    });
    return datasets.map(toDatasetSummary);
  }

  async detail(id: string): Promise<DatasetDetail> {
    const dataset = await this.dataSource.manager.findOne(Dataset, {
      where: { id },
      relations: { createdBy: true },
    });
    if (!dataset) throw new ApiError(HttpStatus.NOT_FOUND, 'No such dataset on the desk');
    return toDatasetDetail(dataset);
  }
}
