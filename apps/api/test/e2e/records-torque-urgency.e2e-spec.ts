import { DECLINED_SAFETY_NOTICE } from '@benchproof/domain';
import { DEMO, startTestApp, type TestApp } from '../test-app';
import { bookIn } from './records-helpers';

const DAY_MS = 86_400_000;
/** A calendar day relative to the real clock the test app runs on. */
const daysFromToday = (days: number) => new Date(Date.now() + days * DAY_MS).toISOString().slice(0, 10);

describe('records: wrench calibration, threadlocker, recommendation urgency, open jobs', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  const base = {
    fastener: 'Disc rotor bolts',
    specSource: 'Rotor maker’s manual',
    specified: { min: 5, unit: 'nm' },
    applied: { value: 5, unit: 'nm' },
    tool: 'TW-07',
  };

  it('stores the calibration date and threadlocker, and flags a calibration older than 12 months', async () => {
    const desk = await t.signIn(DEMO.desk);
    const mech = await t.signIn(DEMO.mechanic);
    const job = await bookIn(desk);
    const fresh = daysFromToday(-30);
    const old = daysFromToday(-400);
    const a = (
      await mech.agent
        .post(`/api/jobs/${job.id}/torque-entries`)
        .send({ ...base, toolCalibratedOn: fresh, threadlocker: 'pre_applied' })
        .expect(201)
    ).body;
    expect(a).toMatchObject({ toolCalibratedOn: fresh, threadlocker: 'pre_applied', calibrationOverdue: false, tool: 'TW-07' });
    // ISO 6789-1:2017 recalibration after 12 months (from memory, CHECKS.md B.4 [M]): 400 days is past it.
    const b = (
      await mech.agent
        .post(`/api/jobs/${job.id}/torque-entries`)
        .send({ ...base, toolCalibratedOn: old, threadlocker: 'blue_medium' })
        .expect(201)
    ).body;
    expect(b).toMatchObject({ toolCalibratedOn: old, threadlocker: 'blue_medium', calibrationOverdue: true });
    const c = (await mech.agent.post(`/api/jobs/${job.id}/torque-entries`).send(base).expect(201)).body;
    expect(c).toMatchObject({ toolCalibratedOn: null, threadlocker: null, calibrationOverdue: false });
    const list = (await mech.agent.get(`/api/jobs/${job.id}/torque-entries`).expect(200)).body;
    expect(list.map((e: { toolCalibratedOn: string | null; threadlocker: string | null }) => [e.toolCalibratedOn, e.threadlocker])).toEqual([
      [fresh, 'pre_applied'],
      [old, 'blue_medium'],
      [null, null],
    ]);
  });

  it('rejects a calibration date in the future and an unknown threadlocker with 400 VALIDATION_FAILED naming the field', async () => {
    const desk = await t.signIn(DEMO.desk);
    const mech = await t.signIn(DEMO.mechanic);
    const job = await bookIn(desk);
    const future = await mech.agent.post(`/api/jobs/${job.id}/torque-entries`).send({ ...base, toolCalibratedOn: daysFromToday(3) });
    expect(future.status).toBe(400);
    expect(future.body.code).toBe('VALIDATION_FAILED');
    expect(future.body.details.issues.map((i: { path: string }) => i.path)).toEqual(['toolCalibratedOn']);
    const glue = await mech.agent.post(`/api/jobs/${job.id}/torque-entries`).send({ ...base, threadlocker: 'glue' });
    expect(glue.status).toBe(400);
    expect(glue.body.details.issues.map((i: { path: string }) => i.path)).toEqual(['threadlocker']);
    expect((await mech.agent.get(`/api/jobs/${job.id}/torque-entries`).expect(200)).body).toHaveLength(0);
  });

  it('defaults urgency from the condition, keeps the mechanic’s choice, and returns it in the estimate', async () => {
    const desk = await t.signIn(DEMO.desk);
    const mech = await t.signIn(DEMO.mechanic);
    const job = await bookIn(desk);
    const finding = async (condition: string) =>
      (
        await mech.agent
          .post(`/api/jobs/${job.id}/findings`)
          .send({ area: 'brakes', condition, description: `${condition} pads` })
          .expect(201)
      ).body.id as number;
    const rec = (id: number, body: object = {}) =>
      mech.agent.post(`/api/jobs/${job.id}/findings/${id}/recommendation`).send({ summary: 'Pads', parts: [], labourHundredths: 50, ...body });
    const unsafe = (await rec(await finding('unsafe')).expect(201)).body;
    const worn = (await rec(await finding('worn')).expect(201)).body;
    const wearing = (await rec(await finding('wearing')).expect(201)).body;
    const chosen = (await rec(await finding('wearing'), { urgency: 'safety' }).expect(201)).body;
    expect([unsafe.urgency, worn.urgency, wearing.urgency, chosen.urgency]).toEqual(['safety', 'soon', 'advisory', 'safety']);
    expect((await rec(wearing.findingId, { urgency: 'whenever' })).status).toBe(400);
    await desk.agent
      .post(`/api/jobs/${job.id}/recommendations/${chosen.id}/decision`)
      .send({ status: 'declined', channel: 'phone', decidedByName: 'Ottilie Fernsby' })
      .expect(201);
    const est = (await desk.agent.get(`/api/jobs/${job.id}/estimate`).expect(200)).body;
    const byId = new Map(
      est.items.map((i: { recommendation: { id: number; urgency: string; decisionStatus: string } }) => [i.recommendation.id, i.recommendation]),
    );
    expect(byId.get(chosen.id)).toMatchObject({ urgency: 'safety', decisionStatus: 'declined' });
    expect(byId.get(worn.id)).toMatchObject({ urgency: 'soon' });
    // The web estimate prints this notice for a declined safety item (libs/domain safety wording).
    expect(DECLINED_SAFETY_NOTICE).toMatch(/not to ride/);
  });

  it('lists only open jobs with open=true and only closed ones with open=false', async () => {
    const desk = await t.signIn(DEMO.desk);
    const manager = await t.signIn(DEMO.manager);
    const open = await bookIn(desk, { reportedSymptoms: 'Creak from the saddle' });
    const closed = await bookIn(desk, { reportedSymptoms: 'Owner changed their mind' });
    await manager.agent.post(`/api/jobs/${closed.id}/transitions`).send({ to: 'cancelled' }).expect(200);
    const ids = async (q: string) => (await desk.agent.get(`/api/jobs?pageSize=100${q}`).expect(200)).body.items as { id: number; status: string }[];
    const openOnly = await ids('&open=true');
    expect(openOnly.map((j) => j.id)).toContain(open.id);
    expect(openOnly.map((j) => j.id)).not.toContain(closed.id);
    expect(openOnly.every((j) => j.status !== 'collected' && j.status !== 'cancelled')).toBe(true);
    const closedOnly = await ids('&open=false');
    expect(closedOnly.map((j) => j.id)).toContain(closed.id);
    expect(closedOnly.every((j) => j.status === 'collected' || j.status === 'cancelled')).toBe(true);
    expect((await ids('')).map((j) => j.id)).toEqual(expect.arrayContaining([open.id, closed.id]));
    expect((await desk.agent.get('/api/jobs?open=maybe')).status).toBe(400);
  });
});
