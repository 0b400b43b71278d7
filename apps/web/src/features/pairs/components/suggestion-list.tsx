import type { PairSuggestionDto } from '@benchproof/contracts';
import { MEDIA_AREA_LABELS } from '@benchproof/domain';
import { Badge, Button, Group, Image, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconLink } from '@tabler/icons-react';

/** Plain words for the framing match, from the Hamming distance of the two 64-bit hashes (CHECKS.md B.9 rule of thumb). */
export function framingWords(distance: number | null): { label: string; color: string } {
  if (distance === null) return { label: 'Framing being compared…', color: 'gray' };
  if (distance <= 10) return { label: 'Same framing', color: 'teal' };
  if (distance <= 22) return { label: 'Similar framing', color: 'teal' };
  if (distance <= 28) return { label: 'Framing differs a little', color: 'yellow' };
  return { label: 'Framing differs', color: 'gray' };
}

function SuggestionCard({ s, onPick, busy }: { s: PairSuggestionDto; onPick: () => void; busy: boolean }) {
  const framing = framingWords(s.distance);
  return (
    <Paper withBorder radius="md" p="sm" data-testid="pair-suggestion">
      <SimpleGrid cols={2} spacing={6}>
        {[s.before, s.after].map((a, i) => (
          <Stack key={a.id} gap={2}>
            <Image
              src={a.urls.thumb ?? undefined}
              alt={`${i === 0 ? 'Before' : 'After'}${a.caption ? `: ${a.caption}` : ' photo'}`}
              radius="sm"
              fallbackSrc=""
              h={110}
              fit="cover"
            />
            <Text size="xs" c="dimmed" lineClamp={1}>
              {i === 0 ? 'Before' : 'After'} · {a.caption || 'No caption'}
            </Text>
          </Stack>
        ))}
      </SimpleGrid>
      <Group gap={6} mt="xs">
        <Badge variant="light" color={s.sameArea ? 'blue' : 'gray'}>
          {MEDIA_AREA_LABELS[s.before.area]}
        </Badge>
        <Badge variant="light" color={framing.color}>
          {framing.label}
        </Badge>
      </Group>
      <Button size="md" mt="xs" fullWidth leftSection={<IconLink size={20} />} onClick={onPick} loading={busy}>
        Pair these
      </Button>
    </Paper>
  );
}

/** The one-tap picks: each shot in at most one, likeliest first. */
export function SuggestionList({
  suggestions,
  onPick,
  busyKey,
}: {
  suggestions: PairSuggestionDto[];
  onPick: (s: PairSuggestionDto) => void;
  busyKey: string | null;
}) {
  const picks = suggestions.filter((s) => s.best);
  if (!picks.length) return <Text c="dimmed">No suggestions: every before shot with an after shot is already paired, or there are none yet.</Text>;
  return (
    <SimpleGrid cols={{ base: 1, md: 2 }} spacing="sm">
      {picks.map((s) => (
        <SuggestionCard key={`${s.before.id}-${s.after.id}`} s={s} onPick={() => onPick(s)} busy={busyKey === `${s.before.id}-${s.after.id}`} />
      ))}
    </SimpleGrid>
  );
}
