import {
  claimStatuses,
  SEARCH_QUERY_MAX_LENGTH,
  searchDocumentTypes,
  type ClaimStatus,
  type SearchDocumentType,
  type SearchQuery,
} from '@skyledger/contracts';
import { Type } from 'class-transformer';
import { DateField, EnumField, IntField, TextField } from '../../common/validation/fields';

export class SearchQueryDto implements SearchQuery {
  @TextField(SEARCH_QUERY_MAX_LENGTH)
  q: string;

  @EnumField(searchDocumentTypes, { optional: true })
  type?: SearchDocumentType;

  @EnumField(claimStatuses, { optional: true })
  status?: ClaimStatus;

  @TextField(40, { optional: true })
  topic?: string;

  @TextField(40, { optional: true })
  rating?: string;

  @DateField({ optional: true })
  from?: string;

  @DateField({ optional: true })
  to?: string;

  @Type(() => Number)
  @IntField(1, 500, { optional: true })
  page?: number;
}
