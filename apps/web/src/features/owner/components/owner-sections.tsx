import type { OwnerPageDto } from '@benchproof/contracts';
import { GENERAL_SAFETY } from '@benchproof/domain';
import { Anchor, Button, Card, Group, Stack, Text, Title } from '@mantine/core';
import { Suspense } from 'react';
import { IconDownload, IconPhone } from '@tabler/icons-react';
import { ConditionBadge } from '../../../components/condition-badge';
import classes from './owner.module.css';
import { PairSlider } from './owner-lazy';
import { useDates } from '../../../lib/dates';

/** Shop name in its own colours, and a big tap-to-call button. */
export function BrandBar({ page }: { page: OwnerPageDto }) {
  const { shop } = page;
  return (
    <div className={classes.brandBar} style={{ background: shop.brandPrimary, borderBottom: `6px solid ${shop.brandAccent}` }}>
      <Group justify="space-between" wrap="nowrap">
        <Text fw={800} size="xl" c="#fff" miw={0}>
          {shop.name}
        </Text>
        {shop.phone && (
          <Button
            component="a"
            href={`tel:${shop.phone.replace(/[^+\d]/g, '')}`}
            size="md"
            mih={44}
            className={classes.keepWidth}
            color={shop.brandAccent}
            c="#1a1a1a"
            leftSection={<IconPhone size={20} />}
          >
            Call
          </Button>
        )}
      </Group>
    </div>
  );
}

export function BikeAndJob({ page }: { page: OwnerPageDto }) {
  const { bike, job } = page;
  return (
    <Stack gap={4}>
      <Text c="dimmed">
        Hello {page.ownerName.split(' ')[0]}, this is your bike’s page for job {job.number}.
      </Text>
      <Title order={1} size="h2">
        {[bike.maker, bike.model].join(' ')}
        {bike.year ? ` (${bike.year})` : ''}
      </Title>
      {job.reportedSymptoms && (
        <Card withBorder radius="md" padding="sm" mt="xs">
          <Text size="sm" c="dimmed">
            What you told us
          </Text>
          <Text>{job.reportedSymptoms}</Text>
        </Card>
      )}
    </Stack>
  );
}

export function Measurements({ page }: { page: OwnerPageDto }) {
  if (!page.measurements.length) return null;
  return (
    <Stack gap="sm">
      <Title order={2} size="h3">
        What we measured
      </Title>
      {page.measurements.map((m) => (
        <Card key={m.id} withBorder radius="md" padding="sm">
          <Stack gap={4}>
            <ConditionBadge condition={m.condition} />
            <Text fw={600}>{m.verdict}</Text>
            <Text size="sm" c="dimmed">
              {m.explanation}
            </Text>
          </Stack>
        </Card>
      ))}
    </Stack>
  );
}

export function Pairs({ page }: { page: OwnerPageDto }) {
  if (!page.pairs.length) return null;
  return (
    <Stack gap="sm">
      <Title order={2} size="h3">
        Before and after
      </Title>
      <Suspense fallback={null}>
        {page.pairs.map((p) => (
          <PairSlider key={p.id} pair={p} />
        ))}
      </Suspense>
    </Stack>
  );
}

export function ReportAndContact({ page }: { page: OwnerPageDto }) {
  const dates = useDates();
  return (
    <Stack gap="sm">
      {page.report && (
        <Button
          component="a"
          href={page.report.pdfUrl}
          size="lg"
          variant="light"
          leftSection={<IconDownload />}
          classNames={{ root: classes.wrapButton, label: classes.wrapLabel }}
        >
          Download the bench report (PDF)
        </Button>
      )}
      <Text size="sm" c="dimmed">
        {GENERAL_SAFETY}
      </Text>
      <Text size="sm">
        Questions?{' '}
        {page.shop.phone && (
          <Anchor className={classes.tapLink} href={`tel:${page.shop.phone.replace(/[^+\d]/g, '')}`}>
            {page.shop.phone}
          </Anchor>
        )}
        {page.shop.email && (
          <>
            {' '}
            · <Anchor href={`mailto:${page.shop.email}`}>{page.shop.email}</Anchor>
          </>
        )}
      </Text>
      <Text size="xs" c="dimmed">
        This private link works until {dates.date(page.expiresAt)}.
      </Text>
    </Stack>
  );
}
