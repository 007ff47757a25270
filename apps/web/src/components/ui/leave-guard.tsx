import { AlertDialog, Button, Flex } from '@radix-ui/themes';
import { useEffect } from 'react';
import { useBlocker } from 'react-router-dom';

interface LeaveGuardProps {
  /** True while there is unsaved work on the page. */
  when: boolean;
  /** What would be lost, e.g. "your changes to the draft". */
  what: string;
}

/**
 * Asks before leaving a page with unsaved work: inside the desk with a dialog (React
 * Router's blocker), and on reload, close or a typed address with the browser's own
 * question (beforeunload), which is the only one a browser allows there.
 */
export function LeaveGuard({ when, what }: LeaveGuardProps) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      when && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!when) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [when]);
  return (
    <AlertDialog.Root
      open={blocker.state === 'blocked'}
      onOpenChange={(open) => {
        // Cancel and Escape close the dialog: the person stays.
        if (!open && blocker.state === 'blocked') blocker.reset();
      }}
    >
      <AlertDialog.Content maxWidth="460px">
        <AlertDialog.Title>Leave without saving?</AlertDialog.Title>
        <AlertDialog.Description size="2">
          If you leave this page now, {what} will be lost.
        </AlertDialog.Description>
        <Flex gap="3" justify="end" mt="4" wrap="wrap">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray" highContrast>
              Stay on the page
            </Button>
          </AlertDialog.Cancel>
          <Button color="red" highContrast onClick={() => blocker.proceed?.()}>
            Leave without saving
          </Button>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
