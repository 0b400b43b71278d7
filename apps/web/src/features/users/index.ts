export { usersQuery, useUsers } from './api/users';
export { AddUserForm } from './components/add-user-form';
export { UsersTable } from './components/users-table';
