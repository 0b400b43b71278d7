import type { OwnerEvent } from '@benchproof/contracts';
import { CONSENT_WORDING } from '@benchproof/contracts';
import type { Subscription } from 'rxjs';
import { OwnerLiveEvents } from '../../src/owner-links/owner-events';
import { startTestApp, type TestApp } from '../test-app';
import { createLink, ownerPage, ownerScenario, seen, type OwnerScenario } from './owner-helpers';
import { bookIn } from './records-helpers';

/** Lets the after-commit publish and the in-process emitter run. */
const settle = () => new Promise((r) => setTimeout(r, 50));

// The job page's live stream (GET /api/jobs/:id/owner-events returns OwnerLiveEvents.forJob) is fed by the
// domain events of the change, told once the change has committed, once per job and kind per transaction.
describe('owner live updates come from the domain events', () => {
  let t: TestApp;
  let s: OwnerScenario;
  let heard: OwnerEvent[];
  let sub: Subscription;
  beforeAll(async () => {
    t = await startTestApp();
    s = await ownerScenario(t);
  });
  beforeEach(() => {
    heard = [];
    sub = t.app
      .get(OwnerLiveEvents)
      .forJob(s.desk.user.shopId, s.jobId)
      .subscribe((m) => heard.push(m.data));
  });
  afterEach(() => sub.unsubscribe());
  afterAll(() => t.close());

  it('tells the job page about a new link, a page view and a revoked link', async () => {
    const created = await createLink(s.desk, s.jobId);
    await settle();
    expect(heard.map((e) => e.type)).toEqual(['link']);
    await ownerPage(t, created.token);
    await settle();
    expect(heard.map((e) => e.type)).toEqual(['link', 'viewed']);
    await s.desk.agent.post(`/api/jobs/${s.jobId}/owner-links/${created.link.id}/revoke`).expect(200);
    await settle();
    expect(heard.map((e) => e.type)).toEqual(['link', 'viewed', 'link']);
    expect(heard.every((e) => e.jobId === s.jobId)).toBe(true);
  });

  it('tells nothing of a refused decision (rolled back), and one "decided" for two items answered together', async () => {
    const { token } = await createLink(s.desk, s.jobId);
    const page = await ownerPage(t, token);
    await settle();
    heard = [];
    // The first item is decided (its event emitted) before the second is refused: the whole change rolls back.
    const stale = { ...seen(page, s.padsRec), seenGrossMinor: seen(page, s.padsRec).seenGrossMinor + 1, status: 'approved' };
    const refused = [{ ...seen(page, s.chainRec), status: 'approved' }, stale];
    await t.http().post(`/api/owner/${token}/decisions`).send({ items: refused }).expect(409);
    await settle();
    expect(heard).toEqual([]);
    const items = [
      { ...seen(page, s.chainRec), status: 'approved' },
      { ...seen(page, s.padsRec), status: 'declined', safetyConfirmed: true },
    ];
    await t.http().post(`/api/owner/${token}/decisions`).send({ items }).expect(200);
    await settle();
    expect(heard.map((e) => e.type)).toEqual(['decided']);
  });

  it('tells the job page when the owner gives consent, and nothing for another job', async () => {
    const { token } = await createLink(s.desk, s.jobId);
    const other = await bookIn(s.desk);
    await settle();
    heard = [];
    await createLink(s.desk, other.id);
    await t.http().post(`/api/owner/${token}/consent`).send({ granted: true, nameMakeModel: true, wordingVersion: CONSENT_WORDING.version }).expect(200);
    await settle();
    expect(heard.map((e) => e.type)).toEqual(['consent']);
  });
});
