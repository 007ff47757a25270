import { renderMail, type MailContent } from './mail-layout';

interface About {
  displayName: string;
  summary: string;
  url: string;
}

export function signoffRequestedMail(input: About & { by: string; number: number }): MailContent {
  return renderMail({
    subject: `For sign-off: ${input.summary}`,
    greeting: `Hello ${input.displayName},`,
    paragraphs: [
      `${input.by} has submitted version ${input.number} of the verdict on “${input.summary}” for sign-off.`,
      'The sign-off page shows the checklist and what changed since the last version.',
    ],
    action: { label: 'Open the sign-off page', url: input.url },
  });
}

export function sentBackMail(
  input: About & { by: string; number: number; notes: string },
): MailContent {
  return renderMail({
    subject: `Sent back: ${input.summary}`,
    greeting: `Hello ${input.displayName},`,
    paragraphs: [
      `${input.by} has sent back version ${input.number} of the verdict on “${input.summary}”, with these notes:`,
      input.notes,
    ],
    action: { label: 'Open the claim', url: input.url },
  });
}

export function clearedMail(input: About & { by: string; number: number }): MailContent {
  return renderMail({
    subject: `Cleared: ${input.summary}`,
    greeting: `Hello ${input.displayName},`,
    paragraphs: [
      `${input.by} has cleared version ${input.number} of the verdict on “${input.summary}”.`,
      'It can now be published or scheduled.',
    ],
    action: { label: 'Open the claim', url: input.url },
  });
}
