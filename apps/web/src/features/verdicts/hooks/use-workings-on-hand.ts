import { useCalculators } from '@/features/workings/api/get-calculators';
import { useClaimWorkings } from '@/features/workings/api/get-claim-workings';
import type { WorkingsOnHand } from '../components/working-summary';

/** The claim's stored workings and the calculators' words for them, once loaded. */
export function useWorkingsOnHand(claimId: string): WorkingsOnHand {
  const workings = useClaimWorkings(claimId);
  const calculators = useCalculators();
  return { workings: workings.data, calculators: calculators.data?.calculators };
}
