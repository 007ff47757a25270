import { Flex, Text } from '@radix-ui/themes';
import { EditorContent, useEditor, type Content, type Editor } from '@tiptap/react';
import { useId, useState } from 'react';
import { CitedSources } from '../cited-sources';
import { deskExplainerExtensions } from './desk-extensions';
import { useExplainerEvidence } from './explainer-evidence';
import { ExplainerToolbar } from './explainer-toolbar';
import { useCitedSourceIds } from './use-cited-source-ids';

/** The explainer's Tiptap editor, on the shared schema with the desk's own node views. */
export function useExplainerEditor(body: Content, labelledBy: string, describedBy: string): Editor {
  const [extensions] = useState(deskExplainerExtensions);
  return useEditor({
    extensions,
    content: body,
    editorProps: {
      attributes: {
        role: 'textbox',
        'aria-multiline': 'true',
        'aria-labelledby': labelledBy,
        'aria-describedby': describedBy,
        class: 'sl-explainer sl-explainer-editor',
      },
    },
  });
}

/** The ids the editor's label and hint carry, made before the editor that names them. */
export function useExplainerFieldIds() {
  const id = useId();
  return { labelId: `${id}-label`, hintId: `${id}-hint` };
}

interface ExplainerEditorProps {
  editor: Editor;
  labelId: string;
  hintId: string;
}

/** The explainer field: its label, toolbar, text and the numbered list of what it cites. */
export function ExplainerEditor({ editor, labelId, hintId }: ExplainerEditorProps) {
  const { sources } = useExplainerEvidence();
  const cited = useCitedSourceIds(editor);
  return (
    <Flex direction="column" gap="2">
      <Text as="div" id={labelId} size="2" weight="bold">
        Explainer
      </Text>
      <Text as="div" id={hintId} size="1" color="gray">
        The fact first, then the claim, then why it misleads. Insert workings and cite sources from
        the toolbar.
      </Text>
      <ExplainerToolbar editor={editor} />
      <EditorContent editor={editor} />
      <CitedSources ids={cited} sources={sources} />
    </Flex>
  );
}
