import type { ShopSettingsDto, ShowcaseItemDto } from '@benchproof/contracts';
import { TASK_RUNNER, type TaskRunner } from '../../src/infra/tasks';
import { exportOf, listItems, settled } from '../showcase/showcase-helpers';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

describe('showcase desk access: the policy allows desk to view, the shop decides', () => {
  let t: TestApp;
  let mgr: SignedIn;
  let desk: SignedIn;
  let mech: SignedIn;
  let seeded: ShowcaseItemDto[];

  const allowDesk = async (on: boolean) => (await mgr.agent.patch('/api/shop/settings').send({ showcaseDeskAccess: on }).expect(200)).body as ShopSettingsDto;
  const refusedAs = async (req: { expect(status: number): Promise<{ body: unknown }> }, status: number) =>
    ((await req.expect(status)).body as { code: string }).code;

  beforeAll(async () => {
    t = await startTestApp();
    await settled(t);
    mgr = await t.signIn(DEMO.manager);
    desk = await t.signIn(DEMO.desk);
    mech = await t.signIn(DEMO.mechanic);
    seeded = await listItems(mgr);
  });
  afterAll(() => t.close());

  it('is off by default: desk gets SHOWCASE_DESK_OFF (403) on the library and its exports; a mechanic is FORBIDDEN', async () => {
    expect(((await desk.agent.get('/api/shop/settings').expect(200)).body as ShopSettingsDto).showcaseDeskAccess).toBe(false);
    const pairId = seeded[0].pairId;
    const off = await desk.agent.get('/api/showcase/items').expect(403);
    expect(off.body).toMatchObject({ code: 'SHOWCASE_DESK_OFF', message: expect.stringContaining('Shop settings') });
    expect(await refusedAs(desk.agent.get(`/api/showcase/items/${pairId}/export?size=square`), 403)).toBe('SHOWCASE_DESK_OFF');
    expect(await refusedAs(desk.agent.post('/api/showcase/zip').send({ items: [{ pairId }] }), 403)).toBe('SHOWCASE_DESK_OFF');
    expect(await refusedAs(desk.agent.post('/api/showcase/exports').send({ items: [{ pairId }] }), 403)).toBe('SHOWCASE_DESK_OFF');
    expect(await refusedAs(mech.agent.get('/api/showcase/items'), 403)).toBe('FORBIDDEN');
    // Only a manager may open it to the desk.
    expect(await refusedAs(desk.agent.patch('/api/shop/settings').send({ showcaseDeskAccess: true }), 403)).toBe('FORBIDDEN');
  });

  it('once the manager allows it, desk sees the same library and exports from it, but cannot edit or see the take-down list', async () => {
    expect((await allowDesk(true)).showcaseDeskAccess).toBe(true);
    const pairId = seeded[0].pairId;
    expect((await listItems(desk)).map((i) => i.pairId)).toEqual(seeded.map((i) => i.pairId));
    await exportOf(desk, pairId, 'variant=pair&size=square').expect(200).expect('content-type', 'image/jpeg');
    const task = (
      await desk.agent
        .post('/api/showcase/exports')
        .send({ items: [{ pairId }] })
        .expect(201)
    ).body as { key: string };
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    expect((await desk.agent.get(`/api/showcase/exports/${task.key}`).expect(200)).body).toMatchObject({ state: 'done' });
    // The manager's own tools stay the manager's: captions, favourites, drafts, the take-down list.
    expect(await refusedAs(desk.agent.patch(`/api/showcase/items/${pairId}`).send({ favourite: true }), 403)).toBe('FORBIDDEN');
    expect(await refusedAs(desk.agent.get(`/api/showcase/items/${pairId}/caption-draft`), 403)).toBe('FORBIDDEN');
    expect(await refusedAs(desk.agent.get(`/api/showcase/jobs/${seeded[0].jobId}/downloads`), 403)).toBe('FORBIDDEN');
    // The desk's export is in the audit like any other.
    const downloads = (await mgr.agent.get(`/api/showcase/jobs/${seeded[0].jobId}/downloads`).expect(200)).body as { userId: number }[];
    expect(downloads.map((d) => d.userId)).toContain(desk.user.id);

    // Switched off again: closed at once, including the desk's own finished export.
    await allowDesk(false);
    expect(await refusedAs(desk.agent.get('/api/showcase/items'), 403)).toBe('SHOWCASE_DESK_OFF');
    expect(await refusedAs(desk.agent.get(`/api/showcase/exports/${task.key}/download`), 403)).toBe('SHOWCASE_DESK_OFF');
    expect(await listItems(mgr)).toHaveLength(seeded.length);
  });
});
