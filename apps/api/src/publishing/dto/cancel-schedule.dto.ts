import { VersionField } from '../../common/validation/fields';

export class CancelScheduleDto {
  @VersionField()
  version: number;
}
