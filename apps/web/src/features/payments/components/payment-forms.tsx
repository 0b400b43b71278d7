import { IN_SHOP_METHODS, RecordPaymentRequestSchema, RefundRequestSchema, type JobPayments, type PaymentDto } from '@benchproof/contracts';
import { majorTextToMinor } from '@benchproof/domain';
import { Alert, Button, Group, Modal, NativeSelect, Stack, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { contractResolver, formFailure, pathTable, showServerFieldErrors } from '../../../lib/form';
import { useRecordPayment, useRefund } from '../api/payments';

export const METHOD_LABELS: Record<PaymentDto['method'], string> = {
  online: 'Online card payment',
  card_terminal: 'Card terminal',
  cash: 'Cash',
  bank_transfer: 'Bank transfer',
};

type InShop = (typeof IN_SHOP_METHODS)[number];

interface RecordValues {
  method: InShop;
  amount: string;
  note: string;
}
const AMOUNT_BOX = pathTable({ amountMinor: 'amount' });
/** The typed amount in minor units; NaN when it is not an amount, so the schema refuses it. */
const minorOf = (text: string, currency: string) => majorTextToMinor(text, currency) ?? Number.NaN;

/** Desk records money taken at the counter; the amount box starts at what is due (part payments: type less). */
export function RecordPaymentForm({ jobId, data, due }: { jobId: number; data: JobPayments; due: string }) {
  const record = useRecordPayment(jobId);
  const { currency, dueMinor } = data.balance;
  const toRequest = (v: RecordValues) => ({ method: v.method, amountMinor: minorOf(v.amount, currency), note: v.note });
  const schema = RecordPaymentRequestSchema.refine((r) => r.amountMinor <= dueMinor, { path: ['amountMinor'], message: 'That is more than is due' });
  const form = useForm<RecordValues>({
    initialValues: { method: 'card_terminal', amount: due, note: '' },
    validate: contractResolver(schema, toRequest, AMOUNT_BOX),
  });
  const submit = form.onSubmit((v) =>
    record.mutate(RecordPaymentRequestSchema.parse(toRequest(v)), {
      onSuccess: () => form.setValues({ amount: '', note: '' }),
      onError: (e) => showServerFieldErrors(form, e, AMOUNT_BOX),
    }),
  );
  const failure = formFailure(record.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="sm">
        <NativeSelect
          label="How it was paid"
          size="lg"
          data={IN_SHOP_METHODS.map((m) => ({ value: m, label: METHOD_LABELS[m] }))}
          {...form.getInputProps('method')}
        />
        <TextInput label={`Amount (${currency})`} size="lg" inputMode="decimal" {...form.getInputProps('amount')} />
        <TextInput label="Note (optional)" size="lg" {...form.getInputProps('note')} />
        {failure && <Alert color="red">{failure}</Alert>}
        <Button type="submit" size="lg" loading={record.isPending}>
          Record payment
        </Button>
      </Stack>
    </form>
  );
}

/** A manager gives money back against one payment; a reason is required and goes into the audit log. */
export function RefundDialog({ jobId, payment, currency, onClose }: { jobId: number; payment: PaymentDto | null; currency: string; onClose: () => void }) {
  const refund = useRefund(jobId);
  const toRequest = (v: { amount: string; reason: string }) => ({ amountMinor: minorOf(v.amount, currency), reason: v.reason });
  const left = payment?.refundableMinor ?? 0;
  const schema = RefundRequestSchema.refine((r) => r.amountMinor <= left, { path: ['amountMinor'], message: 'More than is left of this payment' });
  const form = useForm({ initialValues: { amount: '', reason: '' }, validate: contractResolver(schema, toRequest, AMOUNT_BOX) });
  const close = () => (form.reset(), onClose());
  const submit = form.onSubmit((v) => {
    if (!payment) return;
    refund.mutate(
      { paymentId: payment.id, body: RefundRequestSchema.parse(toRequest(v)) },
      { onSuccess: close, onError: (e) => showServerFieldErrors(form, e, AMOUNT_BOX) },
    );
  });
  const failure = formFailure(refund.error);
  return (
    <Modal opened={payment !== null} onClose={close} title="Refund" centered>
      <form onSubmit={submit} noValidate>
        <Stack gap="sm">
          <TextInput label={`Amount (${currency})`} size="lg" inputMode="decimal" {...form.getInputProps('amount')} />
          <Textarea label="Reason" size="lg" autosize minRows={2} {...form.getInputProps('reason')} />
          {failure && <Alert color="red">{failure}</Alert>}
          <Group justify="flex-end">
            <Button variant="default" size="lg" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" color="red" size="lg" loading={refund.isPending}>
              Refund
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
