import type { MediaAssetDto } from '@benchproof/contracts';
import exifr from 'exifr';
import sharp from 'sharp';
import { binary, derivativesSettled } from '../media/media-fixtures';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

/**
 * The demo shots are written as a phone would: pixels stored turned with EXIF Orientation
 * 3, 6 or 8 (CIPA DC-008 / JEITA CP-3451, orientation tag 0x0112) and GPS tags in IFD0's
 * GPS IFD (pointer 0x8825). The demo must show them upright and free of location data.
 */
describe('demo media in the seeded shop', () => {
  let t: TestApp;
  let mech: SignedIn;
  let assets: MediaAssetDto[];
  const bytes = async (path: string): Promise<Buffer> => (await mech.agent.get(path).buffer(true).parse(binary).expect(200)).body as Buffer;

  beforeAll(async () => {
    t = await startTestApp();
    await derivativesSettled(t);
    mech = await t.signIn(DEMO.mechanic);
    const jobs = (await mech.agent.get('/api/jobs').query({ open: 'true', pageSize: 50 }).expect(200)).body.items as { id: number }[];
    const lists = await Promise.all(jobs.map(async (j) => (await mech.agent.get(`/api/jobs/${j.id}/media`).expect(200)).body as MediaAssetDto[]));
    assets = lists.flat();
  });
  afterAll(() => t.close());

  it('puts before and after shots, and scope stills, on jobs that are under way', () => {
    expect(assets.length).toBeGreaterThanOrEqual(8);
    expect(new Set(assets.map((a) => a.phase))).toEqual(new Set(['before', 'during', 'after']));
    expect(assets.some((a) => a.source === 'scope' && a.area === 'frame_interior')).toBe(true);
  });

  it('keeps GPS in the immutable original but in no derivative, and shows every shot upright', async () => {
    const withGps = [];
    for (const a of assets) {
      const original = await bytes(`/api/media/${a.id}/original`);
      if (await exifr.gps(original)) withGps.push(a.id);
      for (const variant of ['thumb', 'screen', 'print'] as const) {
        const derived = await bytes(`/api/media/${a.id}/${variant}`);
        expect(await exifr.gps(derived)).toBeUndefined();
        const meta = await sharp(derived).metadata();
        // The scenes are drawn landscape (1200×800); an upright derivative keeps that shape.
        expect({ id: a.id, variant, landscape: meta.width > meta.height, orientation: meta.orientation ?? 1 }).toEqual({
          id: a.id,
          variant,
          landscape: true,
          orientation: 1,
        });
      }
    }
    expect(withGps.length).toBeGreaterThan(0);
  });
});
