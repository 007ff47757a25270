import { citedSourceIds } from '@skyledger/explainer';
import { useEditorState, type Editor } from '@tiptap/react';
import { useMemo } from 'react';

/** The editor's document as JSON, recomputed only when the document changes. */
export function useEditorJson(editor: Editor) {
  // The document is immutable: a new one means a change, the same one means none.
  const doc = useEditorState({
    editor,
    selector: ({ editor: current }) => current.state.doc,
    equalityFn: (a, b) => a === b,
  });
  return useMemo(() => doc.toJSON() as { type: 'doc'; [key: string]: unknown }, [doc]);
}

/** The sources the document cites, in order of first citation, kept up to date as it changes. */
export function useCitedSourceIds(editor: Editor): string[] {
  const json = useEditorJson(editor);
  return useMemo(() => citedSourceIds(json), [json]);
}
