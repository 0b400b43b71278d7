export { shopSettingsQuery, useShopSettings } from './api/shop-settings';
export { ShopSettingsForm } from './components/shop-settings-form';
