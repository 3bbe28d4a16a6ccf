// Sends mail through SMTP (the local fake server in development and tests); a send failure is logged, never thrown into a request.
import nodemailer, { type Transporter } from 'nodemailer';
import type { Logger } from 'pino';

export interface MailAttachment {
  filename: string;
  content: Buffer;
  contentType: string;
}

export interface MailMessage {
  to: string[];
  subject: string;
  text: string;
  attachments?: MailAttachment[];
}

export class Mailer {
  private readonly transport: Transporter;

  constructor(
    options: { host: string; port: number; from: string },
    private readonly logger: Logger,
  ) {
    // The fake server offers no TLS; a real relay would be configured with its own settings.
    this.transport = nodemailer.createTransport({ host: options.host, port: options.port, secure: false, ignoreTLS: true });
    this.from = options.from;
  }

  private readonly from: string;

  /** Returns whether the message was handed to the SMTP server. */
  async send(message: MailMessage): Promise<boolean> {
    const to = [...new Set(message.to.filter(Boolean))];
    if (!to.length) return false;
    try {
      await this.transport.sendMail({ from: this.from, to, subject: message.subject, text: message.text, attachments: message.attachments });
      return true;
    } catch (error) {
      this.logger.warn({ err: error, subject: message.subject }, 'mail not sent');
      return false;
    }
  }

  close(): void {
    this.transport.close();
  }
}
