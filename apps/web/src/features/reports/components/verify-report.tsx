import type { VerifyResult } from '@benchproof/contracts';
import { Alert, Button, FileButton, Group, Stack, Text, TextInput, Title } from '@mantine/core';
import { IconCircleCheck, IconFileSearch, IconAlertTriangle } from '@tabler/icons-react';
import { ApiError } from '../../../lib/api-client';
import { useVerify } from './use-verify';
import { useDates } from '../../../lib/dates';

function Answer({ result }: { result: VerifyResult }) {
  const dates = useDates();
  if (!result.issued) {
    return (
      <Alert color="red" icon={<IconAlertTriangle />} title="Not a report we issued">
        No issued bench report matches this file or fingerprint. A report that was changed in any way — even one byte — no longer matches.
      </Alert>
    );
  }
  return (
    <Alert color="teal" icon={<IconCircleCheck />} title="Genuine report">
      <Text>
        Issued by <b>{result.shopName}</b>
      </Text>
      <Text>
        Job {result.jobNumber} · version {result.version}
      </Text>
      <Text>Issued on {dates.date(result.issuedAt)}</Text>
    </Alert>
  );
}

/** The public check: drop in the PDF or type the fingerprint; answers only who issued it, for which job, and when. */
export function VerifyReport({ initialCode }: { initialCode?: string }) {
  const { typed, setTyped, fieldError, answer, checkTyped, checkFile, busy } = useVerify(initialCode);

  return (
    <Stack gap="lg" maw={640}>
      <Title order={2}>Check a bench report</Title>
      <Text>Choose the PDF you were given. It is checked in this browser; the file is not uploaded.</Text>
      <FileButton accept="application/pdf" onChange={(f) => f && checkFile(f)}>
        {(props) => (
          <Button {...props} size="lg" leftSection={<IconFileSearch />} loading={busy}>
            Choose the PDF
          </Button>
        )}
      </FileButton>
      <Text c="dimmed">Or type the fingerprint printed on the report’s last page.</Text>
      <Group align="flex-start" wrap="wrap">
        <TextInput
          label="Fingerprint"
          value={typed}
          onChange={(e) => setTyped(e.currentTarget.value)}
          error={fieldError}
          size="md"
          style={{ flex: 1, minWidth: 240 }}
          ff="monospace"
          autoComplete="off"
        />
        <Button size="md" mt={28} onClick={checkTyped} loading={busy}>
          Check
        </Button>
      </Group>
      {answer.error && <Alert color="red">{answer.error instanceof ApiError ? answer.error.message : 'The check could not be made. Try again.'}</Alert>}
      {answer.data && !busy && <Answer result={answer.data} />}
    </Stack>
  );
}
