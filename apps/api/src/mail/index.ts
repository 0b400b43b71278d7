export { MailModule } from './mail.module';
export { MailService, type QueuedMail, type ReportPdf } from './mail.service';
export { invitationMail, passwordResetMail, signupConfirmMail } from './templates/account';
export type { ShopBrand } from './templates/layout';
