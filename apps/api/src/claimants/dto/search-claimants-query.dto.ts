import { TextField } from '../../common/validation/fields';

export class SearchClaimantsQueryDto {
  /** Matches the start of the name or of any word in it. */
  @TextField(160, { optional: true })
  q?: string;
}
