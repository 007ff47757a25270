import { Card, Code, Flex, Text } from '@radix-ui/themes';
import type { AttachmentView } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { formatBytes } from '@/lib/format-bytes';
import { AttachmentPreview } from './attachment-preview';
import { OpenFileButton } from './open-file-button';

const typeNames: Record<AttachmentView['mediaType'], string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG image',
  'image/jpeg': 'JPEG image',
  'image/webp': 'WebP image',
  'text/csv': 'CSV table',
  'text/plain': 'Plain text',
};

export function AttachmentItem({ attachment }: { attachment: AttachmentView }) {
  return (
    <Card size="2">
      <Flex direction="column" gap="3">
        <Flex direction="column" gap="1">
          <Text weight="bold" className="sl-break">
            {attachment.originalName}
          </Text>
          <Text size="2" color="gray">
            {typeNames[attachment.mediaType]}, {formatBytes(attachment.size)}. Uploaded by{' '}
            {attachment.uploadedBy.displayName}, <DateTime value={attachment.uploadedAt} />.
          </Text>
          <Text size="1" color="gray" className="sl-break">
            SHA-256{' '}
            <Code variant="ghost" size="1">
              {attachment.sha256}
            </Code>
          </Text>
        </Flex>
        <AttachmentPreview attachment={attachment} />
        <Flex>
          <OpenFileButton attachment={attachment} />
        </Flex>
      </Flex>
    </Card>
  );
}
