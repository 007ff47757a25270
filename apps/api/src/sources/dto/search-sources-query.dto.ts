import { TextField } from '../../common/validation/fields';

export class SearchSourcesQueryDto {
  /** Matches the start of the title or of any word in it, or a DOI exactly. */
  @TextField(200, { optional: true })
  q?: string;
}
