import { Card, Stack, Text, Title } from '@mantine/core';
import { ConsentPanel } from './consent-panel';
import { CreateOwnerLink } from './create-owner-link';
import { OwnerActivity } from './owner-activity';
import { OwnerLinkList } from './owner-link-list';

/** Job page section: send the owner link (copy or e-mail), see its expiry, revoke it; consent and owner activity below. */
export function OwnerLinkPanel({ jobId, canManage, ownerName }: { jobId: number; canManage: boolean; ownerName: string }) {
  return (
    <Stack gap="lg">
      <Card withBorder padding="md">
        <Stack gap="sm">
          <Title order={3}>Owner link</Title>
          <Text size="sm" c="dimmed">
            A private page where {ownerName} sees the findings with photos, approves or declines the work and answers the marketing question. A new link
            replaces the earlier ones.
          </Text>
          {canManage && <CreateOwnerLink jobId={jobId} />}
          <OwnerLinkList jobId={jobId} canManage={canManage} />
        </Stack>
      </Card>
      <ConsentPanel jobId={jobId} canRecord={canManage} ownerName={ownerName} />
      <OwnerActivity jobId={jobId} />
    </Stack>
  );
}
