import { CONSENT_WORDING, type ConsentDto } from '@benchproof/contracts';
import { Alert, Badge, Button, Card, Checkbox, Group, Spoiler, Stack, Text, TextInput, Title } from '@mantine/core';
import { useState } from 'react';
import type { ApiError } from '../../../lib/api-client';
import { useConsentStatus, useRecordConsent } from '../api/owner-links';

/** What the consent in force allows, how and when it was given, and under which wording. */
function ConsentInForce({ current }: { current: ConsentDto }) {
  return (
    <Text size="sm">
      {current.granted
        ? current.nameMakeModel
          ? 'Bike photos; make and model may be named.'
          : 'Bike photos; make and model not named.'
        : 'Photos may not be used.'}{' '}
      {current.method === 'owner_link' ? 'On the owner page' : 'In person'}, {new Date(current.at).toLocaleString()} ({current.wordingVersion}).
    </Text>
  );
}

/** Desk records an answer the owner gave at the counter, after reading them the wording. */
function RecordInPerson({ jobId, ownerName }: { jobId: number; ownerName: string }) {
  const record = useRecordConsent(jobId);
  const [name, setName] = useState(ownerName);
  const [makeModel, setMakeModel] = useState(false);
  const save = (granted: boolean) => record.mutate({ granted, nameMakeModel: makeModel, givenByName: name, wordingVersion: CONSENT_WORDING.version });
  return (
    <Stack gap="xs">
      <Text fw={600} size="sm">
        Record an answer given in person (read the wording to the owner first)
      </Text>
      <TextInput label="Given by" value={name} onChange={(e) => setName(e.currentTarget.value)} size="md" />
      <Checkbox label={CONSENT_WORDING.makeModelLabel} checked={makeModel} onChange={(e) => setMakeModel(e.currentTarget.checked)} size="md" />
      <Group>
        <Button mih={44} onClick={() => save(true)} loading={record.isPending}>
          Record consent
        </Button>
        <Button mih={44} variant="light" color="gray" onClick={() => save(false)} loading={record.isPending}>
          Record refusal
        </Button>
      </Group>
      {record.error && <Alert color="red">{(record.error as ApiError).message}</Alert>}
    </Stack>
  );
}

/** Marketing consent of the job: in force, history, and a form for consent given in person. */
export function ConsentPanel({ jobId, canRecord, ownerName }: { jobId: number; canRecord: boolean; ownerName: string }) {
  const status = useConsentStatus(jobId);
  const current = status.data?.current ?? null;
  return (
    <Card withBorder padding="md">
      <Stack gap="sm">
        <Group justify="space-between">
          <Title order={3}>Marketing consent</Title>
          <Badge size="lg" color={current?.granted ? 'teal' : 'gray'} data-testid="consent-state">
            {current ? (current.granted ? 'Granted' : 'Refused / withdrawn') : 'Not asked'}
          </Badge>
        </Group>
        {current && <ConsentInForce current={current} />}
        <Spoiler maxHeight={0} showLabel="Show the wording" hideLabel="Hide the wording">
          {CONSENT_WORDING.paragraphs.map((p) => (
            <Text key={p} size="sm">
              {p}
            </Text>
          ))}
        </Spoiler>
        {canRecord && <RecordInPerson jobId={jobId} ownerName={ownerName} />}
      </Stack>
    </Card>
  );
}
