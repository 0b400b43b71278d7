import { PageHeader } from '../../../components/page-header';
import { QueryState } from '../../../components/query-state';
import { ShopSettingsForm, useShopSettings } from '../../../features/shop-settings';

export function ShopSettingsRoute() {
  const settings = useShopSettings();
  return (
    <>
      <PageHeader title="Shop settings" subtitle="Rates, units, the final-check rule, chain limits and the look of your reports." />
      <QueryState isLoading={settings.isLoading} error={settings.error} />
      {settings.data && <ShopSettingsForm settings={settings.data} />}
    </>
  );
}
