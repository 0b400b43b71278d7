import { Group, Text } from '@mantine/core';

/** BenchProof's mark (a chainring with a proof tick) and name. */
export function Logo({ size = 32, withName = true }: { size?: number; withName?: boolean }) {
  return (
    <Group gap={8} wrap="nowrap">
      <img src="/benchproof-mark.svg" width={size} height={size} alt={withName ? '' : 'BenchProof'} />
      {withName && (
        // Brass 8 on white is 5.5:1; brass 7 (4.0:1) failed WCAG 1.4.3 at the header's 18 px.
        <Text fw={700} fz={size * 0.6} c="bench.8" style={{ letterSpacing: '-0.02em' }}>
          Bench<span style={{ color: 'var(--mantine-color-brass-8)' }}>Proof</span>
        </Text>
      )}
    </Group>
  );
}
