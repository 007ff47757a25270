import { ClaimWorkings } from '@/features/workings/components/claim-workings';
import type { SectionProps } from '../claim-tabs';

/** The claim's workings: each saved calculator run, re-runnable with the current library. */
export function WorkingsSection({ claim }: SectionProps) {
  return <ClaimWorkings claimId={claim.id} />;
}
