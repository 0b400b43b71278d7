import type { CreatedOwnerLinkDto, OwnerPageDto } from '@benchproof/contracts';
import { derivativesSettled, solidJpeg } from '../media/media-fixtures';
import { DEMO, type SignedIn, type TestApp } from '../test-app';
import { bookIn } from './records-helpers';

export interface OwnerScenario {
  jobId: number;
  desk: SignedIn;
  mech: SignedIn;
  /** Recommendation ids: chain (worn, soon) and brake pads (unsafe, safety). */
  chainRec: number;
  padsRec: number;
  chainFinding: number;
  padsFinding: number;
  linkedAsset: number;
  unlinkedAsset: number;
}

/**
 * A job waiting on the owner: two priced findings (one a safety item), one
 * shot linked to a finding and one that is not, and an internal decision note.
 */
export async function ownerScenario(t: TestApp): Promise<OwnerScenario> {
  const desk = await t.signIn(DEMO.desk);
  const mech = await t.signIn(DEMO.mechanic);
  const job = await bookIn(desk);
  const j = `/api/jobs/${job.id}`;
  await desk.agent.post(`${j}/transitions`).send({ to: 'on_stand' }).expect(200);
  const chain = (
    await mech.agent.post(`${j}/findings`).send({ area: 'drivetrain', condition: 'worn', description: 'Chain stretched past its limit' }).expect(201)
  ).body as { id: number };
  const pads = (
    await mech.agent.post(`${j}/findings`).send({ area: 'brakes', condition: 'unsafe', description: 'Rear pads worn to the backing plate' }).expect(201)
  ).body as { id: number };
  const chainRec = (
    await desk.agent
      .post(`${j}/findings/${chain.id}/recommendation`)
      .send({ summary: 'New chain', parts: [{ description: 'Chain 11-speed', qty: 1, unitPriceMinor: 3500 }], labourHundredths: 25 })
      .expect(201)
  ).body as { id: number };
  const padsRec = (
    await desk.agent
      .post(`${j}/findings/${pads.id}/recommendation`)
      .send({ summary: 'New rear pads', parts: [{ description: 'Pads', qty: 1, unitPriceMinor: 2200 }], labourHundredths: 30 })
      .expect(201)
  ).body as { id: number };
  const upload = async (colour: string) =>
    (
      (
        await mech.agent
          .post(`${j}/media`)
          .field('phase', 'before')
          .field('area', 'drivetrain')
          .attach('files', await solidJpeg(900, 600, colour), 'shot.jpg')
          .expect(201)
      ).body as { assets: { id: number }[] }
    ).assets[0].id;
  const linkedAsset = await upload('#aa3333');
  const unlinkedAsset = await upload('#33aa33');
  await derivativesSettled(t);
  await mech.agent
    .put(`${j}/findings/${chain.id}/media`)
    .send({ assetIds: [linkedAsset] })
    .expect(200);
  await desk.agent.post(`${j}/transitions`).send({ to: 'waiting_owner' }).expect(200);
  return { jobId: job.id, desk, mech, chainRec: chainRec.id, padsRec: padsRec.id, chainFinding: chain.id, padsFinding: pads.id, linkedAsset, unlinkedAsset };
}

export async function createLink(s: SignedIn, jobId: number): Promise<CreatedOwnerLinkDto & { token: string }> {
  const body = (await s.agent.post(`/api/jobs/${jobId}/owner-links`).send({ expiresInDays: 7, send: true }).expect(201)).body as CreatedOwnerLinkDto;
  return { ...body, token: body.url.split('/o/')[1] };
}

export const ownerPage = async (t: TestApp, token: string): Promise<OwnerPageDto> =>
  (await t.http().get(`/api/owner/${token}`).expect(200)).body as OwnerPageDto;

export const seen = (page: OwnerPageDto, recId: number) => {
  const rec = page.findings.find((f) => f.recommendation?.id === recId)?.recommendation;
  if (!rec) throw new Error(`no recommendation ${recId}`);
  return { recommendationId: recId, seenUpdatedAt: rec.updatedAt, seenGrossMinor: rec.totals.grossMinor };
};
