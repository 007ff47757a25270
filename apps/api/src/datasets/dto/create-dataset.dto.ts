import { Type } from 'class-transformer';
import {
  DATASET_MAX_COLUMNS,
  type CreateDatasetRequest,
  type DatasetValueColumn,
} from '@skyledger/contracts';
import { ArrayMaxSize, ArrayMinSize, IsArray, ValidateNested } from 'class-validator';
import { TextField, UuidField } from '../../common/validation/fields';

export class DatasetValueColumnDto implements DatasetValueColumn {
  @TextField(120)
  column: string;

  @TextField(40)
  unit: string;

  @TextField(120, { optional: true })
  label?: string;
}

export class CreateDatasetDto implements CreateDatasetRequest {
  @UuidField()
  attachmentId: string;

  @TextField(160)
  name: string;

  @TextField(2000)
  description: string;

  @TextField(120)
  timeColumn: string;

  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(DATASET_MAX_COLUMNS)
  @ValidateNested({ each: true })
  @Type(() => DatasetValueColumnDto)
  valueColumns: DatasetValueColumnDto[];
}
