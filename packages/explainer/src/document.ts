import { type JSONContent } from '@tiptap/core';
import { linkProtocols } from './extensions.js';

export type ExplainerDocument = JSONContent & { type: 'doc' };

const nodeTypes = new Set([
  'doc',
  'paragraph',
  'text',
  'heading',
  'bulletList',
  'orderedList',
  'listItem',
  'blockquote',
  'horizontalRule',
  'hardBreak',
  'workingEmbed',
  'sourceCitation',
]);
const markTypes = new Set(['bold', 'italic', 'strike', 'link']);

/** True for an http(s) or mailto address; `javascript:`, `data:` and the rest are false. */
export function isAllowedHref(href: unknown): boolean {
  if (typeof href !== 'string') return false;
  try {
    const protocol = new URL(href).protocol.replace(/:$/, '');
    return (linkProtocols as readonly string[]).includes(protocol);
  } catch {
    return false;
  }
}

/**
 * The document with everything outside the schema removed: unknown nodes and marks,
 * links to anything but http(s) and mailto, and attributes other than the ones the
 * schema reads. What remains is valid input for the renderer.
 */
export function cleanExplainerDocument(input: unknown): ExplainerDocument {
  const clean = (node: JSONContent): JSONContent | null => {
    if (typeof node !== 'object' || node === null || !nodeTypes.has(String(node.type))) {
      return null;
    }
    const out: JSONContent = { type: node.type };
    if (node.type === 'text') {
      if (typeof node.text !== 'string' || node.text === '') return null;
      out.text = node.text;
    }
    if (node.type === 'heading') out.attrs = { level: node.attrs?.level === 3 ? 3 : 2 };
    if (node.type === 'orderedList' && Number.isInteger(node.attrs?.start)) {
      out.attrs = { start: node.attrs!.start as number };
    }
    if (node.type === 'workingEmbed' || node.type === 'sourceCitation') {
      const key = node.type === 'workingEmbed' ? 'workingId' : 'sourceId';
      const id = node.attrs?.[key];
      if (typeof id !== 'string' || !/^[0-9a-f-]{36}$/i.test(id)) return null;
      out.attrs = { [key]: id };
    }
    const marks = (Array.isArray(node.marks) ? node.marks : [])
      .filter((mark) => markTypes.has(String(mark?.type)))
      .filter((mark) => mark.type !== 'link' || isAllowedHref(mark.attrs?.href))
      .map((mark) =>
        mark.type === 'link'
          ? { type: 'link', attrs: { href: mark.attrs!.href as string } }
          : { type: mark.type },
      );
    if (marks.length) out.marks = marks;
    if (Array.isArray(node.content)) {
      const content = node.content
        .map(clean)
        .filter((child): child is JSONContent => child !== null);
      if (content.length) out.content = content;
    }
    return out;
  };
  const cleaned = clean(input as JSONContent);
  if (!cleaned || cleaned.type !== 'doc') return { type: 'doc', content: [] };
  return cleaned as ExplainerDocument;
}

function walk(node: JSONContent, visit: (node: JSONContent) => void): void {
  visit(node);
  for (const child of node.content ?? []) walk(child, visit);
}

/** The ids of the sources cited, in order of first citation: citation [1] is the first. */
export function citedSourceIds(doc: JSONContent): string[] {
  const ids: string[] = [];
  walk(doc, (node) => {
    const id =
      node.type === 'sourceCitation' ? (node.attrs?.sourceId as string | undefined) : undefined;
    if (id && !ids.includes(id)) ids.push(id);
  });
  return ids;
}

export function embeddedWorkingIds(doc: JSONContent): string[] {
  const ids: string[] = [];
  walk(doc, (node) => {
    const id =
      node.type === 'workingEmbed' ? (node.attrs?.workingId as string | undefined) : undefined;
    if (id && !ids.includes(id)) ids.push(id);
  });
  return ids;
}

/** The words of the document, blocks on lines of their own: for search and diffs. */
export function explainerPlainText(doc: JSONContent): string {
  const blocks: string[] = [];
  const inline = (node: JSONContent): string =>
    node.type === 'text'
      ? (node.text ?? '')
      : node.type === 'hardBreak'
        ? '\n'
        : node.type === 'sourceCitation'
          ? '[source]'
          : (node.content ?? []).map(inline).join('');
  const block = (node: JSONContent) => {
    if (node.type === 'paragraph' || node.type === 'heading') blocks.push(inline(node));
    else if (node.type === 'workingEmbed') blocks.push('[working]');
    else for (const child of node.content ?? []) block(child);
  };
  block(doc);
  return blocks.filter((text) => text.trim() !== '').join('\n');
}

export function isEmptyExplainer(doc: JSONContent): boolean {
  return (
    explainerPlainText(doc)
      .replace(/\[(source|working)\]/g, '')
      .trim() === ''
  );
}
