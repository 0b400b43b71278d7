import { roleCan, type Action, type SessionUser } from '@benchproof/contracts';
import { onlineManager } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router';
import { sessionHasExpired, sessionKey, sessionQuery } from '../features/auth';
import { shopSettingsQuery } from '../features/shop-settings';
import { ApiError } from '../lib/api-client';
import { queryClient } from '../lib/query-client';
import { shopCan } from './shop-access';

/**
 * The signed-in user. Offline (or with the workshop server out of reach) the last known one from this phone's kept
 * cache, so the kept pages open; a session restored from that cache is confirmed with the server when it can be.
 */
async function currentUser(): Promise<SessionUser | null> {
  const known = queryClient.getQueryData<SessionUser | null>(sessionKey);
  if (known && !onlineManager.isOnline()) return known;
  if (!queryClient.getQueryState(sessionKey)?.isInvalidated) return queryClient.ensureQueryData(sessionQuery);
  return queryClient.fetchQuery(sessionQuery).catch((e: unknown) => {
    if (known && e instanceof ApiError && e.code === 'NETWORK') return known;
    throw e;
  });
}

/** Loader for the signed-in area: no session → sign-in, remembering where the user was going. */
export async function requireSession({ request }: LoaderFunctionArgs) {
  const user = await currentUser();
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
