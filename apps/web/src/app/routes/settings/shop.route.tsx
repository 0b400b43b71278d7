import { ComingLater } from '../../../components/coming-later';

export function ShopSettingsRoute() {
  return <ComingLater title="Shop settings" arrivesWith="the workshop records issue: labour rate, tax, currency, units and the final-check rule" />;
}
