import { SHOWCASE_SIZE_KEYS, type ShowcaseSize, type ShowcaseVariant, type ShowcaseZipRequest } from '@benchproof/contracts';
import { Alert, Button, Group, Select, Stack } from '@mantine/core';
import { IconFileZip } from '@tabler/icons-react';
import { useState } from 'react';
import { useZipExport } from '../hooks/use-zip-export';
import { ExportProgress } from './export-progress';

/** What one card asks for: the same "What" and "Size" its own Export button uses. */
export interface CardChoice {
  pairId: number;
  variant: ShowcaseVariant;
  size: ShowcaseSize;
}

/** The zip's format, stated on the screen: each card's own choice, or that choice in all three sizes. */
type ZipFormat = 'card' | 'all';
const ZIP_FORMAT_OPTIONS: { value: ZipFormat; label: string }[] = [
  { value: 'card', label: 'As chosen on each card' },
  { value: 'all', label: 'Each card’s choice, all three sizes' },
];

/** Every selected card's file (its "What" and "Size"), or its "What" in all three sizes. */
export function zipRequest(choices: CardChoice[], format: ZipFormat): ShowcaseZipRequest {
  return {
    items: choices.flatMap((c) => (format === 'all' ? SHOWCASE_SIZE_KEYS : [c.size]).map((size) => ({ pairId: c.pairId, variant: c.variant, size }))),
  };
}

/** The zip's format and button for the selection, then the zip's progress, download or failure. */
export function ZipBar({ choices }: { choices: CardChoice[] }) {
  const [format, setFormat] = useState<ZipFormat>('card');
  const zip = useZipExport();
  if (!choices.length && !zip.task && !zip.problem) return null;
  const files = zipRequest(choices, format).items.length;
  return (
    <Stack gap="sm" style={{ position: 'sticky', bottom: 0, background: 'var(--mantine-color-body)', padding: 8, zIndex: 2 }}>
      {zip.task && <ExportProgress key={zip.task.start.key} start={zip.task.start} files={zip.task.files} onDismiss={zip.dismiss} />}
      {zip.problem && (
        <Alert color="red" title={zip.problem.title} role="alert">
          {zip.problem.message}
        </Alert>
      )}
      {choices.length > 0 && (
        <Group justify="flex-end" align="flex-end" wrap="nowrap" gap="sm">
          <Select
            size="md"
            label="Files in the zip"
            style={{ flex: '0 1 280px', minWidth: 0 }}
            data={ZIP_FORMAT_OPTIONS}
            value={format}
            onChange={(v) => v && setFormat(v)}
            allowDeselect={false}
          />
          <Button
            size="md"
            style={{ flexShrink: 0 }}
            leftSection={<IconFileZip size={20} />}
            loading={zip.busy}
            onClick={() => void zip.run(zipRequest(choices, format))}
          >
            Zip {files} file{files === 1 ? '' : 's'}
          </Button>
        </Group>
      )}
    </Stack>
  );
}
