import { formatMoney } from '@benchproof/domain';
import { emailKit, renderHtml } from './email-kit';
import { MailFrame, Paragraphs } from './frame';
import { type RenderedMail, type ShopBrand, textFrame } from './layout';

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

/** The amounts, one row each, the total (third row) in bold under a rule. */
function Amounts({ rows }: { rows: [string, string][] }) {
  const { Section, Row, Column } = emailKit();
  return (
    <Section style={{ margin: '0 0 14px' }}>
      {rows.map(([label, amount], i) => {
        const total = i === 2 ? { fontWeight: 'bold', borderTop: '1px solid #cccccc' } : {};
        return (
          <Row key={i} style={total}>
            <Column style={{ padding: '6px 0', fontSize: '16px' }}>{label}</Column>
            <Column style={{ padding: '6px 0', fontSize: '16px', textAlign: 'right' }}>{amount}</Column>
          </Row>
        );
      })}
    </Section>
  );
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
  const after = [...taxLine, 'Keep this e-mail as your receipt.'];
  const text = textFrame(input.shop, [...lines, rows.map(([k, v]) => `${k}: ${v}`).join('\n'), ...after]);
  const html = renderHtml(
    <MailFrame shop={input.shop} title={subject} preview={lines[1]}>
      <Paragraphs lines={lines} />
      <Amounts rows={rows} />
      <Paragraphs lines={after} />
    </MailFrame>,
  );
  return { subject, text, html };
}
