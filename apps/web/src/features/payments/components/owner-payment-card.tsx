import { formatMoney } from '@benchproof/domain';
import { Alert, Button, Card, Stack, Text, Title } from '@mantine/core';
import { useDates } from '../../../lib/dates';
import { formFailure } from '../../../lib/messages';
import { useOwnerPayment, useStartCheckout } from '../api/payments';

/**
 * The owner page's payment card: the amount due and a pay button once the bike is ready, "paid" with
 * the date afterwards. Coming back from the checkout records nothing: the card waits for the shop's
 * records to show the payment (the provider's signed notice), polling for a short while.
 */
export function OwnerPaymentCard({ token, returned }: { token: string; returned: 'done' | 'cancelled' | null }) {
  const dates = useDates();
  const q = useOwnerPayment(token, returned === 'done');
  const start = useStartCheckout(token);
  const b = q.data?.balance;
  if (!b || b.state === 'nothing_due') return null;
  const failure = formFailure(start.error);
  return (
    <Card withBorder padding="md" data-testid="owner-payment">
      <Stack gap="xs">
        <Title order={2} size="h3">
          Payment
        </Title>
        {b.state === 'paid' || b.dueMinor <= 0 ? (
          <Text fw={700} c="teal" role="status" data-testid="paid-status">
            Paid{b.paidAt ? ` on ${dates.date(b.paidAt)}` : ''}. Thank you!
          </Text>
        ) : (
          <>
            <Text>
              Amount due: <b>{formatMoney(b.dueMinor, b.currency)}</b>
            </Text>
            {returned === 'done' && <Text role="status">Checking your payment with the card service…</Text>}
            {returned === 'cancelled' && <Text>You left the payment page; nothing was charged.</Text>}
            {q.data?.canPay ? (
              <Button size="lg" mih={52} onClick={() => start.mutate()} loading={start.isPending}>
                Pay {formatMoney(b.dueMinor, b.currency)} by card
              </Button>
            ) : (
              <Text size="sm" c="dimmed">
                You can pay here once your bike is ready to collect.
              </Text>
            )}
            {failure && <Alert color="red">{failure}</Alert>}
          </>
        )}
      </Stack>
    </Card>
  );
}
