import { roleCan } from '@benchproof/contracts';
import { PaymentsPanel } from '../../../../features/payments';
import type { SectionProps } from './section-props';

// The payments feature (features/payments) owns this section: balance, in-shop payments, refunds.
export default function PaymentSection({ job, me }: SectionProps) {
  return <PaymentsPanel jobId={job.id} canRecord={roleCan(me.role, 'payments.record')} canRefund={roleCan(me.role, 'payments.refund')} />;
}
