import { renderMail, type MailContent } from './mail-layout';

export function publishedMail(input: {
  displayName: string;
  summary: string;
  url: string;
}): MailContent {
  return renderMail({
    subject: `Published: ${input.summary}`,
    greeting: `Hello ${input.displayName},`,
    paragraphs: [`The explainer on “${input.summary}” is now published for readers.`],
    action: { label: 'Read it as readers see it', url: input.url },
  });
}

export function scheduledPublishedMail(input: {
  displayName: string;
  summary: string;
  url: string;
  at: Date;
  timeZone: string;
}): MailContent {
  const when = new Intl.DateTimeFormat('en-GB', {
    dateStyle: 'long',
    timeStyle: 'short',
    timeZone: input.timeZone,
  }).format(input.at);
  return renderMail({
    subject: `Scheduled publication done: ${input.summary}`,
    greeting: `Hello ${input.displayName},`,
    paragraphs: [
      `The explainer on “${input.summary}” you scheduled for ${when} (${input.timeZone}) has been published.`,
    ],
    action: { label: 'Read it as readers see it', url: input.url },
  });
}

export function readerConfirmMail(input: {
  summary: string;
  confirmUrl: string;
  siteName: string;
}): MailContent {
  return renderMail({
    subject: `Confirm: updates to “${input.summary}”`,
    greeting: 'Hello,',
    paragraphs: [
      `Someone, probably you, asked ${input.siteName} to e-mail this address when the explainer “${input.summary}” is corrected or updated.`,
      'Nothing will be sent unless you confirm. If it was not you, ignore this mail and the address will not be used.',
    ],
    action: { label: 'Confirm the updates', url: input.confirmUrl },
    closing: input.siteName,
  });
}

export function readerUpdateMail(input: {
  summary: string;
  kindLabel: string;
  text: string;
  url: string;
  unsubscribeUrl: string;
  siteName: string;
}): MailContent {
  return renderMail({
    subject: `${input.kindLabel}: ${input.summary}`,
    greeting: 'Hello,',
    paragraphs: [
      `The explainer “${input.summary}” has a new note (${input.kindLabel.toLowerCase()}):`,
      input.text,
      `To stop these mails, open this link; your address is then deleted: ${input.unsubscribeUrl}`,
    ],
    action: { label: 'Read the explainer', url: input.url },
    closing: input.siteName,
  });
}
