import { formatMoney } from '@benchproof/domain';
import { Button, Center, Group, Loader, Stack, Text, Title } from '@mantine/core';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useOwnerPage } from '../api/owner-page';
import { ConfirmDecisions } from './confirm-decisions';
import { ConsentCard } from './consent-card';
import { LinkProblem } from './link-problem';
import classes from './owner.module.css';
import { OwnerFindingCard } from './owner-finding';
import { BikeAndJob, BrandBar, Measurements, Pairs, ReportAndContact } from './owner-sections';
import { useChoices } from './use-choices';

/** The owner's private page for one job, phone-first: evidence, decisions, consent. */
export function OwnerPage({ token }: { token: string }) {
  const page = useOwnerPage(token);
  if (page.error) {
    const e = page.error instanceof ApiError ? page.error : new ApiError(0, 'NETWORK', 'No connection.');
    return <LinkProblem code={e.code} message={e.message} />;
  }
  if (!page.data)
    return (
      <Center h="60vh">
        <Loader aria-label="Loading your bike’s page" />
      </Center>
    );
  return <OwnerPageBody token={token} page={page.data} refetch={() => void page.refetch()} />;
}

function OwnerPageBody({ token, page, refetch }: { token: string; page: NonNullable<ReturnType<typeof useOwnerPage>['data']>; refetch: () => void }) {
  const c = useChoices(page.findings);
  const [confirming, setConfirming] = useState(false);
  const [sent, setSent] = useState(false);
  // Unsafe items first: "do not ride" must be the first thing the owner reads.
  const findings = [...page.findings].sort((a, b) => Number(b.doNotRide) - Number(a.doNotRide));
  const currency = page.findings.find((f) => f.recommendation)?.recommendation?.currency ?? 'EUR';
  return (
    <div className={classes.page}>
      <BrandBar page={page} />
      <Stack gap="lg">
        <BikeAndJob page={page} />
        {sent && (
          <Text fw={600} c="teal" role="status">
            Thank you — the shop has your answers.
          </Text>
        )}
        {page.findings.length > 0 && (
          <Stack gap="sm">
            <Title order={2} size="h3">
              What we found
            </Title>
            {findings.map((f) => (
              <OwnerFindingCard
                key={f.id}
                finding={f}
                choice={f.recommendation ? c.choices[f.recommendation.id] : undefined}
                onChoose={(ch) => f.recommendation && c.choose(f.recommendation.id, ch)}
              />
            ))}
          </Stack>
        )}
        <Measurements page={page} />
        <Pairs page={page} />
        <ConsentCard token={token} consent={page.consent} />
        <ReportAndContact page={page} />
      </Stack>
      {c.pending.length > 0 && (
        <div className={classes.stickyBar}>
          <Group className={classes.stickyInner} justify="space-between" wrap="nowrap">
            <div>
              <Text size="sm" c="dimmed">
                {c.chosen.length} of {c.pending.length} answered
              </Text>
              <Text fw={700} size="lg" data-testid="running-total">
                Approved: {formatMoney(c.approvedMinor, currency)}
              </Text>
            </div>
            <Button size="lg" mih={52} disabled={c.chosen.length === 0} onClick={() => setConfirming(true)}>
              Confirm
            </Button>
          </Group>
        </div>
      )}
      <ConfirmDecisions
        token={token}
        opened={confirming}
        onClose={() => setConfirming(false)}
        onDone={() => {
          setConfirming(false);
          setSent(true);
          c.reset();
        }}
        onPriceChanged={() => {
          c.reset();
          refetch();
        }}
        chosen={c.chosen}
        choices={c.choices}
        approvedMinor={c.approvedMinor}
        currency={currency}
      />
    </div>
  );
}
