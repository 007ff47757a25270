import { CheckCircledIcon, ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Box, Callout } from '@radix-ui/themes';

export interface Notice {
  tone: 'success' | 'problem';
  text: string;
}

export type ShowNotice = (notice: Notice) => void;

/** A live region that is always there, so changes to its text are announced. */
export function LiveNotice({ notice }: { notice: Notice | null }) {
  return (
    <Box role="status" aria-live="polite">
      {notice ? (
        <Callout.Root color={notice.tone === 'success' ? 'jade' : 'red'} size="1" highContrast>
          <Callout.Icon>
            {notice.tone === 'success' ? (
              <CheckCircledIcon aria-hidden />
            ) : (
              <ExclamationTriangleIcon aria-hidden />
            )}
          </Callout.Icon>
          <Callout.Text>{notice.text}</Callout.Text>
        </Callout.Root>
      ) : null}
    </Box>
  );
}
