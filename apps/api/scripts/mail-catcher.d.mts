/** Types for mail-catcher.mjs (plain JS so `npm run mail` needs no build). */
export interface CaughtAttachment {
  index: number;
  filename: string;
  contentType: string;
  size: number;
  sha256: string;
}

export interface CaughtMessage {
  id: number;
  messageId: string | null;
  from: string;
  to: string;
  envelopeTo: string[];
  subject: string;
  date: string;
  text: string;
  html: string | null;
  attachments: CaughtAttachment[];
}

export interface MailCatcher {
  smtpPort: number;
  httpPort: number;
  /** The inbox page. */
  url: string;
  /** What to put in SMTP_URL. */
  smtpUrl: string;
  messages(): CaughtMessage[];
  attachment(id: number, index: number): Buffer | null;
  waitFor(n: number, timeoutMs?: number): Promise<CaughtMessage[]>;
  close(): Promise<void>;
}

export function startMailCatcher(opts?: { smtpPort?: number; httpPort?: number; host?: string }): Promise<MailCatcher>;
