import { type AuditQuery } from '@skyledger/contracts';
import { Type } from 'class-transformer';
import { DateField, IntField, TextField, UuidField } from '../../common/validation/fields';

export class AuditQueryDto implements AuditQuery {
  @TextField(64, { optional: true })
  action?: string;

  @TextField(64, { optional: true })
  entityType?: string;

  @UuidField({ optional: true })
  actor?: string;

  @UuidField({ optional: true })
  claim?: string;

  @DateField({ optional: true })
  from?: string;

  @DateField({ optional: true })
  to?: string;

  @Type(() => Number)
  @IntField(1, 100_000, { optional: true })
  page?: number;
}
