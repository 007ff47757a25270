import { outboxStates, type OutboxQuery, type OutboxState } from '@skyledger/contracts';
import { Type } from 'class-transformer';
import { EnumField, IntField } from '../../common/validation/fields';

export class OutboxQueryDto implements OutboxQuery {
  @EnumField(outboxStates, { optional: true })
  state?: OutboxState;

  @Type(() => Number)
  @IntField(1, 100_000, { optional: true })
  page?: number;
}
