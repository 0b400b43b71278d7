import { VerifyHashSchema, type VerifyResult } from '@benchproof/contracts';
import { Alert, Button, FileButton, Group, Stack, Text, TextInput, Title } from '@mantine/core';
import { IconCircleCheck, IconFileSearch, IconAlertTriangle } from '@tabler/icons-react';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { verifyReport } from '../api/reports';

/** SHA-256 of a file, computed in this browser (Web Crypto); the file never leaves the device. */
async function sha256Hex(file: File): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', await file.arrayBuffer());
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

function Answer({ result }: { result: VerifyResult }) {
  if (!result.issued) {
    return (
      <Alert color="red" icon={<IconAlertTriangle />} title="Not a report we issued">
        No issued bench report matches this file or fingerprint. A report that was changed in any way — even one byte — no longer matches.
      </Alert>
    );
  }
  return (
    <Alert color="teal" icon={<IconCircleCheck />} title="Genuine report">
      <Text>Issued by <b>{result.shopName}</b></Text>
      <Text>Job {result.jobNumber} · version {result.version}</Text>
      <Text>Issued on {new Date(result.issuedAt).toLocaleDateString(undefined, { dateStyle: 'long' })}</Text>
    </Alert>
  );
}

/** The public check: drop in the PDF or type the fingerprint; answers only who issued it, for which job, and when. */
export function VerifyReport({ initialCode }: { initialCode?: string }) {
  const initial = VerifyHashSchema.safeParse(initialCode ?? '');
  const [typed, setTyped] = useState(initialCode ?? '');
  const [fieldError, setFieldError] = useState<string | null>(null);
  const [hash, setHash] = useState<string | null>(initial.success ? initial.data : null);
  const [hashing, setHashing] = useState(false);
  const answer = useQuery({ queryKey: ['verify', hash], queryFn: () => verifyReport(hash ?? ''), enabled: hash !== null, retry: false, staleTime: Infinity });

  const checkTyped = () => {
    const parsed = VerifyHashSchema.safeParse(typed);
    setFieldError(parsed.success ? null : (parsed.error.issues[0]?.message ?? 'Not a fingerprint'));
    if (parsed.success) setHash(parsed.data);
  };
  const checkFile = (file: File) => {
    setHashing(true);
    void sha256Hex(file)
      .then(setHash)
      .finally(() => setHashing(false));
  };
  const busy = hashing || answer.isFetching;

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
