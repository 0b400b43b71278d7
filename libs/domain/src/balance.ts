import { requireInteger } from './numeric';
import { roundMinor, taxMinor } from './money';

/*
 * What a job owes. Charges are net amounts (each already rounded the way its own
 * line is printed), each with the tax rate it was quoted at. Tax is charged ONCE
 * per rate on the summed net, never per line, with the one rounding rule of
 * money.ts (half away from zero). Payments lower what is due, refunds raise it.
 */

/** One charged item: its net in minor units and the tax rate (basis points) it was quoted at. */
export interface Charge {
  readonly netMinor: number;
  readonly taxRateBp: number;
}

export interface BalanceInput {
  readonly charges: readonly Charge[];
  /** Amounts received, positive minor units. */
  readonly paymentsMinor: readonly number[];
  /** Amounts given back, positive minor units. */
  readonly refundsMinor: readonly number[];
}

export interface Balance {
  readonly netMinor: number;
  readonly taxMinor: number;
  readonly grossMinor: number;
  readonly paidMinor: number;
  readonly refundedMinor: number;
  /** gross − paid + refunded; negative when the shop owes the owner money back. */
  readonly dueMinor: number;
}

export type PaymentState = 'nothing_due' | 'unpaid' | 'part_paid' | 'paid' | 'overpaid';

/** Logged bench time charged at an hourly rate: minutes × rate / 60, rounded once (7 min at 60.00/h = 7.00). */
export function workChargeMinor(minutes: number, rateMinorPerHour: number): number {
  requireInteger('minutes', minutes, { min: 0 });
  requireInteger('labour rate', rateMinorPerHour, { min: 0 });
  return roundMinor(minutes * rateMinorPerHour, 60);
}

const sum = (values: readonly number[], name: string): number =>
  values.reduce((total, v) => {
    requireInteger(name, v, { min: 0 });
    return total + v;
  }, 0);

/** The job's balance: nets summed per tax rate, tax once per rate on that sum, then payments and refunds. */
export function jobBalance(input: BalanceInput): Balance {
  const netByRate = new Map<number, number>();
  for (const c of input.charges) {
    requireInteger('charge', c.netMinor, { min: 0 });
    netByRate.set(c.taxRateBp, (netByRate.get(c.taxRateBp) ?? 0) + c.netMinor);
  }
  let net = 0;
  let tax = 0;
  for (const [rate, rateNet] of netByRate) {
    net += rateNet;
    tax += taxMinor(rateNet, rate);
  }
  const paid = sum(input.paymentsMinor, 'payment');
  const refunded = sum(input.refundsMinor, 'refund');
  const gross = net + tax;
  return { netMinor: net, taxMinor: tax, grossMinor: gross, paidMinor: paid, refundedMinor: refunded, dueMinor: gross - paid + refunded };
}

/** How the job stands for desk and the owner page. */
export function paymentState(b: Pick<Balance, 'grossMinor' | 'paidMinor' | 'refundedMinor' | 'dueMinor'>): PaymentState {
  if (b.dueMinor < 0) return 'overpaid';
  if (b.grossMinor === 0 && b.paidMinor - b.refundedMinor === 0) return 'nothing_due';
  if (b.dueMinor === 0) return 'paid';
  return b.paidMinor - b.refundedMinor > 0 ? 'part_paid' : 'unpaid';
}
