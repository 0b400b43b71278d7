import sharp from 'sharp';
import { composeShowcase, coverWindow, type ComposeRequest } from './showcase-compose';

const W = 1600;
const H = 1000;
/** The subject: a dull grey rotor-like ring, off-centre to the left (centre 320, 500; outer radius 170). */
const SUBJECT = { cx: 320, cy: 500, r: 170 };
/** Its box, normalised, as the marks' box of a ring drawn around it would be. */
const SUBJECT_BOX = { x: (SUBJECT.cx - SUBJECT.r) / W, y: (SUBJECT.cy - SUBJECT.r) / H, w: (2 * SUBJECT.r) / W, h: (2 * SUBJECT.r) / H };

/**
 * A workshop photo in miniature, made with sharp: dark bench, a grey ring (the part) left of
 * centre, and a bright, busy stripe (a window, a light) along the right edge, the most
 * eye-catching thing in the frame.
 */
async function photo(): Promise<Buffer> {
  const stripes = Array.from(
    { length: 12 },
    (_, i) => `<rect x="${1420 + i * 15}" y="0" width="8" height="${H}" fill="${i % 2 ? '#ffffff' : '#ffe14d'}"/>`,
  ).join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}">
    <rect width="${W}" height="${H}" fill="#2a2a2a"/>
    <circle cx="${SUBJECT.cx}" cy="${SUBJECT.cy}" r="${SUBJECT.r - 15}" fill="none" stroke="#8c1c8c" stroke-width="30"/>
    <circle cx="${SUBJECT.cx}" cy="${SUBJECT.cy}" r="40" fill="#8c1c8c"/>
    <rect x="1400" y="0" width="200" height="${H}" fill="#fffbe0"/>${stripes}
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 92 }).toBuffer();
}

/** Share of the output's pixels in the subject's colour (magenta) and in the distraction's (near white / yellow). */
async function shares(jpeg: Buffer): Promise<{ subject: number; distraction: number }> {
  const { data, info } = await sharp(jpeg).raw().toBuffer({ resolveWithObject: true });
  let subject = 0;
  let distraction = 0;
  for (let i = 0; i < data.length; i += info.channels) {
    const [r, g, b] = [data[i], data[i + 1], data[i + 2]];
    if (r > 110 && r < 170 && g < 60 && b > 110 && b < 170) subject++;
    if (r > 220 && g > 200) distraction++;
  }
  const n = info.width * info.height;
  return { subject: subject / n, distraction: distraction / n };
}

const request = (shot: Buffer, over: Partial<ComposeRequest>): ComposeRequest => ({
  shots: [shot],
  crop: null,
  focus: [null],
  width: 1080,
  height: 1080,
  layout: 'side',
  labels: [],
  watermark: { text: '', logo: null },
  ...over,
});

describe('showcase crops around the pair’s subject, not the brightest thing in the frame', () => {
  let shot: Buffer;
  // The subject's painted area: ring 2π·155·30 + hub π·40² ≈ 34,240 px of the source. Whole in a square
  // (a 1000×1000 window) that is 3.4 % of the output, in a portrait (800×1000) 4.3 %; 90 % of that must show.
  const PAINTED = 2 * Math.PI * 155 * 30 + Math.PI * 40 * 40;
  beforeAll(async () => {
    shot = await photo();
  });

  it('square, subject marked: the whole ring is in frame and the bright stripe is not', async () => {
    const s = await shares(await composeShowcase(request(shot, { focus: [SUBJECT_BOX] })));
    expect(s.subject).toBeGreaterThan((0.9 * PAINTED) / (1000 * 1000));
    expect(s.distraction).toBeLessThan(0.001);
  });

  it('portrait (1080×1350), subject marked: the ring stays whole', async () => {
    const s = await shares(await composeShowcase(request(shot, { focus: [SUBJECT_BOX], height: 1350 })));
    expect(s.subject).toBeGreaterThan((0.9 * PAINTED) / (800 * 1000));
    expect(s.distraction).toBeLessThan(0.001);
  });

  it('the pair’s crop window wins over the marks: a crop around the stripe shows the stripe', async () => {
    const crop = { x: 0.8, y: 0, w: 0.2, h: 1 };
    const s = await shares(await composeShowcase(request(shot, { crop, focus: [SUBJECT_BOX] })));
    expect(s.subject).toBe(0);
    expect(s.distraction).toBeGreaterThan(0.3);
  });

  it('no crop and no marks: the centre, not the stripe at the edge', async () => {
    const s = await shares(await composeShowcase(request(shot, {})));
    expect(s.distraction).toBeLessThan(0.001);
  });

  // Plain arithmetic on the window (no outside source needed): the largest window of the aspect, centred, clamped.
  it.each([
    ['square of a landscape, centred', 1600, 1000, 1, null, { left: 300, top: 0, width: 1000, height: 1000 }],
    ['square, subject at the left edge: clamped to the edge', 1600, 1000, 1, { x: 0, y: 0.4, w: 0.1, h: 0.2 }, { left: 0, top: 0, width: 1000, height: 1000 }],
    [
      'square, subject at the right: window ends at the edge',
      1600,
      1000,
      1,
      { x: 0.8, y: 0.4, w: 0.1, h: 0.2 },
      { left: 600, top: 0, width: 1000, height: 1000 },
    ],
    [
      'banner (1600:600) of a landscape, subject low',
      1600,
      1000,
      1600 / 600,
      { x: 0.4, y: 0.8, w: 0.2, h: 0.1 },
      { left: 0, top: 400, width: 1600, height: 600 },
    ],
    ['portrait (4:5) of a portrait photo, centred', 1000, 1600, 0.8, null, { left: 0, top: 175, width: 1000, height: 1250 }],
  ] as const)('%s', (_, w, h, aspect, focus, expected) => {
    expect(coverWindow(w, h, aspect, focus)).toEqual(expected);
  });
});
