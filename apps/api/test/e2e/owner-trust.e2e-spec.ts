import { CONSENT_WORDING, type OwnerPageDto } from '@benchproof/contracts';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { DOMAIN_EVENTS } from '../../src/core/events';
import { loadConfig } from '../../src/config';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';
import { createLink, ownerPage, ownerScenario, seen, type OwnerScenario } from './owner-helpers';

const audit = async (who: SignedIn, jobId: number) =>
  (await who.agent.get(`/api/audit?entityType=job&entityId=${jobId}`).expect(200)).body as { action: string; details: Record<string, unknown> }[];
const decisions = (page: OwnerPageDto) => page.findings.map((f) => f.recommendation?.decisionStatus);
const staffDecision = { status: 'approved', channel: 'phone', decidedByName: 'The owner' };

// Issue 18 (owner path trust): a closed job takes no answers, one answer per item in one transaction, no caching, links from config.
describe('owner path: what the shop and the owner can trust', () => {
  let t: TestApp;
  let manager: SignedIn;
  beforeAll(async () => {
    // No PUBLIC_URL: in development and tests, links point at localhost:PORT from the configuration.
    // No mail server here: one attempt, so an owner-link e-mail that cannot go leaves no retry waiting (derivativesSettled waits for queued work).
    t = await startTestApp({ PORT: '4567', MAIL_MAX_ATTEMPTS: '1' });
    manager = await t.signIn(DEMO.manager);
  });
  afterAll(() => t.close());

  describe('a closed job', () => {
    let s: OwnerScenario;
    let token: string;
    let page: OwnerPageDto;
    beforeAll(async () => {
      s = await ownerScenario(t);
      token = (await createLink(s.desk, s.jobId)).token;
      page = await ownerPage(t, token);
      await s.desk.agent.post(`/api/jobs/${s.jobId}/transitions`).send({ to: 'cancelled' }).expect(200);
    });

    it('takes no more answers from the owner (409 JOB_CLOSED, nothing stored) but stays readable and says it is closed', async () => {
      const res = await t
        .http()
        .post(`/api/owner/${token}/decisions`)
        .send({ items: [{ ...seen(page, s.chainRec), status: 'approved' }] });
      expect(res.status).toBe(409);
      expect(res.body).toMatchObject({ code: 'JOB_CLOSED', details: { what: 'decision' } });
      const after = await ownerPage(t, token);
      expect(after.job.status).toBe('cancelled');
      expect(decisions(after)).toEqual(['pending', 'pending']);
      expect((await audit(manager, s.jobId)).filter((e) => e.action === 'recommendation.decided')).toEqual([]);
    });

    it('still lets the owner give or withdraw marketing consent', async () => {
      const give = { granted: true, nameMakeModel: false, wordingVersion: CONSENT_WORDING.version };
      await t.http().post(`/api/owner/${token}/consent`).send(give).expect(200);
      await t
        .http()
        .post(`/api/owner/${token}/consent`)
        .send({ ...give, granted: false })
        .expect(200);
      expect((await ownerPage(t, token)).consent).toMatchObject({ granted: false });
    });

    it('refuses desk a recorded decision, and lets a manager correct it with an audited override', async () => {
      const desk = await s.desk.agent.post(`/api/jobs/${s.jobId}/recommendations/${s.chainRec}/decision`).send(staffDecision);
      expect(desk.status).toBe(409);
      expect(desk.body.code).toBe('JOB_CLOSED');
      await manager.agent.post(`/api/jobs/${s.jobId}/recommendations/${s.chainRec}/decision`).send(staffDecision).expect(201);
      const log = await audit(manager, s.jobId);
      expect(log.filter((e) => e.action === 'job.closed_override')).toEqual([
        expect.objectContaining({ details: expect.objectContaining({ what: 'decision', status: 'cancelled' }) }),
      ]);
      expect(log.filter((e) => e.action === 'recommendation.decided')).toHaveLength(1);
    });
  });

  describe('one answer per item, all or nothing', () => {
    let s: OwnerScenario;
    let token: string;
    beforeAll(async () => {
      s = await ownerScenario(t);
      token = (await createLink(s.desk, s.jobId)).token;
    });

    it('refuses a submission naming an item twice (same or opposite answers) with 400 and stores nothing', async () => {
      const page = await ownerPage(t, token);
      for (const second of ['approved', 'declined']) {
        const res = await t
          .http()
          .post(`/api/owner/${token}/decisions`)
          .send({
            items: [
              { ...seen(page, s.chainRec), status: 'approved' },
              { ...seen(page, s.chainRec), status: second },
            ],
          });
        expect(res.status).toBe(400);
        expect(res.body).toMatchObject({ code: 'VALIDATION_FAILED', details: { issues: [{ path: 'items.1.recommendationId' }] } });
      }
      expect(decisions(await ownerPage(t, token))).toEqual(['pending', 'pending']);
    });

    it('rolls back the decisions already stored and their audit entries when a later step of the submission fails', async () => {
      const page = await ownerPage(t, token);
      const emitter = t.app.get(EventEmitter2);
      let n = 0;
      // A synchronous listener throwing on the second decision stands for any failure mid-submission (a full disk, a lost lock).
      const failSecond = () => {
        n += 1;
        if (n === 2) throw new Error('second decision fails');
      };
      emitter.on(DOMAIN_EVENTS.recommendationDecided, failSecond);
      try {
        const res = await t
          .http()
          .post(`/api/owner/${token}/decisions`)
          .send({
            items: [
              { ...seen(page, s.chainRec), status: 'approved' },
              { ...seen(page, s.padsRec), status: 'approved' },
            ],
          });
        expect(res.status).toBe(500);
      } finally {
        emitter.off(DOMAIN_EVENTS.recommendationDecided, failSecond);
      }
      const after = await ownerPage(t, token);
      expect(decisions(after)).toEqual(['pending', 'pending']);
      expect(after.job.status).toBe('waiting_owner');
      expect((await audit(manager, s.jobId)).some((e) => e.action === 'recommendation.decided')).toBe(false);
    });
  });

  describe('caching and link origin', () => {
    let s: OwnerScenario;
    beforeAll(async () => {
      s = await ownerScenario(t);
    });

    it('sends no-store on every owner JSON answer, errors included, and private on owner images', async () => {
      const { token } = await createLink(s.desk, s.jobId);
      const ok = await t.http().get(`/api/owner/${token}`).expect(200);
      expect(ok.headers['cache-control']).toBe('no-store');
      const bad = await t.http().get(`/api/owner/${token.slice(0, -2)}xx`);
      expect(bad.status).toBe(404);
      expect(bad.headers['cache-control']).toBe('no-store');
      const refused = await t.http().post(`/api/owner/${token}/decisions`).send({ items: [] });
      expect(refused.status).toBe(400);
      expect(refused.headers['cache-control']).toBe('no-store');
      const img = await t.http().get(`/api/owner/${token}/media/${s.linkedAsset}/thumb`).expect(200);
      expect(img.headers['cache-control']).toMatch(/^private\b/);
      const missingReport = await t.http().get(`/api/owner/${token}/report.pdf`);
      expect(missingReport.status).toBe(404);
      expect(missingReport.headers['cache-control']).toBe('no-store');
    });

    it('builds the link from the configuration, never from the Host header', async () => {
      const res = await s.desk.agent
        .post(`/api/jobs/${s.jobId}/owner-links`)
        .set('Host', 'evil.example.test')
        .set('X-Forwarded-Host', 'evil.example.test')
        .send({ expiresInDays: 7, send: false })
        .expect(201);
      expect(res.body.url).toMatch(/^http:\/\/localhost:4567\/o\/[^/]+$/);
    });
  });

  it('refuses to start in production without PUBLIC_URL, saying what to set; development defaults to localhost:PORT', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', DATABASE_PATH: ':memory:' })).toThrow(/PUBLIC_URL is required when NODE_ENV=production/);
    expect(loadConfig({ NODE_ENV: 'production', DATABASE_PATH: ':memory:', PUBLIC_URL: 'https://a.test' }).publicUrl).toBe('https://a.test');
    expect(loadConfig({ DATABASE_PATH: ':memory:', PORT: '4123' }).publicUrl).toBe('http://localhost:4123');
  });
});
