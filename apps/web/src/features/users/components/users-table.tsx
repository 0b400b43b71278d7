import { ROLE_LABELS, ROLES, type Role, type UserDto } from '@benchproof/contracts';
import { Alert, Badge, Button, Card, Group, Select, Stack, Table, Text, useMatches } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { ApiError } from '../../../lib/api-client';
import classes from './users-table.module.css';
import { useSendResetLink, useUpdateUser, useUsers } from '../api/users';

const roleOptions = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

function useUpdateWithFeedback() {
  const update = useUpdateUser();
  const run = (id: number, patch: { role?: Role; active?: boolean }) =>
    update.mutate(
      { id, ...patch },
      { onError: (e) => notifications.show({ color: 'red', title: 'Not changed', message: e instanceof ApiError ? e.message : 'Try again.' }) },
    );
  return { run, pending: update.isPending };
}

/** The role choice, status and actions of one person: the same on a table row (wide) and a card (phone). */
function useUserParts(user: UserDto, me: number, size?: 'lg') {
  const { run, pending } = useUpdateWithFeedback();
  const role = (
    <Select
      aria-label={`Role of ${user.name}`}
      size={size}
      data={roleOptions}
      value={user.role}
      allowDeselect={false}
      disabled={!user.active || pending}
      onChange={(v) => v && run(user.id, { role: v })}
    />
  );
  const status = user.active ? <Badge color="bench">Active</Badge> : <Badge color="gray">Deactivated</Badge>;
  const actions = (
    <>
      {user.active && user.id !== me && <ResetLinkButton user={user} size={size} />}
      <Button
        size={size}
        variant="light"
        color={user.active ? 'red' : 'bench'}
        disabled={pending || user.id === me}
        onClick={() => run(user.id, { active: !user.active })}
      >
        {user.active ? 'Deactivate' : 'Reactivate'}
      </Button>
    </>
  );
  return { role, status, actions };
}

function Person({ user }: { user: UserDto }) {
  return (
    <div>
      <Text fw={600}>{user.name}</Text>
      <Text size="sm" c="dimmed" className={classes.email}>
        {user.email}
      </Text>
    </div>
  );
}

function UserRow({ user, me }: { user: UserDto; me: number }) {
  const { role, status, actions } = useUserParts(user, me);
  return (
    <Table.Tr opacity={user.active ? 1 : 0.55}>
      <Table.Td>
        <Person user={user} />
      </Table.Td>
      <Table.Td miw={150}>{role}</Table.Td>
      <Table.Td>{status}</Table.Td>
      <Table.Td>
        <Group justify="flex-end" gap="xs">
          {actions}
        </Group>
      </Table.Td>
    </Table.Tr>
  );
}

/** On a phone each person is a card: the four columns ran off a 390 px screen. */
function UserCard({ user, me }: { user: UserDto; me: number }) {
  const { role, status, actions } = useUserParts(user, me, 'lg');
  return (
    <Card withBorder padding="sm" opacity={user.active ? 1 : 0.55}>
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" wrap="nowrap">
          <Person user={user} />
          {status}
        </Group>
        {role}
        <Group gap="xs">{actions}</Group>
      </Stack>
    </Card>
  );
}

/** Mails the person a link to choose a new password; nobody sees or types it for them. */
function ResetLinkButton({ user, size }: { user: UserDto; size?: 'lg' }) {
  const send = useSendResetLink();
  const done = () => notifications.show({ color: 'teal', title: 'Link sent', message: `${user.name} can now choose a new password from their e-mail.` });
  return (
    <Button size={size} variant="default" loading={send.isPending} onClick={() => send.mutate(user.id, { onSuccess: done })}>
      Send password link
    </Button>
  );
}

export function UsersTable({ me }: { me: number }) {
  const users = useUsers();
  const phone = useMatches({ base: true, sm: false });
  if (users.error) return <Alert color="red">{users.error.message}</Alert>;
  if (phone) {
    return (
      <Stack gap="sm">
        {users.data?.map((u) => (
          <UserCard key={u.id} user={u} me={me} />
        ))}
      </Stack>
    );
  }
  return (
    <Table verticalSpacing="sm" highlightOnHover>
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Person</Table.Th>
          <Table.Th>Role</Table.Th>
          <Table.Th>Status</Table.Th>
          <Table.Th />
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {users.data?.map((u) => (
          <UserRow key={u.id} user={u} me={me} />
        ))}
      </Table.Tbody>
    </Table>
  );
}
