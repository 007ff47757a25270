import type { UseFormRegisterReturn } from 'react-hook-form';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextInputField } from '@/components/ui/text-input-field';

type WordField = UseFormRegisterReturn & { error: string | undefined };

/** A level's words, as readers see them: its label and what it means. */
export function RatingLevelWordsFields({
  label,
  description,
}: {
  label: WordField;
  description: WordField;
}) {
  return (
    <>
      <TextInputField label="Label" autoComplete="off" {...label} />
      <TextAreaField label="What it means" rows={4} {...description} />
    </>
  );
}
