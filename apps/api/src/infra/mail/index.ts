export {
  MAIL_TRANSPORT,
  SmtpMailTransport,
  isPermanentSmtpError,
  type MailTransport,
  type OutgoingMail,
  type OutgoingAttachment,
  type SentReceipt,
} from './mail-transport';
export { MailTransportModule } from './mail.module';
