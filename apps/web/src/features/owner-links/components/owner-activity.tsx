import { Card, Stack, Text, Title } from '@mantine/core';
import { useOwnerActivity } from '../api/owner-links';
import { useDates } from '../../../lib/dates';

const str = (v: unknown, fallback = ''): string => (typeof v === 'string' || typeof v === 'number' ? String(v).replace('_', ' ') : fallback);

const LABELS: Record<string, (d: Record<string, unknown>) => string> = {
  'owner.viewed': () => 'Owner opened the page',
  'owner_link.created': (d) => `Link created (${d.channel === 'sms' ? 'text' : 'e-mail'} ${d.mail === 'queued' ? 'queued' : 'not sent'})`,
  'owner_link.revoked': () => 'Link revoked',
  'recommendation.decided': (d) =>
    `${str(d.decidedByName, 'Owner')} ${str(d.status)} ${str(d.summary) || `item #${str(d.recommendationId)}`} (${str(d.channel)})`,
  'consent.granted': (d) => `Consent granted (${str(d.method)})`,
  'consent.revoked': (d) => `Consent refused or withdrawn (${str(d.method)})`,
};

/** Audit events of the owner side of this job, newest first. */
export function OwnerActivity({ jobId }: { jobId: number }) {
  const dates = useDates();
  const activity = useOwnerActivity(jobId);
  return (
    <Card withBorder padding="md">
      <Stack gap={6}>
        <Title order={3}>Owner activity</Title>
        {activity.data?.length === 0 && (
          <Text c="dimmed" size="sm">
            Nothing yet.
          </Text>
        )}
        {activity.data?.map((e) => (
          <Text key={e.id} size="sm" data-testid="owner-activity-item">
            <Text span c="dimmed">
              {dates.dateTime(e.at)}
            </Text>{' '}
            · {(LABELS[e.action] ?? (() => e.action))(e.details ?? {})}
          </Text>
        ))}
      </Stack>
    </Card>
  );
}
