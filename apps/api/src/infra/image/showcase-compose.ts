import sharp from 'sharp';

/** A normalised rectangle of the upright image (0..1), as the pairs feature stores it. */
export interface NormalisedCrop {
  x: number;
  y: number;
  w: number;
  h: number;
}

export interface ComposeRequest {
  /** One shot (alone) or two (before, after): upright JPEG bytes with redactions already burnt in. */
  shots: Buffer[];
  crop: NormalisedCrop | null;
  /** Per shot, the subject's box (the annotated marks), normalised; used only when there is no crop. Null: the centre. */
  focus: (NormalisedCrop | null)[];
  width: number;
  height: number;
  /** 'side' puts the shots left and right, 'stacked' top and bottom. */
  layout: 'side' | 'stacked';
  /** A label per shot ("before", "after") or none. */
  labels: string[];
  /** The shop's mark, bottom-right: its logo (JPEG bytes) when it has one, else its name in our type. */
  watermark: { text: string; logo: Buffer | null };
}

const GUTTER = 8;
const BACKGROUND = '#14181c';

const escapeXml = (s: string) => s.replace(/[<>&"']/g, (c) => `&#${c.charCodeAt(0)};`);

export interface PixelWindow {
  left: number;
  top: number;
  width: number;
  height: number;
}

/**
 * The largest window of the cell's aspect inside a W×H image, centred on the subject
 * (a normalised box) or on the image's centre, and moved back inside the image at its edges.
 * Never "the most eye-catching part": a bright stripe at the edge must not win over the part.
 */
export function coverWindow(W: number, H: number, aspect: number, focus: NormalisedCrop | null): PixelWindow {
  const width = W / H > aspect ? Math.max(1, Math.round(H * aspect)) : W;
  const height = W / H > aspect ? H : Math.max(1, Math.round(W / aspect));
  const cx = focus ? (focus.x + focus.w / 2) * W : W / 2;
  const cy = focus ? (focus.y + focus.h / 2) * H : H / 2;
  const left = Math.round(Math.min(W - width, Math.max(0, cx - width / 2)));
  const top = Math.round(Math.min(H - height, Math.max(0, cy - height / 2)));
  return { left, top, width, height };
}

/** The pair's crop window in pixels of this image (at least 1 px, inside the image). */
function cropPixels(crop: NormalisedCrop, W: number, H: number): PixelWindow {
  const left = Math.min(W - 1, Math.round(crop.x * W));
  const top = Math.min(H - 1, Math.round(crop.y * H));
  return { left, top, width: Math.max(1, Math.min(W - left, Math.round(crop.w * W))), height: Math.max(1, Math.min(H - top, Math.round(crop.h * H))) };
}

/**
 * Fills one cell of the layout around the pair's subject: the pair's crop window when it has one
 * (centred in the cell), else the shot's marks, else the centre.
 */
async function cell(shot: Buffer, crop: NormalisedCrop | null, focus: NormalisedCrop | null, width: number, height: number): Promise<Buffer> {
  const meta = await sharp(shot).metadata();
  const W = meta.width ?? 1;
  const H = meta.height ?? 1;
  const area = crop ? cropPixels(crop, W, H) : { left: 0, top: 0, width: W, height: H };
  const win = coverWindow(area.width, area.height, width / height, crop ? null : focus);
  return sharp(shot, { failOn: 'truncated' })
    .extract({ left: area.left + win.left, top: area.top + win.top, width: win.width, height: win.height })
    .resize(width, height, { fit: 'fill' })
    .toColourspace('srgb')
    .png()
    .toBuffer();
}

/**
 * Our label and watermark layer, one SVG the size of the canvas: a dark pill with a
 * white upper-case word in each cell's top-left corner, the shop name bottom-right.
 */
function overlay(req: ComposeRequest, cells: { left: number; top: number }[]): string {
  const scale = Math.max(0.6, Math.min(req.width, req.height) / 1080);
  const fs = Math.round(34 * scale);
  const pad = Math.round(20 * scale);
  const labels = req.labels
    .map((text, i) => {
      const { left, top } = cells[i];
      const w = Math.round(fs * 0.82 * text.length + pad * 2);
      const h = Math.round(fs * 1.6);
      return `<g transform="translate(${left + pad},${top + pad})"><rect width="${w}" height="${h}" rx="${h / 2}" fill="#14181c" fill-opacity="0.82"/><text x="${w / 2}" y="${h * 0.68}" text-anchor="middle" font-family="DejaVu Sans, sans-serif" font-weight="bold" letter-spacing="${fs * 0.08}" font-size="${fs}" fill="#ffffff">${escapeXml(text.toUpperCase())}</text></g>`;
    })
    .join('');
  const wfs = Math.round(24 * scale);
  const mark = req.watermark.logo
    ? ''
    : `<text x="${req.width - pad}" y="${req.height - pad}" text-anchor="end" font-family="DejaVu Sans, sans-serif" font-size="${wfs}" fill="#ffffff" fill-opacity="0.85" stroke="#14181c" stroke-opacity="0.5" stroke-width="${Math.max(1, wfs / 12)}" paint-order="stroke">${escapeXml(req.watermark.text)}</text>`;
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${req.width}" height="${req.height}">${labels}${mark}</svg>`;
}

/** Logo box: at most a quarter of the width and a tenth of the short side; the logo keeps its proportions. */
const LOGO_MAX_W = 0.25;
const LOGO_MAX_H = 0.1;
/** Slightly see-through so the photo still reads under a large logo. */
const LOGO_OPACITY = 0.9;

/** The logo, fitted into its box and placed bottom-right on the same padding as the text mark. */
async function logoLayer(logo: Buffer, width: number, height: number): Promise<{ input: Buffer; left: number; top: number }> {
  const scale = Math.max(0.6, Math.min(width, height) / 1080);
  const pad = Math.round(20 * scale);
  const fitted = sharp(logo, { failOn: 'truncated' }).resize(Math.round(width * LOGO_MAX_W), Math.round(Math.min(width, height) * LOGO_MAX_H), {
    fit: 'inside',
  });
  const { data, info } = await fitted.toColourspace('srgb').ensureAlpha(LOGO_OPACITY).png().toBuffer({ resolveWithObject: true });
  return { input: data, left: width - pad - info.width, top: height - pad - info.height };
}

/**
 * Lays the shots into a canvas of exactly width×height, adds labels and the watermark,
 * and encodes a baseline sRGB JPEG. Nothing from the inputs' metadata is carried over:
 * sharp writes none unless asked (withMetadata/keepExif), and we never ask.
 */
export async function composeShowcase(req: ComposeRequest): Promise<Buffer> {
  const n = req.shots.length;
  const side = req.layout === 'side';
  const cw = side ? Math.floor((req.width - GUTTER * (n - 1)) / n) : req.width;
  const ch = side ? req.height : Math.floor((req.height - GUTTER * (n - 1)) / n);
  const positions = req.shots.map((_, i) => (side ? { left: i * (cw + GUTTER), top: 0 } : { left: 0, top: i * (ch + GUTTER) }));
  const cells = await Promise.all(req.shots.map((s, i) => cell(s, req.crop, req.focus[i] ?? null, cw, ch)));
  const logo = req.watermark.logo ? [await logoLayer(req.watermark.logo, req.width, req.height)] : [];
  return sharp({ create: { width: req.width, height: req.height, channels: 3, background: BACKGROUND } })
    .composite([...cells.map((input, i) => ({ input, ...positions[i] })), { input: Buffer.from(overlay(req, positions)), left: 0, top: 0 }, ...logo])
    .toColourspace('srgb')
    .jpeg({ quality: 86, optimiseCoding: true })
    .toBuffer();
}
