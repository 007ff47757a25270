import { Text } from '@radix-ui/themes';
import type { Editor } from '@tiptap/react';
import { AppLink } from '@/components/ui/app-link';
import { paths } from '@/config/paths';
import { WorkingSummary } from '../working-summary';
import { EditorDialog } from './editor-dialog';
import { useExplainerEvidence } from './explainer-evidence';
import { PickList } from './pick-list';

/** Puts one of the claim's workings into the explainer, where the caret is. */
export function InsertWorkingDialog({ editor }: { editor: Editor }) {
  const { claimId, workings, calculators } = useExplainerEvidence();
  const title = (calculatorId: string) =>
    calculators?.find((calculator) => calculator.id === calculatorId)?.title ?? calculatorId;
  return (
    <EditorDialog
      editor={editor}
      trigger="Insert working"
      title="Insert a working"
      description="The explainer shows the working as the server stored and recomputed it, never a copy of its numbers."
    >
      {(done) =>
        !workings ? (
          <Text color="gray">Loading the claim’s workings…</Text>
        ) : workings.length === 0 ? (
          <Text as="p">
            No workings on this claim yet.{' '}
            <AppLink to={paths.app.workbench.getHref(undefined, claimId)}>
              Run one in the workbench
            </AppLink>
            , then come back.
          </Text>
        ) : (
          <PickList
            label="The claim’s workings"
            items={workings}
            describe={(working) => (
              <WorkingSummary
                workingId={working.id}
                workings={workings}
                calculators={calculators}
              />
            )}
            pickLabel={(working) => `Insert ${title(working.calculatorId)}`}
            pickText="Insert"
            onPick={(working) =>
              done(() =>
                editor
                  .chain()
                  .insertContent({ type: 'workingEmbed', attrs: { workingId: working.id } })
                  .run(),
              )
            }
          />
        )
      }
    </EditorDialog>
  );
}
