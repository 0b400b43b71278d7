import { Global, Injectable, Module } from '@nestjs/common';
import { JOB_BALANCES, type JobBalancePort } from '../jobs';
import { ShopsModule } from '../shops';
import { BalanceService } from './balance.service';
import { PaymentsRepository } from './payments.repository';

/** The payments feature's answer to the jobs feature's JOB_BALANCES port. */
@Injectable()
export class PaymentsJobBalances implements JobBalancePort {
  constructor(private readonly balances: BalanceService) {}

  dueByJob(shopId: number, jobIds: number[]): Map<number, number> {
    return new Map([...this.balances.balances(shopId, jobIds)].map(([id, b]) => [id, b.dueMinor]));
  }

  readyUnpaidIds(shopId: number): number[] {
    return this.balances.readyUnpaidIds(shopId);
  }
}

/**
 * Balances, and the JOB_BALANCES port they provide. Global because the port is declared below payments: JobsModule
 * receives it by injection without importing payments (a module import would be a cycle). Only the port and
 * BalanceService are exported.
 */
@Global()
@Module({
  imports: [ShopsModule],
  providers: [PaymentsRepository, BalanceService, PaymentsJobBalances, { provide: JOB_BALANCES, useExisting: PaymentsJobBalances }],
  exports: [BalanceService, JOB_BALANCES],
})
export class BalanceModule {}
