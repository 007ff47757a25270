import type { ReactNode } from 'react';
import type { Control, FieldValues, Path, UseFormRegister } from 'react-hook-form';
import { ControlledCheckbox } from '@/components/ui/controlled-checkbox';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextInputField } from '@/components/ui/text-input-field';
import { useFieldErrors } from '@/lib/use-field-errors';
import { SummaryCounter } from './summary-counter';

interface ClaimWords {
  text: string;
  summary: string;
  topics: string;
  legalReview: boolean;
}

interface ClaimWordsFieldsProps<T extends FieldValues> {
  control: Control<T>;
  register: UseFormRegister<T>;
  /** Set when the legal-review flag is on and only a desk chief may clear it. */
  legalLocked?: boolean;
  /** Shown right under the claim's text, e.g. earlier claims like it. */
  afterText?: ReactNode;
}

/** The claim as said, its neutral summary, its topics and the legal flag: filing and editing. */
export function ClaimWordsFields<T extends FieldValues & ClaimWords>({
  control,
  register,
  legalLocked = false,
  afterText,
}: ClaimWordsFieldsProps<T>) {
  const errorOf = useFieldErrors(control);
  const name = (field: keyof ClaimWords) => field as Path<T>;
  return (
    <>
      <TextAreaField
        label="The claim as it was said"
        hint="Word for word where you can, without tidying it up"
        rows={4}
        error={errorOf('text')}
        {...register(name('text'))}
      />
      {afterText}
      <TextInputField
        label="Neutral summary"
        hint={<SummaryCounter control={control} />}
        autoComplete="off"
        error={errorOf('summary')}
        {...register(name('summary'))}
      />
      <TextInputField
        label="Topics"
        hint="Topic tags separated by commas, e.g. sea-level, solar"
        autoComplete="off"
        error={errorOf('topics')}
        {...register(name('topics'))}
      />
      <ControlledCheckbox
        control={control}
        name={name('legalReview')}
        label="Needs legal review"
        hint={
          legalLocked
            ? 'Only a desk chief can clear this flag'
            : 'It names a private individual, or checking it may carry legal risk'
        }
        disabled={legalLocked}
      />
    </>
  );
}
