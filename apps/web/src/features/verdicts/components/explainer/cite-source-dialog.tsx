import { Text } from '@radix-ui/themes';
import type { Editor } from '@tiptap/react';
import { SourceSummary } from '../source-summary';
import { EditorDialog } from './editor-dialog';
import { useExplainerEvidence } from './explainer-evidence';
import { PickList } from './pick-list';

/** Cites one of the claim's sources where the caret is; it shows as [n] in the text. */
export function CiteSourceDialog({ editor }: { editor: Editor }) {
  const { sources } = useExplainerEvidence();
  return (
    <EditorDialog
      editor={editor}
      trigger="Cite source"
      title="Cite a source"
      description="Citations are numbered in the order they first appear, and listed under the explainer."
    >
      {(done) =>
        sources.length === 0 ? (
          <Text as="p">No sources on this claim yet: cite them on the claim page first.</Text>
        ) : (
          <PickList
            label="The claim’s sources"
            items={sources}
            describe={(source) => <SourceSummary source={source} />}
            pickLabel={(source) => `Cite ${source.title}`}
            pickText="Cite"
            onPick={(source) =>
              done(() =>
                editor
                  .chain()
                  .insertContent({ type: 'sourceCitation', attrs: { sourceId: source.id } })
                  .run(),
              )
            }
          />
        )
      }
    </EditorDialog>
  );
}
