import { Inject, Injectable } from '@nestjs/common';
import type { BalanceDto } from '@benchproof/contracts';
import { estimateTotals, jobBalance, paymentState, workChargeMinor, type Charge } from '@benchproof/domain';
import { ShopsService } from '../shops';
import type { DbTx } from '../core/db';
import { type ChargedRecommendation, PaymentsRepository, type PaymentRow } from './payments.repository';

/** A recommendation's net: each line rounded as printed (libs/domain estimateTotals), tax left to the balance. */
const recommendationNet = (r: ChargedRecommendation): number =>
  estimateTotals(
    [
      ...r.parts.map((p) => ({ kind: 'part' as const, qty: p.qty, unitPriceMinor: p.unitPriceMinor })),
      { kind: 'labour', hours: r.labourHundredths / 100, rateMinorPerHour: r.labourRateMinor },
    ],
    0,
  ).netMinor;

/** When the payments brought the balance to zero (or below), for "paid on …". */
function paidAt(gross: number, rows: PaymentRow[]): Date | null {
  let net = 0;
  let at: Date | null = null;
  for (const p of rows) {
    net += p.kind === 'payment' ? p.amountMinor : -p.amountMinor;
    if (gross > 0 && net >= gross && at === null) at = p.at;
    if (net < gross) at = null;
  }
  return at;
}

/** Balances of jobs from approved work, chargeable bench time, payments and refunds (libs/domain jobBalance). */
@Injectable()
export class BalanceService {
  constructor(
    private readonly repo: PaymentsRepository,
    @Inject(ShopsService) private readonly shops: ShopsService,
  ) {}

  balances(shopId: number, jobIds: number[], tx?: DbTx): Map<number, BalanceDto> {
    const out = new Map<number, BalanceDto>();
    if (!jobIds.length) return out;
    const shop = this.shops.settings(shopId);
    const charges = new Map<number, Charge[]>(jobIds.map((id) => [id, []]));
    for (const r of this.repo.approvedRecommendations(shopId, jobIds)) charges.get(r.jobId)?.push({ netMinor: recommendationNet(r), taxRateBp: r.taxRateBp });
    for (const w of this.repo.chargedWork(shopId, jobIds))
      charges.get(w.jobId)?.push({ netMinor: workChargeMinor(w.minutes, w.rateMinor), taxRateBp: shop.taxRateBp });
    const rows = this.repo.paymentsOf(shopId, jobIds, tx);
    for (const id of jobIds) {
      const mine = rows.filter((p) => p.jobId === id);
      const b = jobBalance({
        charges: charges.get(id) ?? [],
        paymentsMinor: mine.filter((p) => p.kind === 'payment').map((p) => p.amountMinor),
        refundsMinor: mine.filter((p) => p.kind === 'refund').map((p) => p.amountMinor),
      });
      const at = paidAt(b.grossMinor, mine);
      out.set(id, { ...b, currency: shop.currency, state: paymentState(b), paidAt: b.dueMinor <= 0 && at ? at.toISOString() : null });
    }
    return out;
  }

  balance(shopId: number, jobId: number, tx?: DbTx): BalanceDto {
    return this.balances(shopId, [jobId], tx).get(jobId)!;
  }

  readyUnpaidIds(shopId: number): number[] {
    const ready = this.repo.readyJobIds(shopId);
    return [...this.balances(shopId, ready)].filter(([, b]) => b.dueMinor > 0).map(([id]) => id);
  }
}
