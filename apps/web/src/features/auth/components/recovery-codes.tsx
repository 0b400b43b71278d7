import { Alert, Button, CopyButton, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconCopy, IconShieldCheck } from '@tabler/icons-react';

/** The ten recovery codes, shown this once; each works one time instead of the app's code. */
export function RecoveryCodesCard({ codes, onDone }: { codes: string[]; onDone: () => void }) {
  return (
    <Stack>
      <Alert color="teal" variant="light" icon={<IconShieldCheck />} title="Two-step sign-in is on">
        Keep these recovery codes somewhere safe, away from your phone. Each one works once if your phone is lost. They are shown only now.
      </Alert>
      <Paper withBorder p="md" radius="md">
        <SimpleGrid cols={2} spacing="xs" data-testid="recovery-codes">
          {codes.map((c) => (
            <Text key={c} ff="monospace" fz="lg">
              {c}
            </Text>
          ))}
        </SimpleGrid>
      </Paper>
      <CopyButton value={codes.join('\n')}>
        {({ copied, copy }) => (
          <Button variant="default" size="lg" leftSection={<IconCopy />} onClick={copy}>
            {copied ? 'Copied' : 'Copy the codes'}
          </Button>
        )}
      </CopyButton>
      <Button size="lg" onClick={onDone}>
        I have kept them safe
      </Button>
    </Stack>
  );
}
