import { Flex, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

export interface FieldIds {
  controlId: string;
  labelId: string;
  hintId: string;
  errorId: string;
}

interface FieldFrameProps {
  ids: FieldIds;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
}

/** Label above the control, then its hint and its error, each tied to the control by id. */
export function FieldFrame({ ids, label, hint, error, children }: FieldFrameProps) {
  return (
    <Flex direction="column" gap="1">
      <Text as="label" id={ids.labelId} htmlFor={ids.controlId} size="2" weight="bold">
        {label}
      </Text>
      {children}
      {hint ? (
        <Text id={ids.hintId} size="1" color="gray">
          {hint}
        </Text>
      ) : null}
      {error ? (
        <Text id={ids.errorId} size="2" color="red" className="sl-field-error">
          {error}
        </Text>
      ) : null}
    </Flex>
  );
}

/** The aria attributes a control needs to announce its hint and error. */
export function describedBy(ids: FieldIds, hint: unknown, error: string | undefined) {
  const described = [hint ? ids.hintId : null, error ? ids.errorId : null].filter(Boolean);
  return {
    'aria-invalid': error ? true : undefined,
    'aria-describedby': described.length > 0 ? described.join(' ') : undefined,
  } as const;
}
