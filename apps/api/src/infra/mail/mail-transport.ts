import type { Readable } from 'node:stream';
import type { Transporter } from 'nodemailer';
import type SMTPTransport from 'nodemailer/lib/smtp-transport';

/** One attachment; `content` is read while the message is sent, so large files are never held twice. */
export interface OutgoingAttachment {
  filename: string;
  contentType: string;
  content: Readable | Buffer;
}

export interface OutgoingMail {
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string;
  /** Stable across attempts, so a receiving system can drop a duplicate left by a crash mid-send. */
  messageId: string;
  attachments: OutgoingAttachment[];
}

export interface SentReceipt {
  messageId: string;
  /** The relay's last reply line, e.g. "250 OK: queued as …". */
  response: string;
}

/** Sends one message over SMTP; resolves once the relay has accepted it for every recipient. */
export interface MailTransport {
  send(mail: OutgoingMail): Promise<SentReceipt>;
  close(): void;
}

export const MAIL_TRANSPORT = Symbol('MAIL_TRANSPORT');

/** True when the relay refused for good (5xx, RFC 5321 §4.2.1): trying again cannot help. */
export function isPermanentSmtpError(err: unknown): boolean {
  const code = (err as { responseCode?: unknown } | null)?.responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}

/**
 * nodemailer over SMTP from one URL: smtp:// upgrades with STARTTLS when the server offers it,
 * smtps:// is TLS from the first byte; user:pass@ in the URL authenticates. Timeouts are short
 * so an unreachable relay fails an attempt quickly and the outbox backs off.
 */
export class SmtpMailTransport implements MailTransport {
  private transporter?: Promise<Transporter<SMTPTransport.SentMessageInfo, SMTPTransport.Options>>;

  constructor(private readonly url: string) {}

  /** nodemailer (about 13 MB of RSS) loads with the first message, not at boot. */
  private connect() {
    const options: SMTPTransport.Options = { url: this.url, connectionTimeout: 15_000, greetingTimeout: 15_000, socketTimeout: 60_000 };
    this.transporter ??= import('nodemailer').then(({ createTransport }) => createTransport(options));
    return this.transporter;
  }

  async send(mail: OutgoingMail): Promise<SentReceipt> {
    const info = await (
      await this.connect()
    ).sendMail({
      from: mail.from,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      messageId: mail.messageId,
      attachments: mail.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: a.content })),
    });
    if (info.rejected.length) throw Object.assign(new Error(`Recipient refused: ${JSON.stringify(info.rejected[0])}`), { responseCode: 550 });
    return { messageId: info.messageId, response: info.response };
  }

  close(): void {
    void this.transporter?.then((t) => t.close());
  }
}
