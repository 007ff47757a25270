import { PlusIcon } from '@radix-ui/react-icons';
import { Button, Grid } from '@radix-ui/themes';
import {
  replyChannelLabels,
  replyChannels,
  replyOutcomeLabels,
  replyOutcomes,
} from '@skyledger/contracts';
import { Controller } from 'react-hook-form';
import { ControlledSelect } from '@/components/ui/controlled-select';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextInputField } from '@/components/ui/text-input-field';
import { ZonedDateTimeField } from '@/components/ui/zoned-date-time-field';
import { useDeskTimeZone } from '@/lib/desk-time-zone';
import { useAddReplyAttempt } from '../../../api/add-reply-attempt';
import {
  emptyReplyAttemptForm,
  replyAttemptFormField,
  replyAttemptFormFields,
  replyAttemptFormSchema,
  toCreateReplyAttemptRequest,
} from '../../../forms/reply-attempt-form';
import { FormDialog } from '../../shared/form-dialog';
import { useFormDialog } from '../../shared/use-form-dialog';

const channelOptions = replyChannels.map((value) => ({ value, label: replyChannelLabels[value] }));
const outcomeOptions = replyOutcomes.map((value) => ({ value, label: replyOutcomeLabels[value] }));

interface LogReplyAttemptDialogProps {
  claimId: string;
  claimant: string;
  onNotice: ShowNotice;
}

export function LogReplyAttemptDialog({ claimId, claimant, onNotice }: LogReplyAttemptDialogProps) {
  const add = useAddReplyAttempt(claimId);
  const deskTimeZone = useDeskTimeZone();
  const { form, dialog } = useFormDialog({
    schema: replyAttemptFormSchema,
    initial: () => emptyReplyAttemptForm(deskTimeZone),
    send: (values) => add.mutateAsync(toCreateReplyAttemptRequest(values)),
    onSent: (logged) =>
      onNotice({ tone: 'success', text: `The attempt to reach ${logged.contacted} is logged.` }),
    apiErrors: { fields: replyAttemptFormFields, formField: replyAttemptFormField },
  });
  const {
    control,
    register,
    formState: { errors },
  } = form;

  return (
    <FormDialog
      trigger={
        <Button highContrast>
          <PlusIcon aria-hidden />
          Log a reply attempt
        </Button>
      }
      title="Log a reply attempt"
      description={`Who at ${claimant}'s side was asked for a reply, how and when, and what came back.`}
      submitLabel="Log the attempt"
      maxWidth="640px"
      {...dialog}
    >
      <TextInputField
        label="Who was contacted"
        hint="The person or office, e.g. the councillor's office"
        autoComplete="off"
        error={errors.contacted?.message}
        {...register('contacted')}
      />
      <Controller
        control={control}
        name="timeZone"
        render={({ field }) => (
          <ZonedDateTimeField
            label="Contacted at"
            localInput={register('contactedAtLocal')}
            zone={field.value}
            onZoneChange={field.onChange}
            zoneRef={field.ref}
            hint="The deadline below is read in the same time zone"
            localError={errors.contactedAtLocal?.message}
            zoneError={errors.timeZone?.message}
          />
        )}
      />
      <Grid columns={{ initial: '1', sm: '2' }} gap="4">
        <ControlledSelect
          control={control}
          name="channel"
          label="How"
          options={channelOptions}
          placeholder="Choose a channel"
        />
        <TextInputField
          label="Deadline for a reply (optional)"
          type="datetime-local"
          error={errors.deadlineLocal?.message}
          {...register('deadlineLocal')}
        />
      </Grid>
      <ControlledSelect
        control={control}
        name="outcome"
        label="Outcome"
        options={outcomeOptions}
        placeholder="Choose the outcome"
      />
      <TextAreaField
        label="Their reply"
        hint="In their words, or a summary; needed when they replied"
        rows={3}
        error={errors.reply?.message}
        {...register('reply')}
      />
    </FormDialog>
  );
}
