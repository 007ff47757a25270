import {
  reliabilityGradeDescriptions,
  reliabilityGradeLabels,
  reliabilityGrades,
  type ReliabilityGrade,
} from '@skyledger/contracts';
import type { Control, FieldValues, Path, UseFormRegister } from 'react-hook-form';
import { ControlledSelect } from '@/components/ui/controlled-select';
import { TextAreaField } from '@/components/ui/text-area-field';
import { useFieldErrors } from '@/lib/use-field-errors';

const gradeOptions = reliabilityGrades.map((grade) => ({
  value: grade,
  label: reliabilityGradeLabels[grade],
}));

interface Grading {
  grade: ReliabilityGrade | '';
  gradeReason: string;
}

interface GradeFieldsProps<T extends FieldValues> {
  control: Control<T>;
  register: UseFormRegister<T>;
}

/** How far the desk trusts a source, and why: the grade is never given without its reason. */
export function GradeFields<T extends FieldValues & Grading>({
  control,
  register,
}: GradeFieldsProps<T>) {
  const errorOf = useFieldErrors(control);
  return (
    <>
      <ControlledSelect
        control={control}
        name={'grade' as Path<T>}
        label="Reliability grade"
        options={gradeOptions}
        placeholder="Choose a grade"
        hint={(grade) =>
          grade
            ? reliabilityGradeDescriptions[grade as ReliabilityGrade]
            : 'What each grade means shows here'
        }
      />
      <TextAreaField
        label="Reason for the grade"
        rows={3}
        error={errorOf('gradeReason')}
        {...register('gradeReason' as Path<T>)}
      />
    </>
  );
}
