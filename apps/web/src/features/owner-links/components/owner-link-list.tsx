import type { OwnerLinkDto } from '@benchproof/contracts';
import { Badge, Button, Group, Text } from '@mantine/core';
import { useOwnerLinks, useRevokeOwnerLink } from '../api/owner-links';

const STATE_COLOUR = { active: 'teal', expired: 'gray', revoked: 'red' } as const;
const when = (iso: string) => new Date(iso).toLocaleString();

/** One link: its state, when it runs out, whether the owner opened it; the active one can be revoked. */
function OwnerLinkRow({ link: l, onRevoke, revoking }: { link: OwnerLinkDto; onRevoke?: () => void; revoking: boolean }) {
  return (
    <Group justify="space-between" data-testid={`owner-link-${l.id}`}>
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
      {onRevoke && l.state === 'active' && (
        <Button color="red" variant="light" mih={44} onClick={onRevoke} loading={revoking}>
          Revoke
        </Button>
      )}
    </Group>
  );
}

/** Every link made for the job, newest first as the API lists them. */
export function OwnerLinkList({ jobId, canManage }: { jobId: number; canManage: boolean }) {
  const links = useOwnerLinks(jobId);
  const revoke = useRevokeOwnerLink(jobId);
  return links.data?.map((l) => <OwnerLinkRow key={l.id} link={l} onRevoke={canManage ? () => revoke.mutate(l.id) : undefined} revoking={revoke.isPending} />);
}
