import { Text } from '@radix-ui/themes';
import { CLAIM_SUMMARY_MAX_LENGTH } from '@skyledger/contracts';
import { useWatch, type Control, type FieldValues, type Path } from 'react-hook-form';

/**
 * "42 of 75 characters" under the summary as it is typed; red past the limit. It watches
 * the field itself, so a keystroke re-renders this line and not the whole form.
 */
export function SummaryCounter<T extends FieldValues & { summary: string }>({
  control,
}: {
  control: Control<T>;
}) {
  const summary = useWatch({ control, name: 'summary' as Path<T> }) as string;
  const length = summary.trim().length;
  const over = length > CLAIM_SUMMARY_MAX_LENGTH;
  return (
    <Text color={over ? 'red' : undefined}>
      One neutral line: {length} of {CLAIM_SUMMARY_MAX_LENGTH} characters
      {over ? `, ${length - CLAIM_SUMMARY_MAX_LENGTH} too many` : ''}
    </Text>
  );
}
