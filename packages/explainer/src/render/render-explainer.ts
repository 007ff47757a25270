import { generateHTML } from '@tiptap/html/server';
import sanitizeHtml from 'sanitize-html';
import { citedSourceIds, cleanExplainerDocument, isAllowedHref } from '../document.js';
import { explainerExtensions, linkProtocols } from '../extensions.js';

const uuid = /^[0-9a-f-]{36}$/i;

/**
 * The allow-list every explainer's HTML passes through, whether it was just rendered or
 * read back: the schema's own tags and attributes, links to http(s) and mailto only.
 * Citations get their number, in order of first citation, from `citationNumbers`.
 */
export function sanitizeExplainerHtml(
  html: string,
  citationNumbers: ReadonlyMap<string, number> = new Map(),
): string {
  return sanitizeHtml(html, {
    allowedTags: [
      'p',
      'h2',
      'h3',
      'strong',
      'em',
      's',
      'a',
      'ul',
      'ol',
      'li',
      'blockquote',
      'hr',
      'br',
      'figure',
    ],
    allowedAttributes: {
      a: ['href', 'rel', 'class', 'data-source-id'],
      ol: ['start'],
      figure: ['class', 'data-working-id'],
    },
    allowedClasses: { a: ['citation'], figure: ['working-embed'] },
    allowedSchemes: [...linkProtocols],
    allowedSchemesAppliedToAttributes: ['href'],
    allowProtocolRelative: false,
    disallowedTagsMode: 'discard',
    transformTags: {
      a: (tagName, attribs): sanitizeHtml.Tag => {
        const sourceId = attribs['data-source-id'];
        if (sourceId && uuid.test(sourceId)) {
          const number = citationNumbers.get(sourceId);
          return {
            tagName,
            attribs: { class: 'citation', 'data-source-id': sourceId, href: `#source-${sourceId}` },
            ...(number ? { text: `[${number}]` } : {}),
          };
        }
        const href = attribs.href;
        const kept: sanitizeHtml.Attributes =
          href && isAllowedHref(href) ? { href, rel: 'noopener noreferrer' } : {};
        return { tagName, attribs: kept };
      },
    },
  });
}

/**
 * An explainer as safe HTML: the document cleaned of anything outside the schema,
 * rendered with the same Tiptap extensions as the editor, then sanitized.
 */
export function renderExplainerHtml(doc: unknown): string {
  const cleaned = cleanExplainerDocument(doc);
  const numbers = new Map(citedSourceIds(cleaned).map((id, index) => [id, index + 1]));
  return sanitizeExplainerHtml(generateHTML(cleaned, explainerExtensions()), numbers);
}
