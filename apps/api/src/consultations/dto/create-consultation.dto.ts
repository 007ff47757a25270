import { type CreateConsultationRequest } from '@skyledger/contracts';
import { BooleanField, DateField, TextField } from '../../common/validation/fields';

export class CreateConsultationDto implements CreateConsultationRequest {
  @TextField(160)
  name: string;

  @TextField(200)
  affiliation: string;

  @TextField(160)
  field: string;

  @TextField(5000)
  quote: string;

  @DateField()
  consultedOn: string;

  /** What the expert declared; "None declared" is an answer, an empty field is not. */
  @TextField(1000)
  declaredConflicts: string;

  @BooleanField()
  independentOfClaimant: boolean;
}
