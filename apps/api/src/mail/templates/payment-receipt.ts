import { formatMoney } from '@benchproof/domain';
import { esc, htmlFrame, paragraphs, type RenderedMail, type ShopBrand, textFrame } from './layout';

export interface ReceiptLine {
  label: string;
  amountMinor: number;
}

export interface PaymentReceiptInput {
  shop: ShopBrand & { taxNumber: string; currency: string };
  ownerName: string;
  jobNumber: string;
  bikeLabel: string;
  /** Net, tax, total, then each payment and refund. */
  netMinor: number;
  taxMinor: number;
  grossMinor: number;
  payments: ReceiptLine[];
  paidOn: string;
}

/** "Paid, thank you": what was charged, tax, how it was paid, and the shop's tax number when it has one. */
export function paymentReceiptMail(input: PaymentReceiptInput): RenderedMail {
  const money = (minor: number) => formatMoney(minor, input.shop.currency);
  const subject = `Receipt: job ${input.jobNumber} paid in full`;
  const rows: [string, string][] = [
    ['Work (before tax)', money(input.netMinor)],
    ['Tax', money(input.taxMinor)],
    ['Total', money(input.grossMinor)],
    ...input.payments.map((p): [string, string] => [p.label, money(p.amountMinor)]),
  ];
  const lines = [`Hello ${input.ownerName},`, `Thank you: the work on your ${input.bikeLabel} (job ${input.jobNumber}) was paid in full on ${input.paidOn}.`];
  const taxLine = input.shop.taxNumber.trim() ? [`Tax number: ${input.shop.taxNumber.trim()}`] : [];
  const text = textFrame(input.shop, [...lines, rows.map(([k, v]) => `${k}: ${v}`).join('\n'), ...taxLine, 'Keep this e-mail as your receipt.']);
  const table =
    `<table role="presentation" cellpadding="6" style="border-collapse:collapse;width:100%">` +
    rows
      .map(
        ([k, v], i) =>
          `<tr${i === 2 ? ' style="font-weight:bold;border-top:1px solid #ccc"' : ''}><td>${esc(k)}</td><td style="text-align:right">${esc(v)}</td></tr>`,
      )
      .join('') +
    `</table>`;
  const html = htmlFrame(input.shop, subject, paragraphs(lines) + table + paragraphs([...taxLine, 'Keep this e-mail as your receipt.']));
  return { subject, text, html };
}
