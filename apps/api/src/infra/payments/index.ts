export {
  PAYMENT_PROVIDER,
  PaymentProvider,
  PaymentProviderError,
  WebhookSignatureError,
  stripeOptions,
  type CheckoutRequest,
  type CheckoutSession,
  type ProviderEvent,
} from './payment-provider';
export { PaymentProviderModule } from './payments.module';
