import { Box, Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { CalculatorInfo } from '@skyledger/calc';
import type { WorkingView } from '@skyledger/contracts';
import { useQuery } from '@tanstack/react-query';
import { useId, useState, type FormEvent } from 'react';
import { FormError } from '@/components/ui/form-error';
import { TextAreaField } from '@/components/ui/text-area-field';
import { claimQueryOptions } from '@/features/claims/api/get-claim';
import { errorMessage } from '@/lib/api-error-messages';
import { useSaveWorking } from '../../api/save-working';
import { inputErrorsOf } from '../../form/api-field-errors';
import { buildInputs } from '../../form/build-inputs';
import type { FormState } from '../../form/form-state';
import { ChosenClaim } from './chosen-claim';
import { ClaimPicker } from './claim-picker';
import { SavedWorking } from './saved-working';

interface SaveWorkingPanelProps {
  calculator: CalculatorInfo;
  form: FormState;
  /** The claim to save to, from the page's address; null until one is chosen. */
  claimId: string | null;
  onClaimChange: (claimId: string | null) => void;
  /** The API's refusal of inputs, by input name, to show on the fields. */
  onInputErrors: (errors: Record<string, string>) => void;
}

const noteMaxLength = 2000;

/**
 * Saves the form's inputs as a working on a claim. Only the calculator, the inputs and the
 * note are sent: the server runs the library itself and keeps its own result.
 */
export function SaveWorkingPanel({
  calculator,
  form,
  claimId,
  onClaimChange,
  onInputErrors,
}: SaveWorkingPanelProps) {
  const headingId = useId();
  const [note, setNote] = useState('');
  const [saved, setSaved] = useState<{ claimId: string; working: WorkingView } | null>(null);
  const [noClaim, setNoClaim] = useState(false);
  const save = useSaveWorking(claimId ?? '');
  // Shares the cache with the chosen claim above: its summary names where it was saved.
  const claim = useQuery({ ...claimQueryOptions(claimId ?? ''), enabled: claimId !== null });
  const built = buildInputs(calculator.inputs, form, { for: 'request' });
  const unready = Object.keys(built.problems).length > 0 || built.missing.length > 0;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!claimId) {
      setNoClaim(true);
      return;
    }
    const trimmed = note.trim();
    save.mutate(
      { calculatorId: calculator.id, inputs: built.inputs, ...(trimmed ? { note: trimmed } : {}) },
      {
        onSuccess: (working) => {
          setSaved({ claimId, working });
          // The note belongs to the working just kept; the next save is a new working.
          setNote('');
        },
        onError: (error) => onInputErrors(inputErrorsOf(error)),
      },
    );
  };
  const inputErrors = Object.values(inputErrorsOf(save.error));
  const formError = save.isError
    ? inputErrors.length > 0
      ? `The server refused these inputs: ${inputErrors.join('; ')}. The marked fields say which.`
      : errorMessage(save.error)
    : undefined;

  return (
    <Card asChild size="3">
      <section aria-labelledby={headingId}>
        <Flex direction="column" gap="4">
          <Flex direction="column" gap="1">
            <Heading as="h2" size="5" id={headingId}>
              Save to a claim
            </Heading>
            <Text as="p" size="2" color="gray">
              Only the calculator and these inputs are sent: the server runs the calculation again
              and keeps its own result, with your name, on the claim.
            </Text>
          </Flex>
          {claimId ? (
            <ChosenClaim claimId={claimId} onChange={() => onClaimChange(null)} />
          ) : (
            <Flex direction="column" gap="1">
              <ClaimPicker
                onPick={(picked) => {
                  setNoClaim(false);
                  onClaimChange(picked);
                }}
              />
              {noClaim ? (
                <Text size="2" color="red" className="sl-field-error">
                  Choose the claim to save this working to.
                </Text>
              ) : null}
            </Flex>
          )}
          <form onSubmit={submit} noValidate>
            <Flex direction="column" gap="4">
              <TextAreaField
                label="Note (optional)"
                hint="What this working shows, in a sentence, for the copy desk and later readers."
                value={note}
                maxLength={noteMaxLength}
                rows={3}
                onChange={(event) => setNote(event.target.value)}
              />
              <FormError message={formError} />
              <Flex gap="3" align="center" wrap="wrap">
                <Button
                  type="submit"
                  size="3"
                  highContrast
                  loading={save.isPending}
                  disabled={unready}
                >
                  Save the working
                </Button>
                {unready ? (
                  <Text size="2" color="gray">
                    Complete the inputs first: the calculation has to run before it can be saved.
                  </Text>
                ) : null}
              </Flex>
            </Flex>
          </form>
          <Box role="status" aria-live="polite">
            {saved ? (
              <SavedWorking
                calculator={calculator}
                working={saved.working}
                claimId={saved.claimId}
                claimSummary={saved.claimId === claimId ? claim.data?.summary : undefined}
              />
            ) : null}
          </Box>
        </Flex>
      </section>
    </Card>
  );
}
