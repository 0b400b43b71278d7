import type { OwnerFinding } from '@benchproof/contracts';
import { DECLINED_SAFETY_NOTICE, formatMoney, INSPECTION_AREA_LABELS } from '@benchproof/domain';
import { Alert, Button, Checkbox, Group, List, Modal, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import type { ApiError } from '../../../lib/api-client';
import { useOwnerDecisions } from '../api/owner-page';
import type { Choice } from './use-choices';

interface Props {
  token: string;
  opened: boolean;
  onClose: () => void;
  onDone: () => void;
  onPriceChanged: () => void;
  chosen: OwnerFinding[];
  choices: Record<number, Choice>;
  approvedMinor: number;
  currency: string;
}

/** Last look before the answers go to the shop; a declined safety item needs its own tick. */
export function ConfirmDecisions({ token, opened, onClose, onDone, onPriceChanged, chosen, choices, approvedMinor, currency }: Props) {
  const send = useOwnerDecisions(token);
  const [safetyOk, setSafetyOk] = useState<Record<number, boolean>>({});
  const declinedSafety = chosen.filter((f) => f.recommendation?.urgency === 'safety' && choices[f.recommendation.id] === 'declined');
  const ready = declinedSafety.every((f) => safetyOk[f.id]);
  const err = send.error as ApiError | null;

  const submit = () => {
    const items = chosen.flatMap((f) => {
      const rec = f.recommendation;
      if (!rec) return [];
      const status = choices[rec.id];
      return [
        {
          recommendationId: rec.id,
          status,
          seenUpdatedAt: rec.updatedAt,
          seenGrossMinor: rec.totals.grossMinor,
          safetyConfirmed: status === 'declined' && Boolean(safetyOk[f.id]),
        },
      ];
    });
    send.mutate(
      { items },
      {
        onSuccess: onDone,
        onError: (e) => {
          if ((e as ApiError).code === 'PRICE_CHANGED') onPriceChanged();
        },
      },
    );
  };

  return (
    <Modal opened={opened} onClose={onClose} title="Send your answers to the shop?" fullScreen radius={0}>
      <Stack gap="md">
        <List spacing="xs">
          {chosen.map((f) => (
            <List.Item key={f.id}>
              <Text span fw={600}>
                {choices[f.recommendation?.id ?? 0] === 'approved' ? 'Approve' : 'Decline'}:
              </Text>{' '}
              {f.recommendation?.summary} ({INSPECTION_AREA_LABELS[f.area]})
            </List.Item>
          ))}
        </List>
        <Text size="lg">
          Approved work: <b>{formatMoney(approvedMinor, currency)}</b> including tax
        </Text>
        {declinedSafety.map((f) => (
          <SafetyDecline key={f.id} finding={f} confirmed={Boolean(safetyOk[f.id])} onConfirm={(ok) => setSafetyOk((p) => ({ ...p, [f.id]: ok }))} />
        ))}
        {err && <SendError err={err} />}
        <Group grow>
          <Button size="lg" mih={52} variant="default" onClick={onClose}>
            Back
          </Button>
          <Button size="lg" mih={52} onClick={submit} loading={send.isPending} disabled={!ready || chosen.length === 0}>
            Send answers
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}

/** A declined safety item: the caution in full and a second confirmation. */
function SafetyDecline({ finding: f, confirmed, onConfirm }: { finding: Props['chosen'][number]; confirmed: boolean; onConfirm: (ok: boolean) => void }) {
  return (
    <Alert color="red" variant="light" title={`You are declining a safety item: ${f.recommendation?.summary ?? ''}`}>
      <Stack gap="xs">
        <Text>{DECLINED_SAFETY_NOTICE}</Text>
        {f.cautions.map((c) => (
          <Text key={c} size="sm">
            {c}
          </Text>
        ))}
        <Checkbox size="lg" label="I understand, and I still decline this work" checked={confirmed} onChange={(e) => onConfirm(e.currentTarget.checked)} />
      </Stack>
    </Alert>
  );
}

/** Why the answers were not sent; a changed price names the new one. */
function SendError({ err }: { err: ApiError }) {
  return (
    <Alert color={err.code === 'PRICE_CHANGED' ? 'orange' : 'red'} title={err.code === 'PRICE_CHANGED' ? 'The price has changed' : 'Not sent'}>
      {err.code === 'PRICE_CHANGED'
        ? `${err.message} New price: ${formatMoney((err.details as { grossMinor: number }).grossMinor, (err.details as { currency: string }).currency)}. Nothing was sent; the page now shows the new price.`
        : err.message}
    </Alert>
  );
}
