import { ROLE_LABELS, ROLES, type Role, type UserDto } from '@benchproof/contracts';
import { Alert, Badge, Button, Group, Select, Table, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { ApiError } from '../../../lib/api-client';
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

function UserRow({ user, me }: { user: UserDto; me: number }) {
  const { run, pending } = useUpdateWithFeedback();
  return (
    <Table.Tr opacity={user.active ? 1 : 0.55}>
      <Table.Td>
        <Text fw={600}>{user.name}</Text>
        <Text size="sm" c="dimmed">
          {user.email}
        </Text>
      </Table.Td>
      <Table.Td miw={150}>
        <Select
          aria-label={`Role of ${user.name}`}
          data={roleOptions}
          value={user.role}
          allowDeselect={false}
          disabled={!user.active || pending}
          onChange={(v) => v && run(user.id, { role: v })}
        />
      </Table.Td>
      <Table.Td>{user.active ? <Badge color="bench">Active</Badge> : <Badge color="gray">Deactivated</Badge>}</Table.Td>
      <Table.Td>
        <Group justify="flex-end" gap="xs">
          {user.active && user.id !== me && <ResetLinkButton user={user} />}
          <Button
            variant="light"
            color={user.active ? 'red' : 'bench'}
            disabled={pending || user.id === me}
            onClick={() => run(user.id, { active: !user.active })}
          >
            {user.active ? 'Deactivate' : 'Reactivate'}
          </Button>
        </Group>
      </Table.Td>
    </Table.Tr>
  );
}

/** Mails the person a link to choose a new password; nobody sees or types it for them. */
function ResetLinkButton({ user }: { user: UserDto }) {
  const send = useSendResetLink();
  const done = () => notifications.show({ color: 'teal', title: 'Link sent', message: `${user.name} can now choose a new password from their e-mail.` });
  return (
    <Button variant="default" loading={send.isPending} onClick={() => send.mutate(user.id, { onSuccess: done })}>
      Send password link
    </Button>
  );
}

export function UsersTable({ me }: { me: number }) {
  const users = useUsers();
  if (users.error) return <Alert color="red">{users.error.message}</Alert>;
  return (
    <Table.ScrollContainer minWidth={560}>
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
    </Table.ScrollContainer>
  );
}
