import type { AnnotationDocumentDto, MediaAssetDto } from '@benchproof/contracts';
import sharp from 'sharp';
import { vi } from 'vitest';
import { IMAGE, type ImageAdapter } from '../../src/infra/image';
import { TASK_RUNNER, type TaskRunner } from '../../src/infra/tasks';
import { binary, bookJob, derivativesSettled } from '../media/media-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

const W = 800;
const H = 600;
const base = { colour: 'amber', width: 'medium' } as const;
const BOX = { x0: 400, y0: 300, x1: 560, y1: 420 };

/** A 4 px checkerboard: pixelation averages it to grey, so a redacted box cannot look like the original. */
function checkerboard(): Promise<Buffer> {
  const raw = Buffer.alloc(W * H * 3);
  for (let y = 0; y < H; y++) for (let x = 0; x < W; x++) raw.fill(((x >> 2) + (y >> 2)) % 2 ? 235 : 20, (y * W + x) * 3, (y * W + x) * 3 + 3);
  return sharp(raw, { raw: { width: W, height: H, channels: 3 } })
    .jpeg({ quality: 95 })
    .toBuffer();
}

const blurDoc = (): AnnotationDocumentDto => ({
  schemaVersion: 2,
  image: { width: W, height: H },
  shapes: [{ ...base, id: 'b1', kind: 'blur', topLeft: { x: BOX.x0 / W, y: BOX.y0 / H }, bottomRight: { x: BOX.x1 / W, y: BOX.y1 / H } }],
});

/**
 * Mean absolute per-channel difference (0–255) between two same-size images over the
 * pixels where `inside` says so. Re-encoding a JPEG alone moves pixels a little; a
 * redaction moves the checkerboard by ~100 on average.
 */
async function meanAbsDiff(a: Buffer, b: Buffer, inside: (x: number, y: number) => boolean): Promise<number> {
  const [ra, rb] = await Promise.all([a, b].map((img) => sharp(img).removeAlpha().raw().toBuffer()));
  let sum = 0;
  let n = 0;
  for (let y = 0; y < H; y++) {
    for (let x = 0; x < W; x++) {
      if (!inside(x, y)) continue;
      for (let c = 0; c < 3; c++) sum += Math.abs(ra[(y * W + x) * 3 + c] - rb[(y * W + x) * 3 + c]);
      n += 3;
    }
  }
  return sum / n;
}

describe('annotations: versions, validation, server render', () => {
  let t: TestApp;
  let mech: SignedIn;
  let asset: MediaAssetDto;
  let jobId: number;
  beforeAll(async () => {
    t = await startTestApp();
    mech = await t.signIn(DEMO.mechanic);
    jobId = await bookJob(t);
    asset = (
      await mech.agent
        .post(`/api/jobs/${jobId}/media`)
        .field('phase', 'before')
        .field('area', 'drivetrain')
        .attach('files', await checkerboard(), 'chain.jpg')
        .expect(201)
    ).body.assets[0];
    await derivativesSettled(t);
  });
  afterAll(() => t.close());

  const fetch = async (path: string): Promise<Buffer> => (await mech.agent.get(path).buffer(true).parse(binary).expect(200)).body as Buffer;

  it('serves the plain screen derivative while a photo has no annotation', async () => {
    expect((await mech.agent.get(`/api/annotations/${asset.id}`).expect(200)).body).toEqual({
      mediaId: asset.id,
      version: 0,
      document: null,
      savedAt: null,
      savedBy: null,
    });
    expect((await fetch(`/api/media/${asset.id}/annotated/screen`)).equals(await fetch(`/api/media/${asset.id}/screen`))).toBe(true);
  });

  it('refuses malformed documents with VALIDATION_FAILED and the field path', async () => {
    const bad = (shapes: unknown[]) =>
      mech.agent
        .put(`/api/annotations/${asset.id}`)
        .send({ baseVersion: 0, document: { ...blurDoc(), shapes } })
        .expect(400);
    const unknownKind = (await bad([{ ...base, id: 'x', kind: 'star', at: { x: 0.5, y: 0.5 } }])).body;
    expect(unknownKind.code).toBe('VALIDATION_FAILED');
    expect(unknownKind.details.issues).toContainEqual({ path: 'document.shapes.0.kind', message: 'Unknown shape kind.' });
    const outside = (await bad([{ ...base, id: 'x', kind: 'arrow', from: { x: 0.5, y: 0.5 }, to: { x: 1.5, y: 0.5 } }])).body;
    expect(outside.details.issues).toContainEqual({ path: 'document.shapes.0.to.x', message: 'Points must lie on the image (0 to 1).' });
    const wrongImage = (
      await mech.agent
        .put(`/api/annotations/${asset.id}`)
        .send({ baseVersion: 0, document: { ...blurDoc(), image: { width: 600, height: 800 } } })
        .expect(400)
    ).body;
    expect(wrongImage.details.issues[0].path).toBe('document.image');
  });

  it('saves versions with optimistic concurrency: a stale base version is a CONFLICT', async () => {
    const v1 = (await mech.agent.put(`/api/annotations/${asset.id}`).send({ baseVersion: 0, document: blurDoc() }).expect(200)).body;
    expect(v1).toMatchObject({ mediaId: asset.id, version: 1, document: blurDoc() });
    const stale = (await mech.agent.put(`/api/annotations/${asset.id}`).send({ baseVersion: 0, document: blurDoc() }).expect(409)).body;
    expect(stale).toMatchObject({ code: 'CONFLICT', details: { currentVersion: 1 } });
    expect((await mech.agent.get(`/api/annotations/${asset.id}`).expect(200)).body.version).toBe(1);
  });

  it('pixelates blur boxes in the pixels and leaves the rest alone', async () => {
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    const plain = await fetch(`/api/media/${asset.id}/screen`);
    const annotated = await fetch(`/api/media/${asset.id}/annotated/screen`);
    const inBox = (x: number, y: number) => x >= BOX.x0 && x < BOX.x1 && y >= BOX.y0 && y < BOX.y1;
    // Two JPEG blocks (16 px) around the box are left out: the encoder's 8×8 blocks mix pixels across the edge.
    const farFromBox = (x: number, y: number) => x < BOX.x0 - 16 || x >= BOX.x1 + 16 || y < BOX.y0 - 16 || y >= BOX.y1 + 16;
    const inside = await meanAbsDiff(plain, annotated, inBox);
    const outside = await meanAbsDiff(plain, annotated, farFromBox);
    // Stated tolerance: outside the box at most 4 of 255 (re-encoding at quality 88); inside at least 60.
    expect(outside).toBeLessThan(4);
    expect(inside).toBeGreaterThan(60);
  });

  it('renders a version once and serves the cached render afterwards', async () => {
    const image = t.app.get<ImageAdapter>(IMAGE);
    const spy = vi.spyOn(image, 'annotate');
    const doc = { ...blurDoc(), shapes: [...blurDoc().shapes, { ...base, id: 'r1', kind: 'ring', centre: { x: 0.2, y: 0.2 }, rx: 0.1, ry: 0.1 }] };
    await mech.agent.put(`/api/annotations/${asset.id}`).send({ baseVersion: 1, document: doc }).expect(200);
    const [a, b] = await Promise.all([fetch(`/api/media/${asset.id}/annotated/print`), fetch(`/api/media/${asset.id}/annotated/print`)]);
    await t.app.get<TaskRunner>(TASK_RUNNER).settled();
    const c = await fetch(`/api/media/${asset.id}/annotated/print`);
    expect(a.equals(b) && b.equals(c)).toBe(true);
    // Version 2 at two sizes: exactly two renders, however many requests and the background task.
    expect(spy).toHaveBeenCalledTimes(2);
    spy.mockRestore();
  });

  it('is invisible to another shop', async () => {
    const other = await t.signIn(DEMO.otherShopMechanic);
    await other.agent.get(`/api/annotations/${asset.id}`).expect(404);
    await other.agent.get(`/api/media/${asset.id}/annotated/screen`).expect(404);
    await other.agent.put(`/api/annotations/${asset.id}`).send({ baseVersion: 2, document: blurDoc() }).expect(404);
  });

  it('records chain wear from a ruler over 4 pitches on a calibrated photo, through the typed-reading rules', async () => {
    // Scale: 200 px = 25.4 mm (a rule's inch) → 0.127 mm/px. Ruler 403 px = 51.181 mm over 4 pitches (50.8 mm nominal)
    // = +0.75 % (CHECKS.md B.1 formula), over the 0.5 % limit for an 11-speed chain.
    const doc: AnnotationDocumentDto = {
      schemaVersion: 2,
      image: { width: W, height: H },
      shapes: [
        { ...base, id: 's', kind: 'scale', from: { x: 0.1, y: 0.8 }, to: { x: 0.35, y: 0.8 }, knownMm: 25.4 },
        { ...base, id: 'r', kind: 'ruler', from: { x: 0.1, y: 0.5 }, to: { x: 0.1 + 403 / W, y: 0.5 }, pitches: 4 },
      ],
    };
    await mech.agent.put(`/api/annotations/${asset.id}`).send({ baseVersion: 2, document: doc }).expect(200);
    const insp = (await mech.agent.get(`/api/jobs/${jobId}/inspection`).expect(200)).body;
    const cp = insp.areas.flatMap((a: { checkpoints: { key: string; id: number }[] }) => a.checkpoints).find((c: { key: string }) => c.key === 'chain_wear').id;
    const stale = await mech.agent
      .post(`/api/annotations/${asset.id}/chain-reading`)
      .send({ rulerId: 'r', pitches: 4, checkpointId: cp, version: 2 })
      .expect(409);
    expect(stale.body.code).toBe('CONFLICT');
    const m = (await mech.agent.post(`/api/annotations/${asset.id}/chain-reading`).send({ rulerId: 'r', pitches: 4, checkpointId: cp, version: 3 }).expect(201))
      .body;
    expect(m.input).toEqual({ kind: 'chain_elongation', method: 'ruler', pitches: 4, lengthValue: 51.18, lengthUnit: 'mm' });
    expect(m.result).toMatchObject({ condition: 'worn', verdict: 'replace_chain' });
    const miscount = (await mech.agent.post(`/api/annotations/${asset.id}/chain-reading`).send({ rulerId: 'r', pitches: 3, version: 3 }).expect(400)).body;
    expect(miscount.details.issues[0]).toMatchObject({ path: 'rulerId' });
  });
});
