import { Alert, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { IconCalendarDue } from '@tabler/icons-react';
import dayjs from 'dayjs';
import { QueryState } from '../../../components/query-state';
import { useBikeHistory } from '../api/bikes';
import { BikeVisitsTable } from './bike-visits';
import { WearChart } from './wear-chart';
import { useDates } from '../../../lib/dates';

function NextChainDue({ due }: { due: NonNullable<ReturnType<typeof useBikeHistory>['data']>['nextChainDue'] }) {
  const dates = useDates();
  if (!due)
    return (
      <Text size="sm" c="dimmed">
        Not enough chain readings yet to tell when the next chain is due.
      </Text>
    );
  const dueNow = !dayjs(due.dueOn).isAfter(dayjs(), 'day');
  return (
    <Alert icon={<IconCalendarDue />} color="bench" variant="light" title={dueNow ? 'Chain due now' : `Next chain likely due around ${dates.date(due.dueOn)}`}>
      {due.basis}
      {due.ratePctPer30Days > 0 && ` Wear rising about ${due.ratePctPer30Days.toFixed(2)} % a month towards the ${due.limitPct} % replace-at limit.`} An
      estimate from past visits, not a promise; the chain maker's instructions govern.
    </Alert>
  );
}

/** The bike's visits and its wear trend across them. */
export function BikeHistoryPanel({ bikeId }: { bikeId: number }) {
  const history = useBikeHistory(bikeId);
  const data = history.data;
  if (!data) return <QueryState isLoading={history.isLoading} error={history.error} />;
  return (
    <Stack>
      <Title order={3}>Wear across visits</Title>
      <NextChainDue due={data.nextChainDue} />
      {data.series.length === 0 ? (
        <Text c="dimmed">No measurements recorded yet.</Text>
      ) : (
        <SimpleGrid cols={{ base: 1, md: 2 }}>
          {data.series.map((s) => (
            <WearChart key={s.key} series={s} />
          ))}
        </SimpleGrid>
      )}
      <Title order={3}>Visits</Title>
      <BikeVisitsTable jobs={data.jobs} />
    </Stack>
  );
}
