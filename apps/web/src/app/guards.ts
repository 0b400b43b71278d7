import { roleCan, type Action } from '@benchproof/contracts';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import { sessionHasExpired, sessionQuery } from '../features/auth';
import { shopSettingsQuery } from '../features/shop-settings';
import { queryClient } from '../lib/query-client';
import { shopCan } from './shop-access';

/** Loader for the signed-in area: no session → sign-in, remembering where the user was going. */
export async function requireSession({ request }: LoaderFunctionArgs) {
  const user = await queryClient.ensureQueryData(sessionQuery);
  if (!user) {
    const url = new URL(request.url);
    const reason = sessionHasExpired() ? '&reason=expired' : '';
    throw redirect(`/sign-in?next=${encodeURIComponent(url.pathname + url.search)}${reason}`);
  }
  return null;
}

/** The jobs list, told which action the page needed, so it can say why the user landed there. */
const deniedUrl = (action: Action) => `/jobs?denied=${encodeURIComponent(action)}`;

/** Loader for pages limited by ACCESS_POLICY; roles that may not do `action` are sent to the jobs page. */
export const requireAction = (action: Action) => async (args: LoaderFunctionArgs) => {
  // Child loaders run alongside the parent's, so this one must send a visitor to sign-in too.
  await requireSession(args);
  const user = await queryClient.ensureQueryData(sessionQuery);
  if (!user || !roleCan(user.role, action)) throw redirect(deniedUrl(action));
  return null;
};

/** Loader for the showcase: the policy's `showcase.view`, and for the desk only where the shop allows it. */
export async function requireShowcase(args: LoaderFunctionArgs) {
  await requireSession(args);
  const user = await queryClient.ensureQueryData(sessionQuery);
  const shop = user ? await queryClient.ensureQueryData(shopSettingsQuery).catch(() => undefined) : undefined;
  if (!user || !shopCan(user.role, shop)('showcase.view')) throw redirect(deniedUrl('showcase.view'));
  return null;
}
