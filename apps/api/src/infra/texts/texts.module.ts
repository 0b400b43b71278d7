import { Global, Module } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { TEXT_PROVIDER, TextProvider } from './text-provider';

/** The text-message seam: the local fake or a real account, chosen by TWILIO_* configuration alone. */
@Global()
@Module({
  providers: [{ provide: TEXT_PROVIDER, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => new TextProvider(cfg) }],
  exports: [TEXT_PROVIDER],
})
export class TextProviderModule {}
