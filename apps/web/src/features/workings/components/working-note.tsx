import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Flex, Text } from '@radix-ui/themes';
import { updateWorkingSchema, type WorkingView } from '@skyledger/contracts';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { FormError } from '@/components/ui/form-error';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useUpdateWorkingNote } from '../api/update-working-note';
import { staleWorkingMessage } from './working-messages';

const noteFormSchema = z.object({ note: updateWorkingSchema.shape.note.unwrap() });
type NoteForm = z.input<typeof noteFormSchema>;

interface WorkingNoteProps {
  claimId: string;
  working: WorkingView;
  mayEdit: boolean;
  onNotice: ShowNotice;
}

/** The editor's note on a working; the only part of it that changes after it is saved. */
export function WorkingNote({ claimId, working, mayEdit, onNotice }: WorkingNoteProps) {
  const [editing, setEditing] = useState(false);
  const update = useUpdateWorkingNote(claimId);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<NoteForm>({
    resolver: zodResolver(noteFormSchema),
    defaultValues: { note: working.note ?? '' },
  });

  const onSubmit = handleSubmit(({ note }) =>
    update
      // The version read last: after a 409 the reloaded working carries the stored one.
      .mutateAsync({ workingId: working.id, note: note.trim(), version: working.version })
      .then(
        (saved) => {
          reset({ note: saved.note ?? '' });
          setEditing(false);
          onNotice({ tone: 'success', text: 'The note is saved.' });
        },
        (error: unknown) =>
          setError('root.server', {
            type: 'server',
            message: changeErrorMessage(error, staleWorkingMessage),
          }),
      ),
  );

  if (editing) {
    return (
      <form onSubmit={onSubmit} noValidate aria-label="Edit the note">
        <Flex direction="column" gap="3">
          <FormError message={errors.root?.server?.message} />
          <TextAreaField
            label="Note"
            rows={3}
            hint="What this working shows for the claim, in a sentence or two."
            error={errors.note?.message}
            {...register('note')}
          />
          <Flex gap="3" wrap="wrap">
            <Button type="submit" size="2" highContrast loading={isSubmitting}>
              Save the note
            </Button>
            <Button
              type="button"
              size="2"
              variant="soft"
              color="gray"
              highContrast
              onClick={() => {
                reset({ note: working.note ?? '' });
                setEditing(false);
              }}
            >
              Cancel
            </Button>
          </Flex>
        </Flex>
      </form>
    );
  }
  return (
    <Flex direction="column" gap="2" align="start">
      {working.note ? (
        <Text as="p" className="sl-prose sl-pre-line">
          {working.note}
        </Text>
      ) : (
        <Text color="gray">No note.</Text>
      )}
      {mayEdit ? (
        <Button
          size="1"
          variant="soft"
          color="gray"
          highContrast
          onClick={() => {
            reset({ note: working.note ?? '' });
            setEditing(true);
          }}
        >
          {working.note ? 'Edit the note' : 'Add a note'}
        </Button>
      ) : null}
    </Flex>
  );
}
