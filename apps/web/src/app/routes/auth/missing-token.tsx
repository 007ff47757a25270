import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Callout } from '@radix-ui/themes';

/** A link from an e-mail that lost its token on the way, e.g. cut off by a mail client. */
export function MissingToken({ what }: { what: string }) {
  return (
    <Callout.Root color="red" role="alert">
      <Callout.Icon>
        <ExclamationTriangleIcon aria-hidden />
      </Callout.Icon>
      <Callout.Text>
        This {what} link is incomplete. Open the link from the e-mail again, or copy the whole
        address into the browser.
      </Callout.Text>
    </Callout.Root>
  );
}
