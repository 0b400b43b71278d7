import type { OwnerFinding } from '@benchproof/contracts';
import { DECLINED_SAFETY_NOTICE, formatMoney, INSPECTION_AREA_LABELS } from '@benchproof/domain';
import { Alert, Button, Checkbox, Group, List, Modal, Stack, Text } from '@mantine/core';
import type { ApiError } from '../../../lib/api-client';
import type { Choice } from './use-choices';
import classes from './owner.module.css';
import { useSendDecisions } from './use-send-decisions';

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

const wrap = { root: classes.wrapButton, label: classes.wrapLabel };

/** Each answer in one line, as the owner chose it. */
function AnswerList({ chosen, choices }: { chosen: OwnerFinding[]; choices: Record<number, Choice> }) {
  return (
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
  );
}

/** Last look before the answers go to the shop; a declined safety item needs its own tick. */
export function ConfirmDecisions({ token, opened, onClose, onDone, onPriceChanged, chosen, choices, approvedMinor, currency }: Props) {
  const send = useSendDecisions({ token, chosen, choices, onDone, onPriceChanged });
  return (
    <Modal opened={opened} onClose={onClose} title="Send your answers to the shop?" fullScreen radius={0}>
      <Stack gap="md">
        <AnswerList chosen={chosen} choices={choices} />
        <Text size="lg">
          Approved work: <b>{formatMoney(approvedMinor, currency)}</b> including tax
        </Text>
        {send.declinedSafety.map((f) => (
          <SafetyDecline key={f.id} finding={f} confirmed={Boolean(send.safetyOk[f.id])} onConfirm={(ok) => send.confirmSafety(f.id, ok)} />
        ))}
        {send.error && <SendError err={send.error} />}
        <Group grow>
          <Button size="lg" variant="default" onClick={onClose} classNames={wrap}>
            Back
          </Button>
          <Button size="lg" onClick={send.submit} classNames={wrap} loading={send.sending} disabled={!send.ready || chosen.length === 0}>
            Send answers
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}

/** A declined safety item: the caution in full and a second confirmation. */
function SafetyDecline({ finding: f, confirmed, onConfirm }: { finding: OwnerFinding; confirmed: boolean; onConfirm: (ok: boolean) => void }) {
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
