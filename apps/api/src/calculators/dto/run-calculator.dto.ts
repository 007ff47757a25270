import { type RunCalculatorRequest } from '@skyledger/contracts';
import { IsObject } from 'class-validator';

export class RunCalculatorDto implements RunCalculatorRequest {
  /** Checked by the calculator itself; a refusal is a 422 naming the input. */
  @IsObject()
  inputs: Record<string, unknown>;
}
