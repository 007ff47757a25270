import { type JSONContent } from '@tiptap/core';
import { describe, expect, it } from 'vitest';
import { citedSourceIds, cleanExplainerDocument, explainerPlainText } from '../document.js';
import { explainerTemplate } from '../template.js';
import { renderExplainerHtml, sanitizeExplainerHtml } from './render-explainer.js';

const sourceA = '11111111-1111-4111-8111-111111111111';
const sourceB = '22222222-2222-4222-8222-222222222222';
const working = '33333333-3333-4333-8333-333333333333';

const text = (value: string, marks?: JSONContent['marks']): JSONContent => ({
  type: 'text',
  text: value,
  ...(marks ? { marks } : {}),
});
const paragraph = (...content: JSONContent[]): JSONContent => ({ type: 'paragraph', content });

describe('renderExplainerHtml', () => {
  it('renders the schema, numbering citations in order of first citation', () => {
    const html = renderExplainerHtml({
      type: 'doc',
      content: [
        { type: 'heading', attrs: { level: 2 }, content: [text('What the evidence shows')] },
        paragraph(
          text('Heat from the interior is tiny', [{ type: 'bold' }]),
          { type: 'sourceCitation', attrs: { sourceId: sourceB } },
          text(' next to greenhouse forcing '),
          { type: 'sourceCitation', attrs: { sourceId: sourceA } },
          { type: 'sourceCitation', attrs: { sourceId: sourceB } },
          text(', see '),
          text('the report', [
            { type: 'link', attrs: { href: 'https://www.ipcc.ch/report/ar6/wg1/' } },
          ]),
        ),
        { type: 'workingEmbed', attrs: { workingId: working } },
      ],
    });
    expect(html).toBe(
      '<h2>What the evidence shows</h2>' +
        `<p><strong>Heat from the interior is tiny</strong><a class="citation" data-source-id="${sourceB}" href="#source-${sourceB}">[1]</a>` +
        ` next to greenhouse forcing <a class="citation" data-source-id="${sourceA}" href="#source-${sourceA}">[2]</a>` +
        `<a class="citation" data-source-id="${sourceB}" href="#source-${sourceB}">[1]</a>` +
        ', see <a href="https://www.ipcc.ch/report/ar6/wg1/" rel="noopener noreferrer">the report</a></p>' +
        `<figure data-working-id="${working}" class="working-embed">Working</figure>`,
    );
  });

  it('drops javascript: and data: links, unknown nodes and script tags', () => {
    const doc = {
      type: 'doc',
      content: [
        paragraph(
          text('click', [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }]),
          text(' or ', [
            { type: 'link', attrs: { href: 'data:text/html,<script>alert(1)</script>' } },
          ]),
          text('<script>alert(2)</script>'),
        ),
        { type: 'script', content: [text('alert(3)')] },
        { type: 'image', attrs: { src: 'x', onerror: 'alert(4)' } },
      ],
    };
    const html = renderExplainerHtml(doc);
    expect(html).toBe('<p>click or &lt;script&gt;alert(2)&lt;/script&gt;</p>');
    expect(cleanExplainerDocument(doc).content).toHaveLength(1);
  });

  it('keeps sanitizing HTML read back from anywhere', () => {
    const hostile =
      '<p onclick="alert(1)">Hi<script>alert(2)</script><img src=x onerror=alert(3)>' +
      '<a href="javascript:alert(4)">x</a><a href="https://example.test/" target="_blank" style="color:red">y</a></p>' +
      '<svg><script>alert(5)</script></svg><iframe src="https://evil.test"></iframe>';
    expect(sanitizeExplainerHtml(hostile)).toBe(
      '<p>Hi<a>x</a><a href="https://example.test/" rel="noopener noreferrer">y</a></p>',
    );
  });
});

describe('the explainer template and text', () => {
  it('puts the fact first, then the claim, then why it misleads', () => {
    const doc = explainerTemplate({
      text: 'The core heats the planet.',
      claimantName: 'A councillor',
    });
    const lines = explainerPlainText(doc).split('\n');
    expect(lines[0]).toBe('What the evidence shows');
    expect(lines.indexOf('The claim')).toBeLessThan(lines.indexOf('Why it misleads'));
    expect(lines).toContain('The core heats the planet.');
    expect(citedSourceIds(doc)).toEqual([]);
  });
});
