import { IN_SHOP_METHODS, type JobPayments, type PaymentDto } from '@benchproof/contracts';
import { majorTextToMinor } from '@benchproof/domain';
import { Alert, Button, Group, Modal, NativeSelect, Stack, TextInput, Textarea } from '@mantine/core';
import { useState } from 'react';
import { formFailure } from '../../../lib/form';
import { useRecordPayment, useRefund } from '../api/payments';

export const METHOD_LABELS: Record<PaymentDto['method'], string> = {
  online: 'Online card payment',
  card_terminal: 'Card terminal',
  cash: 'Cash',
  bank_transfer: 'Bank transfer',
};

type InShop = (typeof IN_SHOP_METHODS)[number];

/** Desk records money taken at the counter; the amount box starts at what is due (part payments: type less). */
export function RecordPaymentForm({ jobId, data, due }: { jobId: number; data: JobPayments; due: string }) {
  const record = useRecordPayment(jobId);
  const [method, setMethod] = useState<InShop>('card_terminal');
  const [amount, setAmount] = useState(due);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  const submit = () => {
    const minor = majorTextToMinor(amount, data.balance.currency);
    if (minor === null || minor <= 0) return setError('Enter an amount like 12.50');
    if (minor > data.balance.dueMinor) return setError('That is more than is due');
    setError(null);
    record.mutate({ method, amountMinor: minor, note }, { onSuccess: (d) => (setNote(''), setAmount(d.balance.dueMinor > 0 ? '' : '')) });
  };
  const failure = formFailure(record.error);
  return (
    <Stack gap="sm">
      <NativeSelect
        label="How it was paid"
        size="lg"
        value={method}
        onChange={(e) => setMethod(e.currentTarget.value as InShop)}
        data={IN_SHOP_METHODS.map((m) => ({ value: m, label: METHOD_LABELS[m] }))}
      />
      <TextInput
        label={`Amount (${data.balance.currency})`}
        size="lg"
        inputMode="decimal"
        value={amount}
        onChange={(e) => setAmount(e.currentTarget.value)}
        error={error}
      />
      <TextInput label="Note (optional)" size="lg" value={note} onChange={(e) => setNote(e.currentTarget.value)} />
      {failure && <Alert color="red">{failure}</Alert>}
      <Button size="lg" onClick={submit} loading={record.isPending}>
        Record payment
      </Button>
    </Stack>
  );
}

/** A manager gives money back against one payment; a reason is required and goes into the audit log. */
export function RefundDialog({ jobId, payment, currency, onClose }: { jobId: number; payment: PaymentDto | null; currency: string; onClose: () => void }) {
  const refund = useRefund(jobId);
  const [amount, setAmount] = useState('');
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const submit = () => {
    if (!payment) return;
    const minor = majorTextToMinor(amount, currency);
    if (minor === null || minor <= 0) return setError('Enter an amount like 12.50');
    if (minor > payment.refundableMinor) return setError('More than is left of this payment');
    if (reason.trim().length < 3) return setError('Say why the money goes back');
    setError(null);
    refund.mutate({ paymentId: payment.id, body: { amountMinor: minor, reason } }, { onSuccess: () => (setAmount(''), setReason(''), onClose()) });
  };
  const failure = formFailure(refund.error);
  return (
    <Modal opened={payment !== null} onClose={onClose} title="Refund" centered>
      <Stack gap="sm">
        <TextInput label={`Amount (${currency})`} size="lg" inputMode="decimal" value={amount} onChange={(e) => setAmount(e.currentTarget.value)} />
        <Textarea label="Reason" size="lg" autosize minRows={2} value={reason} onChange={(e) => setReason(e.currentTarget.value)} />
        {(error || failure) && <Alert color="red">{error ?? failure}</Alert>}
        <Group justify="flex-end">
          <Button variant="default" size="lg" onClick={onClose}>
            Cancel
          </Button>
          <Button color="red" size="lg" onClick={submit} loading={refund.isPending}>
            Refund
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
