import {
  CLAIM_SUMMARY_MAX_LENGTH,
  CLAIM_TEXT_MAX_LENGTH,
  TOPIC_MAX_LENGTH,
  TOPICS_MAX,
} from '@skyledger/contracts';
import { Transform } from 'class-transformer';
import { ArrayMaxSize, ArrayUnique, IsArray, IsString, Matches, MaxLength } from 'class-validator';
import { BooleanField, TextField } from '../../common/validation/fields';

/** The fields of a claim an editor writes; filing and editing share them. */
export class ClaimFieldsDto {
  @TextField(CLAIM_TEXT_MAX_LENGTH)
  text: string;

  @TextField(CLAIM_SUMMARY_MAX_LENGTH)
  summary: string;

  @Transform(({ value }: { value: unknown }) =>
    Array.isArray(value)
      ? value.map((topic) => (typeof topic === 'string' ? topic.trim().toLowerCase() : topic))
      : value,
  )
  @IsArray()
  @ArrayMaxSize(TOPICS_MAX)
  @ArrayUnique({ message: 'topics must not repeat a topic' })
  @IsString({ each: true })
  @MaxLength(TOPIC_MAX_LENGTH, { each: true })
  @Matches(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, {
    each: true,
    message: 'each topic must be lower-case letters, digits and hyphens, e.g. sea-level',
  })
  topics: string[];

  @BooleanField({ optional: true })
  legalReview?: boolean;
}
