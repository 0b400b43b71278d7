import { Global, Inject, Module, type OnApplicationShutdown } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { MAIL_TRANSPORT, type MailTransport, SmtpMailTransport } from './mail-transport';

/** The SMTP seam: the local catcher or a real relay, chosen by SMTP_URL alone. */
@Global()
@Module({
  providers: [{ provide: MAIL_TRANSPORT, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => new SmtpMailTransport(cfg.SMTP_URL) }],
  exports: [MAIL_TRANSPORT],
})
export class MailTransportModule implements OnApplicationShutdown {
  constructor(@Inject(MAIL_TRANSPORT) private readonly transport: MailTransport) {}

  onApplicationShutdown(): void {
    this.transport.close();
  }
}
