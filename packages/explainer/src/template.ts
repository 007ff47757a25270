import { type ExplainerDocument } from './document.js';

const heading = (text: string) => ({
  type: 'heading',
  attrs: { level: 2 },
  content: [{ type: 'text', text }],
});
const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });

/**
 * How a new explainer starts: the fact first, then the claim, then why it misleads, so a
 * reader who stops after one paragraph leaves with the fact rather than the myth.
 */
export function explainerTemplate(claim: {
  text: string;
  claimantName: string;
}): ExplainerDocument {
  return {
    type: 'doc',
    content: [
      heading('What the evidence shows'),
      paragraph('State the fact plainly, with its source and how sure the science is.'),
      heading('The claim'),
      {
        type: 'blockquote',
        content: [paragraph(claim.text)],
      },
      paragraph(`Who said it (${claim.claimantName}), where and when.`),
      heading('Why it misleads'),
      paragraph('Explain the error or the missing context, and show the working.'),
    ],
  };
}
