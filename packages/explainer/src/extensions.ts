import { type Extensions } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';
import { SourceCitation, WorkingEmbed } from './nodes.js';

/** The protocols a link in an explainer may use; anything else is dropped. */
export const linkProtocols = ['http', 'https', 'mailto'] as const;

/**
 * The explainer's schema, the same for the desk's editor and the API's renderer:
 * paragraphs, headings (levels 2 and 3: the page title is level 1), lists, quotes,
 * bold, italic, links, and the two nodes of our own.
 */
export function explainerExtensions(): Extensions {
  return [
    StarterKit.configure({
      heading: { levels: [2, 3] },
      code: false,
      codeBlock: false,
      underline: false,
      link: {
        openOnClick: false,
        autolink: true,
        protocols: [...linkProtocols],
        defaultProtocol: 'https',
        HTMLAttributes: { rel: 'noopener noreferrer', target: null },
      },
    }),
    WorkingEmbed,
    SourceCitation,
  ];
}
