import { simpleParser } from 'mailparser';
import { type AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

export interface AcceptedMail {
  to: string;
  subject: string;
  text: string;
}

/**
 * An SMTP server that can hold a message after receiving it, before answering 250. A
 * message counts as delivered only when it is answered while its sender is still
 * connected: a sender killed while the answer is held has delivered nothing, as with a
 * real relay, which takes responsibility for a mail only when it says 250.
 */
export class HoldingSmtp {
  readonly accepted: AcceptedMail[] = [];
  /** How many messages arrived while holding was on (answered or not). */
  held = 0;
  holding = false;
  private readonly open = new Set<string>();
  private waiters: Array<() => void> = [];
  private server: SMTPServer | undefined;
  port = 0;

  async start(): Promise<this> {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      onConnect: (session, callback) => {
        this.open.add(session.id);
        callback();
      },
      onClose: (session) => {
        this.open.delete(session.id);
        this.wake();
      },
      onData: (stream, session, callback) => {
        simpleParser(stream)
          .then(async (parsed) => {
            if (this.holding) {
              this.held += 1;
              this.wake();
              // Never answered: the sender is killed while it waits.
              while (this.open.has(session.id)) await this.changed();
              return;
            }
            const to = parsed.to;
            this.accepted.push({
              to: (Array.isArray(to) ? to : to ? [to] : []).map((a) => a.text).join(','),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
            });
            this.wake();
            callback();
          })
          .catch((error: Error) => callback(error));
      },
    });
    await new Promise<void>((resolve) => this.server!.listen(0, '127.0.0.1', resolve));
    this.port = (this.server.server.address() as AddressInfo).port;
    return this;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  /** Resolves once `condition` holds, re-checked whenever a message or connection changes. */
  async until(condition: () => boolean, timeoutMs = 30_000): Promise<void> {
    const deadline = Date.now() + timeoutMs;
    while (!condition()) {
      if (Date.now() > deadline)
        throw new Error(`timed out; accepted: ${this.accepted.map((m) => m.subject).join('; ')}`);
      await Promise.race([this.changed(), new Promise((resolve) => setTimeout(resolve, 200))]);
    }
  }

  private changed(): Promise<void> {
    return new Promise((resolve) => this.waiters.push(resolve));
  }

  private wake(): void {
    const waiters = this.waiters;
    this.waiters = [];
    waiters.forEach((wake) => wake());
  }
}
