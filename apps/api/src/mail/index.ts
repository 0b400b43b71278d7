export { MailModule } from './mail.module';
export { MailService, type QueuedMail } from './mail.service';
export type { IssuedPdf, ReportFiles } from './report-files';
