import { type SimilarClaimsQuery } from '@skyledger/contracts';
import { MinLength } from 'class-validator';
import { TextField } from '../../common/validation/fields';

export class SimilarClaimsQueryDto implements SimilarClaimsQuery {
  /** The claim as it is being typed; shorter texts match too much to help. */
  @TextField(4000)
  @MinLength(12)
  text: string;
}
