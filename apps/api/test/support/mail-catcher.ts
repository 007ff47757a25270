import { simpleParser, type ParsedMail } from 'mailparser';
import { type AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

export interface CaughtMail {
  to: string[];
  subject: string;
  text: string;
  html: string | false;
  messageId: string | undefined;
}

/**
 * A real SMTP server on 127.0.0.1 (random port) that keeps every message it receives,
 * parsed, so tests read the mails the API really sent.
 */
export class MailCatcher {
  readonly messages: CaughtMail[] = [];
  private server: SMTPServer | undefined;
  private waiters: Array<() => void> = [];
  port = 0;

  async start(port = 0): Promise<this> {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then((parsed) => {
            this.messages.push(toCaught(parsed));
            this.waiters.forEach((wake) => wake());
            callback();
          })
          .catch((error: Error) => callback(error));
      },
    });
    await new Promise<void>((resolve) => this.server!.listen(port, '127.0.0.1', resolve));
    this.port = (this.server.server.address() as AddressInfo).port;
    return this;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  /** Waits for a mail matching the predicate and returns it. */
  async waitFor(predicate: (mail: CaughtMail) => boolean, timeoutMs = 10_000): Promise<CaughtMail> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const found = this.messages.find(predicate);
      if (found) return found;
      const left = deadline - Date.now();
      if (left <= 0) {
        const seen =
          this.messages.map((mail) => `${mail.to.join(',')}: ${mail.subject}`).join('; ') || 'none';
        throw new Error(`no matching mail within ${timeoutMs} ms (received: ${seen})`);
      }
      await new Promise<void>((resolve) => {
        const timer = setTimeout(resolve, left);
        this.waiters.push(() => {
          clearTimeout(timer);
          resolve();
        });
      });
      this.waiters = [];
    }
  }

  to(address: string): CaughtMail[] {
    return this.messages.filter((mail) => mail.to.includes(address));
  }
}

function toCaught(parsed: ParsedMail): CaughtMail {
  const recipients = Array.isArray(parsed.to) ? parsed.to : parsed.to ? [parsed.to] : [];
  return {
    to: recipients.flatMap((group) => group.value.map((entry) => entry.address ?? '')),
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    html: parsed.html ?? false,
    messageId: parsed.messageId,
  };
}

/** The link of a mail that goes to this path of the desk, e.g. `/accept-invite`. */
export function linkIn(mail: CaughtMail, path: string): URL {
  const match = mail.text.match(new RegExp(`https?://\\S+${path}\\?\\S+`));
  if (!match) throw new Error(`no ${path} link in the mail "${mail.subject}":\n${mail.text}`);
  return new URL(match[0]);
}
