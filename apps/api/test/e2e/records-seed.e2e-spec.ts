import { JOB_STATUSES } from '@benchproof/domain';
import { DEMO, startTestApp, type TestApp } from '../test-app';

describe('demo records seed', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('has jobs in every status, some overdue, and a bike with a three-visit chain trend', async () => {
    const { agent } = await t.signIn(DEMO.manager);
    const page = (await agent.get('/api/jobs?pageSize=100').expect(200)).body as {
      items: { status: string; overdue: boolean; bike: { id: number; model: string } }[];
    };
    expect(new Set(page.items.map((j) => j.status))).toEqual(new Set(JOB_STATUSES));
    expect(page.items.some((j) => j.overdue)).toBe(true);
    const bikeId = page.items.find((j) => j.bike.model === 'Stratus 11')?.bike.id;
    const history = (await agent.get(`/api/bikes/${bikeId}/history`).expect(200)).body;
    const chain = history.series.find((s: { key: string }) => s.key === 'chain_elongation');
    // Gauge 0.2 % and 0.4 % on past visits, ruler 307.24 mm over 24 pitches (0.8005 %) today.
    expect(chain.points.map((p: { value: number }) => p.value)).toEqual([0.2, 0.4, 0.8005]);
    expect(chain.limit).toBe(0.5);
    expect(history.nextChainDue).toMatchObject({ limitPct: 0.5 });
    expect(history.jobs).toHaveLength(3);
  });

  it('seeds wrench calibration dates, threadlocker and recommendation urgency', async () => {
    const { agent } = await t.signIn(DEMO.manager);
    const page = (await agent.get('/api/jobs?pageSize=100').expect(200)).body as { items: { id: number; status: string; bike: { model: string } }[] };
    const harrier = page.items.find((j) => j.bike.model === 'Harrier Loop' && j.status === 'in_work')!;
    const torque = (await agent.get(`/api/jobs/${harrier.id}/torque-entries`).expect(200)).body as {
      tool: string;
      toolCalibratedOn: string | null;
      threadlocker: string | null;
      calibrationOverdue: boolean;
    }[];
    expect(torque.every((e) => e.toolCalibratedOn !== null && e.threadlocker === 'none')).toBe(true);
    // The beam wrench was calibrated 420 days before the work: past the 12-month interval (ISO 6789-1:2017, from memory).
    expect(torque.map((e) => [e.tool, e.calibrationOverdue])).toEqual([
      ['Click wrench 2–24 N·m', false],
      ['Beam wrench 0–10 N·m', true],
    ]);
    const est = (await agent.get(`/api/jobs/${harrier.id}/estimate`).expect(200)).body;
    expect(est.items.map((i: { recommendation: { urgency: string } }) => i.recommendation.urgency)).toEqual(['safety']);
  });
});
