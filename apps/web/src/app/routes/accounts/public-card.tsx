import { Center, Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { Logo } from '../../../components/logo';

/** The frame of the pages reached without a session: setup, invitation, password links. */
export function PublicCard({ title, intro, children, wide = false }: { title: string; intro?: ReactNode; children: ReactNode; wide?: boolean }) {
  return (
    <Center mih="100dvh" p="md" bg="bench.0">
      <Paper withBorder shadow="sm" p="xl" radius="lg" w="100%" maw={wide ? 720 : 440}>
        <Stack gap="lg">
          <Logo size={40} />
          <div>
            <Title order={2}>{title}</Title>
            {intro && <Text c="dimmed">{intro}</Text>}
          </div>
          {children}
        </Stack>
      </Paper>
    </Center>
  );
}
