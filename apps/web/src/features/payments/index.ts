export { PaymentsPanel } from './components/payments-panel';
export { OwnerPaymentCard } from './components/owner-payment-card';
