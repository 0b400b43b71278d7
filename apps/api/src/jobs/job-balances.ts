import { DomainError } from '../core/http';

/** What the payments feature answers about money due (bound at start-up, so jobs never imports payments). */
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
export class JobBalances {
  private port: JobBalancePort | null = null;

  use(port: JobBalancePort): void {
    this.port = port;
  }

  dueByJob(shopId: number, jobIds: number[]): Map<number, number> {
    return this.port && jobIds.length ? this.port.dueByJob(shopId, jobIds) : new Map<number, number>();
  }

  readyUnpaidIds(shopId: number): number[] {
    return this.port?.readyUnpaidIds(shopId) ?? [];
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
