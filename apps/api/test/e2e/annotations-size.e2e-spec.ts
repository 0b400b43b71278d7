import { saveAnnotationMaxBytes, type AnnotationDocumentDto, type MediaAssetDto } from '@benchproof/contracts';
import { bookJob, derivativesSettled, solidJpeg } from '../media/media-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

const W = 800;
const H = 600;
const base = { colour: 'lime', width: 'thin' } as const;

/** A finger stroke sampled at every pointer move: `n` points at full double precision. */
function stroke(n: number, phase: number) {
  return Array.from({ length: n }, (_, i) => {
    const t = i / (n - 1);
    return { x: 0.05 + 0.9 * t, y: 0.5 + 0.3 * Math.sin(t * 9 + phase) + 0.013 * Math.sin(t * 131 + phase * 7) };
  });
}

/** Three long pen strokes: about 170 kB of JSON, well inside the schema's limits. */
const longStrokes = (): AnnotationDocumentDto => ({
  schemaVersion: 2,
  image: { width: W, height: H },
  shapes: [0, 1, 2].map((i) => ({ ...base, id: `pen-${i}`, kind: 'pen' as const, points: stroke(1150, i * 1.7) })),
});

describe('annotation saves: body limit from the schema, not-found photos', () => {
  let t: TestApp;
  let mech: SignedIn;
  let asset: MediaAssetDto;
  beforeAll(async () => {
    t = await startTestApp();
    mech = await t.signIn(DEMO.mechanic);
    const jobId = await bookJob(t);
    asset = (
      await mech.agent
        .post(`/api/jobs/${jobId}/media`)
        .field('phase', 'before')
        .field('area', 'drivetrain')
        .attach('files', await solidJpeg(W, H), 'chain.jpg')
        .expect(201)
    ).body.assets[0];
    await derivativesSettled(t);
  });
  afterAll(() => t.close());

  it('saves a ~170 kB document of long strokes (413 under the old 100 kB limit) and stores it rounded and simplified', async () => {
    const doc = longStrokes();
    const body = JSON.stringify({ baseVersion: 0, document: doc });
    expect(body.length).toBeGreaterThan(160_000);
    expect(body.length).toBeLessThan(190_000);
    const res = await mech.agent.put(`/api/annotations/${asset.id}`).set('Content-Type', 'application/json').send(body).expect(200);
    expect(res.body.version).toBe(1);
    const stored = (await mech.agent.get(`/api/annotations/${asset.id}`).expect(200)).body.document as AnnotationDocumentDto;
    const points = stored.shapes.flatMap((s) => (s.kind === 'pen' ? s.points : []));
    // Every coordinate on the 1e-4 grid; each stroke keeps its ends and far fewer points.
    expect(points.every((p) => Number(p.x.toFixed(4)) === p.x && Number(p.y.toFixed(4)) === p.y)).toBe(true);
    for (const [i, s] of stored.shapes.entries()) {
      if (s.kind !== 'pen') throw new Error('pen expected');
      expect(s.points.length).toBeLessThan(1150 / 4);
      expect(s.points[0].x).toBeCloseTo(0.05, 4);
      expect(s.points.at(-1)!.x).toBeCloseTo(0.95, 4);
      expect(s.id).toBe(`pen-${i}`);
    }
    expect(JSON.stringify(stored).length).toBeLessThan(body.length / 5);
  });

  it('answers 413 BODY_TOO_LARGE with the computed limit just past the largest valid save, and keeps 100 kB elsewhere', async () => {
    const limit = saveAnnotationMaxBytes();
    expect(limit).toBeGreaterThan(1_000_000);
    const tooBig = JSON.stringify({ baseVersion: 1, document: longStrokes(), pad: 'x'.repeat(limit) });
    const res = await mech.agent.put(`/api/annotations/${asset.id}`).set('Content-Type', 'application/json').send(tooBig).expect(413);
    expect(res.body).toMatchObject({ code: 'BODY_TOO_LARGE', details: { limitBytes: limit } });
    // The chain-reading route under the same path keeps the default JSON limit.
    const big = JSON.stringify({ rulerId: 'r', pitches: 24, version: 1, pad: 'x'.repeat(150_000) });
    const other = await mech.agent.post(`/api/annotations/${asset.id}/chain-reading`).set('Content-Type', 'application/json').send(big).expect(413);
    expect(other.body.details.limitBytes).toBe(100 * 1024);
  });

  it('answers 404 for a photo that does not exist or belongs to another shop, even with a large body', async () => {
    await mech.agent.get('/api/annotations/987654').expect(404);
    const body = JSON.stringify({ baseVersion: 0, document: longStrokes() });
    const missing = await mech.agent.put('/api/annotations/987654').set('Content-Type', 'application/json').send(body).expect(404);
    expect(missing.body.code).toBe('NOT_FOUND');
    const other = await t.signIn(DEMO.otherShopMechanic);
    expect((await other.agent.get(`/api/annotations/${asset.id}`).expect(404)).body.code).toBe('NOT_FOUND');
  });
});
