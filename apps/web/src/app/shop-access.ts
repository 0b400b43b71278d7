import { canOpenShowcase, roleCan, type Action, type Role, type ShopSettingsDto } from '@benchproof/contracts';

/**
 * ACCESS_POLICY for a role, narrowed by the shop's own switches: the policy lets the desk
 * view the showcase, the shop's `showcaseDeskAccess` decides whether it does (as the api
 * checks). Without the shop's settings yet, the showcase stays hidden from those who need them.
 */
export function shopCan(role: Role, shop: Pick<ShopSettingsDto, 'showcaseDeskAccess'> | undefined): (action: Action) => boolean {
  return (action) => {
    if (action !== 'showcase.view') return roleCan(role, action);
    return roleCan(role, 'showcase.manage') || (!!shop && canOpenShowcase(role, shop));
  };
}
