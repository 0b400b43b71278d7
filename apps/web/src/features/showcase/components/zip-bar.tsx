import { SHOWCASE_SIZES, SHOWCASE_SIZE_KEYS, type ShowcaseSize, type ShowcaseZipRequest } from '@benchproof/contracts';
import { Alert, Button, Group, Select, Stack } from '@mantine/core';
import { IconFileZip } from '@tabler/icons-react';
import { useState } from 'react';
import { useZipExport } from '../hooks/use-zip-export';
import { ExportProgress } from './export-progress';

type ZipSize = ShowcaseSize | 'all';
const ZIP_SIZE_OPTIONS: { value: ZipSize; label: string }[] = [
  ...SHOWCASE_SIZE_KEYS.map((k) => ({ value: k, label: SHOWCASE_SIZES[k].label })),
  { value: 'all', label: 'All three sizes' },
];

/** The composed pair of every selected item, in one size or all three. */
export function zipRequest(pairIds: number[], size: ZipSize): ShowcaseZipRequest {
  const sizes = size === 'all' ? [...SHOWCASE_SIZE_KEYS] : [size];
  return { items: pairIds.flatMap((pairId) => sizes.map((s) => ({ pairId, variant: 'pair' as const, size: s }))) };
}

/** Size and the zip button for the selection, then the zip's progress, download or failure. */
export function ZipBar({ pairIds }: { pairIds: number[] }) {
  const [size, setSize] = useState<ZipSize>('square');
  const zip = useZipExport();
  if (!pairIds.length && !zip.task && !zip.problem) return null;
  const files = zipRequest(pairIds, size).items.length;
  return (
    <Stack gap="sm" style={{ position: 'sticky', bottom: 0, background: 'var(--mantine-color-body)', padding: 8, zIndex: 2 }}>
      {zip.task && <ExportProgress key={zip.task.start.key} start={zip.task.start} files={zip.task.files} onDismiss={zip.dismiss} />}
      {zip.problem && (
        <Alert color="red" title={zip.problem.title} role="alert">
          {zip.problem.message}
        </Alert>
      )}
      {pairIds.length > 0 && (
        <Group justify="flex-end" align="flex-end" wrap="nowrap" gap="sm">
          <Select
            size="md"
            label="Zip size"
            style={{ flex: '0 1 240px', minWidth: 0 }}
            data={ZIP_SIZE_OPTIONS}
            value={size}
            onChange={(v) => v && setSize(v)}
            allowDeselect={false}
          />
          <Button
            size="md"
            style={{ flexShrink: 0 }}
            leftSection={<IconFileZip size={20} />}
            loading={zip.busy}
            onClick={() => void zip.run(zipRequest(pairIds, size))}
          >
            Zip {files} file{files === 1 ? '' : 's'}
          </Button>
        </Group>
      )}
    </Stack>
  );
}
