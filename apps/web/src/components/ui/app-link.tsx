import { Link } from '@radix-ui/themes';
import type { ComponentProps } from 'react';
import { Link as RouterLink } from 'react-router-dom';

type AppLinkProps = Omit<ComponentProps<typeof Link>, 'asChild' | 'href'> & { to: string };

/** A Radix-styled link that navigates inside the desk without a page load. */
export function AppLink({ to, children, ...props }: AppLinkProps) {
  return (
    <Link asChild {...props}>
      <RouterLink to={to}>{children}</RouterLink>
    </Link>
  );
}
