import type { ReportDto } from '@benchproof/contracts';
import { Alert, Badge, Button, Card, Group, Progress, Stack, Text, Title } from '@mantine/core';
import { IconDownload, IconFileCheck } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useCreateDraft, useIssueReport, useReports } from '../api/reports';
import { ReportPreview } from './report-preview';
import { useDates } from '../../../lib/dates';
import { ConfirmStep } from '../../../components/confirm-step';

const kb = (bytes: number | null) => (bytes === null ? '' : `${Math.round(bytes / 1024)} kB`);

function Rendering({ report }: { report: ReportDto }) {
  return (
    <Stack gap={4}>
      <Text size="sm">Rendering… {Math.round(report.progress * 100)} %</Text>
      <Progress value={report.progress * 100} size="lg" aria-label="Render progress" animated />
    </Stack>
  );
}

/** The current draft: its render state, and the way to issue it unless that has been done. */
function DraftCard({ draft, nextVersion, onIssue, issuing }: { draft: ReportDto; nextVersion: number; onIssue?: () => void; issuing: boolean }) {
  const dates = useDates();
  return (
    <Card withBorder>
      <Stack gap="sm">
        <Group justify="space-between" wrap="wrap">
          <Text fw={600}>Draft of {dates.dateTime(draft.createdAt)}</Text>
          <Badge color={draft.state === 'failed' ? 'red' : 'gray'} size="lg">
            {draft.state === 'ready' ? `${draft.pageCount} pages · ${kb(draft.byteSize)}` : draft.state}
          </Badge>
        </Group>
        {draft.state === 'rendering' && <Rendering report={draft} />}
        {draft.state === 'failed' && <Alert color="red">The draft could not be rendered: {draft.error}</Alert>}
        {draft.state === 'ready' && onIssue && (
          <ConfirmStep
            question={`Issue version ${nextVersion}? An issued report never changes; a correction becomes a new version.`}
            confirmLabel={`Issue version ${nextVersion}`}
            onConfirm={onIssue}
            trigger={(ask) => (
              <Button size="lg" color="teal" leftSection={<IconFileCheck />} onClick={ask} loading={issuing}>
                Issue this draft as version {nextVersion}
              </Button>
            )}
          />
        )}
      </Stack>
    </Card>
  );
}

/**
 * The job's bench report: make a draft (rendered in the background), preview it,
 * issue it as the next version; every issued version stays downloadable.
 */
export function ReportSection({ jobId, canIssue, extra }: { jobId: number; canIssue: boolean; extra?: (issued: ReportDto) => React.ReactNode }) {
  const reports = useReports(jobId);
  const createDraft = useCreateDraft(jobId);
  const issue = useIssueReport(jobId);
  const [previewId, setPreviewId] = useState<number | null>(null);
  const list = reports.data ?? [];
  const draft = list.find((r) => r.kind === 'draft');
  const issued = list.filter((r) => r.kind === 'issued');
  const preview = list.find((r) => r.id === previewId) ?? (draft?.state === 'ready' ? draft : undefined);
  const error = [createDraft.error, issue.error].find((e) => e instanceof ApiError);
  return (
    <Stack gap="lg">
      <Group justify="space-between" wrap="wrap">
        <Title order={3}>Bench report</Title>
        {canIssue && (
          <Button size="lg" onClick={() => createDraft.mutate(undefined, { onSuccess: (d) => setPreviewId(d.id) })} loading={createDraft.isPending}>
            {draft ? 'Make a new draft' : 'Make a draft'}
          </Button>
        )}
      </Group>
      {error && <Alert color="red">{error.message}</Alert>}
      {draft && (
        <DraftCard
          draft={draft}
          nextVersion={(issued[0]?.version ?? 0) + 1}
          onIssue={canIssue && !issued.some((r) => r.fromDraftId === draft.id) ? () => issue.mutate(draft.id) : undefined}
          issuing={issue.isPending}
        />
      )}
      {preview && <ReportPreview key={preview.id} report={preview} />}
      <Stack gap="xs">
        <Title order={4}>Issued versions</Title>
        {issued.length === 0 && <Text c="dimmed">No version issued yet.</Text>}
        {issued.map((r) => (
          <IssuedCard key={r.id} report={r} onPreview={() => setPreviewId(r.id)} extra={extra} />
        ))}
      </Stack>
    </Stack>
  );
}

/** One issued version: who issued it when, its fingerprint, preview and download, and the slot (e.g. send to owner). */
function IssuedCard({ report: r, onPreview, extra }: { report: ReportDto; onPreview: () => void; extra?: (issued: ReportDto) => React.ReactNode }) {
  const dates = useDates();
  return (
    <Card withBorder padding="sm">
      <Group justify="space-between" wrap="wrap">
        <Stack gap={0}>
          <Text fw={700}>Version {r.version}</Text>
          <Text size="sm" c="dimmed">
            Issued {r.issuedAt && dates.dateTime(r.issuedAt)}
            {r.createdBy ? ` by ${r.createdBy.name}` : ''} · {kb(r.byteSize)}
          </Text>
          {r.fingerprint && (
            <Text size="xs" c="dimmed" ff="monospace" style={{ wordBreak: 'break-all' }}>
              Fingerprint {r.fingerprint}
            </Text>
          )}
        </Stack>
        {r.state === 'rendering' && <Rendering report={r} />}
        {r.state === 'ready' && r.urls.download && (
          <Group gap="xs">
            <Button variant="light" size="md" onClick={onPreview}>
              Preview
            </Button>
            <Button component="a" href={r.urls.download} size="md" leftSection={<IconDownload />}>
              Download
            </Button>
          </Group>
        )}
      </Group>
      {r.state === 'ready' && extra?.(r)}
    </Card>
  );
}
