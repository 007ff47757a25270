export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

interface MailParts {
  subject: string;
  greeting: string;
  paragraphs: string[];
  action?: { label: string; url: string };
  closing?: string;
}

const escapeHtml = (value: string) =>
  value.replace(/[&<>"']/g, (char) => `&#${char.charCodeAt(0)};`);

/** One plain layout for every Skyledger mail: a text part first, and the same as HTML. */
export function renderMail(parts: MailParts): MailContent {
  const closing = parts.closing ?? 'The Skyledger desk';
  const text = [
    parts.greeting,
    '',
    ...parts.paragraphs.flatMap((paragraph) => [paragraph, '']),
    ...(parts.action ? [`${parts.action.label}: ${parts.action.url}`, ''] : []),
    `— ${closing}`,
  ].join('\n');
  const html = [
    '<!doctype html><html><body style="font-family: sans-serif; line-height: 1.5; color: #1d2a26">',
    `<p>${escapeHtml(parts.greeting)}</p>`,
    ...parts.paragraphs.map((paragraph) => `<p>${escapeHtml(paragraph)}</p>`),
    ...(parts.action
      ? [`<p><a href="${escapeHtml(parts.action.url)}">${escapeHtml(parts.action.label)}</a></p>`]
      : []),
    `<p>— ${escapeHtml(closing)}</p>`,
    '</body></html>',
  ].join('\n');
  return { subject: parts.subject, text, html };
}
