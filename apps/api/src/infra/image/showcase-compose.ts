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

/** Crops (normalised → pixels of this image) and fills one cell of the layout. */
async function cell(shot: Buffer, crop: NormalisedCrop | null, width: number, height: number): Promise<Buffer> {
  let img = sharp(shot, { failOn: 'truncated' });
  if (crop) {
    const meta = await sharp(shot).metadata();
    const W = meta.width ?? 1;
    const H = meta.height ?? 1;
    const left = Math.min(W - 1, Math.round(crop.x * W));
    const top = Math.min(H - 1, Math.round(crop.y * H));
    img = img.extract({
      left,
      top,
      width: Math.max(1, Math.min(W - left, Math.round(crop.w * W))),
      height: Math.max(1, Math.min(H - top, Math.round(crop.h * H))),
    });
  }
  return img.resize(width, height, { fit: 'cover', position: 'attention' }).toColourspace('srgb').png().toBuffer();
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
  const cells = await Promise.all(req.shots.map((s) => cell(s, req.crop, cw, ch)));
  const logo = req.watermark.logo ? [await logoLayer(req.watermark.logo, req.width, req.height)] : [];
  return sharp({ create: { width: req.width, height: req.height, channels: 3, background: BACKGROUND } })
    .composite([...cells.map((input, i) => ({ input, ...positions[i] })), { input: Buffer.from(overlay(req, positions)), left: 0, top: 0 }, ...logo])
    .toColourspace('srgb')
    .jpeg({ quality: 86, optimiseCoding: true })
    .toBuffer();
}
