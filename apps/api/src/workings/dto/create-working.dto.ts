import { ApiPropertyOptional } from '@nestjs/swagger';
import { type CreateWorkingRequest } from '@skyledger/contracts';
import { IsObject, IsOptional } from 'class-validator';
import { TextField } from '../../common/validation/fields';

export class CreateWorkingDto implements CreateWorkingRequest {
  @TextField(64)
  calculatorId: string;

  /** Checked by the calculator itself; a refusal is a 422 naming the input. */
  @IsObject()
  inputs: Record<string, unknown>;

  @TextField(2000, { optional: true })
  note?: string;

  /**
   * Accepted and never read: the desk may send back the result it showed, but only the
   * server's own run of the inputs is stored.
   */
  @ApiPropertyOptional({ description: 'Ignored: the server computes every output itself' })
  @IsOptional()
  outputs?: unknown;

  @ApiPropertyOptional({ description: 'Ignored: the server computes every step itself' })
  @IsOptional()
  steps?: unknown;
}
