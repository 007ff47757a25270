import { roleLabels, type Role } from '@skyledger/contracts';
import { renderMail, type MailContent } from './mail-layout';

export function invitationMail(input: {
  displayName: string;
  role: Role;
  invitedBy: string;
  url: string;
  validHours: number;
}): MailContent {
  return renderMail({
    subject: 'You are invited to the Skyledger desk',
    greeting: `Hello ${input.displayName},`,
    paragraphs: [
      `${input.invitedBy} has invited you to the science desk's Skyledger as ${roleLabels[input.role].toLowerCase()}.`,
      `Open the link below to choose your password. It works once and for ${input.validHours} hours.`,
    ],
    action: { label: 'Set your password', url: input.url },
  });
}
