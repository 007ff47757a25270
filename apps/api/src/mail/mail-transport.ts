import { Inject, Injectable, type OnModuleDestroy } from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import { mailConfig, type MailConfig } from '../config/configuration';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string | null;
  /** Our own id for the mail, so a receiver can tell a re-delivery from a new mail. */
  messageId: string;
}

/** SMTP through nodemailer: the local catcher by default, any relay by configuration. */
@Injectable()
export class MailTransport implements OnModuleDestroy {
  private readonly transporter: Transporter;

  constructor(@Inject(mailConfig.KEY) private readonly config: MailConfig) {
    this.transporter = createTransport({
      host: config.host,
      port: config.port,
      secure: config.secure,
      ...(config.user ? { auth: { user: config.user, pass: config.password ?? '' } } : {}),
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 20_000,
    });
  }

  async send(mail: OutgoingMail): Promise<void> {
    const domain = this.config.from.match(/@([^>\s]+)/)?.[1] ?? 'skyledger.test';
    await this.transporter.sendMail({
      from: this.config.from,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      ...(mail.html ? { html: mail.html } : {}),
      messageId: `<${mail.messageId}@${domain}>`,
    });
  }

  onModuleDestroy(): void {
    this.transporter.close();
  }
}
