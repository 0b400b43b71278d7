import { IMPORT_FIELD_LABELS, IMPORT_FIELDS, type ImportField, type ImportMapping } from '@benchproof/contracts';
import { Select, SimpleGrid } from '@mantine/core';

const OPTIONS = [{ value: '', label: 'Do not import' }, ...IMPORT_FIELDS.map((f) => ({ value: f, label: IMPORT_FIELD_LABELS[f] }))];

/** One picker per column of the file: which of our fields it feeds. */
export function ColumnMapping({ columns, mapping, onChange }: { columns: string[]; mapping: ImportMapping; onChange: (m: ImportMapping) => void }) {
  return (
    <SimpleGrid cols={{ base: 1, sm: 2, md: 3 }} spacing="sm">
      {columns.map((column) => (
        <Select
          key={column}
          label={`Column “${column}”`}
          size="md"
          data={OPTIONS}
          value={mapping[column] ?? ''}
          allowDeselect={false}
          onChange={(v) => onChange({ ...mapping, [column]: (v ?? '') as ImportField | '' })}
        />
      ))}
    </SimpleGrid>
  );
}
