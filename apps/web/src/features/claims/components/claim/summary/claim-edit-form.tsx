import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Flex, Heading } from '@radix-ui/themes';
import type { ClaimDetail, CurrentUser } from '@skyledger/contracts';
import { useForm } from 'react-hook-form';
import { FormError } from '@/components/ui/form-error';
import type { Notice } from '@/components/ui/toaster';
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
