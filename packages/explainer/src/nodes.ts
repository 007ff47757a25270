import { mergeAttributes, Node } from '@tiptap/core';

/** Reads an attribute without needing the DOM typings (the API compiles without them). */
const attribute = (element: unknown, name: string) =>
  (element as { getAttribute(name: string): string | null }).getAttribute(name);

/**
 * A working of the claim, embedded by id. The document keeps only the id: whoever shows
 * the explainer draws the working from the stored one, so the text can never disagree
 * with what the server computed.
 */
export const WorkingEmbed = Node.create({
  name: 'workingEmbed',
  group: 'block',
  atom: true,
  draggable: true,
  addAttributes() {
    return {
      workingId: {
        default: null,
        parseHTML: (element) => attribute(element, 'data-working-id'),
        renderHTML: (attributes) => ({ 'data-working-id': attributes.workingId as string }),
      },
    };
  },
  parseHTML() {
    return [{ tag: 'figure[data-working-id]' }];
  },
  renderHTML({ HTMLAttributes }) {
    return ['figure', mergeAttributes(HTMLAttributes, { class: 'working-embed' }), 'Working'];
  },
});

/**
 * A citation of one of the claim's sources, by id. Rendered as a link to the source list;
 * its number is given when the explainer is rendered, in order of first citation.
 */
export const SourceCitation = Node.create({
  name: 'sourceCitation',
  group: 'inline',
  inline: true,
  atom: true,
  addAttributes() {
    return {
      sourceId: {
        default: null,
        parseHTML: (element) => attribute(element, 'data-source-id'),
        renderHTML: (attributes) => ({ 'data-source-id': attributes.sourceId as string }),
      },
    };
  },
  parseHTML() {
    return [{ tag: 'a[data-source-id]' }];
  },
  renderHTML({ HTMLAttributes }) {
    return [
      'a',
      mergeAttributes(HTMLAttributes, {
        class: 'citation',
        href: `#source-${HTMLAttributes['data-source-id'] as string}`,
      }),
      '[source]',
    ];
  },
});
