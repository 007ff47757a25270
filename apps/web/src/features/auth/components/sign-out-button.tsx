import { Button } from '@radix-ui/themes';
import { useSignOut } from '../api/sign-out';

export function SignOutButton() {
  const signOut = useSignOut();
  return (
    <Button
      variant="soft"
      color="gray"
      highContrast
      loading={signOut.isPending}
      onClick={() => signOut.mutate()}
    >
      Sign out
    </Button>
  );
}
