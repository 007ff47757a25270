import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Callout } from '@radix-ui/themes';

/** The form-level error: what the API said that belongs to no single field. */
export function FormError({ message }: { message: string | undefined }) {
  if (!message) return null;
  return (
    <Callout.Root color="red" role="alert" size="1">
      <Callout.Icon>
        <ExclamationTriangleIcon aria-hidden />
      </Callout.Icon>
      <Callout.Text>{message}</Callout.Text>
    </Callout.Root>
  );
}
