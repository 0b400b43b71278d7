import type { ShowcaseItemDto } from '@benchproof/contracts';
import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { DB, type Db } from '../../src/core/db';
import { consents } from '../../src/db/schema';
import { BOX, checkerboard, exifrAll, exiftoolGroups, H, meanAbsDiff, setConsent, W } from '../showcase/showcase-fixtures';
import { blurredPair, exportOf, listItems, settled } from '../showcase/showcase-helpers';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

/** Exports carry no metadata: sharp, exifr and exiftool all find none. */
async function expectClean(img: Buffer, w: number, h: number, label: string): Promise<void> {
  const meta = await sharp(img).metadata();
  expect({ label, w: meta.width, h: meta.height, exif: meta.exif, icc: meta.icc, xmp: meta.xmp, iptc: meta.iptc }).toEqual({
    label,
    w,
    h,
    exif: undefined,
    icc: undefined,
    xmp: undefined,
    iptc: undefined,
  });
  expect(await exifrAll(img)).toBeUndefined();
  expect(exiftoolGroups(img)).toEqual([]);
}

describe('showcase: consent on the server, clean exports', () => {
  let t: TestApp;
  let mgr: SignedIn;
  let mech: SignedIn;
  let seeded: ShowcaseItemDto[];

  const items = (query = '') => listItems(mgr, query);

  beforeAll(async () => {
    t = await startTestApp();
    await settled(t);
    mgr = await t.signIn(DEMO.manager);
    mech = await t.signIn(DEMO.mechanic);
    seeded = await items();
  });
  afterAll(() => t.close());

  it('lists the seeded consented pairs with consent scope and date; filters by area and date', async () => {
    expect(seeded.length).toBeGreaterThanOrEqual(3);
    expect(new Set(seeded.map((i) => i.jobId)).size).toBe(1);
    expect(seeded[0].consent).toMatchObject({ nameMakeModel: true, wordingVersion: 'marketing-photos-v1' });
    expect(seeded.every((i) => i.caption.length > 10)).toBe(true);
    const brakes = await items('?area=brakes');
    expect(brakes.length).toBeGreaterThan(0);
    expect(brakes.every((i) => i.area === 'brakes')).toBe(true);
    expect(await items('?from=2100-01-01')).toEqual([]);
  });

  it('without consent, outside its wording, or revoked: never listed and never exported', async () => {
    const { jobId, pairId } = await blurredPair(t, mech, null);
    const listed = async () => (await items()).some((i) => i.pairId === pairId);
    expect(await listed()).toBe(false);
    expect((await exportOf(mgr, pairId, 'size=square').expect(409)).body.toString()).toContain('NO_CONSENT');

    // A consent under a wording that never mentioned marketing photos does not cover the showcase.
    const db = t.app.get<Db>(DB);
    const row = { shopId: 1, jobId, granted: true, nameMakeModel: false, wordingVersion: 'service-updates-v0', method: 'in_person' as const };
    db.insert(consents)
      .values({ ...row, givenByName: 'x', recordedBy: null, ownerLinkId: null, at: new Date() })
      .run();
    expect(await listed()).toBe(false);
    expect((await exportOf(mgr, pairId, 'size=square').expect(409)).body.toString()).toContain('NO_CONSENT');

    await setConsent(mgr, jobId, true, false);
    const item = (await items()).find((i) => i.pairId === pairId)!;
    // The pair's caption names the bike but the owner did not allow that: a draft is shown instead.
    expect(item.caption).not.toMatch(/Testwerk|Bench One/);
    const named = await mgr.agent.patch(`/api/showcase/items/${pairId}`).send({ caption: 'A Testwerk, fresh' }).expect(409);
    expect(named.body).toMatchObject({ code: 'NO_CONSENT', details: { issues: [{ path: 'caption' }] } });
    await exportOf(mgr, pairId, 'size=square').expect(200);

    await setConsent(mgr, jobId, false);
    expect(await listed()).toBe(false);
    expect((await exportOf(mgr, pairId, 'size=square').expect(409)).body.toString()).toContain('CONSENT_REVOKED');
    db.delete(consents).where(eq(consents.jobId, jobId)).run();
  });

  it('exports have the asked pixel sizes and no metadata at all (exifr, exiftool)', async () => {
    const pairId = seeded[0].pairId;
    const cases = [
      ['variant=pair&size=square', 1080, 1080],
      ['variant=pair&size=portrait', 1080, 1350],
      ['variant=pair&size=banner', 1600, 600],
      ['variant=before&size=square', 1080, 1080],
      ['variant=after&size=banner', 1600, 600],
    ] as const;
    for (const [q, w, h] of cases) {
      const img = (await exportOf(mgr, pairId, q).expect(200).expect('content-type', 'image/jpeg')).body as Buffer;
      await expectClean(img, w, h, q);
    }
    const downloads = (await mgr.agent.get(`/api/showcase/jobs/${seeded[0].jobId}/downloads`).expect(200)).body as { pairId: number; bytes: number }[];
    expect(downloads.filter((d) => d.pairId === pairId)).toHaveLength(cases.length);
    expect(downloads.every((d) => d.bytes > 1000)).toBe(true);
  });

  it('the blur box is pixelated in the export and the rest matches the original, with the crop applied', async () => {
    // Crop the lower half: 800×300 of the 800×600 shot, exactly 2× into the 1600×600 banner.
    const crop = { x: 0, y: 0.5, w: 1, h: 0.5 };
    const { jobId, pairId } = await blurredPair(t, mech, crop);
    await setConsent(mgr, jobId, true);
    const out = (await exportOf(mgr, pairId, 'variant=before&size=banner').expect(200)).body as Buffer;
    const reference = await sharp(await checkerboard())
      .extract({ left: 0, top: 300, width: W, height: H / 2 })
      .resize(1600, 600)
      .toBuffer();
    const inBox = (x: number, y: number) => x >= BOX.x0 * 2 + 8 && x < BOX.x1 * 2 - 8 && y >= (BOX.y0 - 300) * 2 + 8 && y < (BOX.y1 - 300) * 2 - 8;
    const clear = (x: number, y: number) => !(x >= BOX.x0 * 2 - 40 && x < BOX.x1 * 2 + 40 && y < (BOX.y1 - 300) * 2 + 40) && !(x > 1100 && y > 520);
    const inside = await meanAbsDiff(out, reference, 1600, 600, inBox);
    const outside = await meanAbsDiff(out, reference, 1600, 600, clear);
    console.info(`blurred export vs original: mean |Δ| inside the box ${inside.toFixed(1)}, elsewhere ${outside.toFixed(1)} (0–255)`);
    expect(inside).toBeGreaterThan(60);
    expect(outside).toBeLessThan(12);
  });

  it('carries the shop logo as the watermark once one is set (the name otherwise); still no metadata', async () => {
    const pairId = seeded[0].pairId;
    const square = async () => (await exportOf(mgr, pairId, 'variant=pair&size=square').expect(200)).body as Buffer;
    // The watermark corner (logo box: a quarter of the width, a tenth of the height, 20 px in) and the rest.
    const corner = (x: number, y: number) => x >= 1080 - 20 - 270 && x < 1060 && y >= 1080 - 20 - 108 && y < 1060;
    const rest = (x: number, y: number) => x < 1080 - 20 - 290 || y < 1080 - 20 - 128;
    const named = await square();
    const seededName = ((await mgr.agent.get('/api/shop/settings').expect(200)).body as { name: string }).name;

    // Another shop name changes the corner only: the fallback mark is the name.
    await mgr.agent.patch('/api/shop/settings').send({ name: 'Cog & Crank Test Works' }).expect(200);
    const renamed = await square();
    await mgr.agent.patch('/api/shop/settings').send({ name: seededName }).expect(200);
    expect(await meanAbsDiff(renamed, named, 1080, 1080, corner)).toBeGreaterThan(1);

    // A bold logo with an EXIF block of its own: red with a white bar, 3:1.
    const bar = Buffer.from(
      '<svg xmlns="http://www.w3.org/2000/svg" width="600" height="200"><rect width="600" height="200" fill="#c0392b"/><rect x="60" y="80" width="480" height="40" fill="#fff"/></svg>',
    );
    const logo = await sharp(bar)
      .jpeg()
      .withExif({ IFD0: { Artist: 'Logo maker' } })
      .toBuffer();
    await mgr.agent.post('/api/shop/logo').attach('file', logo, 'logo.jpg').expect(201);
    const withLogo = await square();
    const inCorner = await meanAbsDiff(withLogo, named, 1080, 1080, corner);
    const elsewhere = await meanAbsDiff(withLogo, named, 1080, 1080, rest);
    console.info(`logo watermark: mean |Δ| in the corner ${inCorner.toFixed(1)}, elsewhere ${elsewhere.toFixed(1)} (0–255)`);
    expect(inCorner).toBeGreaterThan(25);
    expect(elsewhere).toBeLessThan(1);
    // Red where the logo sits (its red field, 90 % over the photo), left of the bar's end.
    const { data } = await sharp(withLogo)
      .extract({ left: 1060 - 12, top: 1060 - 12, width: 4, height: 4 })
      .raw()
      .toBuffer({ resolveWithObject: true });
    expect(data[0] - data[2]).toBeGreaterThan(80);
    await expectClean(withLogo, 1080, 1080, 'square with logo');
    await expectClean((await exportOf(mgr, pairId, 'variant=after&size=banner').expect(200)).body as Buffer, 1600, 600, 'banner with logo');
    await mgr.agent.delete('/api/shop/logo').expect(200);
    expect(await meanAbsDiff(await square(), named, 1080, 1080, corner)).toBeLessThan(1);
  });
});
