import { DownloadIcon } from '@radix-ui/react-icons';
import { Button, Flex, Text } from '@radix-ui/themes';
import { errorMessage } from '@/lib/api-error-messages';

interface DownloadButtonProps {
  label: string;
  pending: boolean;
  /** Why the last download failed, if it did. */
  error: unknown;
  onClick: () => void;
}

/** A button that fetches a file with the token and hands it to the browser, saying if it failed. */
export function DownloadButton({ label, pending, error, onClick }: DownloadButtonProps) {
  return (
    <Flex direction="column" gap="1" align="start">
      <Button variant="soft" color="gray" highContrast loading={pending} onClick={onClick}>
        <DownloadIcon aria-hidden />
        {label}
      </Button>
      {error ? (
        <Text size="2" color="red" role="alert">
          {errorMessage(error)}
        </Text>
      ) : null}
    </Flex>
  );
}
