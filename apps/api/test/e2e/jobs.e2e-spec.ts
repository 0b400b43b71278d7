import { JOB_TRANSITIONS, TERMINAL_STATUSES, JOB_STATUSES } from '@benchproof/domain';
import { DEMO, startTestApp, type TestApp } from '../test-app';
import { ALL_PASS } from '../support/final-check';
import { bookIn } from './records-helpers';

describe('jobs: book-in and the status machine', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('books in customer, bike, job and checkpoints together, numbering sequentially per shop', async () => {
    const desk = await t.signIn(DEMO.desk);
    const a = await bookIn(desk);
    const b = await bookIn(desk, { newCustomer: undefined, newBike: undefined, customerId: a.customer.id, bikeId: a.bike.id });
    const seqA = Number(a.number.split('-')[2]);
    expect(Number(b.number.split('-')[2])).toBe(seqA + 1);
    expect(a.status).toBe('booked_in');
    const insp = (await desk.agent.get(`/api/jobs/${a.id}/inspection`).expect(200)).body;
    expect(insp.total).toBeGreaterThan(30);
    expect(insp.inspected).toBe(0);
    const detail = (await desk.agent.get(`/api/jobs/${a.id}`).expect(200)).body;
    expect(detail.nextAction).toEqual({ to: 'on_stand', label: 'Put on the stand' });
    expect(detail.customerDetail.name).toBe('Ottilie Fernsby');
  });

  it('rolls the whole book-in back when the bike belongs to someone else', async () => {
    const desk = await t.signIn(DEMO.desk);
    const a = await bookIn(desk);
    const before = (await desk.agent.get('/api/customers?pageSize=100').expect(200)).body.total;
    const res = await desk.agent.post('/api/jobs').send({
      newCustomer: { name: 'Brand New Owner', email: 'new@example.test', preferredChannel: 'email' },
      bikeId: a.bike.id,
      reportedSymptoms: 'x',
      promisedOn: '2030-01-10',
    });
    expect(res.status).toBe(400);
    expect((await desk.agent.get('/api/customers?pageSize=100').expect(200)).body.total).toBe(before);
  });

  it('allows every move in JOB_TRANSITIONS, refuses others with ILLEGAL_TRANSITION, keeps terminal states terminal', async () => {
    const manager = await t.signIn(DEMO.manager);
    const mech = await t.signIn(DEMO.mechanic);
    for (const tr of JOB_TRANSITIONS) {
      const job = await bookIn(manager, { mechanicId: mech.user.id });
      await driveTo(t, job.id, tr.from);
      if (tr.to === 'ready')
        await (await t.signIn(DEMO.mechanic2)).agent.post(`/api/jobs/${job.id}/final-check`).send({ items: ALL_PASS, passed: true }).expect(201);
      const res = await manager.agent.post(`/api/jobs/${job.id}/transitions`).send({ to: tr.to, confirmNoReport: tr.to === 'collected' });
      expect({ move: `${tr.from}->${tr.to}`, status: res.status }).toEqual({ move: `${tr.from}->${tr.to}`, status: 200 });
      expect(res.body.status).toBe(tr.to);
    }
    const job = await bookIn(manager);
    const illegal = await manager.agent.post(`/api/jobs/${job.id}/transitions`).send({ to: 'ready' }).expect(409);
    expect(illegal.body.code).toBe('ILLEGAL_TRANSITION');
    await manager.agent.post(`/api/jobs/${job.id}/transitions`).send({ to: 'cancelled' }).expect(200);
    for (const to of JOB_STATUSES) {
      const res = await manager.agent.post(`/api/jobs/${job.id}/transitions`).send({ to }).expect(409);
      expect(res.body.code).toBe('ILLEGAL_TRANSITION');
    }
    expect(TERMINAL_STATUSES).toContain('cancelled');
    const events = (await manager.agent.get(`/api/jobs/${job.id}/events`).expect(200)).body;
    expect(events.map((e: { to: string }) => e.to)).toEqual(['booked_in', 'cancelled']);
  });

  it('needs a passed final check by a second person before ready', async () => {
    const manager = await t.signIn(DEMO.manager);
    const mech = await t.signIn(DEMO.mechanic);
    const mech2 = await t.signIn(DEMO.mechanic2);
    const job = await bookIn(manager, { mechanicId: mech.user.id });
    await driveTo(t, job.id, 'final_check');
    expect((await manager.agent.post(`/api/jobs/${job.id}/transitions`).send({ to: 'ready' }).expect(409)).body.code).toBe('FINAL_CHECK_REQUIRED');
    const same = await mech.agent.post(`/api/jobs/${job.id}/final-check`).send({ items: ALL_PASS, passed: true });
    expect(same.status).toBe(409);
    expect(same.body.code).toBe('FINAL_CHECK_SAME_PERSON');
    await mech2.agent.post(`/api/jobs/${job.id}/final-check`).send({ items: ALL_PASS, passed: true }).expect(201);
    const ready = (await manager.agent.post(`/api/jobs/${job.id}/transitions`).send({ to: 'ready' }).expect(200)).body;
    expect(ready.finalChecker).toEqual({ id: mech2.user.id, name: expect.any(String) });
  });

  it('filters the jobs table by status list and free text', async () => {
    const desk = await t.signIn(DEMO.desk);
    const job = await bookIn(desk, {
      newBike: {
        maker: 'Marrowgate',
        model: 'Filbert 3',
        frameMaterial: 'steel',
        drivetrainSpeeds: 8,
        brakeType: 'rim',
        cableRouting: 'external',
        dropoutType: 'horizontal',
      },
    });
    const page = (await desk.agent.get('/api/jobs?q=filbert&status=booked_in,on_stand').expect(200)).body;
    expect(page.items.map((j: { id: number }) => j.id)).toContain(job.id);
    expect(page.items.every((j: { status: string }) => ['booked_in', 'on_stand'].includes(j.status))).toBe(true);
    const none = (await desk.agent.get('/api/jobs?q=filbert&status=ready').expect(200)).body;
    expect(none.items.map((j: { id: number }) => j.id)).not.toContain(job.id);
  });
});

/** Walks a job along the primary path (and side steps) to `target`, recording a passed check on the way to ready. */
async function driveTo(t: TestApp, jobId: number, target: string): Promise<void> {
  const manager = await t.signIn(DEMO.manager);
  const path = ['booked_in', 'on_stand', 'waiting_owner', 'in_work', 'final_check', 'ready', 'collected'];
  if (target === 'cancelled') {
    await manager.agent.post(`/api/jobs/${jobId}/transitions`).send({ to: 'cancelled' }).expect(200);
    return;
  }
  const checker = await t.signIn(DEMO.mechanic2);
  for (const to of path.slice(1, path.indexOf(target) + 1)) {
    if (to === 'ready') {
      await checker.agent.post(`/api/jobs/${jobId}/final-check`).send({ items: ALL_PASS, passed: true }).expect(201);
    }
    await manager.agent
      .post(`/api/jobs/${jobId}/transitions`)
      .send({ to, confirmNoReport: to === 'collected' })
      .expect(200);
  }
}
