import { IMPORT_FIELD_LABELS, type ImportField, type ImportRow } from '@benchproof/contracts';
import { Stack, Table, Text } from '@mantine/core';

const fieldLabel = (f: string): string => IMPORT_FIELD_LABELS[f as ImportField] ?? f;

function RowStatus({ row }: { row: ImportRow }) {
  if (row.problems.length)
    return (
      <Stack gap={2}>
        {row.problems.map((p) => (
          <Text key={p.field + p.message} size="sm" c="red.8">
            {fieldLabel(p.field)}: {p.message}
          </Text>
        ))}
      </Stack>
    );
  if (row.customer.kind === 'existing')
    return (
      <Text size="sm" fw={600} c="blue.9">
        Matches {row.customer.name}
      </Text>
    );
  return (
    <Text size="sm" fw={600} c="teal.9">
      New customer
    </Text>
  );
}

/**
 * Every row of the file with what importing it would do, or what is wrong with it. Three narrow columns and
 * wrapping text, so a phone shows each row's problems without scrolling sideways.
 */
export function ImportRowsTable({ rows }: { rows: ImportRow[] }) {
  return (
    <Table.ScrollContainer minWidth={300}>
      <Table verticalSpacing="xs" striped>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Line</Table.Th>
            <Table.Th>Owner and bike</Table.Th>
            <Table.Th>Result</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((r) => (
            <Table.Tr key={r.line} data-testid="import-row" data-problems={r.problems.length}>
              <Table.Td>{r.line}</Table.Td>
              <Table.Td>
                <Text size="sm" fw={600}>
                  {r.customerName || '—'}
                </Text>
                <Text size="sm">{r.bikeLabel ?? '—'}</Text>
              </Table.Td>
              <Table.Td>
                <RowStatus row={r} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
