export { MailModule } from './mail.module';
export { MailService, type QueuedMail, type ReportPdf } from './mail.service';
