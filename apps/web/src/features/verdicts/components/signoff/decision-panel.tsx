import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, Heading, Text } from '@radix-ui/themes';
import { claimTransitionSchema, type ClaimDetail, type SignoffView } from '@skyledger/contracts';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { FormError } from '@/components/ui/form-error';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { optionalText } from '@/features/claims/forms/form-rules';
import { useMoveClaim } from '../../api/move-claim';
import { refusalMessage } from '../../verdict-words';

const schema = z.object({ note: claimTransitionSchema.shape.note.unwrap() });
type DecisionForm = z.input<typeof schema>;

interface DecisionPanelProps {
  claim: ClaimDetail;
  signoff: SignoffView & { version: NonNullable<SignoffView['version']> };
  onNotice: ShowNotice;
}

/**
 * Clear or send back the submitted version. The API decides who may (never the version's
 * author) and refuses to clear with an item open; the buttons say so before anyone tries.
 */
export function DecisionPanel({ claim, signoff, onNotice }: DecisionPanelProps) {
  const move = useMoveClaim(claim.id);
  const reasonId = useId();
  const [refusal, setRefusal] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<DecisionForm>({
    resolver: zodResolver(schema),
    defaultValues: { note: '' },
  });
  const { number } = signoff.version;
  const open = signoff.checklist.filter((item) => !item.done);
  const clearWaitsFor =
    open.length > 0
      ? `Clearing waits for ${open.length === 1 ? 'an open item' : `${open.length} open items`} on the checklist: ${open.map((item) => item.label.toLowerCase()).join('; ')}.`
      : null;

  const decide = (to: 'cleared' | 'sent_back') =>
    handleSubmit(({ note }) => {
      if (to === 'sent_back' && !note.trim()) {
        setError('note', { message: 'Say what needs changing: the notes go to the author' });
        return;
      }
      setRefusal(null);
      // Awaited: once decided, the version leaves the page and this panel with it.
      return move.mutateAsync({ to, note: optionalText(note), version: claim.version }).then(
        () =>
          onNotice({
            tone: 'success',
            text:
              to === 'cleared'
                ? `Version ${number} is cleared; the author is told by e-mail.`
                : `Version ${number} is sent back with your notes; the author is told by e-mail.`,
          }),
        (error: unknown) => setRefusal(refusalMessage(error)),
      );
    });

  return (
    <form aria-labelledby={`${reasonId}-title`} noValidate onSubmit={(e) => e.preventDefault()}>
      <Flex direction="column" gap="3">
        <Heading as="h2" size="4" id={`${reasonId}-title`}>
          Your decision on version {number}
        </Heading>
        {signoff.whyNot ? (
          <Callout.Root color="gray" highContrast size="1">
            <Callout.Text id={reasonId}>{signoff.whyNot}</Callout.Text>
          </Callout.Root>
        ) : null}
        <TextAreaField
          label="Notes for the author"
          hint="Needed to send back; kept with this version"
          rows={4}
          disabled={!signoff.mayDecide}
          error={formState.errors.note?.message}
          {...register('note')}
        />
        <FormError message={refusal ?? undefined} />
        <Flex gap="3" wrap="wrap">
          <Button
            type="button"
            highContrast
            color="jade"
            disabled={!signoff.mayDecide || open.length > 0}
            loading={move.isPending && move.variables?.to === 'cleared'}
            onClick={decide('cleared')}
          >
            Clear version {number}
          </Button>
          <Button
            type="button"
            highContrast
            color="gray"
            variant="outline"
            disabled={!signoff.mayDecide}
            loading={move.isPending && move.variables?.to === 'sent_back'}
            onClick={decide('sent_back')}
          >
            Send back with notes
          </Button>
        </Flex>
        {signoff.mayDecide && clearWaitsFor ? (
          <Text size="2" color="gray">
            {clearWaitsFor}
          </Text>
        ) : null}
      </Flex>
    </form>
  );
}
