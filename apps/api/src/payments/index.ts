export { PaymentsModule } from './payments.module';
export { PaymentsService } from './payments.service';
export { BalanceService } from './balance.service';
