import { type SqliteTaskRunner, TASK_RUNNER } from '../../src/infra/tasks';
import { startTestApp, type TestApp } from '../test-app';

describe('readiness (GET /api/health/ready)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('answers ready without a session once the database answers and the task runner polls', async () => {
    await t.app.get<SqliteTaskRunner>(TASK_RUNNER).settled();
    const res = await t.http().get('/api/health/ready').expect(200);
    expect(res.body).toMatchObject({ status: 'ready', checks: { database: { ok: true }, tasks: { ok: true, driver: 'sqlite' } } });
    expect(res.body.checks.tasks.counts.done).toBeGreaterThan(0);
  });

  it('answers 503 NOT_READY in the one error shape when the task runner has stopped', async () => {
    await t.app.get<SqliteTaskRunner>(TASK_RUNNER).stop();
    const res = await t.http().get('/api/health/ready').expect(503);
    expect(res.body).toMatchObject({ code: 'NOT_READY', details: { database: { ok: true }, tasks: { ok: false } } });
    expect(typeof res.body.message).toBe('string');
    // Liveness is unaffected: the process still answers.
    await t.http().get('/api/health').expect(200);
  });
});
