export { MailModule } from './mail.module';
export { MailService, type QueuedMail } from './mail.service';
export type { IssuedPdf, ReportFiles } from './report-files';
export { invitationMail, passwordResetMail, signupConfirmMail } from './templates/account';
export type { ShopBrand } from './templates/layout';
