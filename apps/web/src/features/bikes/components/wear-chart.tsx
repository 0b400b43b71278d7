import '@mantine/charts/styles.css';
import type { WearSeries } from '@benchproof/contracts';
import { LineChart } from '@mantine/charts';
import { Paper, Stack, Text, Title } from '@mantine/core';
import { CONDITION_LABELS } from '@benchproof/domain';
import { useDates } from '../../../lib/dates';

/** One repeated measurement across visits, with the limit the verdicts used drawn as a line. */
export function WearChart({ series }: { series: WearSeries }) {
  const dates = useDates();
  const data = series.points.map((p) => ({
    visit: `${dates.date(p.at)} · ${p.jobNumber}`,
    value: Math.round(p.value * 1000) / 1000,
    condition: CONDITION_LABELS[p.condition],
  }));
  const isLimitAbove = series.kind === 'chain_elongation';
  return (
    <Paper withBorder p="md">
      <Stack gap="xs">
        <Title order={4}>{series.label}</Title>
        {data.length < 2 && (
          <Text size="sm" c="dimmed">
            One reading so far; the trend shows from the second visit.
          </Text>
        )}
        <LineChart
          h={220}
          data={data}
          dataKey="visit"
          series={[{ name: 'value', label: `${series.label} (${series.unit})`, color: 'bench.7' }]}
          unit={` ${series.unit}`}
          curveType="linear"
          withDots
          referenceLines={
            series.limit === null
              ? []
              : [
                  {
                    y: series.limit,
                    label: isLimitAbove ? `Replace at ${series.limit} ${series.unit}` : `Minimum ${series.limit} ${series.unit}`,
                    color: 'red.8',
                  },
                ]
          }
          yAxisProps={{ width: 72, domain: [0, (max: number) => Math.ceil(Math.max(max, series.limit ?? 0) * 12) / 10] }}
          valueFormatter={(v) => v.toLocaleString('en-GB', { maximumFractionDigits: 2 })}
        />
        <Text size="sm" c="dimmed">
          {series.points
            .map((p) => `${p.jobNumber}: ${p.value.toLocaleString('en-GB', { maximumFractionDigits: 2 })} ${series.unit} (${CONDITION_LABELS[p.condition]})`)
            .join(' · ')}
        </Text>
      </Stack>
    </Paper>
  );
}
