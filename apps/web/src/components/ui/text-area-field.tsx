import { TextArea } from '@radix-ui/themes';
import type { ComponentProps, ReactNode } from 'react';
import { describedBy, FieldFrame } from './field-frame';
import { useFieldIds } from './use-field-ids';

type TextAreaFieldProps = Omit<ComponentProps<typeof TextArea>, 'id'> & {
  label: string;
  hint?: ReactNode;
  error?: string;
};

export function TextAreaField({ label, hint, error, ...textAreaProps }: TextAreaFieldProps) {
  const ids = useFieldIds();
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={error}>
      <TextArea
        size="3"
        resize="vertical"
        id={ids.controlId}
        {...describedBy(ids, hint, error)}
        {...textAreaProps}
      />
    </FieldFrame>
  );
}
