import { useId } from 'react';
import type { FieldIds } from './field-frame';

export function useFieldIds(): FieldIds {
  const id = useId();
  return {
    controlId: `${id}-control`,
    labelId: `${id}-label`,
    hintId: `${id}-hint`,
    errorId: `${id}-error`,
  };
}
