import { contrastRatio, isDomainInputError, WCAG_THRESHOLDS } from '@benchproof/domain';
import { Group, Paper, Text } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck } from '@tabler/icons-react';

/** White report text on the brand colour, with its WCAG 2.2 contrast ratio; below 4.5:1 warns. */
export function ContrastCheck({ colour }: { colour: string }) {
  let ratio: number | null = null;
  try {
    ratio = contrastRatio(colour, '#FFFFFF');
  } catch (e) {
    if (!isDomainInputError(e)) throw e;
  }
  if (ratio === null) return <Text size="sm" c="dimmed">Enter a colour like #1F5F5B to check it.</Text>;
  const ok = ratio >= WCAG_THRESHOLDS.aaText;
  return (
    <Group gap="sm" wrap="wrap">
      <Paper px="md" py={8} radius="sm" style={{ background: colour }}>
        <Text c="#FFFFFF" fw={700}>Report heading</Text>
      </Paper>
      <Group gap={4} wrap="nowrap">
        {ok ? <IconCircleCheck color="var(--mantine-color-teal-8)" /> : <IconAlertTriangle color="var(--mantine-color-red-8)" />}
        <Text size="sm" fw={600} c={ok ? 'teal.9' : 'red.8'}>{ratio.toFixed(2)}:1 — {ok ? 'readable with white text' : 'too light for white text (needs 4.5:1)'}</Text>
      </Group>
    </Group>
  );
}
