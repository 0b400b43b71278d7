import { roleCan, type Action } from '@benchproof/contracts';
import { useSession } from './session';

/**
 * `can(action)` for the signed-in user, from ACCESS_POLICY (libs/contracts) — the
 * same table the api guard reads. Hiding a control is a courtesy; the api refuses anyway.
 */
export function useCan(): (action: Action) => boolean {
  const { data: me } = useSession();
  return (action) => !!me && roleCan(me.role, action);
}
