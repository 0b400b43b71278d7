export { ConsentModule } from './consent.module';
export { ConsentService, type ConsentSource } from './consent.service';
