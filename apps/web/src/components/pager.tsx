import { Button, Group, Text } from '@mantine/core';
import { usePagination } from '@mantine/hooks';
import { IconChevronLeft, IconChevronRight } from '@tabler/icons-react';

const square = { miw: 44, h: 44, px: 8 } as const;

/**
 * Page numbers with … gaps, previous and next, as 44 px buttons. Mantine's usePagination with Button rather than
 * the Pagination component: its own controls and icons cost a first screen about 3 KB gzip, and the jobs list
 * (where this sits) has Button loaded already.
 */
export function Pager({ total, value, onChange }: { total: number; value: number; onChange: (page: number) => void }) {
  const { range, active, next, previous } = usePagination({ total, page: value, onChange });
  return (
    <Group component="nav" aria-label="Pages" gap={6} justify="center">
      <Button {...square} variant="default" onClick={previous} disabled={active <= 1} aria-label="Previous page">
        <IconChevronLeft size={20} aria-hidden />
      </Button>
      {range.map((p, i) =>
        p === 'dots' ? (
          <Text key={`dots-${i}`} c="dimmed" aria-hidden>
            …
          </Text>
        ) : (
          <Button
            key={p}
            {...square}
            variant={p === active ? 'filled' : 'default'}
            aria-current={p === active ? 'page' : undefined}
            aria-label={`Page ${p}`}
            onClick={() => onChange(p)}
          >
            {p}
          </Button>
        ),
      )}
      <Button {...square} variant="default" onClick={next} disabled={active >= total} aria-label="Next page">
        <IconChevronRight size={20} aria-hidden />
      </Button>
    </Group>
  );
}
