import { IMPORT_FIELD_LABELS, type ImportField, type ImportRow } from '@benchproof/contracts';
import { Badge, Stack, Table, Text } from '@mantine/core';

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
      <Badge color="blue" variant="light">
        Matches {row.customer.name}
      </Badge>
    );
  return (
    <Badge color="teal" variant="light">
      New customer
    </Badge>
  );
}

/** Every row of the file with what importing it would do, or what is wrong with it. */
export function ImportRowsTable({ rows }: { rows: ImportRow[] }) {
  return (
    <Table.ScrollContainer minWidth={520}>
      <Table verticalSpacing="xs" striped>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Line</Table.Th>
            <Table.Th>Owner</Table.Th>
            <Table.Th>Bike</Table.Th>
            <Table.Th>Result</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((r) => (
            <Table.Tr key={r.line} data-testid="import-row" data-problems={r.problems.length}>
              <Table.Td>{r.line}</Table.Td>
              <Table.Td>{r.customerName || '—'}</Table.Td>
              <Table.Td>{r.bikeLabel ?? '—'}</Table.Td>
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
