import { Flex, Text } from '@radix-ui/themes';
import { hasClaimRole } from '../../../claim-permissions';
import type { SectionProps } from '../claim-tabs';
import { SectionHeader } from '../section-header';
import { AttachmentItem } from './attachment-item';
import { UploadEvidenceForm } from './upload-evidence-form';

/** The claim's evidence files: images and PDFs previewed in the page, the rest downloaded. */
export function FilesSection({ claim, user, onNotice }: SectionProps) {
  return (
    <Flex direction="column" gap="4">
      <SectionHeader title="Evidence files" />
      {hasClaimRole(user.role, 'contribute') ? (
        <UploadEvidenceForm claimId={claim.id} onNotice={onNotice} />
      ) : null}
      {claim.attachments.length === 0 ? (
        <Text color="gray">No files uploaded to this claim yet.</Text>
      ) : (
        <ul className="sl-card-list" aria-label="Evidence files">
          {claim.attachments.map((attachment) => (
            <li key={attachment.id}>
              <AttachmentItem attachment={attachment} />
            </li>
          ))}
        </ul>
      )}
    </Flex>
  );
}
