// Test helpers: reads rendered pages back with parse5, the HTML parser that follows the
// WHATWG parsing algorithm browsers use, so a test sees the tree a browser would build.
import { parse, type DefaultTreeAdapterTypes, type ParserError } from 'parse5';

export type Element = DefaultTreeAdapterTypes.Element;
type Node = DefaultTreeAdapterTypes.Node;

export interface ParsedPage {
  document: DefaultTreeAdapterTypes.Document;
  /** What the parser had to repair or could not place; empty for well-formed HTML. */
  errors: ParserError[];
}

export function parseHtml(html: string): ParsedPage {
  const errors: ParserError[] = [];
  const document = parse(html, { onParseError: (error) => errors.push(error) });
  return { document, errors };
}

const isElement = (node: Node): node is Element => 'tagName' in node;

/** Every element under `root`, in document order. */
export function allElements(root: Node): Element[] {
  const found: Element[] = [];
  const walk = (node: Node) => {
    if (isElement(node)) found.push(node);
    if ('childNodes' in node) node.childNodes.forEach(walk);
  };
  walk(root);
  return found;
}

/** The one element of a list, failing the test when there are none or several. */
export function only(elements: Element[]): Element {
  expect(elements).toHaveLength(1);
  return elements[0]!;
}

export function attr(element: Element, name: string): string | undefined {
  return element.attrs.find((attribute) => attribute.name === name)?.value;
}

/** Elements under `root` with this tag name and, if given, these attribute values. */
export function byTag(root: Node, tagName: string, attrs: Record<string, string> = {}): Element[] {
  return allElements(root).filter(
    (element) =>
      element.tagName === tagName &&
      Object.entries(attrs).every(([name, value]) => attr(element, name) === value),
  );
}

export function byId(root: Node, id: string): Element {
  const found = allElements(root).find((element) => attr(element, 'id') === id);
  if (!found) throw new Error(`no element with id ${id}`);
  return found;
}

export function hasClass(element: Element, className: string): boolean {
  return (attr(element, 'class') ?? '').split(/\s+/).includes(className);
}

export function byClass(root: Node, className: string): Element[] {
  return allElements(root).filter((element) => hasClass(element, className));
}

// Elements that flow inside a line of text; every other element stands apart from its neighbours.
const inline = new Set([
  'a',
  'abbr',
  'b',
  'cite',
  'code',
  'em',
  'i',
  'q',
  'small',
  'span',
  'strong',
  'sub',
  'sup',
  'time',
]);

/** The text of a node as a reader sees it: blocks and cells apart, runs of spaces made one. */
export function textOf(node: Node): string {
  const parts: string[] = [];
  const walk = (current: Node) => {
    if (current.nodeName === '#text')
      parts.push((current as DefaultTreeAdapterTypes.TextNode).value);
    const apart = isElement(current) && !inline.has(current.tagName);
    if (apart) parts.push(' ');
    if ('childNodes' in current) current.childNodes.forEach(walk);
    if (apart) parts.push(' ');
  };
  walk(node);
  return parts.join('').replace(/\s+/g, ' ').trim();
}

/** The levels of the headings under `root`, in order: [1, 2, 2, 3, ...]. */
export function headingLevels(root: Node): number[] {
  return allElements(root)
    .filter((element) => /^h[1-6]$/.test(element.tagName))
    .map((element) => Number(element.tagName.slice(1)));
}

/** True when the headings start at one h1 and never skip a level going down. */
export function headingsInOrder(levels: readonly number[]): boolean {
  return (
    levels[0] === 1 &&
    levels.filter((level) => level === 1).length === 1 &&
    levels.every((level, index) => index === 0 || level <= levels[index - 1]! + 1)
  );
}

/** Every `<meta>` of the head as name-or-property → content. */
export function metaContent(page: ParsedPage): Record<string, string> {
  return Object.fromEntries(
    byTag(page.document, 'meta').flatMap((meta) => {
      const key = attr(meta, 'property') ?? attr(meta, 'name');
      return key ? [[key, attr(meta, 'content') ?? '']] : [];
    }),
  );
}

/** Scripts a browser would run: any `<script>` that is not JSON-LD data. */
export function runnableScripts(page: ParsedPage): Element[] {
  return byTag(page.document, 'script').filter(
    (script) => attr(script, 'type') !== 'application/ld+json',
  );
}

/** Event-handler attributes (onclick, onerror...) and javascript: links anywhere. */
export function scriptAttributes(page: ParsedPage): string[] {
  return allElements(page.document).flatMap((element) =>
    element.attrs
      .filter(
        (attribute) => /^on/i.test(attribute.name) || /^\s*javascript:/i.test(attribute.value),
      )
      .map((attribute) => `${element.tagName}[${attribute.name}]`),
  );
}

/** Position of an element in document order, for "comes before" checks. */
export function orderOf(page: ParsedPage, element: Element): number {
  return allElements(page.document).indexOf(element);
}
