import { useParams, useSearchParams } from 'react-router';
import { OwnerPage } from '../../../features/owner';
import { OwnerPaymentCard } from '../../../features/payments';

/** /o/:token — the owner's page: no sign-in, outside the staff shell, loaded on its own. */
export function OwnerRoute() {
  const token = useParams().token ?? '';
  // ?payment=done|cancelled: the checkout sent the owner back; the card then waits for the shop's records.
  const back = useSearchParams()[0].get('payment');
  const returned = back === 'done' || back === 'cancelled' ? back : null;
  return <OwnerPage token={token} payment={<OwnerPaymentCard token={token} returned={returned} />} />;
}
