import { PartialType } from '@nestjs/swagger';
import { type UpdateConsultationRequest } from '@skyledger/contracts';
import { VersionField } from '../../common/validation/fields';
import { CreateConsultationDto } from './create-consultation.dto';

export class UpdateConsultationDto
  extends PartialType(CreateConsultationDto)
  implements UpdateConsultationRequest
{
  @VersionField()
  version: number;
}
