export { CustomersModule } from './customers.module';
export { CustomersService } from './customers.service';
export { normalisePhone, toE164 } from './phone-number';
