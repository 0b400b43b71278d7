import { z } from 'zod';
import { IdSchema, IsoDateTimeSchema } from './common';

export const PAYMENT_STATES = ['nothing_due', 'unpaid', 'part_paid', 'paid', 'overpaid'] as const;
export const PaymentStateSchema = z.enum(PAYMENT_STATES);

/** Methods desk records at the counter; 'online' rows come only from the provider's webhook. */
export const IN_SHOP_METHODS = ['card_terminal', 'cash', 'bank_transfer'] as const;
export const PAYMENT_METHODS = ['online', ...IN_SHOP_METHODS] as const;
export const PaymentMethodSchema = z.enum(PAYMENT_METHODS);

export const BalanceDtoSchema = z.object({
  currency: z.string(),
  netMinor: z.number().int(),
  taxMinor: z.number().int(),
  grossMinor: z.number().int(),
  paidMinor: z.number().int(),
  refundedMinor: z.number().int(),
  dueMinor: z.number().int(),
  state: PaymentStateSchema,
  /** When the balance last reached zero through a payment, else null. */
  paidAt: IsoDateTimeSchema.nullable(),
});
export type BalanceDto = z.infer<typeof BalanceDtoSchema>;

export const PaymentDtoSchema = z.object({
  id: IdSchema,
  kind: z.enum(['payment', 'refund']),
  method: PaymentMethodSchema,
  amountMinor: z.number().int(),
  currency: z.string(),
  refundOf: IdSchema.nullable(),
  staff: z.object({ id: IdSchema, name: z.string() }).nullable(),
  note: z.string(),
  /** e.g. 'amount_mismatch': an online payment that did not match what was due. */
  flag: z.string().nullable(),
  /** What is left to refund of a payment (0 for a refund row). */
  refundableMinor: z.number().int(),
  at: IsoDateTimeSchema,
});
export type PaymentDto = z.infer<typeof PaymentDtoSchema>;

export const JobPaymentsSchema = z.object({ balance: BalanceDtoSchema, payments: z.array(PaymentDtoSchema) });
export type JobPayments = z.infer<typeof JobPaymentsSchema>;

const ENTER_AMOUNT = 'Enter an amount like 12.50';
const amount = z.number({ error: ENTER_AMOUNT }).int(ENTER_AMOUNT).positive(ENTER_AMOUNT).max(100_000_000);

export const RecordPaymentRequestSchema = z.object({
  method: z.enum(IN_SHOP_METHODS),
  amountMinor: amount,
  /** Who took the money; default the signed-in user. */
  takenById: IdSchema.optional(),
  note: z.string().trim().max(500).default(''),
});
export type RecordPaymentRequest = z.infer<typeof RecordPaymentRequestSchema>;

export const RefundRequestSchema = z.object({
  amountMinor: amount,
  reason: z.string().trim().min(3, 'Say why the money goes back').max(500),
});
export type RefundRequest = z.infer<typeof RefundRequestSchema>;

/** GET /owner/:token/payment: what the owner page shows about paying. */
export const OwnerPaymentSchema = z.object({
  balance: BalanceDtoSchema,
  /** The pay button shows only when the bike is ready and money is due. */
  canPay: z.boolean(),
});
export type OwnerPayment = z.infer<typeof OwnerPaymentSchema>;

export const CheckoutStartSchema = z.object({ url: z.string().url() });
export type CheckoutStart = z.infer<typeof CheckoutStartSchema>;
