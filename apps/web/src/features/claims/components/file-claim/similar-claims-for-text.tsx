import { useWatch, type Control } from 'react-hook-form';
import { SimilarClaimsPanel } from '@/features/search/components/similar-claims-panel';
import type { FileClaimForm } from '../../forms/file-claim-form';

/** Earlier claims like the one typed; it watches the text itself, so the form stays still. */
export function SimilarClaimsForText({ control }: { control: Control<FileClaimForm> }) {
  const text = useWatch({ control, name: 'text' });
  return <SimilarClaimsPanel text={text} />;
}
