import { SHOWCASE_SIZES, SHOWCASE_SIZE_KEYS, type ShowcaseItemDto, type ShowcaseSize, type ShowcaseVariant } from '@benchproof/contracts';
import { MEDIA_AREA_LABELS } from '@benchproof/domain';
import { ActionIcon, Badge, Button, Checkbox, Group, Paper, Select, SimpleGrid, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconDownload, IconEdit, IconStar, IconStarFilled } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { downloadExport, useUpdateShowcaseItem } from '../api/showcase';
import { CaptionEditor } from './caption-editor';

const VARIANT_OPTIONS: { value: ShowcaseVariant; label: string }[] = [
  { value: 'pair', label: 'Before and after together' },
  { value: 'before', label: 'Before shot alone' },
  { value: 'after', label: 'After shot alone' },
];
const SIZE_OPTIONS = SHOWCASE_SIZE_KEYS.map((k) => ({ value: k, label: SHOWCASE_SIZES[k].label }));
const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });

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

interface Props {
  item: ShowcaseItemDto;
  selected: boolean;
  onSelect: (on: boolean) => void;
}

/** One consented pair: both shots, caption, consent scope and date, favourite, export. */
export function ShowcaseCard({ item, selected, onSelect }: Props) {
  const [editing, { open, close }] = useDisclosure(false);
  const mark = useUpdateShowcaseItem(item.pairId);
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
        </Group>
        <Group gap={6}>
          <Badge variant="light" size="lg">
            {area}
          </Badge>
          <Text size="sm" c="teal.8" fw={600} title={`Consent wording ${item.consent.wordingVersion}`}>
            Consent {day(item.consent.grantedAt)} · {item.consent.nameMakeModel ? 'make & model may be named' : 'bike not named'}
          </Text>
        </Group>
        <ExportControls pairId={item.pairId} selected={selected} onSelect={onSelect} onCaption={open} />
      </Stack>
      {editing && <CaptionEditor item={item} opened={editing} onClose={close} />}
    </Paper>
  );
}

/** Format and size, one-tap export, caption and zip selection. */
function ExportControls({
  pairId,
  selected,
  onSelect,
  onCaption,
}: {
  pairId: number;
  selected: boolean;
  onSelect: (on: boolean) => void;
  onCaption: () => void;
}) {
  const [variant, setVariant] = useState<ShowcaseVariant>('pair');
  const [size, setSize] = useState<ShowcaseSize>('square');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const exportNow = async () => {
    setBusy(true);
    setError(null);
    try {
      await downloadExport(pairId, { variant, size });
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'The export failed.');
    } finally {
      setBusy(false);
    }
  };
  return (
    <>
      <Stack gap={6}>
        <Select size="md" label="What" data={VARIANT_OPTIONS} value={variant} onChange={(v) => v && setVariant(v)} allowDeselect={false} />
        <Select size="md" label="Size" data={SIZE_OPTIONS} value={size} onChange={(v) => v && setSize(v)} allowDeselect={false} />
      </Stack>
      {error && (
        <Text c="red" size="sm" role="alert">
          {error}
        </Text>
      )}
      <Group justify="space-between">
        <Checkbox size="md" label="Select for zip" checked={selected} onChange={(e) => onSelect(e.currentTarget.checked)} />
        <Group gap="xs">
          <Button size="md" variant="light" leftSection={<IconEdit size={20} />} onClick={onCaption}>
            Caption
          </Button>
          <Button size="md" leftSection={<IconDownload size={20} />} loading={busy} onClick={() => void exportNow()}>
            Export
          </Button>
        </Group>
      </Group>
    </>
  );
}
