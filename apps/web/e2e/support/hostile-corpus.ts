import { type Page } from 'playwright-core';
import { expect } from 'vitest';

/** Every payload fits the shortest free-text field that takes them all, a claim's summary. */
export const PAYLOAD_MAX_LENGTH = 75;

/**
 * Hostile text for every free-text field of the desk: markup, event handlers, script URLs,
 * breakouts from attributes, comments, CDATA and JSON-LD, template syntax, entities and
 * unicode tricks. Each payload, if a page ever ran it, does something a test sees: a dialog
 * (`alert`), a console line `SKYLEDGER-XSS-<id>`, or `window.__skyledgerXss` set.
 */
export interface Payload {
  id: string;
  text: string;
}

export const XSS_MARKER = 'SKYLEDGER-XSS';

const alertOf = (id: string) => `alert('${XSS_MARKER}-${id}')`;
const logOf = (id: string) => `console.log('${XSS_MARKER}-${id}')`;
const flagOf = (id: string) => `window.__skyledgerXss='${id}'`;

export const corpus: readonly Payload[] = [
  { id: 's1', text: `<script>${alertOf('s1')}</script>` },
  { id: 's2', text: `<SCRIPT SRC=data:,${logOf('s2')}></SCRIPT>` },
  { id: 'i1', text: `<img src=x onerror="${alertOf('i1')}">` },
  { id: 'i2', text: `<img src=x onerror=${flagOf('i2')}>` },
  { id: 'v1', text: `<svg onload=${alertOf('v1')}>` },
  { id: 'v2', text: `<svg><script>${logOf('v2')}</script></svg>` },
  { id: 'v3', text: `<svg><a href="javascript:${alertOf('v3')}">x</a></svg>` },
  { id: 'b1', text: `"><script>${alertOf('b1')}</script>` },
  { id: 'b2', text: `'><img src=x onerror=${alertOf('b2')}>` },
  { id: 'b3', text: `" autofocus onfocus="${alertOf('b3')}` },
  { id: 'j1', text: `javascript:${alertOf('j1')}` },
  { id: 'd1', text: `data:text/html,<script>${alertOf('d1')}</script>` },
  { id: 'u1', text: `<iframe src="javascript:${alertOf('u1')}"` },
  { id: 'u2', text: `<b onmouseover=${alertOf('u2')}>left open` },
  { id: 'u3', text: `</textarea><script>${alertOf('u3')}</script>` },
  { id: 'u4', text: `--><script>${alertOf('u4')}</script><!--` },
  { id: 'l1', text: `</script><script>${alertOf('l1')}</script>` },
  { id: 'x1', text: `]]><script>${alertOf('x1')}</script>` },
  { id: 't1', text: `{{constructor.constructor('${alertOf('t1')}')()}}` },
  { id: 't2', text: `\${${alertOf('t2')}}` },
  { id: 'e1', text: `&lt;script&gt;${alertOf('e1')}&lt;/script&gt;` },
  { id: 'm1', text: `[click](javascript:${alertOf('m1')})` },
  { id: 'r1', text: `\u202E<script>${alertOf('r1')}</script>` },
  { id: 'z1', text: `<scr\u200Bipt>${alertOf('z1')}</scr\u200Bipt>` },
  { id: 'f1', text: `\uFF1Cscript\uFF1E${alertOf('f1')}\uFF1C/script\uFF1E` },
  { id: 'h1', text: `<a href="javascript:${alertOf('h1')}">a link</a>` },
  { id: 'h2', text: `<base href="javascript:${alertOf('h2')}//">` },
  { id: 'k1', text: `<math><style><img src=x onerror=${alertOf('k1')}>` },
  { id: 'c1', text: `<style>*{background:url("javascript:${alertOf('c1')}")}</style>` },
  { id: 'n1', text: `<details open ontoggle=${alertOf('n1')}>` },
];

/** The payloads that fit a field of at most `max` characters. */
export const fitting = (max: number) => corpus.filter((payload) => payload.text.length <= max);

/** The payloads joined into one text for a long field, cut to whole payloads under `max`. */
export function joined(max: number, separator = '\n'): string {
  let text = '';
  for (const { text: payload } of corpus) {
    const next = text ? `${text}${separator}${payload}` : payload;
    if (next.length > max) break;
    text = next;
  }
  return text;
}

/**
 * Web addresses that are valid http(s) URLs and still carry a payload in their query: the
 * API's check refuses `<`, `>` and spaces, so those are written as a URL would write them
 * (spaces as `/`, which HTML also reads between attributes), but quotes break out of an
 * attribute as they are. Stored as given, shown as text, used as links.
 */
export const hostileWebUrls = corpus.map((payload) => ({
  id: payload.id,
  text: `https://marrowby.test/p?q=${payload.text
    .replace(/\s+/g, '/')
    .replace(/</g, '%3C')
    .replace(/>/g, '%3E')
    .replace(/#/g, '%23')}`,
}));

/** Addresses in schemes that run script or documents: every URL field must refuse them. */
export const scriptUrls = [
  `javascript:${alertOf('url1')}`,
  `JaVaScRiPt:${alertOf('url2')}`,
  ` javascript:${alertOf('url3')}`,
  `java\tscript:${alertOf('url4')}`,
  `data:text/html,<script>${alertOf('url5')}</script>`,
  `data:text/html;base64,${Buffer.from(`<script>${alertOf('url6')}</script>`).toString('base64')}`,
  `vbscript:msgbox(1)`,
  `file:///etc/passwd`,
];

/** What a page did that it never should have, gathered while the test looks around. */
export interface ScriptWatch {
  dialogs: string[];
  markers: string[];
  /** Pages where `window.__skyledgerXss` was found set. */
  flags: string[];
  violations: string[];
}

/**
 * Listens on a page for every sign that a payload ran: dialogs (dismissed at once), console
 * lines with the marker, and Content-Security-Policy violations (reported through the
 * `securitypolicyviolation` event, which fires only where the page has a policy).
 */
export async function watchScripts(page: Page): Promise<ScriptWatch> {
  const watch: ScriptWatch = { dialogs: [], markers: [], flags: [], violations: [] };
  page.on('dialog', (dialog) => {
    watch.dialogs.push(`${page.url()}: ${dialog.type()} ${dialog.message()}`);
    void dialog.dismiss().catch(() => undefined);
  });
  page.on('console', (message) => {
    const text = message.text();
    if (text.includes(XSS_MARKER)) watch.markers.push(`${page.url()}: ${text}`);
    // Chromium logs each violation too ("Refused to …"): both are kept, either fails.
    if (text.startsWith('CSP-VIOLATION ') || text.startsWith('Refused to ')) {
      watch.violations.push(`${page.url()}: ${text}`);
    }
  });
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (event) => {
      console.info(
        `CSP-VIOLATION ${event.violatedDirective} ${event.blockedURI} ${event.sourceFile}:${event.lineNumber}`,
      );
    });
  });
  return watch;
}

/** Nothing ran on the page as it is now, nor before: no dialog, marker, flag or violation. */
export async function expectNoScriptRan(page: Page, watch: ScriptWatch): Promise<void> {
  // Give an injected handler (onerror, onload, ontoggle, autofocus) a moment to fire.
  await page.waitForTimeout(150);
  if (await page.evaluate(() => '__skyledgerXss' in window)) watch.flags.push(page.url());
  expect({ url: page.url(), ...watch }).toEqual({
    url: page.url(),
    dialogs: [],
    markers: [],
    flags: [],
    violations: [],
  });
}

/**
 * The payloads that the page shows as text: each must appear literally in the page's text,
 * which it would not if the browser had parsed it as markup.
 */
export async function expectShownAsText(
  page: Page,
  payloads: ReadonlyArray<Pick<Payload, 'text'>>,
): Promise<void> {
  const text = await page.evaluate(() => document.body.textContent ?? '');
  const normalised = text.replace(/\s+/g, ' ');
  const missing = payloads
    .map((payload) => payload.text.replace(/\s+/g, ' ').trim())
    .filter((payload) => !normalised.includes(payload));
  expect({ url: page.url(), missing }).toEqual({ url: page.url(), missing: [] });
}

/**
 * Nothing in the page's DOM came from a payload: no event-handler attribute (React never
 * writes one), no link or frame to a script or document URL, no script but the app's own
 * and JSON-LD data, no frame but the desk's blob: previews, and none of the elements a
 * payload would bring (object, embed, base, refresh, math).
 */
export async function expectNoInjectedMarkup(page: Page): Promise<void> {
  const found = await page.evaluate(() => {
    const bad: string[] = [];
    const urlAttributes = ['href', 'src', 'action', 'formaction', 'data', 'xlink:href', 'srcdoc'];
    for (const element of document.querySelectorAll('*')) {
      const tag = element.tagName.toLowerCase();
      for (const attribute of element.attributes) {
        const name = attribute.name.toLowerCase();
        if (name.startsWith('on')) bad.push(`<${tag} ${name}>`);
        if (
          urlAttributes.includes(name) &&
          tag !== 'img' &&
          // Browsers skip leading spaces and controls before a scheme.
          // eslint-disable-next-line no-control-regex
          /^[\s\u0000-\u001f]*(javascript|vbscript|data):/i.test(attribute.value)
        ) {
          bad.push(`<${tag} ${name}="${attribute.value.slice(0, 40)}">`);
        }
      }
      if (tag === 'script') {
        const script = element as HTMLScriptElement;
        const own =
          script.type === 'application/ld+json' ||
          (script.src.startsWith(`${location.origin}/assets/`) && script.text === '');
        if (!own) bad.push(`<script src="${script.src}">${script.text.slice(0, 40)}`);
      }
      if (tag === 'iframe' && !(element as HTMLIFrameElement).src.startsWith('blob:')) {
        bad.push(`<iframe src="${(element as HTMLIFrameElement).src}">`);
      }
      if (['object', 'embed', 'base', 'math', 'frame', 'frameset'].includes(tag)) {
        bad.push(`<${tag}>`);
      }
      if (tag === 'meta' && element.hasAttribute('http-equiv')) bad.push('<meta http-equiv>');
    }
    return bad;
  });
  expect({ url: page.url(), found }).toEqual({ url: page.url(), found: [] });
}
