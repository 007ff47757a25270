import { renderMail, type MailContent } from './mail-layout';

export function claimAssignedMail(input: {
  displayName: string;
  assignedBy: string;
  summary: string;
  url: string;
}): MailContent {
  return renderMail({
    subject: `Claim for you: ${input.summary}`,
    greeting: `Hello ${input.displayName},`,
    paragraphs: [
      `${input.assignedBy} has given you a claim to research: “${input.summary}”.`,
      'Its appearances, sources and files are on the claim page.',
    ],
    action: { label: 'Open the claim', url: input.url },
  });
}
