import { Inject, Injectable } from '@nestjs/common';
import { DomainError } from '../core/http';

/**
 * What the jobs feature asks about money due. Jobs declares the port and the payments feature provides it
 * (payments/balance.module.ts), so the arrow points from payments to jobs and jobs never imports payments.
 */
export const JOB_BALANCES = Symbol('JOB_BALANCES');
export interface JobBalancePort {
  /** Money still due per job id (only the ids asked for). */
  dueByJob(shopId: number, jobIds: number[]): Map<number, number>;
  /** Ids of the shop's ready jobs that still have money due. */
  readyUnpaidIds(shopId: number): number[];
  /** One job's charged total, what is due and when the balance reached zero through a payment (ISO), for the report. */
  settlement(shopId: number, jobId: number): JobSettlement;
}

export interface JobSettlement {
  grossMinor: number;
  dueMinor: number;
  paidAt: string | null;
}

/** The jobs feature's view of balances: list figures, the "ready, unpaid" filter and the hand-over rule. */
@Injectable()
export class JobBalances {
  constructor(@Inject(JOB_BALANCES) private readonly port: JobBalancePort) {}

  dueByJob(shopId: number, jobIds: number[]): Map<number, number> {
    return jobIds.length ? this.port.dueByJob(shopId, jobIds) : new Map<number, number>();
  }

  readyUnpaidIds(shopId: number): number[] {
    return this.port.readyUnpaidIds(shopId);
  }

  /** Null when no payments feature is bound (nothing is known about money). */
  settlement(shopId: number, jobId: number): JobSettlement | null {
    return this.port?.settlement(shopId, jobId) ?? null;
  }

  /** Handing over with money due needs desk's reason (UNPAID_BALANCE otherwise); returns what was due. */
  requireSettled(shopId: number, jobId: number, reason: string | null | undefined): number {
    const due = this.dueByJob(shopId, [jobId]).get(jobId) ?? 0;
    if (due > 0 && !reason) throw new DomainError('UNPAID_BALANCE', undefined, { dueMinor: due });
    return due;
  }
}
