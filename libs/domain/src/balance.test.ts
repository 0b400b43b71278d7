import { bignumber } from 'mathjs';
import { DomainInputError } from './errors';
import { jobBalance, paymentState, workChargeMinor, type Charge } from './balance';

/**
 * Oracle: exact decimal arithmetic with mathjs BigNumber (decimal.js), rounded with
 * decimal.js ROUND_HALF_UP (= 4, halves away from zero), the rule of money.ts. Every
 * row was also worked by hand; the working is in the row's comment.
 */
const ROUND_HALF_UP = 4;
const exactTax = (net: number, bp: number): number => bignumber(net).times(bp).div(10_000).toDecimalPlaces(0, ROUND_HALF_UP).toNumber();

describe('workChargeMinor: minutes × hourly rate / 60, rounded once', () => {
  it.each([
    { minutes: 60, rate: 6000, out: 6000 }, // 1 h at 60.00
    { minutes: 7, rate: 6000, out: 700 }, // 7/60 × 6000 = 700 exactly
    { minutes: 7, rate: 4550, out: 531 }, // 7 × 4550 / 60 = 530.8333… → 531
    { minutes: 3, rate: 4550, out: 228 }, // 227.5: a half, away from zero → 228
    { minutes: 1, rate: 4999, out: 83 }, // 83.3166… → 83
    { minutes: 0, rate: 4550, out: 0 },
  ])('$minutes min at $rate/h → $out', ({ minutes, rate, out }) => {
    expect(workChargeMinor(minutes, rate)).toBe(out);
    expect(workChargeMinor(minutes, rate)).toBe(bignumber(minutes).times(rate).div(60).toDecimalPlaces(0, ROUND_HALF_UP).toNumber());
  });

  it('refuses fractional minutes and negative rates', () => {
    expect(() => workChargeMinor(1.5, 6000)).toThrow(DomainInputError);
    expect(() => workChargeMinor(10, -1)).toThrow(DomainInputError);
  });
});

const c = (netMinor: number, taxRateBp: number): Charge => ({ netMinor, taxRateBp });

describe('jobBalance: tax once on the net, then payments and refunds', () => {
  it.each([
    {
      name: 'two charges at 20 %: tax on the summed net, not per line',
      // 1002 + 1002 at 20 %: per line 200.4 → 200 each = 400; on the net 0.2 × 2004 = 400.8 → 401
      charges: [c(1002, 2000), c(1002, 2000)],
      payments: [],
      refunds: [],
      out: { netMinor: 2004, taxMinor: 401, grossMinor: 2405, paidMinor: 0, refundedMinor: 0, dueMinor: 2405 },
    },
    {
      name: 'a half of a minor unit rounds away from zero',
      // 0.19 × 2450 = 465.5 → 466
      charges: [c(2450, 1900)],
      payments: [],
      refunds: [],
      out: { netMinor: 2450, taxMinor: 466, grossMinor: 2916, paidMinor: 0, refundedMinor: 0, dueMinor: 2916 },
    },
    {
      name: 'part payment leaves the rest due',
      // 4500 + 1838 = 6338; 0.2 × 6338 = 1267.6 → 1268; gross 7606; paid 5000 → 2606 due
      charges: [c(4500, 2000), c(1838, 2000)],
      payments: [5000],
      refunds: [],
      out: { netMinor: 6338, taxMinor: 1268, grossMinor: 7606, paidMinor: 5000, refundedMinor: 0, dueMinor: 2606 },
    },
    {
      name: 'paid in full, then a refund makes that much due again',
      // 0.2 × 10000 = 2000; gross 12000; paid 12000; refunded 1500 → 1500 due
      charges: [c(10000, 2000)],
      payments: [7000, 5000],
      refunds: [1500],
      out: { netMinor: 10000, taxMinor: 2000, grossMinor: 12000, paidMinor: 12000, refundedMinor: 1500, dueMinor: 1500 },
    },
    {
      name: 'two tax rates: tax once per rate on that rate’s net',
      // 20 %: 0.2 × (333 + 333) = 133.2 → 133; 5 %: 0.05 × 999 = 49.95 → 50; tax 183; gross 1665 + 183 = 1848
      charges: [c(333, 2000), c(999, 500), c(333, 2000)],
      payments: [],
      refunds: [],
      out: { netMinor: 1665, taxMinor: 183, grossMinor: 1848, paidMinor: 0, refundedMinor: 0, dueMinor: 1848 },
    },
    {
      name: 'overpaid: the shop owes the difference',
      charges: [c(1000, 0)],
      payments: [1200],
      refunds: [],
      out: { netMinor: 1000, taxMinor: 0, grossMinor: 1000, paidMinor: 1200, refundedMinor: 0, dueMinor: -200 },
    },
    {
      name: 'nothing charged, nothing due',
      charges: [],
      payments: [],
      refunds: [],
      out: { netMinor: 0, taxMinor: 0, grossMinor: 0, paidMinor: 0, refundedMinor: 0, dueMinor: 0 },
    },
  ])('$name', ({ charges, payments, refunds, out }) => {
    const b = jobBalance({ charges, paymentsMinor: payments, refundsMinor: refunds });
    expect(b).toEqual(out);
    // Cross-check the tax with decimal.js, rate by rate.
    const rates = [...new Set(charges.map((x) => x.taxRateBp))];
    const oracle = rates.reduce(
      (t, r) =>
        t +
        exactTax(
          charges.filter((x) => x.taxRateBp === r).reduce((s, x) => s + x.netMinor, 0),
          r,
        ),
      0,
    );
    expect(b.taxMinor).toBe(oracle);
  });

  it('refuses negative or fractional amounts', () => {
    expect(() => jobBalance({ charges: [c(-1, 0)], paymentsMinor: [], refundsMinor: [] })).toThrow(DomainInputError);
    expect(() => jobBalance({ charges: [], paymentsMinor: [10.5], refundsMinor: [] })).toThrow(DomainInputError);
  });
});

describe('paymentState', () => {
  it.each([
    { gross: 0, paid: 0, refunded: 0, due: 0, out: 'nothing_due' },
    { gross: 1000, paid: 0, refunded: 0, due: 1000, out: 'unpaid' },
    { gross: 1000, paid: 400, refunded: 0, due: 600, out: 'part_paid' },
    { gross: 1000, paid: 1000, refunded: 0, due: 0, out: 'paid' },
    { gross: 1000, paid: 1000, refunded: 1000, due: 1000, out: 'unpaid' },
    { gross: 1000, paid: 1200, refunded: 0, due: -200, out: 'overpaid' },
  ])('$gross gross, $paid paid, $refunded refunded → $out', ({ gross, paid, refunded, due, out }) => {
    expect(paymentState({ grossMinor: gross, paidMinor: paid, refundedMinor: refunded, dueMinor: due })).toBe(out);
  });
});
