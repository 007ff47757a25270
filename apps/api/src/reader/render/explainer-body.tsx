import { type ReaderWorking } from '@skyledger/contracts';
import { renderToStaticMarkup } from 'react-dom/server';
import { WorkingView } from './working-view.js';

// The sanitizer keeps `figure` only as a working's placeholder; its attributes may come in any order.
const placeholder = /<figure\b([^>]*)>[\s\S]*?<\/figure>/g;
const workingIdAttribute = /\bdata-working-id\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s"'>]+))/;

/**
 * The explainer's sanitized HTML with each working placeholder replaced by the rendered
 * working of that id (a placeholder whose working is missing is dropped), and the workings
 * no placeholder asked for, to show after the body.
 */
export function bodyWithWorkings(
  bodyHtml: string,
  workings: readonly ReaderWorking[],
): { html: string; unplaced: ReaderWorking[] } {
  const byId = new Map(workings.map((working) => [working.id, working]));
  const placed = new Map<string, number>();
  const html = bodyHtml.replace(placeholder, (_figure, attributes: string) => {
    const match = workingIdAttribute.exec(attributes);
    const id = match ? (match[1] ?? match[2] ?? match[3] ?? '') : '';
    const working = byId.get(id);
    if (!working) return '';
    const count = (placed.get(id) ?? 0) + 1;
    placed.set(id, count);
    const elementId = count === 1 ? workingElementId(id) : `${workingElementId(id)}-${count}`;
    return renderToStaticMarkup(<WorkingView working={working} id={elementId} />);
  });
  return { html, unplaced: workings.filter((working) => !placed.has(working.id)) };
}

/** The id of a working's section on the page, for links to it. */
export function workingElementId(workingId: string): string {
  return `working-${workingId}`;
}
