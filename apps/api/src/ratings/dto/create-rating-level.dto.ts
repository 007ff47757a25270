import { type CreateRatingLevelRequest } from '@skyledger/contracts';
import { IsBoolean, IsInt, Matches, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { TextField } from '../../common/validation/fields';

export class CreateRatingLevelDto implements CreateRatingLevelRequest {
  @Matches(/^[a-z]+(?:-[a-z]+)*$/, { message: 'id must be lower-case words joined by hyphens' })
  @MaxLength(40)
  id: string;

  @ValidateIf((_dto, value) => value !== null)
  @IsInt()
  @Min(1)
  @Max(20)
  number: number | null;

  @TextField(60)
  label: string;

  @TextField(600)
  description: string;

  @IsBoolean()
  isRating: boolean;
}
