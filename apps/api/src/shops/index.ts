export { ShopsModule } from './shops.module';
export { ShopsService } from './shops.service';
