import type { OwnerFinding } from '@benchproof/contracts';
import { formatMoney, TERMINAL_STATUSES } from '@benchproof/domain';
import { Alert, Button, Center, Group, Loader, Skeleton, Stack, Text, Title } from '@mantine/core';
import { Suspense, useState, type ReactNode } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useOwnerPage } from '../api/owner-page';
import { Deferred } from './deferred';
import { LinkProblem } from './link-problem';
import classes from './owner.module.css';
import { OwnerFindingCard } from './owner-finding';
import { ConfirmDecisions, ConsentCard, loadConfirmDecisions } from './owner-lazy';
import { BikeAndJob, BrandBar, Measurements, Pairs, ReportAndContact } from './owner-sections';
import { useChoices, type Choice } from './use-choices';
import { DatesLocale } from '../../../lib/dates';

/** The owner's private page for one job, phone-first: evidence, decisions, consent. */
export function OwnerPage({ token, payment }: { token: string; payment?: ReactNode }) {
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
  return (
    <DatesLocale locale={page.data.shop.dateLocale}>
      <OwnerPageBody token={token} page={page.data} refetch={() => void page.refetch()} payment={payment} />
    </DatesLocale>
  );
}

/** About the consent card's height on a 390 px phone (measured in Chromium), so the page does not jump when it loads. */
const CONSENT_CARD_HEIGHT = 660;

type OwnerPageData = NonNullable<ReturnType<typeof useOwnerPage>['data']>;

/** The findings with the owner's choice on each; unsafe items first, since "do not ride" must be the first thing read. */
function FindingsToDecide({
  findings,
  choices,
  onChoose,
  closed,
}: {
  findings: OwnerFinding[];
  choices: Record<number, Choice>;
  onChoose: (recId: number, c: Choice) => void;
  closed: boolean;
}) {
  const sorted = [...findings].sort((a, b) => Number(b.doNotRide) - Number(a.doNotRide));
  return (
    <Stack gap="sm">
      <Title order={2} size="h3">
        What we found
      </Title>
      {sorted.map((f) => (
        <OwnerFindingCard
          key={f.id}
          finding={f}
          choice={f.recommendation ? choices[f.recommendation.id] : undefined}
          onChoose={(ch) => f.recommendation && onChoose(f.recommendation.id, ch)}
          closed={closed}
        />
      ))}
    </Stack>
  );
}

/** Stays at the bottom of the screen: how many answered, the running total, and the way to confirm. */
function AnswerBar({ answered, pending, approved, onConfirm }: { answered: number; pending: number; approved: string; onConfirm: () => void }) {
  return (
    <div className={classes.stickyBar}>
      <Group className={classes.stickyInner} justify="space-between" wrap="nowrap">
        <div>
          <Text size="sm" c="dimmed">
            {answered} of {pending} answered
          </Text>
          <Text fw={700} size="lg" data-testid="running-total">
            Approved: {approved}
          </Text>
        </div>
        <Button size="lg" mih={52} disabled={answered === 0} onClick={onConfirm}>
          Confirm
        </Button>
      </Group>
    </div>
  );
}

type Choices = ReturnType<typeof useChoices>;
type BodyProps = { token: string; page: OwnerPageData; refetch: () => void; payment?: ReactNode };

/**
 * The confirm dialog, whose code loads when the owner makes a first choice (so Confirm opens at once) and
 * stays mounted after the first opening, as it always was, so it keeps its ticks and transitions.
 */
function Decisions(props: {
  token: string;
  c: Choices;
  opened: boolean;
  everOpened: boolean;
  currency: string;
  onClose: () => void;
  onSent: () => void;
  refetch: () => void;
}) {
  const { c, opened } = props;
  if (!props.everOpened) return null;
  return (
    <Suspense fallback={null}>
      <ConfirmDecisions
        token={props.token}
        opened={opened}
        onClose={props.onClose}
        onDone={() => (props.onSent(), c.reset())}
        onPriceChanged={() => (c.reset(), props.refetch())}
        chosen={c.chosen}
        choices={c.choices}
        approvedMinor={c.approvedMinor}
        currency={props.currency}
      />
    </Suspense>
  );
}

/** Said at the top of a closed job's page: still readable, no more answers here. */
function ClosedNotice({ status }: { status: string }) {
  return (
    <Alert color="gray" title="This job is closed" role="status" data-testid="job-closed">
      {status === 'cancelled' ? 'The shop cancelled this job.' : 'Your bike has been handed back.'} You can still read the findings, see the photos and download
      the report. Items can no longer be approved or declined here: call the shop if something still needs doing.
    </Alert>
  );
}

const ThanksNote = () => (
  <Text fw={600} c="teal" role="status">
    Thank you — the shop has your answers.
  </Text>
);

/** `payment`: the payments feature's card (amount due, pay button, "paid"), handed in by the route. */
function OwnerPageBody({ token, page, refetch, payment }: BodyProps) {
  const closed = (TERMINAL_STATUSES as readonly string[]).includes(page.job.status);
  const c = useChoices(page.findings);
  const [confirming, setConfirming] = useState(false);
  const [everConfirmed, setEverConfirmed] = useState(false);
  const [sent, setSent] = useState(false);
  const currency = page.findings.find((f) => f.recommendation)?.recommendation?.currency ?? 'EUR';
  const choose = (recId: number, ch: Choice) => (void loadConfirmDecisions(), c.choose(recId, ch));
  return (
    <div className={classes.page}>
      <BrandBar page={page} />
      <Stack gap="lg">
        <BikeAndJob page={page} />
        {closed && <ClosedNotice status={page.job.status} />}
        {payment}
        {sent && <ThanksNote />}
        {page.findings.length > 0 && <FindingsToDecide findings={page.findings} choices={c.choices} onChoose={choose} closed={closed} />}
        <Measurements page={page} />
        {page.pairs.length > 0 && (
          <Deferred>
            <Pairs page={page} />
          </Deferred>
        )}
        <Deferred placeholder={<Skeleton h={CONSENT_CARD_HEIGHT} radius="md" data-testid="consent-placeholder" />}>
          <ConsentCard token={token} consent={page.consent} />
        </Deferred>
        <ReportAndContact page={page} />
      </Stack>
      {c.pending.length > 0 && !closed && (
        <AnswerBar
          answered={c.chosen.length}
          pending={c.pending.length}
          approved={formatMoney(c.totalApprovedMinor, currency)}
          onConfirm={() => (setConfirming(true), setEverConfirmed(true))}
        />
      )}
      <Decisions
        token={token}
        c={c}
        opened={confirming}
        everOpened={everConfirmed}
        currency={currency}
        onClose={() => setConfirming(false)}
        onSent={() => (setConfirming(false), setSent(true))}
        refetch={refetch}
      />
    </div>
  );
}
