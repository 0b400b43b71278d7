import { INSPECTION_AREA_LABELS } from '@benchproof/domain';
import { Alert, Button, Group, Select, Stack, Text } from '@mantine/core';
import { useQueryClient } from '@tanstack/react-query';
import { IconLink } from '@tabler/icons-react';
import { useState } from 'react';
import { findingMediaQuery, useJobFindings, useLinkFindingMedia } from '../api/media';

/** Adds the shot to a finding's linked shots (keeping the ones already linked). */
export function LinkToFinding({ jobId, assetId }: { jobId: number; assetId: number }) {
  const [open, setOpen] = useState(false);
  const [findingId, setFindingId] = useState<string | null>(null);
  const [linked, setLinked] = useState<string | null>(null);
  const findings = useJobFindings(jobId, open);
  const link = useLinkFindingMedia(jobId);
  const qc = useQueryClient();

  if (!open) {
    return (
      <Button variant="light" leftSection={<IconLink size={18} />} onClick={() => setOpen(true)}>
        Link to finding
      </Button>
    );
  }
  const data = (findings.data ?? []).map((f) => ({ value: String(f.id), label: `${INSPECTION_AREA_LABELS[f.area]}: ${f.description}`.slice(0, 90) }));
  const save = async () => {
    const id = Number(findingId);
    const current = await qc.fetchQuery(findingMediaQuery(jobId, id));
    const ids = [...new Set([...current.assets.map((a) => a.id), assetId])];
    link.mutate({ findingId: id, assetIds: ids }, { onSuccess: () => setLinked(data.find((d) => d.value === findingId)?.label ?? 'the finding') });
  };
  return (
    <Stack gap={6}>
      <Group gap="sm" align="flex-end">
        <Select
          label="Finding"
          placeholder={findings.isLoading ? 'Loading findings…' : data.length ? 'Pick a finding' : 'No findings on this job yet'}
          data={data}
          value={findingId}
          onChange={setFindingId}
          w={280}
          comboboxProps={{ zIndex: 500 }}
        />
        <Button onClick={() => void save()} disabled={!findingId} loading={link.isPending}>
          Link
        </Button>
        <Button variant="subtle" color="gray" onClick={() => setOpen(false)}>
          Close
        </Button>
      </Group>
      {linked && <Text size="sm" c="green.8">{`Linked to ${linked}.`}</Text>}
      {(findings.error ?? link.error) && (
        <Alert color="red" role="alert">
          {(findings.error ?? link.error)?.message}
        </Alert>
      )}
    </Stack>
  );
}
