import type { CreatedOwnerLinkDto } from '@benchproof/contracts';
import { Alert, Badge, Button, Card, CopyButton, Group, NumberInput, Stack, Text, TextInput, Title } from '@mantine/core';
import { IconCopy, IconLink } from '@tabler/icons-react';
import { useState } from 'react';
import type { ApiError } from '../../../lib/api-client';
import { useCreateOwnerLink, useOwnerLinks, useRevokeOwnerLink } from '../api/owner-links';
import { ConsentPanel } from './consent-panel';
import { OwnerActivity } from './owner-activity';

const STATE_COLOUR = { active: 'teal', expired: 'gray', revoked: 'red' } as const;
const when = (iso: string) => new Date(iso).toLocaleString();

/** Job page section: send the owner link (copy or e-mail), see its expiry, revoke it; consent and owner activity below. */
export function OwnerLinkPanel({ jobId, canManage, ownerName }: { jobId: number; canManage: boolean; ownerName: string }) {
  const links = useOwnerLinks(jobId);
  const create = useCreateOwnerLink(jobId);
  const revoke = useRevokeOwnerLink(jobId);
  const [days, setDays] = useState<number>(14);
  const [created, setCreated] = useState<CreatedOwnerLinkDto | null>(null);
  return (
    <Stack gap="lg">
      <Card withBorder padding="md">
        <Stack gap="sm">
          <Title order={3}>Owner link</Title>
          <Text size="sm" c="dimmed">
            A private page where {ownerName} sees the findings with photos, approves or declines the work and answers the marketing question. A new link
            replaces the earlier ones.
          </Text>
          {canManage && (
            <Group align="flex-end">
              <NumberInput label="Works for (days)" value={days} onChange={(v) => setDays(Number(v) || 14)} min={1} max={60} w={140} size="md" />
              <Button
                size="md"
                mih={44}
                leftSection={<IconLink />}
                loading={create.isPending}
                onClick={() => create.mutate({ expiresInDays: days, send: true }, { onSuccess: setCreated })}
              >
                Create and send link
              </Button>
            </Group>
          )}
          {create.error && <Alert color="red">{(create.error as ApiError).message}</Alert>}
          {created && <CreatedLink created={created} />}
          {links.data?.map((l) => (
            <Group key={l.id} justify="space-between" data-testid={`owner-link-${l.id}`}>
              <div>
                <Badge color={STATE_COLOUR[l.state]}>{l.state}</Badge>
                <Text size="sm">
                  Created {when(l.createdAt)} · {l.state === 'active' ? 'expires' : 'expiry'} {when(l.expiresAt)}
                </Text>
                <Text size="xs" c="dimmed">
                  {l.lastViewedAt ? `Last opened ${when(l.lastViewedAt)}` : 'Not opened yet'}
                  {l.sentTo ? ` · sent to ${l.sentTo}` : ''}
                </Text>
              </div>
              {canManage && l.state === 'active' && (
                <Button color="red" variant="light" mih={44} onClick={() => revoke.mutate(l.id)} loading={revoke.isPending}>
                  Revoke
                </Button>
              )}
            </Group>
          ))}
        </Stack>
      </Card>
      <ConsentPanel jobId={jobId} canRecord={canManage} ownerName={ownerName} />
      <OwnerActivity jobId={jobId} />
    </Stack>
  );
}

/** The new link, shown once: copy it for a text message, and whether the e-mail went out. */
function CreatedLink({ created }: { created: CreatedOwnerLinkDto }) {
  return (
    <Alert color="teal" title="Link created — shown only now" data-testid="owner-link-created">
      <Stack gap="xs">
        <TextInput value={created.url} readOnly aria-label="Owner link" onFocus={(e) => e.currentTarget.select()} />
        <CopyButton value={created.url}>
          {({ copied, copy }) => (
            <Button size="md" mih={44} variant="light" leftSection={<IconCopy />} onClick={copy}>
              {copied ? 'Copied' : 'Copy for a text message'}
            </Button>
          )}
        </CopyButton>
        <Text size="sm">{created.mail.status === 'queued' ? 'E-mail queued to the owner.' : `Not e-mailed: ${created.mail.reason ?? ''}`}</Text>
      </Stack>
    </Alert>
  );
}
