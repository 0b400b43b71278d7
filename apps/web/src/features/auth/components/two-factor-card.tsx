import type { RecoveryCodes, TotpEnrolment } from '@benchproof/contracts';
import { Alert, Badge, Button, Group, Paper, PasswordInput, Stack, Text, Title } from '@mantine/core';
import { IconShieldLock } from '@tabler/icons-react';
import { useState } from 'react';
import { useConfirmTwoFactor, useDisableTwoFactor, useStartTwoFactor, useTwoFactor } from '../api/accounts';
import { CodeInput } from './code-input';
import { RecoveryCodesCard } from './recovery-codes';
import { TotpSetup } from './totp-setup';

function Enrol({ onDone }: { onDone: (codes: RecoveryCodes) => void }) {
  const start = useStartTwoFactor();
  const confirm = useConfirmTwoFactor();
  const [code, setCode] = useState('');
  const enrolment: TotpEnrolment | undefined = start.data;
  if (!enrolment)
    return (
      <Button size="lg" leftSection={<IconShieldLock />} loading={start.isPending} onClick={() => start.mutate()}>
        Set up two-step sign-in
      </Button>
    );
  return (
    <Stack>
      <TotpSetup enrolment={enrolment} />
      <CodeInput value={code} onChange={setCode} error={confirm.error?.message} />
      <Button size="lg" loading={confirm.isPending} onClick={() => confirm.mutate(code, { onSuccess: onDone })}>
        Turn on
      </Button>
    </Stack>
  );
}

function TurnOff() {
  const disable = useDisableTwoFactor();
  const [password, setPassword] = useState('');
  return (
    <Group align="flex-end">
      <PasswordInput
        label="Your password, to turn it off"
        value={password}
        onChange={(e) => setPassword(e.currentTarget.value)}
        error={disable.error?.message}
      />
      <Button variant="light" color="red" loading={disable.isPending} onClick={() => disable.mutate(password)}>
        Turn off
      </Button>
    </Group>
  );
}

/** The signed-in person's own second factor: set it up, see what is left, turn it off (unless the shop requires it). */
export function TwoFactorCard() {
  const status = useTwoFactor();
  const [codes, setCodes] = useState<string[] | null>(null);
  const s = status.data;
  return (
    <Paper withBorder p="lg" radius="md" maw={560}>
      <Stack>
        <Group justify="space-between">
          <Title order={3}>Two-step sign-in</Title>
          {s && <Badge color={s.enabled ? 'teal' : 'gray'}>{s.enabled ? 'On' : 'Off'}</Badge>}
        </Group>
        <Text c="dimmed">After your password, sign-in asks for a six-digit code from an app on your phone, so a stolen password alone is not enough.</Text>
        {codes && <RecoveryCodesCard codes={codes} onDone={() => setCodes(null)} />}
        {s && !s.enabled && !codes && <Enrol onDone={(r) => setCodes(r.recoveryCodes)} />}
        {s?.enabled && !codes && <Text>{s.recoveryCodesLeft} recovery codes left.</Text>}
        {s?.enabled && !s.requiredByShop && !codes && <TurnOff />}
        {s?.requiredByShop && <Alert color="blue">Your workshop requires two-step sign-in for everyone.</Alert>}
      </Stack>
    </Paper>
  );
}
