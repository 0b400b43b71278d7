import { Inject, Injectable } from '@nestjs/common';
import type { BalanceDto, JobPayments, PaymentDto, RecordPaymentRequest, RefundRequest } from '@benchproof/contracts';
import { randomUUID } from 'node:crypto';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { UnitOfWork } from '../core/db';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { PAYMENT_PROVIDER, PaymentProviderError, type PaymentProvider } from '../infra/payments';
import type { DbTx } from '../core/db';
import { JobAccess } from '../jobs';
import { MailService } from '../mail';
import { UsersService } from '../users';
import { BalanceService } from './balance.service';
import { type NewPaymentRow, PaymentsRepository, type PaymentRow } from './payments.repository';

type Actor = Pick<AuthUser, 'id' | 'shopId'>;

const METHOD_LABEL: Record<PaymentRow['method'], string> = {
  online: 'Paid online by card',
  card_terminal: 'Paid by card in the shop',
  cash: 'Paid in cash',
  bank_transfer: 'Paid by bank transfer',
};

/** Money in and out of a job: in-shop payments, refunds, online payments from the webhook, and the receipt. */
@Injectable()
export class PaymentsService {
  constructor(
    private readonly uow: UnitOfWork,
    private readonly repo: PaymentsRepository,
    private readonly balances: BalanceService,
    private readonly access: JobAccess,
    private readonly users: UsersService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    @Inject(PAYMENT_PROVIDER) private readonly provider: PaymentProvider,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  forJob(actor: Actor, jobId: number): JobPayments {
    this.access.read(actor, jobId);
    const rows = this.repo.paymentsOf(actor.shopId, [jobId]);
    const names = this.repo.staffNames(actor.shopId, [...new Set(rows.map((r) => r.staffId).filter((x): x is number => x !== null))]);
    return { balance: this.balances.balance(actor.shopId, jobId), payments: rows.map((r) => this.toDto(r, rows, names)) };
  }

  /** Desk records money taken at the counter; part payments are allowed, more than is due is not. */
  recordInShop(actor: AuthUser, jobId: number, input: RecordPaymentRequest): JobPayments {
    this.access.read(actor, jobId);
    const takenBy = input.takenById ?? actor.id;
    if (input.takenById) this.users.get(actor, input.takenById);
    this.uow.run((tx) => {
      const before = this.balances.balance(actor.shopId, jobId, tx);
      if (before.dueMinor <= 0) throw new DomainError('NOTHING_DUE');
      if (input.amountMinor > before.dueMinor)
        throw new DomainError('VALIDATION_FAILED', 'That is more than is due.', {
          issues: [{ path: ['amountMinor'], message: 'More than is due' }],
          dueMinor: before.dueMinor,
        });
      const row = this.insertRow(
        {
          shopId: actor.shopId,
          jobId,
          kind: 'payment',
          method: input.method,
          amountMinor: input.amountMinor,
          currency: before.currency,
          staffId: takenBy,
          note: input.note,
        },
        tx,
      );
      const details = { jobId, method: input.method, amountMinor: input.amountMinor, takenBy };
      this.audit.record(actor, { action: 'payment.recorded', entityType: 'payment', entityId: row.id, details });
    });
    return this.forJob(actor, jobId);
  }

  /** A manager gives money back against one payment, with a reason; online ones through the provider first. */
  async refund(actor: Actor, jobId: number, paymentId: number, input: RefundRequest): Promise<JobPayments> {
    this.access.read(actor, jobId);
    const payment = this.repo.find(actor.shopId, paymentId);
    if (!payment || payment.jobId !== jobId || payment.kind !== 'payment') throw notFound('Payment');
    const rows = this.repo.paymentsOf(actor.shopId, [jobId]);
    if (input.amountMinor > refundable(payment, rows)) throw new DomainError('REFUND_TOO_LARGE', undefined, { refundableMinor: refundable(payment, rows) });
    let providerRef: string | null = null;
    if (payment.method === 'online' && payment.providerRef) {
      const key = `refund-${payment.id}-${input.amountMinor}-${rows.filter((r) => r.refundOf === payment.id).length}`;
      providerRef = await this.provider.refund(payment.providerRef, input.amountMinor, key).catch((e: unknown) => {
        throw new DomainError('PAYMENT_PROVIDER_ERROR', undefined, { reason: e instanceof PaymentProviderError ? e.message : String(e) });
      });
    }
    this.uow.run((tx) => {
      const row = this.insertRow(
        {
          shopId: actor.shopId,
          jobId,
          kind: 'refund',
          method: payment.method,
          amountMinor: input.amountMinor,
          currency: payment.currency,
          refundOf: payment.id,
          staffId: actor.id,
          note: input.reason,
          providerRef,
        },
        tx,
      );
      const details = { jobId, paymentId, amountMinor: input.amountMinor, reason: input.reason, method: payment.method, providerRef };
      this.audit.record(actor, { action: 'payment.refunded', entityType: 'payment', entityId: row.id, details });
    });
    return this.forJob(actor, jobId);
  }

  /**
   * An online payment from a verified webhook. Returns null when this payment was recorded before
   * (a replay). An amount that differs from what was due is recorded AND flagged for desk.
   */
  recordOnline(
    scope: { shopId: number },
    jobId: number,
    p: { paymentRef: string; amountMinor: number; currency: string; expectedMinor: number },
    tx: DbTx,
  ): PaymentRow | null {
    const before = this.balances.balance(scope.shopId, jobId, tx);
    const mismatch = p.amountMinor !== before.dueMinor;
    const row = this.repo.insert(
      {
        ...{ shopId: scope.shopId, jobId, kind: 'payment', method: 'online', amountMinor: p.amountMinor, currency: p.currency.toUpperCase() },
        ...{ staffId: null, providerRef: p.paymentRef, flag: mismatch ? 'amount_mismatch' : null, at: this.clock.now() },
        note: mismatch ? `Paid ${p.amountMinor} when ${before.dueMinor} was due (checkout opened for ${p.expectedMinor})` : '',
      },
      tx,
    );
    if (!row) return null;
    const details = {
      jobId,
      amountMinor: p.amountMinor,
      dueMinor: before.dueMinor,
      providerRef: p.paymentRef,
      ...(mismatch ? { flag: 'amount_mismatch' } : {}),
    };
    this.audit.record({ shopId: scope.shopId, id: null }, { action: 'payment.received_online', entityType: 'payment', entityId: row.id, details });
    this.afterPayment(scope.shopId, jobId, before, tx);
    return row;
  }

  private insertRow(row: Omit<NewPaymentRow, 'at'>, tx: DbTx): PaymentRow {
    const inserted = this.repo.insert({ ...row, providerRef: row.providerRef ?? `local-${randomUUID()}`, at: this.clock.now() }, tx);
    if (!inserted) throw new Error('A local payment reference collided');
    if (row.kind === 'payment') this.afterPayment(row.shopId, row.jobId, null, tx);
    return inserted;
  }

  /** When a payment settles the job, the receipt goes into the outbox in the same transaction. */
  private afterPayment(shopId: number, jobId: number, before: BalanceDto | null, tx: DbTx): void {
    const now = this.balances.balance(shopId, jobId, tx);
    if (now.state !== 'paid' || before?.state === 'paid') return;
    const rows = this.repo.paymentsOf(shopId, [jobId], tx);
    const lines = rows.map((r) => ({
      label: r.kind === 'refund' ? 'Refunded' : METHOD_LABEL[r.method],
      amountMinor: r.kind === 'refund' ? -r.amountMinor : r.amountMinor,
    }));
    this.mail.queueReceipt({ shopId }, jobId, { ...now, payments: lines, paidAt: this.clock.now() }, tx);
  }

  private toDto(r: PaymentRow, all: PaymentRow[], names: Map<number, string>): PaymentDto {
    return {
      ...{ id: r.id, kind: r.kind, method: r.method, amountMinor: r.amountMinor, currency: r.currency, refundOf: r.refundOf ?? null },
      staff: r.staffId ? { id: r.staffId, name: names.get(r.staffId) ?? '' } : null,
      ...{ note: r.note, flag: r.flagClearedAt ? null : r.flag, refundableMinor: r.kind === 'payment' ? refundable(r, all) : 0, at: r.at.toISOString() },
    };
  }
}

/** What is left of a payment to give back. */
function refundable(payment: PaymentRow, all: PaymentRow[]): number {
  return payment.amountMinor - all.filter((r) => r.refundOf === payment.id).reduce((t, r) => t + r.amountMinor, 0);
}
