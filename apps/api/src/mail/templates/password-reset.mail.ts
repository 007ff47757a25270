import { renderMail, type MailContent } from './mail-layout';

export function passwordResetMail(input: {
  displayName: string;
  url: string;
  validMinutes: number;
}): MailContent {
  return renderMail({
    subject: 'Reset your Skyledger password',
    greeting: `Hello ${input.displayName},`,
    paragraphs: [
      'Someone asked to reset the password of your Skyledger account. If it was you, open the link below to choose a new one.',
      `The link works once and for ${input.validMinutes} minutes. If you did not ask, ignore this mail: your password stays as it is.`,
    ],
    action: { label: 'Choose a new password', url: input.url },
  });
}
