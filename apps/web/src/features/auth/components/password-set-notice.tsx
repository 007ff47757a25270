import { CheckCircledIcon } from '@radix-ui/react-icons';
import { Button, Callout, Flex } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';

/** What a one-time link's page shows once the password is set: the news, and the way in. */
export function PasswordSetNotice({ children }: { children: ReactNode }) {
  return (
    <Flex direction="column" gap="4">
      <Callout.Root color="jade" role="status">
        <Callout.Icon>
          <CheckCircledIcon aria-hidden />
        </Callout.Icon>
        <Callout.Text>{children}</Callout.Text>
      </Callout.Root>
      <Button asChild size="3" highContrast>
        <RouterLink to={paths.auth.signIn.getHref()}>Sign in</RouterLink>
      </Button>
    </Flex>
  );
}
