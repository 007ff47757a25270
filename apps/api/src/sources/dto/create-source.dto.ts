import {
  reliabilityGrades,
  sourceKinds,
  type CreateSourceRequest,
  type ReliabilityGrade,
  type SourceKind,
} from '@skyledger/contracts';
import { Matches } from 'class-validator';
import {
  DateField,
  EnumField,
  IntField,
  TextField,
  WebUrlField,
} from '../../common/validation/fields';

export class CreateSourceDto implements CreateSourceRequest {
  @TextField(300)
  title: string;

  @TextField(500, { optional: true })
  authors?: string;

  @TextField(200, { optional: true })
  publisher?: string;

  @IntField(1600, 2100, { optional: true })
  year?: number;

  /** Without the resolver prefix: `10.1029/98GL01908`. */
  @TextField(200, { optional: true })
  @Matches(/^10\.\d{4,9}\/\S+$/, { message: 'doi must look like 10.1029/98GL01908' })
  doi?: string;

  @WebUrlField({ optional: true })
  url?: string;

  @DateField({ optional: true })
  accessedOn?: string;

  @EnumField(sourceKinds)
  kind: SourceKind;

  @EnumField(reliabilityGrades)
  grade: ReliabilityGrade;

  /** Why the desk gives it this grade: always stated. */
  @TextField(1000)
  gradeReason: string;
}
