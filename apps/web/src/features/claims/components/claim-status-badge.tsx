import { Badge } from '@radix-ui/themes';
import { claimStatusLabels, type ClaimStatus } from '@skyledger/contracts';

// The colour only repeats what the words say; the words are always there.
const statusColors = {
  filed: 'gray',
  in_research: 'blue',
  awaiting_signoff: 'amber',
  sent_back: 'orange',
  cleared: 'teal',
  published: 'jade',
  set_aside: 'gray',
} as const satisfies Record<ClaimStatus, string>;

export function ClaimStatusBadge({ status }: { status: ClaimStatus }) {
  return (
    <Badge color={statusColors[status]} highContrast variant="soft" className="sl-nowrap">
      {claimStatusLabels[status]}
    </Badge>
  );
}

/** Marks a claim flagged for legal review, wherever the claim is listed or opened. */
export function LegalReviewBadge({ flagged }: { flagged: boolean }) {
  return flagged ? (
    <Badge color="red" variant="soft" highContrast>
      Legal review
    </Badge>
  ) : null;
}
