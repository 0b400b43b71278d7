import { brandInk, brandSurface, isDomainInputError } from '@benchproof/domain';
import { Group, Paper, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck } from '@tabler/icons-react';

const safe = <T,>(fn: () => T): T | null => {
  try {
    return fn();
  } catch (e) {
    if (!isDomainInputError(e)) throw e;
    return null;
  }
};

/**
 * What the report will do with a brand colour (WCAG 2.2, libs/domain): the text
 * colour it prints on the colour, and whether the colour itself is dark enough
 * for text on white paper — if not, which darker shade the report uses instead.
 */
export function ContrastCheck({ colour }: { colour: string }) {
  const surface = safe(() => brandSurface(colour));
  const ink = safe(() => brandInk(colour));
  if (!surface || !ink)
    return (
      <Text size="sm" c="dimmed">
        Enter a colour like #1F5F5B to check it.
      </Text>
    );
  return (
    <Stack gap={6}>
      <Group gap="sm" wrap="nowrap">
        <Paper px="md" py={8} radius="sm" style={{ background: surface.background }}>
          <Text c={surface.text} fw={700}>
            Report band
          </Text>
        </Paper>
        <Text size="sm">
          {surface.text === '#FFFFFF' ? 'White' : 'Black'} text on it, {surface.ratio.toFixed(2)}:1
        </Text>
      </Group>
      <Group gap={6} wrap="nowrap" align="flex-start">
        {ink.adjusted ? (
          <IconAlertTriangle color="var(--mantine-color-orange-8)" style={{ flexShrink: 0 }} />
        ) : (
          <IconCircleCheck color="var(--mantine-color-teal-8)" style={{ flexShrink: 0 }} />
        )}
        {ink.adjusted ? (
          <Text size="sm" c="orange.9" fw={600}>
            As text on white it reaches only {ink.chosenRatio.toFixed(2)}:1 (body text needs 4.5:1). Reports print headings in the darker{' '}
            <span style={{ color: ink.used }}>{ink.used}</span> ({ink.usedRatio.toFixed(2)}:1) instead.
          </Text>
        ) : (
          <Text size="sm" c="teal.9" fw={600}>
            Readable as text on white: {ink.chosenRatio.toFixed(2)}:1.
          </Text>
        )}
      </Group>
    </Stack>
  );
}
