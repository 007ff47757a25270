import { BOTTOM_LINE_MAX_LENGTH, type CreateVerdictVersionRequest } from '@skyledger/contracts';
import { IsObject, IsOptional, IsString, IsUUID, Matches, MaxLength } from 'class-validator';
import { Trim } from '../../common/transforms';

/** A verdict's fields; each may be left out (and rating and primary source set to null). */
export class VerdictFieldsDto implements CreateVerdictVersionRequest {
  @IsOptional()
  @Matches(/^[a-z]+(?:-[a-z]+)*$/, { message: 'ratingId must be the id of a rating level' })
  ratingId?: string | null;

  @IsOptional()
  @Trim()
  @IsString()
  @MaxLength(BOTTOM_LINE_MAX_LENGTH)
  bottomLine?: string;

  /** A Tiptap document; cleaned to the explainer schema on the server. */
  @IsOptional()
  @IsObject()
  body?: { type: 'doc'; [key: string]: unknown };

  @IsOptional()
  @IsUUID('all', { message: 'primarySourceId must be a UUID' })
  primarySourceId?: string | null;
}
