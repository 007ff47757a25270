import { inject } from 'vitest';

interface MailSummary {
  id: string;
  subject: string;
  to: Array<{ address: string }>;
}

interface MaildevMail extends MailSummary {
  text?: string;
}

/**
 * Reads the mails the app sent, through the mail catcher's REST API: the `nth` (from 1)
 * to this address with this subject, for a flow that mails the same person twice.
 */
export async function waitForMail(
  to: string,
  subject: RegExp,
  timeoutMs = 15_000,
  nth = 1,
): Promise<MaildevMail> {
  const deadline = Date.now() + timeoutMs;
  const api = inject('mailApiUrl');
  while (Date.now() < deadline) {
    const mails = (await (await fetch(`${api}/email`)).json()) as MailSummary[];
    const found = mails.filter(
      (mail) => mail.to.some((recipient) => recipient.address === to) && subject.test(mail.subject),
    )[nth - 1];
    // The list holds summaries; the text (with its links) comes with the whole mail.
    if (found) return (await (await fetch(`${api}/email/${found.id}`)).json()) as MaildevMail;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}

/** The first link in a mail's text that goes to this path of the desk. */
export function linkTo(mail: MaildevMail, path: string): string {
  const match = (mail.text ?? '').match(new RegExp(`https?://\\S+${path}\\?\\S+`));
  if (!match) throw new Error(`no ${path} link in "${mail.subject}"`);
  return match[0];
}
