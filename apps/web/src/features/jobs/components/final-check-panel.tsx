import { roleCan, type FinalCheckRequest, type JobDetail, type Role } from '@benchproof/contracts';
import { failedFinalCheckItems, FINAL_CHECK_ITEMS, FINAL_CHECK_ITEM_LABELS, type FinalCheckItem } from '@benchproof/domain';
import { Alert, Button, Checkbox, Group, Paper, Stack, Text, Textarea, Title } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck, IconCircleX } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { useFinalCheck } from '../api/jobs';
import { useDates } from '../../../lib/dates';

function Rule({ job, checkers }: { job: JobDetail; checkers: string[] }) {
  const mechanic = job.mechanic?.name;
  const eligible = job.finalCheckSecondPerson ? checkers.filter((n) => n !== mechanic) : checkers;
  const who = job.finalCheckSecondPerson ? `a second person — anyone but ${mechanic ?? 'the job’s mechanic'}` : 'any mechanic or manager';
  return (
    <Text size="sm">
      This shop asks for {who}
      {eligible.length ? ` (${eligible.join(', ')})` : ''}.
    </Text>
  );
}

function LastCheck({ job }: { job: JobDetail }) {
  const dates = useDates();
  const fc = job.finalCheck;
  if (!fc) return null;
  const failed = failedFinalCheckItems(fc.items);
  return (
    <Alert
      color={fc.passed ? 'teal' : 'red'}
      variant="light"
      icon={fc.passed ? <IconCircleCheck /> : <IconCircleX />}
      title={`${fc.passed ? 'Passed' : 'Failed'} — ${fc.checker.name}, ${dates.dateTime(fc.at)}`}
    >
      {failed.length > 0 && <Text size="sm">Not passed: {failed.map((i) => FINAL_CHECK_ITEM_LABELS[i]).join('; ')}</Text>}
      {fc.testRideNotes && <Text size="sm">Test ride: {fc.testRideNotes}</Text>}
      {fc.note && <Text size="sm">{fc.note}</Text>}
    </Alert>
  );
}

const noneTicked = () => Object.fromEntries(FINAL_CHECK_ITEMS.map((i) => [i, false])) as Record<FinalCheckItem, boolean>;

/** The checklist's ticks and notes, and sending them; a recorded check clears the form for the next one. */
function useFinalCheckForm(jobId: number) {
  const check = useFinalCheck(jobId);
  const [items, setItems] = useState(noneTicked);
  const [testRideNotes, setTestRideNotes] = useState('');
  const [note, setNote] = useState('');
  const send = (passed: boolean) => {
    const body: FinalCheckRequest = { items, passed, testRideNotes: testRideNotes || null, note: note || null };
    check.mutate(body, {
      onSuccess: () => {
        setItems(noneTicked());
        setNote('');
        setTestRideNotes('');
      },
    });
  };
  const error = check.error instanceof ApiError ? check.error : null;
  return { items, setItems, testRideNotes, setTestRideNotes, note, setNote, send, pending: check.isPending, error };
}

function CheckRefused({ error }: { error: ApiError }) {
  return (
    <Alert
      color="red"
      variant="filled"
      icon={<IconAlertTriangle />}
      role="alert"
      title={error.code === 'FINAL_CHECK_SAME_PERSON' ? 'Needs a second person' : 'Not recorded'}
    >
      {error.message}
    </Alert>
  );
}

function CheckForm({ job, blocked }: { job: JobDetail; blocked: boolean }) {
  const { items, setItems, testRideNotes, setTestRideNotes, note, setNote, send, pending, error } = useFinalCheckForm(job.id);
  const allPassed = FINAL_CHECK_ITEMS.every((i) => items[i]);
  return (
    <Stack gap="sm">
      {FINAL_CHECK_ITEMS.map((i) => (
        <Checkbox
          key={i}
          size="lg"
          label={FINAL_CHECK_ITEM_LABELS[i]}
          checked={items[i]}
          onChange={(e) => setItems({ ...items, [i]: e.currentTarget.checked })}
          disabled={blocked}
        />
      ))}
      <Textarea label="Test ride" autosize minRows={1} value={testRideNotes} onChange={(e) => setTestRideNotes(e.currentTarget.value)} disabled={blocked} />
      <Textarea
        label="Note"
        description="Needed when the check fails: what to redo"
        autosize
        minRows={2}
        value={note}
        onChange={(e) => setNote(e.currentTarget.value)}
        disabled={blocked}
        error={error?.fieldErrors().note}
      />
      <Group grow>
        <Button size="lg" color="teal" leftSection={<IconCircleCheck />} onClick={() => send(true)} loading={pending} disabled={blocked || !allPassed}>
          Passed
        </Button>
        <Button
          size="lg"
          color="red"
          variant="light"
          leftSection={<IconCircleX />}
          onClick={() => send(false)}
          loading={pending}
          disabled={blocked || !note.trim()}
        >
          Failed
        </Button>
      </Group>
      {error && <CheckRefused error={error} />}
    </Stack>
  );
}

/** The final check: who may do it, the last result, the checklist; the server's refusal is shown as it says it. */
export function FinalCheckPanel({ job, me, checkers }: { job: JobDetail; me: { id: number; role: Role }; checkers: string[] }) {
  const samePerson = job.finalCheckSecondPerson && job.mechanic?.id === me.id;
  const wrongRole = !roleCan(me.role, 'jobs.final_check');
  return (
    <Paper withBorder p="md">
      <Stack gap="sm">
        <Title order={3} size="h4">
          Final check
        </Title>
        <Rule job={job} checkers={checkers} />
        <LastCheck job={job} />
        {job.status !== 'final_check' && (
          <Text c="dimmed" size="sm">
            The check is signed off while the job is at Final check.
          </Text>
        )}
        {job.status === 'final_check' && samePerson && (
          <Alert color="brass" variant="light">
            You are this job’s mechanic, so someone else must sign the check off.
          </Alert>
        )}
        {job.status === 'final_check' && wrongRole && (
          <Alert color="gray" variant="light">
            A mechanic or manager signs the final check off.
          </Alert>
        )}
        {job.status === 'final_check' && <CheckForm job={job} blocked={wrongRole} />}
      </Stack>
    </Paper>
  );
}
