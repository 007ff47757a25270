import type { ReactNode, Ref } from 'react';
import { describedBy, FieldFrame } from './field-frame';
import { useFieldIds } from './use-field-ids';

interface FileFieldProps {
  label: string;
  /** What the picker offers, as for `<input accept>`. */
  accept: string;
  onFileChange: (file: File | null) => void;
  hint?: ReactNode;
  error?: string;
  disabled?: boolean;
  name?: string;
  inputRef?: Ref<HTMLInputElement>;
}

/** The browser's own file picker (Radix has none), labelled and tied to its hint and error. */
export function FileField({
  label,
  accept,
  onFileChange,
  hint,
  error,
  disabled,
  name,
  inputRef,
}: FileFieldProps) {
  const ids = useFieldIds();
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={error}>
      <input
        ref={inputRef}
        id={ids.controlId}
        name={name}
        type="file"
        accept={accept}
        disabled={disabled}
        className="sl-file-input"
        onChange={(event) => onFileChange(event.target.files?.[0] ?? null)}
        {...describedBy(ids, hint, error)}
      />
    </FieldFrame>
  );
}
