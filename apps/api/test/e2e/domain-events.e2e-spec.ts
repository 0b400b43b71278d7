import { EventEmitter2 } from '@nestjs/event-emitter';
import { DOMAIN_EVENTS, type JobBookedInEvent, type JobMovedEvent, type RecommendationDecidedEvent } from '../../src/core/events';
import { TASK_RUNNER, type TaskRunner } from '../../src/infra/tasks';
import { DEMO, startTestApp, type TestApp } from '../test-app';
import { bookIn } from './records-helpers';

describe('domain events (@nestjs/event-emitter)', () => {
  let t: TestApp;
  let emitter: EventEmitter2;
  beforeAll(async () => {
    t = await startTestApp();
    emitter = t.app.get(EventEmitter2);
  });
  afterAll(() => t.close());

  it('publishes job booked in, job moved and recommendation decided with their ids', async () => {
    const seen: string[] = [];
    const record = (name: string) => (e: JobBookedInEvent | JobMovedEvent | RecommendationDecidedEvent) =>
      seen.push(`${name}:${e.jobId}:${'to' in e ? e.to : 'status' in e ? e.status : ''}`);
    const listeners = Object.values(DOMAIN_EVENTS).map((name) => [name, record(name)] as const);
    for (const [name, fn] of listeners) emitter.on(name, fn);
    const desk = await t.signIn(DEMO.desk);
    const mech = await t.signIn(DEMO.mechanic);
    const job = await bookIn(desk);
    await desk.agent.post(`/api/jobs/${job.id}/transitions`).send({ to: 'on_stand' }).expect(200);
    const f = (
      await mech.agent.post(`/api/jobs/${job.id}/findings`).send({ area: 'drivetrain', condition: 'worn', description: 'Chain past its limit' }).expect(201)
    ).body;
    const rec = (
      await desk.agent
        .post(`/api/jobs/${job.id}/findings/${f.id}/recommendation`)
        .send({ summary: 'Replace chain', parts: [], labourHundredths: 25 })
        .expect(201)
    ).body;
    await desk.agent
      .post(`/api/jobs/${job.id}/recommendations/${rec.id}/decision`)
      .send({ status: 'declined', channel: 'phone', decidedByName: 'Ottilie Fernsby' })
      .expect(201);
    for (const [name, fn] of listeners) emitter.off(name, fn);
    expect(seen).toEqual([`job.booked_in:${job.id}:`, `job.moved:${job.id}:on_stand`, `recommendation.decided:${job.id}:declined`]);
  });

  it('a listener that enqueues a task in the event transaction loses it when the change rolls back', async () => {
    const tasks = t.app.get<TaskRunner>(TASK_RUNNER);
    const desk = await t.signIn(DEMO.desk);
    const job = await bookIn(desk);
    const onMove = (e: JobMovedEvent) => {
      tasks.enqueue({ kind: 'media.phash', key: `test-job-${e.jobId}`, shopId: e.shopId }, e.tx);
      throw new Error('listener failed after enqueueing');
    };
    emitter.on(DOMAIN_EVENTS.jobMoved, onMove);
    const res = await desk.agent.post(`/api/jobs/${job.id}/transitions`).send({ to: 'on_stand' });
    emitter.off(DOMAIN_EVENTS.jobMoved, onMove);
    expect(res.status).toBe(500);
    expect((await desk.agent.get(`/api/jobs/${job.id}`).expect(200)).body.status).toBe('booked_in');
    expect(tasks.status('media.phash', `test-job-${job.id}`)).toBeNull();
  });
});
