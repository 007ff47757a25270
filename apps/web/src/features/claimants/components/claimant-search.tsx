import { Button, Text } from '@radix-ui/themes';
import { claimantKindLabels, type ClaimantView } from '@skyledger/contracts';
import { SearchPicker } from '@/components/ui/search-picker';
import { claimantSearchQueryOptions } from '../api/search-claimants';

interface ClaimantSearchProps {
  label: string;
  hint?: string;
  error?: string;
  onPick: (claimant: ClaimantView) => void;
}

/** Finds claimants by the start of a name or of a word in it; each result is a button. */
export function ClaimantSearch({ label, hint, error, onPick }: ClaimantSearchProps) {
  return (
    <SearchPicker
      label={label}
      hint={hint}
      error={error}
      noun={['claimant', 'claimants']}
      search={claimantSearchQueryOptions}
      renderItem={(claimant) => (
        <Button
          type="button"
          variant="ghost"
          color="gray"
          highContrast
          className="sl-pick-button"
          onClick={() => onPick(claimant)}
        >
          <Text weight="bold">{claimant.name}</Text>
          <Text size="1" color="gray">
            {claimantKindLabels[claimant.kind]}
            {claimant.affiliation ? ` · ${claimant.affiliation}` : ''}
          </Text>
        </Button>
      )}
    />
  );
}
