import type { ConsentStatusDto, FindingDto, OwnerPageDto } from '@benchproof/contracts';
import { CONSENT_WORDING } from '@benchproof/contracts';
import type { MailCatcher } from '../../scripts/mail-catcher.mjs';
import { startAppWithMail, stopAppWithMail } from '../support/app-with-mail';
import type { TestApp } from '../test-app';
import { createLink, ownerPage, ownerScenario, seen, type OwnerScenario } from './owner-helpers';

// What the owner does on the page: decisions (through the staff decision path) and consent.
describe('owner link: decisions and consent', () => {
  let t: TestApp;
  let s: OwnerScenario;
  let other: OwnerScenario;
  let catcher: MailCatcher;
  beforeAll(async () => {
    ({ t, catcher } = await startAppWithMail({ MAIL_SWEEP_MS: '100' }));
    s = await ownerScenario(t);
    other = await ownerScenario(t);
  });
  afterAll(() => stopAppWithMail(t, catcher));

  it('refuses a decision on a price the owner did not see (desk re-priced meanwhile), storing nothing', async () => {
    const { token } = await createLink(s.desk, s.jobId);
    const before = await ownerPage(t, token);
    await s.desk.agent
      .post(`/api/jobs/${s.jobId}/findings/${s.padsFinding}/recommendation`)
      .send({ summary: 'New rear pads', parts: [{ description: 'Pads', qty: 1, unitPriceMinor: 2900 }], labourHundredths: 30 })
      .expect(201);
    const res = await t
      .http()
      .post(`/api/owner/${token}/decisions`)
      .send({
        items: [
          { ...seen(before, s.chainRec), status: 'approved' },
          { ...seen(before, s.padsRec), status: 'approved' },
        ],
      })
      .expect(409);
    const after = await ownerPage(t, token);
    expect(res.body).toMatchObject({ code: 'PRICE_CHANGED', details: { recommendationId: s.padsRec, grossMinor: seen(after, s.padsRec).seenGrossMinor } });
    expect(seen(after, s.padsRec).seenGrossMinor).toBeGreaterThan(seen(before, s.padsRec).seenGrossMinor);
    expect(after.findings.every((f) => f.recommendation?.decisionStatus === 'pending')).toBe(true);
  });

  it('records approve and decline through the staff decision path, asks twice for a safety decline, and moves the job on', async () => {
    const { token } = await createLink(s.desk, s.jobId);
    const page = await ownerPage(t, token);
    const decline = { ...seen(page, s.padsRec), status: 'declined' };
    const res = await t
      .http()
      .post(`/api/owner/${token}/decisions`)
      .send({ items: [{ ...seen(page, s.chainRec), status: 'approved' }, decline] })
      .expect(422);
    expect(res.body.code).toBe('SAFETY_CONFIRMATION_REQUIRED');
    const done = (
      await t
        .http()
        .post(`/api/owner/${token}/decisions`)
        .send({
          items: [
            { ...seen(page, s.chainRec), status: 'approved' },
            { ...decline, safetyConfirmed: true },
          ],
        })
        .expect(200)
    ).body as OwnerPageDto;
    expect(done.findings.map((f) => f.recommendation?.decisionStatus)).toEqual(['approved', 'declined']);
    const staff = (await s.desk.agent.get(`/api/jobs/${s.jobId}/findings`).expect(200)).body as FindingDto[];
    const last = staff[0].recommendation?.decisions.at(-1);
    expect(last).toMatchObject({ status: 'approved', channel: 'owner_link', recordedById: null, decidedByName: 'Ottilie Fernsby' });
    expect((await s.desk.agent.get(`/api/jobs/${s.jobId}`).expect(200)).body.status).toBe('in_work');
    const again = await t
      .http()
      .post(`/api/owner/${token}/decisions`)
      .send({ items: [{ ...seen(done, s.chainRec), status: 'declined' }] })
      .expect(409);
    expect(again.body.code).toBe('CONFLICT');
    const activity = (await s.desk.agent.get(`/api/jobs/${s.jobId}/owner-activity`).expect(200)).body as {
      action: string;
      details: { channel?: string; summary?: string };
    }[];
    const decided = activity.filter((a) => a.action === 'recommendation.decided' && a.details.channel === 'owner_link');
    expect(decided).toHaveLength(2);
    // the activity names the item the owner answered, not only its number
    expect(decided.every((a) => typeof a.details.summary === 'string' && a.details.summary.length > 0)).toBe(true);
    expect(activity.some((a) => a.action === 'owner.viewed')).toBe(true);
  });

  it('records consent from the owner and in person, versioned, with history and audit', async () => {
    const { token } = await createLink(other.desk, other.jobId);
    const wrong = await t.http().post(`/api/owner/${token}/consent`).send({ granted: true, nameMakeModel: true, wordingVersion: 'old-v0' }).expect(409);
    expect(wrong.body.code).toBe('CONSENT_WORDING_CHANGED');
    await t.http().post(`/api/owner/${token}/consent`).send({ granted: true, nameMakeModel: true, wordingVersion: CONSENT_WORDING.version }).expect(200);
    expect((await ownerPage(t, token)).consent).toMatchObject({ granted: true, nameMakeModel: true, method: 'owner_link' });
    await other.desk.agent
      .post(`/api/jobs/${other.jobId}/consent`)
      .send({ granted: false, nameMakeModel: false, wordingVersion: CONSENT_WORDING.version, givenByName: 'Ottilie Fernsby' })
      .expect(201);
    const status = (await other.desk.agent.get(`/api/jobs/${other.jobId}/consent`).expect(200)).body as ConsentStatusDto;
    expect(status.current).toMatchObject({ granted: false, method: 'in_person', recordedById: other.desk.user.id });
    expect(status.history.map((h) => h.method)).toEqual(['in_person', 'owner_link']);
    await other.mech.agent
      .post(`/api/jobs/${other.jobId}/consent`)
      .send({ granted: true, nameMakeModel: false, wordingVersion: CONSENT_WORDING.version, givenByName: 'X' })
      .expect(403);
    const activity = (await other.desk.agent.get(`/api/jobs/${other.jobId}/owner-activity`).expect(200)).body as { action: string }[];
    expect(activity.map((a) => a.action)).toEqual(expect.arrayContaining(['consent.granted', 'consent.revoked']));
  });

  it('keeps whether the bike may be named across a withdrawal, so consenting again does not reset it', async () => {
    const { token } = await createLink(other.desk, other.jobId);
    const send = (granted: boolean) =>
      t.http().post(`/api/owner/${token}/consent`).send({ granted, nameMakeModel: true, wordingVersion: CONSENT_WORDING.version }).expect(200);
    await send(false);
    expect((await ownerPage(t, token)).consent).toMatchObject({ granted: false, nameMakeModel: true });
    await send(true);
    expect((await ownerPage(t, token)).consent).toMatchObject({ granted: true, nameMakeModel: true });
  });
});
