import { NestedField, UuidField } from '../../common/validation/fields';
import { CreateSourceDto } from './create-source.dto';

/** Cite a source for a claim: an existing one by id, or a new one (one of the two). */
export class LinkSourceDto {
  @UuidField({ optional: true })
  sourceId?: string;

  @NestedField(() => CreateSourceDto, { optional: true })
  source?: CreateSourceDto;
}
