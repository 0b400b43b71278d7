import type { BalanceDto, PaymentDto } from '@benchproof/contracts';
import { formatMoney, minorToMajorText } from '@benchproof/domain';
import { Alert, Badge, Button, Card, Group, Stack, Text, Title } from '@mantine/core';
import dayjs from 'dayjs';
import { useState } from 'react';
import { QueryState } from '../../../components/query-state';
import { useJobPayments } from '../api/payments';
import { METHOD_LABELS, RecordPaymentForm, RefundDialog } from './payment-forms';

export const STATE_LABELS: Record<BalanceDto['state'], string> = {
  nothing_due: 'Nothing charged yet',
  unpaid: 'Unpaid',
  part_paid: 'Part paid',
  paid: 'Paid',
  overpaid: 'Overpaid: money to give back',
};

function BalanceCard({ b }: { b: BalanceDto }) {
  const m = (v: number) => formatMoney(v, b.currency);
  return (
    <Card withBorder padding="md">
      <Group justify="space-between" align="flex-start">
        <div>
          <Text size="sm" c="dimmed">
            Balance due
          </Text>
          <Text fz={28} fw={700} data-testid="balance-due">
            {m(Math.max(0, b.dueMinor))}
          </Text>
        </div>
        <Badge size="lg" color={b.state === 'paid' ? 'teal' : b.state === 'overpaid' ? 'orange' : 'gray'}>
          {STATE_LABELS[b.state]}
        </Badge>
      </Group>
      <Text size="sm">
        Work {m(b.netMinor)} + tax {m(b.taxMinor)} = {m(b.grossMinor)} · paid {m(b.paidMinor)}
        {b.refundedMinor > 0 ? ` · refunded ${m(b.refundedMinor)}` : ''}
      </Text>
      {b.paidAt && <Text size="sm">Paid in full on {dayjs(b.paidAt).format('D MMM YYYY')}</Text>}
    </Card>
  );
}

function PaymentRow({ p, canRefund, onRefund }: { p: PaymentDto; canRefund: boolean; onRefund: () => void }) {
  const sign = p.kind === 'refund' ? '−' : '';
  return (
    <Card withBorder padding="sm">
      <Group justify="space-between" wrap="nowrap">
        <div>
          <Text fw={600}>
            {p.kind === 'refund' ? 'Refund' : METHOD_LABELS[p.method]} {sign}
            {formatMoney(p.amountMinor, p.currency)}
          </Text>
          <Text size="xs" c="dimmed">
            {dayjs(p.at).format('D MMM HH:mm')} · {p.staff?.name ?? 'owner, online'}
            {p.note ? ` · ${p.note}` : ''}
          </Text>
        </div>
        {canRefund && p.kind === 'payment' && p.refundableMinor > 0 && (
          <Button variant="light" color="red" size="md" onClick={onRefund}>
            Refund
          </Button>
        )}
      </Group>
      {p.flag === 'amount_mismatch' && (
        <Alert color="orange" mt="xs" title="Check this payment">
          The owner paid a different amount from what was due when it arrived. Refund the difference or ask for the rest.
        </Alert>
      )}
    </Card>
  );
}

/** The job's balance, its payments and refunds, and the forms for desk and managers. */
export function PaymentsPanel({ jobId, canRecord, canRefund }: { jobId: number; canRecord: boolean; canRefund: boolean }) {
  const q = useJobPayments(jobId);
  const [refunding, setRefunding] = useState<PaymentDto | null>(null);
  if (!q.data) return <QueryState isLoading={q.isLoading} error={q.error} />;
  const { balance, payments } = q.data;
  return (
    <Stack>
      <Title order={3} size="h4">
        Payment
      </Title>
      <BalanceCard b={balance} />
      {payments.map((p) => (
        <PaymentRow key={p.id} p={p} canRefund={canRefund} onRefund={() => setRefunding(p)} />
      ))}
      {canRecord && balance.dueMinor > 0 && (
        <Card withBorder padding="md" bg="gray.0">
          <RecordPaymentForm key={balance.dueMinor} jobId={jobId} data={q.data} due={minorToMajorText(balance.dueMinor, balance.currency)} />
        </Card>
      )}
      <RefundDialog jobId={jobId} payment={refunding} currency={balance.currency} onClose={() => setRefunding(null)} />
    </Stack>
  );
}
