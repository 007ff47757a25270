import { CalendarIcon, RocketIcon } from '@radix-ui/react-icons';
import { Button, Callout } from '@radix-ui/themes';
import {
  updateNoteKindLabels,
  updateNoteKinds,
  type ClaimDetail,
  type PublicationView,
} from '@skyledger/contracts';
import { Controller } from 'react-hook-form';
import { ControlledSelect } from '@/components/ui/controlled-select';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { ZonedDateTimeField } from '@/components/ui/zoned-date-time-field';
import { FormDialog } from '@/features/claims/components/shared/form-dialog';
import { useFormDialog } from '@/features/claims/components/shared/use-form-dialog';
import { staleClaimMoveMessage } from '@/features/verdicts/verdict-words';
import { useDeskTimeZone } from '@/lib/desk-time-zone';
import { usePublishClaim } from '../api/publish-claim';
import {
  emptyPublishForm,
  publishFormField,
  publishFormFields,
  publishFormSchema,
  toPublishRequest,
} from '../forms/publish-form';
import { inItsZone, updateNoteKindHints } from '../publishing-words';

const kindOptions = updateNoteKinds.map((value) => ({
  value,
  label: updateNoteKindLabels[value],
}));

interface PublishDialogProps {
  claim: ClaimDetail;
  /** At a chosen time (an embargo) rather than now. */
  scheduled: boolean;
  /** Published before: this publication needs an update note. */
  needsNote: boolean;
  onNotice: ShowNotice;
}

function noticeOf(publications: PublicationView[], scheduled: boolean): string {
  const [latest] = publications;
  if (scheduled && latest?.scheduledFor && latest.scheduledTimeZone) {
    return `Scheduled: it is published on ${inItsZone(latest.scheduledFor, latest.scheduledTimeZone)}. Readers see nothing of it before then.`;
  }
  return 'Published: readers can read it now.';
}

/**
 * Publish the cleared version now, or schedule it: a time typed on a clock in a chosen
 * zone (the desk's by default). The dialog is the confirmation; an explainer published
 * before goes out only with an update note saying what changed.
 */
export function PublishDialog({ claim, scheduled, needsNote, onNotice }: PublishDialogProps) {
  const publish = usePublishClaim(claim.id);
  const deskTimeZone = useDeskTimeZone();
  const options = { scheduled, needsNote };
  const { form, dialog } = useFormDialog({
    schema: publishFormSchema(options),
    initial: () => emptyPublishForm(deskTimeZone),
    send: (values) => publish.mutateAsync(toPublishRequest(values, options, claim.version)),
    onSent: (publications) =>
      onNotice({ tone: 'success', text: noticeOf(publications, scheduled) }),
    apiErrors: {
      fields: publishFormFields(options),
      formField: publishFormField,
      overrides: {
        noteText: { required: 'Say what changed: readers see this note on the page' },
      },
      statusMessages: { 409: staleClaimMoveMessage },
    },
  });
  const {
    control,
    register,
    formState: { errors },
  } = form;
  const what = needsNote ? 'the corrected explainer' : 'the explainer';

  return (
    <FormDialog
      trigger={
        scheduled ? (
          <Button variant="soft" highContrast>
            <CalendarIcon aria-hidden />
            Schedule…
          </Button>
        ) : (
          <Button highContrast color="jade">
            <RocketIcon aria-hidden />
            Publish now
          </Button>
        )
      }
      title={scheduled ? `Schedule ${what}` : `Publish ${what} now?`}
      description={
        scheduled
          ? 'It stays out of the reader pages, the feed, search and share cards until this time; the desk can cancel it until then.'
          : 'Readers can read it as soon as you confirm, and it cannot be unpublished: later changes go out as dated update notes.'
      }
      submitLabel={scheduled ? 'Schedule it' : 'Publish now'}
      maxWidth="640px"
      {...dialog}
    >
      {scheduled ? (
        <Controller
          control={control}
          name="timeZone"
          render={({ field }) => (
            <ZonedDateTimeField
              label="Publish at"
              localInput={register('atLocal')}
              zone={field.value}
              onZoneChange={field.onChange}
              zoneRef={field.ref}
              hint="The time on the clock of the chosen zone; at least a minute from now"
              localError={errors.atLocal?.message}
              zoneError={errors.timeZone?.message}
            />
          )}
        />
      ) : null}
      {needsNote ? (
        <>
          <Callout.Root color="gray" highContrast size="1">
            <Callout.Text>
              This explainer was published before, so readers are told what changed: the note is
              dated and shown at the top of the page, in the feed and on the corrections page, and
              mailed to readers who subscribed.
            </Callout.Text>
          </Callout.Root>
          <ControlledSelect
            control={control}
            name="noteKind"
            label="Kind of change"
            options={kindOptions}
            placeholder="Choose a kind"
            hint={(kind) =>
              kind ? updateNoteKindHints[kind as keyof typeof updateNoteKindHints] : undefined
            }
          />
          <TextAreaField
            label="Update note for readers"
            hint="What changed and why, in a sentence or two"
            rows={4}
            error={errors.noteText?.message}
            {...register('noteText')}
          />
        </>
      ) : null}
    </FormDialog>
  );
}
