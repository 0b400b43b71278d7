import { ROLE_LABELS, roleCan } from '@benchproof/contracts';
import { useUsers } from '../../features/users';

/** Staff pickers shared by the jobs pages: who can wrench, who can sign a final check, names by id. */
export function useStaff() {
  const { data: users = [] } = useUsers();
  const active = users.filter((u) => u.active && roleCan(u.role, 'work_log.record'));
  return {
    mechanics: active.map((u) => ({ value: String(u.id), label: u.role === 'mechanic' ? u.name : `${u.name} (${ROLE_LABELS[u.role]})` })),
    checkers: active.filter((u) => roleCan(u.role, 'jobs.final_check')).map((u) => u.name),
    staffName: (id: number | null) => users.find((u) => u.id === id)?.name ?? 'a colleague',
  };
}
