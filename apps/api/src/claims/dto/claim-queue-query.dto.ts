import {
  CLAIM_PAGE_SIZE_MAX,
  claimSortFields,
  claimStatuses,
  type ClaimQueueQuery,
  type ClaimSortField,
  type ClaimStatus,
} from '@skyledger/contracts';
import { Transform, Type } from 'class-transformer';
import { IsIn, IsOptional, ValidateIf } from 'class-validator';
import {
  BooleanField,
  DateField,
  EnumField,
  IntField,
  TextField,
  UuidField,
} from '../../common/validation/fields';

/** `'true'`/`'false'` become booleans; anything else stays as sent and fails IsBoolean. */
const QueryBoolean = () =>
  Transform(({ value }: { value: unknown }) =>
    value === 'true' ? true : value === 'false' ? false : value,
  );

export class ClaimQueueQueryDto implements ClaimQueueQuery {
  @EnumField(claimStatuses, { optional: true })
  status?: ClaimStatus;

  /** A person's id, or `none` for claims nobody has taken. */
  @IsOptional()
  @ValidateIf((_query, value) => value !== 'none')
  @UuidField()
  assignee?: string;

  @QueryBoolean()
  @BooleanField({ optional: true })
  mine?: boolean;

  @TextField(40, { optional: true })
  topic?: string;

  @UuidField({ optional: true })
  claimant?: string;

  @DateField({ optional: true })
  filedFrom?: string;

  @DateField({ optional: true })
  filedTo?: string;

  @QueryBoolean()
  @BooleanField({ optional: true })
  legal?: boolean;

  @EnumField(claimSortFields, { optional: true })
  sort?: ClaimSortField;

  @IsOptional()
  @IsIn(['asc', 'desc'], { message: 'order must be asc or desc' })
  order?: 'asc' | 'desc';

  @Type(() => Number)
  @IntField(1, 100_000, { optional: true })
  page?: number;

  @Type(() => Number)
  @IntField(1, CLAIM_PAGE_SIZE_MAX, { optional: true })
  pageSize?: number;
}
