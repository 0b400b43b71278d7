import { redirect } from 'react-router';
import { api } from '../lib/api-client';

/** Loader of the sign-in page: while the server has no workshop, the setup screen is the only way in. */
export async function redirectToSetup() {
  const status = await api<{ setupOpen: boolean }>('/setup', { quietAuth: true }).catch(() => null);
  if (status?.setupOpen) throw redirect('/setup');
  return null;
}
