import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import {
  BOTTOM_LINE_MAX_LENGTH,
  reliabilityGradeLabels,
  type ClaimDetail,
  type VerdictVersionView,
} from '@skyledger/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm, useWatch, type Control } from 'react-hook-form';
import type { z } from 'zod';
import { ControlledSelect } from '@/components/ui/controlled-select';
import { DateTime } from '@/components/ui/date-time';
import { FormError } from '@/components/ui/form-error';
import { LeaveGuard } from '@/components/ui/leave-guard';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { ratingLevelName, useRatingLevels } from '@/features/rating-scale/api/get-rating-levels';
import { isApiError } from '@/lib/api-client';
import { applyApiError } from '@/lib/form-errors';
import { claimVerdictQueryOptions } from '../api/get-claim-verdict';
import { useMoveClaim } from '../api/move-claim';
import { useSaveDraft } from '../api/save-draft';
import {
  toVerdictFields,
  toVerdictForm,
  verdictCodeMessages,
  verdictFormFields,
  verdictFormSchema,
  type VerdictForm,
} from '../forms/verdict-form';
import { refusalMessage } from '../verdict-words';
import { ConflictPanel, type DraftConflict } from './conflict-panel';
import {
  ExplainerEditor,
  useExplainerEditor,
  useExplainerFieldIds,
} from './explainer/explainer-editor';
import { useEditorJson } from './explainer/use-cited-source-ids';

function BottomLineCount({ control }: { control: Control<VerdictForm> }) {
  const length = useWatch({ control, name: 'bottomLine' }).trim().length;
  const over = length > BOTTOM_LINE_MAX_LENGTH;
  return (
    <Text color={over ? 'red' : undefined}>
      One paragraph: {length} of {BOTTOM_LINE_MAX_LENGTH} characters
      {over ? `, ${length - BOTTOM_LINE_MAX_LENGTH} too many` : ''}
    </Text>
  );
}

interface DraftEditorProps {
  claim: ClaimDetail;
  draft: VerdictVersionView;
  onNotice: ShowNotice;
}

/**
 * The draft verdict: rating, bottom line, primary source and the explainer. Saves carry
 * the version they started from; a save that crossed another's shows both texts.
 */
export function DraftEditor({ claim, draft, onNotice }: DraftEditorProps) {
  const queryClient = useQueryClient();
  const { data: levels } = useRatingLevels();
  const save = useSaveDraft(claim.id);
  const move = useMoveClaim(claim.id);
  const [base, setBase] = useState(draft);
  const [conflict, setConflict] = useState<DraftConflict | null>(null);
  const [submitError, setSubmitError] = useState<string | null>(null);
  const ids = useExplainerFieldIds();
  const editor = useExplainerEditor(draft.body, ids.labelId, ids.hintId);
  const body = useEditorJson(editor);
  const [savedBody, setSavedBody] = useState(() => JSON.stringify(editor.getJSON()));
  const form = useForm<VerdictForm, unknown, z.output<typeof verdictFormSchema>>({
    resolver: zodResolver(verdictFormSchema),
    defaultValues: toVerdictForm(draft),
  });
  const unsaved = form.formState.isDirty || JSON.stringify(body) !== savedBody;

  const ratingOptions = levels.map((level) => ({ value: level.id, label: ratingLevelName(level) }));
  const sourceOptions = claim.sources.map((source) => ({
    value: source.id,
    label: `${source.title} (${reliabilityGradeLabels[source.grade].toLowerCase()})`,
  }));

  const onSave = form.handleSubmit(async (values) => {
    const sent = {
      ...toVerdictFields(values),
      body: editor.getJSON() as VerdictVersionView['body'],
    };
    try {
      const saved = await save.mutateAsync({ versionId: base.id, version: base.version, ...sent });
      setBase(saved);
      setSavedBody(JSON.stringify(sent.body));
      form.reset(values);
      setConflict(null);
      setSubmitError(null);
      onNotice({ tone: 'success', text: `The draft of version ${saved.number} is saved.` });
    } catch (error) {
      if (!(isApiError(error) && error.status === 409 && error.body.fields?.version === 'stale')) {
        applyApiError(error, form.setError, {
          fields: verdictFormFields,
          overrides: verdictCodeMessages,
        });
        return;
      }
      const stored = await queryClient.fetchQuery({
        ...claimVerdictQueryOptions(claim.id),
        staleTime: 0,
      });
      const saved = stored.versions.find((version) => version.id === base.id);
      if (saved) setConflict({ mine: sent, saved, kept: false });
    }
  });

  const takeSaved = (saved: VerdictVersionView) => {
    editor.commands.setContent(saved.body, { emitUpdate: false });
    setSavedBody(JSON.stringify(editor.getJSON()));
    form.reset(toVerdictForm(saved));
    setBase(saved);
    setConflict(null);
  };

  // Awaited rather than given callbacks: once submitted, the draft gives way to the frozen
  // version, and callbacks of a mutation whose component has gone are never called.
  const submit = async () => {
    setSubmitError(null);
    try {
      await move.mutateAsync({ to: 'awaiting_signoff', version: claim.version });
      onNotice({
        tone: 'success',
        text: `Version ${base.number} is submitted for sign-off; the copy desk is told by e-mail.`,
      });
    } catch (error) {
      setSubmitError(refusalMessage(error));
    }
  };

  return (
    <form aria-labelledby="draft-title" noValidate onSubmit={onSave}>
      <Flex direction="column" gap="5">
        <Flex direction="column" gap="1">
          <Heading as="h2" size="5" id="draft-title">
            Draft of version {base.number}
          </Heading>
          <Text size="2" color="gray">
            Drafted by {base.draftedBy.displayName}; last saved by {base.lastEditedBy.displayName},{' '}
            <DateTime value={base.updatedAt} />.
          </Text>
        </Flex>
        {conflict ? (
          <ConflictPanel
            conflict={conflict}
            sources={claim.sources}
            onTakeSaved={() => takeSaved(conflict.saved)}
            onKeepMine={() => {
              setBase(conflict.saved);
              setConflict({ ...conflict, kept: true });
            }}
            onClose={() => setConflict(null)}
          />
        ) : null}
        <FormError message={form.formState.errors.root?.server?.message} />
        <Grid columns={{ initial: '1', sm: '2' }} gap="4">
          <ControlledSelect
            control={form.control}
            name="ratingId"
            label="Rating"
            options={ratingOptions}
            placeholder="Choose a rating"
            hint={(ratingId) =>
              levels.find((level) => level.id === ratingId)?.description ??
              'The level of the desk’s scale that fits what the evidence shows'
            }
          />
          <ControlledSelect
            control={form.control}
            name="primarySourceId"
            label="Primary source for the central finding"
            options={sourceOptions}
            placeholder={sourceOptions.length ? 'Choose a source' : 'No sources on the claim yet'}
            hint="Sign-off wants it graded strong or adequate"
          />
        </Grid>
        <TextAreaField
          label="Bottom line"
          rows={3}
          hint={<BottomLineCount control={form.control} />}
          error={form.formState.errors.bottomLine?.message}
          {...form.register('bottomLine')}
        />
        <ExplainerEditor editor={editor} labelId={ids.labelId} hintId={ids.hintId} />
        <Flex gap="3" align="center" wrap="wrap">
          <Button type="submit" highContrast loading={form.formState.isSubmitting}>
            Save the draft
          </Button>
          <Button
            type="button"
            variant="soft"
            highContrast
            disabled={unsaved}
            loading={move.isPending}
            onClick={() => void submit()}
          >
            Submit for sign-off
          </Button>
          <Text size="2" color="gray" role="status">
            {unsaved ? 'Unsaved changes: save them before submitting.' : 'All changes saved.'}
          </Text>
        </Flex>
        <FormError message={submitError ?? undefined} />
      </Flex>
      <LeaveGuard when={unsaved} what="your changes to the draft" />
    </form>
  );
}
