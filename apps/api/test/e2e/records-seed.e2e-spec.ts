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
    const page = (await agent.get('/api/jobs?pageSize=100').expect(200)).body as { items: { status: string; overdue: boolean; bike: { id: number; model: string } }[] };
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
});
