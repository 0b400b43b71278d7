import { SHOWCASE_SIZES, SHOWCASE_SIZE_KEYS, type ShowcaseSize, type ShowcaseVariant } from '@benchproof/contracts';
import { Button, Checkbox, Group, Select, Stack, Text } from '@mantine/core';
import { IconDownload, IconEdit } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { downloadExport } from '../api/showcase';
import { exportFailure } from './export-failure';

const VARIANT_OPTIONS: { value: ShowcaseVariant; label: string }[] = [
  { value: 'pair', label: 'Before and after together' },
  { value: 'before', label: 'Before shot alone' },
  { value: 'after', label: 'After shot alone' },
];
const SIZE_OPTIONS = SHOWCASE_SIZE_KEYS.map((k) => ({ value: k, label: SHOWCASE_SIZES[k].label }));

/** One file made on request and handed to the browser; a refusal becomes a sentence by its code. */
function useFileExport(pairId: number) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const run = async (variant: ShowcaseVariant, size: ShowcaseSize) => {
    setBusy(true);
    setError(null);
    try {
      await downloadExport(pairId, { variant, size });
    } catch (e) {
      setError(e instanceof ApiError ? exportFailure(e.code, e.message).message : 'The export failed.');
    } finally {
      setBusy(false);
    }
  };
  return { busy, error, run };
}

interface Props {
  pairId: number;
  /** What and size: this card's Export button and the zip both use them. */
  choice: { variant: ShowcaseVariant; size: ShowcaseSize };
  onChoice: (choice: { variant: ShowcaseVariant; size: ShowcaseSize }) => void;
  selected: boolean;
  onSelect: (on: boolean) => void;
  /** Null hides the caption button (the caller may not edit captions). */
  onCaption: (() => void) | null;
}

/** Format and size, one-tap export, caption and zip selection. */
export function ExportControls({ pairId, choice, onChoice, selected, onSelect, onCaption }: Props) {
  const { variant, size } = choice;
  const file = useFileExport(pairId);
  return (
    <>
      <Stack gap={6}>
        <Select size="md" label="What" data={VARIANT_OPTIONS} value={variant} onChange={(v) => v && onChoice({ variant: v, size })} allowDeselect={false} />
        <Select size="md" label="Size" data={SIZE_OPTIONS} value={size} onChange={(v) => v && onChoice({ variant, size: v })} allowDeselect={false} />
      </Stack>
      {file.error && (
        <Text c="red" size="sm" role="alert">
          {file.error}
        </Text>
      )}
      <Group justify="space-between">
        <Checkbox size="md" label="Select for zip" checked={selected} onChange={(e) => onSelect(e.currentTarget.checked)} />
        <Group gap="xs">
          {onCaption && (
            <Button size="md" variant="light" leftSection={<IconEdit size={20} />} onClick={onCaption}>
              Caption
            </Button>
          )}
          <Button size="md" leftSection={<IconDownload size={20} />} loading={file.busy} onClick={() => void file.run(variant, size)}>
            Export
          </Button>
        </Group>
      </Group>
    </>
  );
}
