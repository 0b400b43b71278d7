import type { ShowcaseItemDto, ShowcaseSize, ShowcaseVariant } from '@benchproof/contracts';
import { MEDIA_AREA_LABELS } from '@benchproof/domain';
import { ActionIcon, Badge, Group, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconStar, IconStarFilled } from '@tabler/icons-react';
import { useState } from 'react';
import { useUpdateShowcaseItem } from '../api/showcase';
import { CaptionEditor } from './caption-editor';
import { ExportControls } from './export-controls';
import { useDates } from '../../../lib/dates';

/** The annotated render (blur boxes applied) when there is one, else the plain upright copy. */
function Shot({ id, alt }: { id: number; alt: string }) {
  const [src, setSrc] = useState(`/api/media/${id}/annotated/screen`);
  return (
    <img
      src={src}
      alt={alt}
      onError={() => setSrc(`/api/media/${id}/screen`)}
      style={{ width: '100%', aspectRatio: '4 / 3', objectFit: 'cover', borderRadius: 6, display: 'block' }}
    />
  );
}

/** The favourite mark: a 48 px toggle for those who curate the library, a plain star for the others. */
function Favourite({ item, canManage }: { item: ShowcaseItemDto; canManage: boolean }) {
  const mark = useUpdateShowcaseItem(item.pairId);
  if (!canManage) return item.favourite ? <IconStarFilled size={28} color="var(--mantine-color-yellow-6)" aria-label="Favourite" /> : null;
  return (
    <ActionIcon
      size={48}
      variant={item.favourite ? 'filled' : 'light'}
      color="yellow"
      aria-label={item.favourite ? 'Remove favourite' : 'Mark favourite'}
      aria-pressed={item.favourite}
      loading={mark.isPending}
      onClick={() => mark.mutate({ favourite: !item.favourite })}
    >
      {item.favourite ? <IconStarFilled /> : <IconStar />}
    </ActionIcon>
  );
}

interface Props {
  item: ShowcaseItemDto;
  choice: { variant: ShowcaseVariant; size: ShowcaseSize };
  onChoice: (choice: { variant: ShowcaseVariant; size: ShowcaseSize }) => void;
  selected: boolean;
  onSelect: (on: boolean) => void;
  /** Favourites and captions (showcase.manage); everyone who opens the library may export. */
  canManage: boolean;
}

/** One consented pair: both shots, caption, consent scope and date, favourite, export. */
export function ShowcaseCard({ item, choice, onChoice, selected, onSelect, canManage }: Props) {
  const dates = useDates();
  const [editing, { open, close }] = useDisclosure(false);
  const area = MEDIA_AREA_LABELS[item.area];
  return (
    <Paper withBorder radius="md" p="sm" data-testid="showcase-item" aria-label={`${area} pair ${item.pairId}`}>
      <SimpleGrid cols={2} spacing={6}>
        <Shot id={item.before.id} alt={`Before: ${area}`} />
        <Shot id={item.after.id} alt={`After: ${area}`} />
      </SimpleGrid>
      <Stack gap={8} mt="sm">
        <Group justify="space-between" wrap="nowrap" align="flex-start">
          <Text size="md">{item.caption}</Text>
          <Favourite item={item} canManage={canManage} />
        </Group>
        <Group gap={6}>
          <Badge variant="light" size="lg">
            {area}
          </Badge>
          <Text size="sm" c="teal.8" fw={600} title={`Consent wording ${item.consent.wordingVersion}`}>
            Consent {dates.date(item.consent.grantedAt)} · {item.consent.nameMakeModel ? 'make & model may be named' : 'bike not named'}
          </Text>
        </Group>
        <ExportControls pairId={item.pairId} choice={choice} onChoice={onChoice} selected={selected} onSelect={onSelect} onCaption={canManage ? open : null} />
      </Stack>
      {editing && <CaptionEditor item={item} opened={editing} onClose={close} />}
    </Paper>
  );
}
