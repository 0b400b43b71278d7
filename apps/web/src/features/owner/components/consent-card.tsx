import { CONSENT_WORDING, type ConsentDto } from '@benchproof/contracts';
import { Alert, Card, Checkbox, Stack, Switch, Text, Title } from '@mantine/core';
import { useState } from 'react';
import type { ApiError } from '../../../lib/api-client';
import { useOwnerConsent } from '../api/owner-page';
import { useDates } from '../../../lib/dates';

/** The marketing consent switch with the full wording; the owner can turn it off again at any time. */
export function ConsentCard({ token, consent }: { token: string; consent: ConsentDto | null }) {
  const dates = useDates();
  const save = useOwnerConsent(token);
  const granted = consent?.granted ?? false;
  const [makeModel, setMakeModel] = useState(consent?.nameMakeModel ?? false);
  const change = (next: boolean, nameMakeModel = makeModel) => save.mutate({ granted: next, nameMakeModel, wordingVersion: CONSENT_WORDING.version });
  return (
    <Card withBorder radius="md" padding="md">
      <Stack gap="sm">
        <Title order={2} size="h3">
          {CONSENT_WORDING.title}
        </Title>
        {CONSENT_WORDING.paragraphs.map((p) => (
          <Text key={p}>{p}</Text>
        ))}
        <Checkbox
          size="lg"
          label={CONSENT_WORDING.makeModelLabel}
          checked={makeModel}
          onChange={(e) => {
            setMakeModel(e.currentTarget.checked);
            if (granted) change(true, e.currentTarget.checked);
          }}
        />
        <Switch
          size="xl"
          checked={granted}
          disabled={save.isPending}
          onChange={(e) => change(e.currentTarget.checked)}
          label={granted ? 'Yes, you may use the photos' : 'No, do not use the photos'}
          aria-label="Marketing consent"
        />
        {consent && (
          <Text size="sm" c="dimmed">
            {consent.granted ? 'Given' : 'Withdrawn'} on {dates.dateTime(consent.at)} (wording {consent.wordingVersion})
          </Text>
        )}
        {save.error && <Alert color="red">{(save.error as ApiError).message}</Alert>}
      </Stack>
    </Card>
  );
}
