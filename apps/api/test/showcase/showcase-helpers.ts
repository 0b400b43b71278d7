import type { MediaAssetDto, ShotPairDto, ShowcaseItemDto } from '@benchproof/contracts';
import { TASK_RUNNER, type TaskRunner } from '../../src/infra/tasks';
import { binary, bookJob, derivativesSettled } from '../media/media-fixtures';
import type { SignedIn, TestApp } from '../test-app';
import { blurDoc, checkerboard } from './showcase-fixtures';

/** Derivatives made and every queued task run. */
export const settled = async (t: TestApp): Promise<void> => {
  await derivativesSettled(t);
  await t.app.get<TaskRunner>(TASK_RUNNER).settled();
};

export const listItems = async (who: SignedIn, query = ''): Promise<ShowcaseItemDto[]> =>
  (await who.agent.get(`/api/showcase/items${query}`).expect(200)).body as ShowcaseItemDto[];

/** One showcase file as bytes (error bodies come back as bytes too). */
export const exportOf = (who: SignedIn, pairId: number, q: string) => who.agent.get(`/api/showcase/items/${pairId}/export?${q}`).buffer(true).parse(binary);

/** A new job with a checkerboard before (blur box on it) and after, paired by the mechanic; no consent yet. */
export async function blurredPair(t: TestApp, mech: SignedIn, crop: ShotPairDto['crop']): Promise<{ jobId: number; pairId: number; before: MediaAssetDto }> {
  const jobId = await bookJob(t);
  const up = async (phase: string) =>
    (
      await mech.agent
        .post(`/api/jobs/${jobId}/media`)
        .field('phase', phase)
        .field('area', 'drivetrain')
        .attach('files', await checkerboard(), `${phase}.jpg`)
        .expect(201)
    ).body.assets[0] as MediaAssetDto;
  const before = await up('before');
  const after = await up('after');
  await settled(t);
  await mech.agent.put(`/api/annotations/${before.id}`).send({ baseVersion: 0, document: blurDoc() }).expect(200);
  const pair = (
    await mech.agent
      .post(`/api/jobs/${jobId}/pairs`)
      .send({ beforeAssetId: before.id, afterAssetId: after.id, caption: 'Chain cleaned on the Testwerk Bench One', crop })
      .expect(201)
  ).body as ShotPairDto;
  return { jobId, pairId: pair.id, before };
}
