import { Text } from '@radix-ui/themes';

/** The rule an input broke, under it; its id goes into the control's aria-describedby. */
export function InputError({ id, message }: { id: string; message: string | undefined }) {
  if (!message) return null;
  return (
    <Text id={id} size="2" color="red" className="sl-field-error">
      {message}
    </Text>
  );
}

/** The ids a control is described by: its help, its facts, and its error when it has one. */
export function describedByIds(...ids: (string | false | undefined)[]): string | undefined {
  const present = ids.filter(Boolean);
  return present.length > 0 ? present.join(' ') : undefined;
}
