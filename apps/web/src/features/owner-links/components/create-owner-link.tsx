import type { CreatedOwnerLinkDto } from '@benchproof/contracts';
import { Alert, Button, CopyButton, Group, NumberInput, Stack, Text, TextInput } from '@mantine/core';
import { IconCopy, IconLink } from '@tabler/icons-react';
import { useState } from 'react';
import type { ApiError } from '../../../lib/api-client';
import { useCreateOwnerLink } from '../api/owner-links';

/** How the link went out: the owner's preferred channel (texts or e-mail), or why it did not. */
function sentNote(mail: CreatedOwnerLinkDto['mail']): string {
  if (mail.status !== 'queued') return `Not sent: ${mail.reason ?? ''}`;
  return mail.channel === 'sms' ? 'Text queued to the owner (they prefer texts). Its progress shows under Messages.' : 'E-mail queued to the owner.';
}

/** How long the new link works, the button that makes and sends it, and the link itself once made. */
export function CreateOwnerLink({ jobId }: { jobId: number }) {
  const create = useCreateOwnerLink(jobId);
  const [days, setDays] = useState<number>(14);
  const [created, setCreated] = useState<CreatedOwnerLinkDto | null>(null);
  return (
    <>
      <Group align="flex-end">
        <NumberInput label="Works for (days)" value={days} onChange={(v) => setDays(Number(v) || 14)} min={1} max={60} w={170} />
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
      {create.error && <Alert color="red">{(create.error as ApiError).message}</Alert>}
      {created && <CreatedLink created={created} />}
    </>
  );
}

/** The new link, shown once: copy it to pass on by hand, and how it went to the owner (text or e-mail). */
function CreatedLink({ created }: { created: CreatedOwnerLinkDto }) {
  return (
    <Alert color="teal" title="Link created — shown only now" data-testid="owner-link-created">
      <Stack gap="xs">
        <TextInput value={created.url} readOnly aria-label="Owner link" onFocus={(e) => e.currentTarget.select()} />
        <CopyButton value={created.url}>
          {({ copied, copy }) => (
            <Button size="md" mih={44} variant="light" leftSection={<IconCopy />} onClick={copy}>
              {copied ? 'Copied' : 'Copy the link'}
            </Button>
          )}
        </CopyButton>
        <Text size="sm">{sentNote(created.mail)}</Text>
      </Stack>
    </Alert>
  );
}
