import { CheckCircledIcon, ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Box, Callout } from '@radix-ui/themes';
import { isApiError } from '@/lib/api-client';
import { errorMessage, fieldErrorMessage } from '@/lib/api-error-messages';

export interface Notice {
  tone: 'success' | 'problem';
  text: string;
}

export type ShowNotice = (notice: Notice) => void;

export const staleUserMessage = 'Someone else changed this person — reloaded.';

/** Words for a failed change to a person: stale version, a broken rule, or anything else. */
export function describeUserChangeError(error: unknown): string {
  if (isApiError(error) && error.status === 409 && error.body.fields?.version === 'stale') {
    return staleUserMessage;
  }
  const firstField = isApiError(error) ? Object.entries(error.body.fields ?? {})[0] : undefined;
  if (isApiError(error) && firstField) {
    return fieldErrorMessage(firstField[0], firstField[1], error.message);
  }
  return errorMessage(error);
}

/** A live region that is always there, so changes to its text are announced. */
export function PeopleNotice({ notice }: { notice: Notice | null }) {
  return (
    <Box role="status" aria-live="polite">
      {notice ? (
        <Callout.Root color={notice.tone === 'success' ? 'jade' : 'red'} size="1">
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
