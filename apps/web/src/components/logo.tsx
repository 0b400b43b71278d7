import { Group, Text } from '@mantine/core';

/** BenchProof's mark (a chainring with a proof tick) and name. */
export function Logo({ size = 32, withName = true }: { size?: number; withName?: boolean }) {
  return (
    <Group gap={8} wrap="nowrap">
      <img src="/benchproof-mark.svg" width={size} height={size} alt={withName ? '' : 'BenchProof'} />
      {withName && (
        <Text fw={700} fz={size * 0.6} c="bench.8" style={{ letterSpacing: '-0.02em' }}>
          Bench<span style={{ color: 'var(--mantine-color-brass-7)' }}>Proof</span>
        </Text>
      )}
    </Group>
  );
}
