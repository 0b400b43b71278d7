import { DEMO_BIKES, DEMO_JOBS, DEMO_OWNERS } from './records';
import { DEMO_SHOPS } from './staff';

// The seed falls back to the manager when a mechanic's e-mail is unknown, so a typo here
// would quietly change who did the work; these checks catch it before the demo does.
describe('demo records refer to each other', () => {
  const staffOf = (shop: string) => new Set(DEMO_SHOPS.find((s) => s.key === shop)?.staff.map((p) => p.email));

  it.each(DEMO_JOBS.map((j, i) => [i, j] as const))('job %i names a known bike and staff of its own shop', (_i, job) => {
    const bike = DEMO_BIKES.find((b) => b.key === job.bike);
    expect(bike).toBeDefined();
    expect(DEMO_OWNERS.map((o) => o.key)).toContain(bike?.owner);
    for (const email of [job.mechanic, job.checker].filter((e): e is string => !!e)) expect(staffOf(job.shop)).toContain(email);
  });

  it('decisions are made by the bike owner', () => {
    for (const job of DEMO_JOBS) {
      const owner = DEMO_OWNERS.find((o) => o.key === DEMO_BIKES.find((b) => b.key === job.bike)?.owner);
      for (const f of job.findings ?? []) if (f.recommendation?.decision) expect(f.recommendation.decision.decidedByName).toBe(owner?.name);
    }
  });

  it('keys are unique', () => {
    expect(new Set(DEMO_OWNERS.map((o) => o.key)).size).toBe(DEMO_OWNERS.length);
    expect(new Set(DEMO_BIKES.map((b) => b.key)).size).toBe(DEMO_BIKES.length);
  });
});
