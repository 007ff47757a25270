import { type ExplainerDocument } from '@skyledger/explainer';
import { renderExplainerHtml } from '@skyledger/explainer/render';
import { type PatternVerdict } from './vocabulary';

/** What one generated explainer is about: the claim as said, its sources and its working. */
export interface ExplainerParts {
  claimText: string;
  /** Cited in order: the first beside the fact, the second beside why it misleads. */
  sourceIds: readonly string[];
  workingId: string | null;
}

/** An explainer as a verdict version stores it: the Tiptap document as JSON, and its HTML. */
export interface ExplainerBody {
  body: string;
  bodyHtml: string;
}

const heading = (text: string) => ({
  type: 'heading',
  attrs: { level: 2 },
  content: [{ type: 'text', text }],
});

/** A paragraph of text, ending in a citation of `sourceId` when there is one. */
const paragraph = (text: string, sourceId?: string) => ({
  type: 'paragraph',
  content: sourceId
    ? [
        { type: 'text', text: `${text} ` },
        { type: 'sourceCitation', attrs: { sourceId } },
      ]
    : [{ type: 'text', text }],
});

/** The desk's template filled in: the fact first, then the claim, then why it misleads. */
export function explainerDocument(
  verdict: PatternVerdict,
  parts: ExplainerParts,
): ExplainerDocument {
  return {
    type: 'doc',
    content: [
      heading('What the evidence shows'),
      paragraph(verdict.fact, parts.sourceIds[0]),
      heading('The claim'),
      { type: 'blockquote', content: [paragraph(parts.claimText)] },
      heading('Why it misleads'),
      paragraph(verdict.misleads, parts.sourceIds[1]),
      ...(parts.workingId ? [{ type: 'workingEmbed', attrs: { workingId: parts.workingId } }] : []),
    ],
  };
}

/*
 * Rendering (Tiptap, then sanitize-html) costs milliseconds, too much for every row of a
 * large desk. Each shape of a pattern's explainer is rendered once with stand-ins for the
 * ids and the claim's words, which each row then puts back into the HTML.
 */
const standInSources = [
  '5e000000-0000-4000-8000-000000000001',
  '5e000000-0000-4000-8000-000000000002',
];
const standInWorking = 'a0000000-0000-4000-8000-000000000001';
const standInClaim = 'CLAIMTEXTSTANDIN';
const rendered = new Map<PatternVerdict, Map<string, string>>();

/** Text as sanitize-html writes it into HTML. */
const escapeText = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

function renderedShape(verdict: PatternVerdict, sources: number, working: boolean): string {
  const shapes = rendered.get(verdict) ?? new Map<string, string>();
  rendered.set(verdict, shapes);
  const key = `${sources}:${working}`;
  let html = shapes.get(key);
  if (html === undefined) {
    html = renderExplainerHtml(
      explainerDocument(verdict, {
        claimText: standInClaim,
        sourceIds: standInSources.slice(0, sources),
        workingId: working ? standInWorking : null,
      }),
    );
    shapes.set(key, html);
  }
  return html;
}

/** The explainer of one generated verdict, with its HTML as the API would render it. */
export function explainerBody(verdict: PatternVerdict, parts: ExplainerParts): ExplainerBody {
  const sourceIds = parts.sourceIds.slice(0, standInSources.length);
  let html = renderedShape(verdict, sourceIds.length, parts.workingId !== null).replace(
    standInClaim,
    () => escapeText(parts.claimText),
  );
  sourceIds.forEach((id, index) => (html = html.replaceAll(standInSources[index]!, id)));
  if (parts.workingId) html = html.replaceAll(standInWorking, parts.workingId);
  return {
    body: JSON.stringify(explainerDocument(verdict, { ...parts, sourceIds })),
    bodyHtml: html,
  };
}
