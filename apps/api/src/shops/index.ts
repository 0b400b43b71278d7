export { ShopsModule } from './shops.module';
export { ShopsService, type ShopLogo } from './shops.service';
