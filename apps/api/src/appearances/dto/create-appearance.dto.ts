import { type CreateAppearanceRequest } from '@skyledger/contracts';
import {
  BooleanField,
  InstantField,
  TextField,
  TimeZoneField,
  WebUrlField,
} from '../../common/validation/fields';

export class CreateAppearanceDto implements CreateAppearanceRequest {
  @WebUrlField()
  url: string;

  @TextField(160)
  outlet: string;

  @InstantField()
  seenAt: string;

  @TimeZoneField()
  seenTimeZone: string;

  @BooleanField({ optional: true })
  isFirstKnown?: boolean;
}
