import {
  updateNoteKinds,
  type PublishClaimRequest,
  type UpdateNoteKind,
} from '@skyledger/contracts';
import {
  EnumField,
  NestedField,
  InstantField,
  TextField,
  TimeZoneField,
  VersionField,
} from '../../common/validation/fields';

export class UpdateNoteDto {
  @EnumField(updateNoteKinds)
  kind: UpdateNoteKind;

  @TextField(2000)
  text: string;
}

export class PublishClaimDto implements PublishClaimRequest {
  /** When to publish (an embargo); now when left out. */
  @InstantField({ optional: true })
  at?: string;

  /** The time zone the instant was chosen in, kept with it. */
  @TimeZoneField({ optional: true })
  timeZone?: string;

  @NestedField(() => UpdateNoteDto, { optional: true })
  note?: UpdateNoteDto;

  @VersionField()
  version: number;
}
