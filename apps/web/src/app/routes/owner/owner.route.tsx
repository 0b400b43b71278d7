import { useParams } from 'react-router';
import { OwnerPage } from '../../../features/owner';

/** /o/:token — the owner's page: no sign-in, outside the staff shell, loaded on its own. */
export function OwnerRoute() {
  const token = useParams().token ?? '';
  return <OwnerPage token={token} />;
}
