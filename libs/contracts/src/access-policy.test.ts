import { ACCESS_POLICY, ACTIONS, actorCan, roleCan, rolesFor, type Actor } from './access-policy';

const owner: Actor = { kind: 'owner', shopId: 1, jobId: 7 };
const staff = (role: 'manager' | 'desk' | 'mechanic'): Actor => ({ kind: 'staff', shopId: 1, userId: 2, role });

describe('ACCESS_POLICY', () => {
  it('lets an owner link do the owner-facing actions and nothing else', () => {
    expect(ACTIONS.filter((a) => actorCan(owner, a))).toEqual(['owner.view', 'owner.decide', 'owner.consent', 'owner.pay']);
  });

  it('never lets staff act as the owner', () => {
    for (const role of ['manager', 'desk', 'mechanic'] as const) {
      expect(ACTIONS.filter((a) => a.startsWith('owner.') && actorCan(staff(role), a))).toEqual([]);
    }
  });

  it('gives every action someone who may do it', () => {
    expect(ACTIONS.filter((a) => ACCESS_POLICY[a].staff.length === 0 && !ACCESS_POLICY[a].owner)).toEqual([]);
  });

  it.each([
    ['jobs.book_in', ['manager', 'desk']],
    ['jobs.final_check', ['manager', 'mechanic']],
    ['jobs.reopen_evidence', ['manager']],
    ['users.manage', ['manager']],
    ['inspection.record', ['manager', 'mechanic']],
    ['recommendations.decide', ['manager', 'desk']],
  ] as const)('%s stays with %j, as the routes had it before the policy table', (action, roles) => {
    expect(rolesFor(action)).toEqual(roles);
    expect(roleCan('mechanic', action)).toBe((roles as readonly string[]).includes('mechanic'));
  });
});
