import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';
import { ALL_PASS } from '../support/final-check';
import { bookIn } from './records-helpers';

const WORK = { description: 'Trued rear wheel', minutes: 15 };
const FINDING = { area: 'drivetrain', condition: 'worn', description: 'Chain at 0.5 % elongation' };

/** Books a job in and walks it to collected (handover), with a passed final check by a second mechanic. */
async function collectedJob(t: TestApp, desk: SignedIn, manager: SignedIn): Promise<number> {
  const job = await bookIn(desk);
  const checker = await t.signIn(DEMO.mechanic2);
  for (const to of ['on_stand', 'in_work', 'final_check', 'ready', 'collected']) {
    if (to === 'ready') await checker.agent.post(`/api/jobs/${job.id}/final-check`).send({ items: ALL_PASS, passed: true }).expect(201);
    // No report in this test: desk confirms the bike leaves without one.
    await manager.agent
      .post(`/api/jobs/${job.id}/transitions`)
      .send({ to, ...(to === 'collected' ? { confirmNoReport: true } : {}) })
      .expect(200);
  }
  return job.id;
}

describe('JobAccess: evidence freezes at handover', () => {
  let t: TestApp;
  let desk: SignedIn;
  let manager: SignedIn;
  let mechanic: SignedIn;
  let jobId: number;
  beforeAll(async () => {
    t = await startTestApp();
    [desk, manager, mechanic] = [await t.signIn(DEMO.desk), await t.signIn(DEMO.manager), await t.signIn(DEMO.mechanic)];
    jobId = await collectedJob(t, desk, manager);
  });
  afterAll(() => t.close());

  it('refuses staff changes to a collected job with JOB_CLOSED, naming what was refused', async () => {
    const j = `/api/jobs/${jobId}`;
    const attempts: [SignedIn, 'post' | 'patch', string, object, string][] = [
      [mechanic, 'post', `${j}/work-entries`, WORK, 'work_log'],
      [mechanic, 'post', `${j}/findings`, FINDING, 'finding'],
      [mechanic, 'patch', `${j}/media`, { ids: [1], caption: 'Rear hub after' }, 'media'],
      [mechanic, 'post', `${j}/media`, {}, 'media'],
      [desk, 'patch', j, { promisedOn: '2030-02-01' }, 'job'],
    ];
    for (const [who, method, path, body, what] of attempts) {
      const res = await who.agent[method](path).send(body);
      expect({ path, status: res.status, code: res.body.code, what: res.body.details?.what }).toEqual({ path, status: 409, code: 'JOB_CLOSED', what });
      expect(res.body.message).toMatch(/handed back/);
    }
  });

  it('still shows the frozen records', async () => {
    await mechanic.agent.get(`/api/jobs/${jobId}/work-entries`).expect(200);
    await mechanic.agent.get(`/api/jobs/${jobId}/findings`).expect(200);
  });

  it('lets a manager correct a collected job, and audits every override', async () => {
    const before = (await manager.agent.get(`/api/audit?entityType=job&entityId=${jobId}`).expect(200)).body as { action: string }[];
    await manager.agent.post(`/api/jobs/${jobId}/work-entries`).send(WORK).expect(201);
    const after = (await manager.agent.get(`/api/audit?entityType=job&entityId=${jobId}`).expect(200)).body as {
      action: string;
      userId: number;
      details: { what: string; status: string };
    }[];
    const overrides = after.filter((e) => e.action === 'job.closed_override');
    expect(overrides.length).toBe(before.filter((e) => e.action === 'job.closed_override').length + 1);
    expect(overrides.at(-1)).toMatchObject({ userId: manager.user.id, details: { what: 'work_log', status: 'collected' } });
  });

  it("writes no override entry when the manager's change itself fails (the record commits with the change)", async () => {
    const overrides = async () =>
      ((await manager.agent.get(`/api/audit?entityType=job&entityId=${jobId}`).expect(200)).body as { action: string }[]).filter(
        (e) => e.action === 'job.closed_override',
      ).length;
    const before = await overrides();
    const j = `/api/jobs/${jobId}`;
    // Each passes the closed-job check (manager override) and then fails on its own record.
    await manager.agent.delete(`${j}/work-entries/999999`).expect(404);
    await manager.agent.patch(`${j}/findings/999999`).send({ description: 'Chain replaced' }).expect(404);
    await manager.agent
      .patch(`${j}/media`)
      .send({ ids: [999999], caption: 'Rear hub after' })
      .expect(404);
    expect(await overrides()).toBe(before);
  });

  it('writes no override entry for changes to an open job', async () => {
    const open = await bookIn(desk);
    await mechanic.agent.post(`/api/jobs/${open.id}/work-entries`).send(WORK).expect(201);
    await manager.agent.post(`/api/jobs/${open.id}/work-entries`).send(WORK).expect(201);
    const log = (await manager.agent.get(`/api/audit?entityType=job&entityId=${open.id}`).expect(200)).body as { action: string }[];
    expect(log.map((e) => e.action)).not.toContain('job.closed_override');
  });

  it('answers NOT_FOUND, not JOB_CLOSED, to staff of another shop', async () => {
    const stranger = await t.signIn(DEMO.otherShopManager);
    const res = await stranger.agent.post(`/api/jobs/${jobId}/work-entries`).send(WORK);
    expect({ status: res.status, code: res.body.code }).toEqual({ status: 404, code: 'NOT_FOUND' });
  });
});
