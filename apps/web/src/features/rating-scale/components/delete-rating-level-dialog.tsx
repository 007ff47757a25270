import { Button, Text } from '@radix-ui/themes';
import type { RatingLevelView } from '@skyledger/contracts';
import type { ShowNotice } from '@/components/ui/toaster';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { useDeleteRatingLevel } from '../api/delete-rating-level';

interface DeleteRatingLevelDialogProps {
  level: RatingLevelView;
  onNotice: ShowNotice;
}

/** Deleting asks first; a level a verdict uses cannot go, and says so instead of offering it. */
export function DeleteRatingLevelDialog({ level, onNotice }: DeleteRatingLevelDialogProps) {
  const remove = useDeleteRatingLevel();
  if (level.inUse) {
    return (
      <Text size="2" color="gray">
        In use by a verdict, so it stays on the scale.
      </Text>
    );
  }
  return (
    <ConfirmDialog
      trigger={
        <Button variant="soft" color="red" highContrast aria-label={`Delete “${level.label}”`}>
          Delete
        </Button>
      }
      title={`Delete “${level.label}”?`}
      description="No verdict uses it. Once deleted it is gone from the scale and from the methodology page; the audit trail keeps a record of it."
      confirmLabel="Delete the level"
      keepLabel="Keep it"
      color="red"
      onConfirm={() =>
        remove
          .mutateAsync(level.id)
          .then(() => onNotice({ tone: 'success', text: `“${level.label}” is deleted.` }))
      }
    />
  );
}
