import { SHOWCASE_SIZES, type ShowcaseDownloadDto, type ShowcaseSize } from '@benchproof/contracts';
import { Alert, List, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { useDates } from '../../../lib/dates';

const WHAT: Record<string, string> = { pair: 'Before and after together', before: 'Before shot alone', after: 'After shot alone' };
const sizeLabel = (s: string) => (s in SHOWCASE_SIZES ? SHOWCASE_SIZES[s as ShowcaseSize].label : s);

/** Past exports of a job's photos (audit): what to take down after the owner withdraws consent. */
export const useJobDownloads = (jobId: number) =>
  useQuery({ queryKey: ['showcase', 'downloads', jobId], queryFn: () => api<ShowcaseDownloadDto[]>(`/showcase/jobs/${jobId}/downloads`) });

/**
 * The take-down list: every showcase file made from this job, newest first, with when and in what form.
 * `withdrawn` turns the heading into the instruction the withdrawal gives.
 */
export function TakeDownList({ jobId, withdrawn }: { jobId: number; withdrawn: boolean }) {
  const dates = useDates();
  const downloads = useJobDownloads(jobId);
  const rows = [...(downloads.data ?? [])].reverse();
  return (
    <Stack gap={6} data-testid="take-down-list">
      <Title order={4}>Showcase files made from this job</Title>
      {withdrawn && rows.length > 0 && (
        <Alert color="orange" title="Take these down">
          The owner has withdrawn consent. Remove every photo below from wherever you published it (website, social media, print).
        </Alert>
      )}
      {downloads.isError && <Alert color="red">{downloads.error.message}</Alert>}
      {downloads.isSuccess && rows.length === 0 && (
        <Text size="sm" c="dimmed">
          No showcase files have been made from this job.
        </Text>
      )}
      {rows.length > 0 && (
        <List size="sm" spacing={4}>
          {rows.map((d, i) => (
            <List.Item key={`${d.at}-${i}`}>
              {dates.dateTime(d.at)} · pair {d.pairId} · {WHAT[d.variant] ?? d.variant} · {sizeLabel(d.size)} · {Math.max(1, Math.round(d.bytes / 1024))} KB
            </List.Item>
          ))}
        </List>
      )}
    </Stack>
  );
}
