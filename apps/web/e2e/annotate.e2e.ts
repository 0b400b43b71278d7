import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { DESKTOP, openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';

const MECHANIC = 'tobin@lantern-spoke.test';
const TABLET = { width: 820, height: 1180 };

/** A demo photo with its derivatives ready, in a job the mechanic can see. */
async function demoPhoto(page: Page): Promise<{ jobId: number; mediaId: number }> {
  const jobs = (await (await page.request.get('/api/jobs?pageSize=20')).json()) as { items: { id: number }[] };
  for (const { id } of jobs.items) {
    const media = (await (await page.request.get(`/api/jobs/${id}/media`)).json()) as { id: number; kind: string; status: string }[];
    const photo = media.find((m) => m.kind === 'photo' && m.status === 'ready');
    if (photo) return { jobId: id, mediaId: photo.id };
  }
  throw new Error('No demo photo found');
}

/** Drags across the stage between two points given as fractions of its box. */
async function drag(page: Page, from: [number, number], to: [number, number]) {
  const box = (await page.getByTestId('annotate-stage').boundingBox())!;
  await page.mouse.move(box.x + from[0] * box.width, box.y + from[1] * box.height);
  await page.mouse.down();
  await page.mouse.move(box.x + to[0] * box.width, box.y + to[1] * box.height, { steps: 8 });
  await page.mouse.up();
}

const shapes = async (page: Page) => Number(await page.getByTestId('annotate-editor').getAttribute('data-shapes'));
const tool = (page: Page, name: RegExp) => page.getByRole('button', { name }).click();

/** Two fingers spreading apart over the stage, sent as real touch events (CDP Input.dispatchTouchEvent). */
async function pinchOut(page: Page) {
  const box = (await page.getByTestId('annotate-stage').boundingBox())!;
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  const cdp = await page.context().newCDPSession(page);
  const at = (d: number) => [
    { x: cx - d, y: cy, id: 1 },
    { x: cx + d, y: cy, id: 2 },
  ];
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: at(40) });
  for (const d of [60, 90, 120, 150]) await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: at(d) });
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
}

/**
 * Mean absolute difference per channel (0–255) between two same-size RGB images,
 * over all pixels and over the pixels a mask marks (the annotation's own pixels).
 */
async function difference(a: Buffer, b: Buffer, mask: Buffer) {
  const [ra, rb, rm] = await Promise.all([a, b, mask].map((img) => sharp(img).removeAlpha().raw().toBuffer({ resolveWithObject: true })));
  expect([ra.info.width, ra.info.height]).toEqual([rb.info.width, rb.info.height]);
  let all = 0;
  let marked = 0;
  let n = 0;
  for (let i = 0; i < ra.data.length; i += 3) {
    const d = Math.abs(ra.data[i] - rb.data[i]) + Math.abs(ra.data[i + 1] - rb.data[i + 1]) + Math.abs(ra.data[i + 2] - rb.data[i + 2]);
    all += d;
    if (rm.data[i] > 0) {
      marked += d;
      n += 3;
    }
  }
  return { all: all / ra.data.length, marked: marked / Math.max(1, n), markedPixels: n / 3 };
}

describe('annotate a photo on a tablet with touch', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('sets a scale, rings and measures, undoes and redoes, saves, reloads, and matches the server render', async () => {
    b = await openBrowser(TABLET, { touch: true });
    const { page } = b;
    await signIn(page, MECHANIC);
    const { jobId, mediaId } = await demoPhoto(page);
    const base = (await (await page.request.get(`/api/annotations/${mediaId}`)).json()) as { version: number };
    await page.goto(`/jobs/${jobId}/media/${mediaId}/annotate`);
    await page.getByTestId('annotate-stage').waitFor();

    await tool(page, /^Set scale/);
    await drag(page, [0.1, 0.85], [0.3, 0.85]);
    await page.getByRole('button', { name: 'One inch on a rule (25.4 mm)' }).click();
    await tool(page, /^Ring/);
    await drag(page, [0.5, 0.4], [0.58, 0.4]);
    await tool(page, /^Arrow/);
    await drag(page, [0.2, 0.2], [0.42, 0.36]);
    await tool(page, /^Measure/);
    await drag(page, [0.1, 0.65], [0.45, 0.65]);
    await shot(page, 'annotate-tablet-drawn');
    expect(await shapes(page)).toBe(4);
    // 0.35 of the stage against a 0.20 scale line of 25.4 mm: 1.75 × 25.4 = 44.45 mm, give or take a pixel.
    const mm = Number(/^Ruler: ([\d.]+) mm/.exec((await page.getByTestId('ruler-length').textContent()) ?? '')?.[1]);
    expect(Math.abs(mm - 44.45)).toBeLessThan(0.6);

    await page.getByRole('button', { name: /^Undo/ }).click();
    expect(await shapes(page)).toBe(3);
    await page.getByRole('button', { name: /^Redo/ }).click();
    expect(await shapes(page)).toBe(4);
    // On a slow machine the autosave (1.2 s) may have saved the four shapes already, and redo back to them
    // is then the saved point again with nothing to save: Save is offered only while something is unsaved.
    const saveButton = page.getByRole('button', { name: 'Save', exact: true });
    if (await saveButton.isEnabled()) await saveButton.click();
    await page.getByTestId('save-state').getByText('Saved').waitFor();
    await shot(page, 'annotate-tablet');

    await page.reload();
    await page.getByTestId('annotate-stage').waitFor();
    await page.waitForFunction(() => document.querySelector('[data-testid="annotate-editor"]')?.getAttribute('data-shapes') === '4');
    const saved = (await (await page.request.get(`/api/annotations/${mediaId}`)).json()) as { version: number; document: { shapes: { kind: string }[] } };
    expect(saved.version).toBeGreaterThan(base.version);
    expect(saved.document.shapes.map((s) => s.kind)).toEqual(['scale', 'ring', 'arrow', 'ruler']);

    // Same picture on both sides: the editor's export and the server's render of the saved version, same size.
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download the annotated image' }).click()]);
    const editor = readFileSync(await download.path());
    const server = Buffer.from(await (await page.request.get(`/api/media/${mediaId}/annotated/screen`)).body());
    const plain = Buffer.from(await (await page.request.get(`/api/media/${mediaId}/screen`)).body());
    // The mask: pixels the server render changed by more than 48 (sum over channels) from the plain photo.
    const { data, info } = await sharp(server).removeAlpha().raw().toBuffer({ resolveWithObject: true });
    const bare = await sharp(plain).removeAlpha().raw().toBuffer();
    const mask = Buffer.alloc(data.length);
    for (let i = 0; i < data.length; i += 3) {
      const d = Math.abs(data[i] - bare[i]) + Math.abs(data[i + 1] - bare[i + 1]) + Math.abs(data[i + 2] - bare[i + 2]);
      if (d > 48) mask.fill(255, i, i + 3);
    }
    const diff = await difference(
      editor,
      server,
      await sharp(mask, { raw: { width: info.width, height: info.height, channels: 3 } })
        .png()
        .toBuffer(),
    );
    console.info(
      `editor vs server: mean abs diff ${diff.all.toFixed(2)} over all pixels, ${diff.marked.toFixed(2)} over ${diff.markedPixels} annotation pixels`,
    );
    expect(diff.markedPixels).toBeGreaterThan(1000);
    // Stated tolerances (0–255 per channel): whole image ≤ 3 (JPEG re-encoding, anti-aliasing);
    // annotation pixels ≤ 30 (stroke edges and glyph shapes differ between Chromium canvas and librsvg).
    expect(diff.all).toBeLessThan(3);
    expect(diff.marked).toBeLessThan(30);

    await pinchOut(page);
    await page.waitForFunction(() => Number(document.querySelector('[data-testid="annotate-editor"]')?.getAttribute('data-zoom')) > 1.5);
    await shot(page, 'annotate-tablet-zoomed');
  }, 240_000);

  it.each([
    ['phone', PHONE],
    ['desktop', DESKTOP],
  ] as const)(
    'shows the editor on a %s',
    async (name, viewport) => {
      b = await openBrowser(viewport, { touch: name === 'phone' });
      await signIn(b.page, MECHANIC);
      const { jobId, mediaId } = await demoPhoto(b.page);
      await b.page.goto(`/jobs/${jobId}/media/${mediaId}/annotate`);
      await b.page.getByTestId('annotate-stage').waitFor();
      await b.page.getByTestId('save-state').waitFor();
      await b.page.locator('[data-testid="annotate-stage"] canvas').first().waitFor();
      await shot(b.page, `annotate-${name}`);
    },
    120_000,
  );
});

describe('annotate on a phone (390 × 844)', () => {
  let b: Browser;
  afterEach(() => b?.close());

  /** The photo's share of the screen height: the stage's box against the viewport. */
  const photoShare = async (page: Page) => (await page.getByTestId('annotate-stage').boundingBox())!.height / PHONE.height;

  it('keeps the photo on most of the screen in every tool, with one style control and a measurement sheet that closes', async () => {
    b = await openBrowser(PHONE, { touch: true });
    const { page } = b;
    await signIn(page, MECHANIC);
    const { jobId, mediaId } = await demoPhoto(page);
    await page.goto(`/jobs/${jobId}/media/${mediaId}/annotate`);
    await page.locator('[data-testid="annotate-stage"] canvas').first().waitFor();

    for (const [name, file] of [
      ['Select and move', 'select'],
      ['Ring', 'ring'],
      ['Arrow', 'arrow'],
      ['Pen', 'pen'],
      ['Label', 'label'],
      ['Set scale', 'scale'],
      ['Measure', 'measure'],
      ['Blur box', 'blur'],
    ]) {
      await tool(page, new RegExp(`^${name}`));
      expect(await photoShare(page)).toBeGreaterThan(0.8);
      await shot(page, `annotate-phone-${file}`);
    }
    await tool(page, /^Ring/);
    expect(await page.getByTestId('tool-hint').textContent()).toMatch(/grows from its centre/);

    // Colour and width behind one control.
    await page.getByTestId('style-button').click();
    await page.getByRole('button', { name: 'Colour cyan' }).click();
    await shot(page, 'annotate-phone-style');
    await page.keyboard.press('Escape');
    await page.getByTestId('style-popover').waitFor({ state: 'hidden' });
    expect(await page.getByTestId('style-button').getAttribute('aria-label')).toMatch(/cyan/);

    // Measure: a plain length first; the chain wording only when asked for; the sheet closes.
    await tool(page, /^Set scale/);
    await drag(page, [0.1, 0.7], [0.5, 0.7]);
    await page.getByRole('button', { name: 'One inch on a rule (25.4 mm)' }).click();
    await tool(page, /^Measure/);
    await drag(page, [0.15, 0.4], [0.6, 0.4]);
    const sheet = page.getByTestId('measure-sheet');
    await sheet.waitFor();
    expect(await photoShare(page)).toBeGreaterThan(0.8);
    expect((await sheet.boundingBox())!.height / PHONE.height).toBeLessThan(0.3);
    expect(await page.getByTestId('chain-panel').count()).toBe(0);
    expect(await sheet.textContent()).not.toMatch(/pitch/i);
    await shot(page, 'annotate-phone-measure-sheet');
    await sheet.getByText('Chain wear').click();
    await page.getByTestId('chain-panel').waitFor();
    await shot(page, 'annotate-phone-chain');
    await page.getByRole('button', { name: 'Close the measurement' }).click();
    await sheet.waitFor({ state: 'hidden' });
    expect(await photoShare(page)).toBeGreaterThan(0.8);

    // The label dialog is quiet until something is typed; a label at the edge is kept inside.
    await tool(page, /^Label/);
    await drag(page, [0.99, 0.25], [0.99, 0.25]);
    const text = page.getByRole('textbox', { name: 'Text' });
    await text.waitFor();
    expect(await page.getByText('A label needs 1 to 120 characters.').count()).toBe(0);
    await text.fill('x');
    await text.fill('');
    await page.getByText('A label needs 1 to 120 characters.').waitFor();
    await text.fill('Pads worn to the backing');
    await page.getByRole('button', { name: 'Place label' }).click();

    // Saved, then a ring, then undo back to what was saved: "Saved" again.
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await page.getByTestId('save-state').getByText('Saved').waitFor();
    await tool(page, /^Ring/);
    await drag(page, [0.5, 0.55], [0.56, 0.55]);
    await page.getByTestId('save-state').getByText('Unsaved changes').waitFor({ timeout: 1000 });
    await page.getByRole('button', { name: /^Undo/ }).click();
    await page.getByTestId('save-state').getByText('Saved').waitFor({ timeout: 1000 });

    const saved = (await (await page.request.get(`/api/annotations/${mediaId}`)).json()) as { document: { shapes: { kind: string; at?: { x: number } }[] } };
    // The photo may carry the tablet test's marks already: ours are the last three.
    const ours = saved.document.shapes.slice(-3);
    expect(ours.map((s) => s.kind)).toEqual(['scale', 'ruler', 'label']);
    expect(ours[2].at!.x).toBeLessThan(0.95);

    // The viewer says the photo is annotated and switches between the render and the photo.
    await page.goto(`/jobs/${jobId}?section=media`);
    await page.locator(`[data-testid="media-tile"]:has(img[src*="/media/${mediaId}/"]) button`).first().click();
    const image = page.getByTestId('viewer-image');
    await page.getByTestId('annotated-switch').waitFor();
    expect(await image.getAttribute('data-showing')).toBe('annotated');
    expect(await image.getAttribute('src')).toMatch(/\/annotated\/screen/);
    await shot(page, 'viewer-phone-annotated');
    await page.getByTestId('annotated-switch').getByText('Photo').click();
    expect(await image.getAttribute('data-showing')).toBe('photo');
    expect(await image.getAttribute('src')).toMatch(new RegExp(`/api/media/${mediaId}/screen`));
  }, 240_000);

  it('shows the not-found page for a photo that does not exist', async () => {
    b = await openBrowser(PHONE, { touch: true });
    await signIn(b.page, MECHANIC);
    const { jobId } = await demoPhoto(b.page);
    await b.page.goto(`/jobs/${jobId}/media/987654321/annotate`);
    await b.page.getByRole('heading', { name: 'Nothing on this hook' }).waitFor({ timeout: 15_000 });
  }, 120_000);
});
