import type { CustomerDto, CustomerListQuery } from '@benchproof/contracts';
import { Anchor, Box, Card, Group, Pagination, Select, Stack, Table, Text, TextInput, UnstyledButton } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { IconSearch } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router';
import { QueryState } from '../../../components/query-state';
import { useCustomers } from '../api/customers';
import { useDates } from '../../../lib/dates';

type Sort = `${CustomerListQuery['sort']}:${CustomerListQuery['order']}`;
const SORTS: { value: Sort; label: string }[] = [
  { value: 'name:asc', label: 'Name A–Z' },
  { value: 'name:desc', label: 'Name Z–A' },
  { value: 'createdAt:desc', label: 'Newest first' },
  { value: 'createdAt:asc', label: 'Oldest first' },
];

function Rows({ items }: { items: CustomerDto[] }) {
  const dates = useDates();
  return (
    <Table.ScrollContainer minWidth={640}>
      <Table verticalSpacing="sm" highlightOnHover>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Name</Table.Th>
            <Table.Th>Phone</Table.Th>
            <Table.Th>E-mail</Table.Th>
            <Table.Th>Prefers</Table.Th>
            <Table.Th>Since</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {items.map((c) => (
            <Table.Tr key={c.id}>
              <Table.Td>
                <Anchor component={Link} to={`/customers/${c.id}`} fw={700}>
                  {c.name}
                </Anchor>
              </Table.Td>
              <Table.Td>{c.phone || '—'}</Table.Td>
              <Table.Td>{c.email || '—'}</Table.Td>
              <Table.Td>{c.preferredChannel === 'sms' ? 'Text' : c.preferredChannel === 'email' ? 'E-mail' : 'Phone'}</Table.Td>
              <Table.Td>{dates.month(c.createdAt)}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

function Cards({ items }: { items: CustomerDto[] }) {
  return (
    <Stack gap="sm">
      {items.map((c) => (
        <UnstyledButton key={c.id} component={Link} to={`/customers/${c.id}`}>
          <Card withBorder padding="md">
            <Text fw={700}>{c.name}</Text>
            <Text size="sm" c="dimmed">
              {[c.phone, c.email].filter(Boolean).join(' · ') || 'No contact details'}
            </Text>
          </Card>
        </UnstyledButton>
      ))}
    </Stack>
  );
}

/** Customers with search, sort and paging done by the server. */
export function CustomersTable({ pageSize = 20 }: { pageSize?: number }) {
  const [q, setQ] = useState('');
  const [debounced] = useDebouncedValue(q.trim(), 300);
  const [sort, setSort] = useState<Sort>('name:asc');
  const [page, setPage] = useState(1);
  const list = useCustomers({
    q: debounced || undefined,
    sort: sort.split(':')[0] as CustomerListQuery['sort'],
    order: sort.split(':')[1] as CustomerListQuery['order'],
    page,
    pageSize,
  });
  const pages = list.data ? Math.max(1, Math.ceil(list.data.total / list.data.pageSize)) : 1;
  return (
    <Stack>
      <Group grow preventGrowOverflow={false} wrap="wrap">
        <TextInput
          aria-label="Search customers"
          placeholder="Name, phone or e-mail"
          leftSection={<IconSearch size={18} />}
          value={q}
          onChange={(e) => {
            setQ(e.currentTarget.value);
            setPage(1);
          }}
          miw={220}
        />
        <Select aria-label="Sort" data={SORTS} value={sort} onChange={(v) => v && setSort(v)} allowDeselect={false} maw={220} />
      </Group>
      <QueryState isLoading={list.isLoading} error={list.error} />
      {list.data && list.data.items.length === 0 && <Text c="dimmed">No customers found.</Text>}
      {list.data && list.data.items.length > 0 && (
        <>
          <Box visibleFrom="sm">
            <Rows items={list.data.items} />
          </Box>
          <Box hiddenFrom="sm">
            <Cards items={list.data.items} />
          </Box>
        </>
      )}
      {pages > 1 && (
        <Group justify="center">
          <Pagination total={pages} value={page} onChange={setPage} size="lg" />
        </Group>
      )}
    </Stack>
  );
}
