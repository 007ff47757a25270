import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Flex, Heading, Text } from '@radix-ui/themes';
import type { ClaimDetail, ClaimVerdictView, CurrentUser } from '@skyledger/contracts';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { FormError } from '@/components/ui/form-error';
import type { Notice } from '@/components/ui/toaster';
import { claimVerdictQueryOptions } from '@/features/verdicts/api/get-claim-verdict';
import { applyApiError } from '@/lib/form-errors';
import { useUpdateClaim } from '../../../api/update-claim';
import {
  editClaimFormFields,
  editClaimFormSchema,
  toEditClaimForm,
  toUpdateClaimRequest,
  type EditClaimForm,
} from '../../../forms/edit-claim-form';
import { ClaimWordsFields } from '../../shared/claim-words-fields';
import { staleClaimMessage } from '../claim-messages';

/**
 * What readers are shown while the claim is edited: the API keeps the claim as the copy
 * desk cleared it with each version, and reader pages show that one.
 */
function readersSee(verdict: ClaimVerdictView | undefined): string | null {
  const versions = verdict?.versions ?? [];
  const cleared = versions.find((version) => version.state === 'cleared');
  if (cleared) {
    return `The copy desk cleared version ${cleared.number} with the claim as it stood: readers will be shown what was said, its summary and who said it as cleared. A change to those reaches them only with a version cleared after it.`;
  }
  const published = versions.find((version) => version.state === 'published');
  if (published) {
    return `Readers are shown what was said, its summary and who said it as published with version ${published.number}, until a corrected version is cleared and published.`;
  }
  return null;
}

interface ClaimEditFormProps {
  claim: ClaimDetail;
  user: CurrentUser;
  onDone: (notice: Notice | null) => void;
}

/**
 * Edits the claim's words with the version it was loaded at. On a 409 the claim reloads
 * under the form and the typed edit stays, so the editor can compare and save again.
 */
export function ClaimEditForm({ claim, user, onDone }: ClaimEditFormProps) {
  const update = useUpdateClaim(claim.id);
  const note = readersSee(useQuery(claimVerdictQueryOptions(claim.id)).data);
  const {
    control,
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<EditClaimForm>({
    resolver: zodResolver(editClaimFormSchema),
    defaultValues: toEditClaimForm(claim),
  });
  // Only a desk chief clears a legal-review flag once it is set.
  const legalLocked = claim.legalReview && user.role !== 'desk_chief';

  const onSubmit = handleSubmit((values) =>
    update.mutateAsync(toUpdateClaimRequest(values, claim.version)).then(
      () => onDone({ tone: 'success', text: 'Your changes to the claim are saved.' }),
      (error: unknown) =>
        applyApiError(error, setError, {
          fields: editClaimFormFields,
          statusMessages: { 409: staleClaimMessage },
        }),
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Edit the claim">
      <Flex direction="column" gap="4">
        <Heading as="h2" size="5">
          Edit the claim
        </Heading>
        {note ? (
          <Text as="p" size="2" color="gray">
            {note}
          </Text>
        ) : null}
        <FormError message={errors.root?.server?.message} />
        <ClaimWordsFields control={control} register={register} legalLocked={legalLocked} />
        <Flex gap="3" wrap="wrap">
          <Button type="submit" highContrast loading={isSubmitting}>
            Save changes
          </Button>
          <Button
            type="button"
            variant="soft"
            color="gray"
            highContrast
            onClick={() => onDone(null)}
          >
            Cancel
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
