import { Global, Module } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config';
import { PAYMENT_PROVIDER, PaymentProvider } from './payment-provider';

/** The card-payment seam: the local fake or a real account, chosen by STRIPE_* configuration alone. */
@Global()
@Module({
  providers: [{ provide: PAYMENT_PROVIDER, inject: [APP_CONFIG], useFactory: (cfg: AppConfig) => new PaymentProvider(cfg) }],
  exports: [PAYMENT_PROVIDER],
})
export class PaymentProviderModule {}
