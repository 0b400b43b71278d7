export { usersQuery, useUsers } from './api/users';
export { InviteForm } from './components/invite-form';
export { InvitationsList } from './components/invitations-list';
export { UsersTable } from './components/users-table';
