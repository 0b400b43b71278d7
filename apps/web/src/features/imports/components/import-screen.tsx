import type { ImportMapping, ImportPreview, ImportSummary } from '@benchproof/contracts';
import { Alert, Anchor, Button, FileButton, Group, Stack, Text, Title } from '@mantine/core';
import { IconCircleCheck, IconFileUpload, IconTableImport } from '@tabler/icons-react';
import { useState } from 'react';
import { usePreviewImport, useRunImport } from '../api/imports';
import { ColumnMapping } from './column-mapping';
import { ImportRowsTable } from './import-rows-table';

/** "1 bike", "3 bikes": the counts read as sentences. */
const n = (count: number, one: string, many: string) => `${count} ${count === 1 ? one : many}`;

function Counts({ preview }: { preview: ImportPreview }) {
  const c = preview.counts;
  return (
    <Text>
      {n(c.rows, 'row', 'rows')}: <b>{c.valid} ready</b> ({n(c.newCustomers, 'new customer', 'new customers')}, {c.matchedCustomers} matched to customers on
      file, {n(c.bikes, 'bike', 'bikes')}) and <b>{c.withProblems} with problems</b>, {c.withProblems === 1 ? 'which is' : 'which are'} left out.
    </Text>
  );
}

function Summary({ summary }: { summary: ImportSummary }) {
  return (
    <Alert color="teal" variant="light" icon={<IconCircleCheck />} title="Imported" role="status">
      {n(summary.customersCreated, 'new customer', 'new customers')}, {n(summary.customersMatched, 'row', 'rows')} added to customers already on file,{' '}
      {n(summary.bikesCreated, 'bike', 'bikes')}.
      {summary.rowsSkipped > 0 && ` ${n(summary.rowsSkipped, 'row was', 'rows were')} left out (lines ${summary.skippedLines.join(', ')}).`}
    </Alert>
  );
}

function PickFile({ sampleUrl, onFile }: { sampleUrl: string; onFile: (f: File | null) => void }) {
  return (
    <Group>
      <FileButton onChange={onFile} accept=".csv,text/csv">
        {(props) => (
          <Button size="lg" leftSection={<IconFileUpload />} {...props}>
            Choose a CSV file
          </Button>
        )}
      </FileButton>
      <Anchor href={sampleUrl} download>
        Download a sample file
      </Anchor>
    </Group>
  );
}

/** Pick a CSV, check the column mapping and every row, then import the good rows in one go. */
export function ImportScreen({ sampleUrl }: { sampleUrl: string }) {
  const [csv, setCsv] = useState<string | null>(null);
  const [mapping, setMapping] = useState<ImportMapping | undefined>(undefined);
  const preview = usePreviewImport();
  const run = useRunImport();
  const load = async (file: File | null) => {
    if (!file) return;
    const text = await file.text();
    setCsv(text);
    run.reset();
    preview.mutate({ csv: text }, { onSuccess: (p) => setMapping(p.mapping) });
  };
  const remap = (m: ImportMapping) => {
    setMapping(m);
    if (csv) preview.mutate({ csv, mapping: m });
  };
  const p = preview.data;
  return (
    <Stack>
      <PickFile sampleUrl={sampleUrl} onFile={(f) => void load(f)} />
      {preview.error && <Alert color="red">{preview.error.message}</Alert>}
      {run.data && <Summary summary={run.data} />}
      {p && mapping && !run.data && (
        <>
          <Title order={3}>Which column is what</Title>
          <ColumnMapping columns={p.columns} mapping={mapping} onChange={remap} />
          <Counts preview={p} />
          <ImportRowsTable rows={p.rows} />
          {run.error && <Alert color="red">{run.error.message}</Alert>}
          <Button
            size="lg"
            leftSection={<IconTableImport />}
            disabled={p.counts.valid === 0 || preview.isPending}
            loading={run.isPending}
            onClick={() => csv && run.mutate({ csv, mapping })}
          >
            Import {p.counts.valid} rows
          </Button>
        </>
      )}
    </Stack>
  );
}
