import { PartialType } from '@nestjs/swagger';
import { type UpdateSourceRequest } from '@skyledger/contracts';
import { VersionField } from '../../common/validation/fields';
import { CreateSourceDto } from './create-source.dto';

export class UpdateSourceDto extends PartialType(CreateSourceDto) implements UpdateSourceRequest {
  @VersionField()
  version: number;
}
