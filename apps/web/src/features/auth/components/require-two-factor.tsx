import { Alert, Paper, Stack, Switch, Text, Title } from '@mantine/core';
import { useRequireTwoFactor, useTwoFactor } from '../api/accounts';

/** A manager requires two-step sign-in for every account; people without it set it up at their next sign-in. */
export function RequireTwoFactorCard() {
  const status = useTwoFactor();
  const change = useRequireTwoFactor();
  const s = status.data;
  return (
    <Paper withBorder p="lg" radius="md" maw={560}>
      <Stack>
        <Title order={3}>For the whole workshop</Title>
        <Switch
          size="lg"
          label="Everyone signs in in two steps"
          checked={s?.requiredByShop ?? false}
          disabled={!s || (!s.enabled && !s.requiredByShop) || change.isPending}
          onChange={(e) => change.mutate(e.currentTarget.checked)}
        />
        {s && !s.enabled && <Text c="dimmed">Turn it on for your own account first.</Text>}
        {change.data?.required && change.data.signedOut > 0 && (
          <Alert color="blue">{change.data.signedOut} people were signed out; they set up two-step sign-in when they next sign in.</Alert>
        )}
        {change.error && <Alert color="red">{change.error.message}</Alert>}
      </Stack>
    </Paper>
  );
}
