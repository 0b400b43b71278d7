import type { AnnotationDocument, Shape } from './document';
import { PALETTE } from './palette';
import { renderSvg, shapeToSvg } from './svg';

const base = { colour: 'cyan', width: 'medium' } as const;
const size = { width: 1000, height: 500 };
const shapes: Shape[] = [
  { ...base, id: 's', kind: 'scale', from: { x: 0.1, y: 0.9 }, to: { x: 0.3, y: 0.9 }, knownMm: 10 },
  { ...base, id: 'g', kind: 'ring', centre: { x: 0.5, y: 0.5 }, rx: 0.1, ry: 0.2 },
  { ...base, id: 'a', kind: 'arrow', from: { x: 0.1, y: 0.1 }, to: { x: 0.4, y: 0.1 } },
  {
    ...base,
    id: 'p',
    kind: 'pen',
    points: [
      { x: 0, y: 0 },
      { x: 0.5, y: 0.5 },
      { x: 1, y: 0 },
    ],
  },
  { ...base, id: 'l', kind: 'label', at: { x: 0.5, y: 0.2 }, text: 'Crack <2 mm> & wear' },
  { ...base, id: 'r', kind: 'ruler', from: { x: 0.1, y: 0.7 }, to: { x: 0.45, y: 0.7 } },
  { ...base, id: 'b', kind: 'blur', topLeft: { x: 0.8, y: 0.8 }, bottomRight: { x: 0.9, y: 0.9 } },
];
const doc: AnnotationDocument = { schemaVersion: 2, image: size, shapes };
const svgOf = (id: string) =>
  shapeToSvg(
    doc,
    shapes.find((s) => s.id === id)!,
    size,
  );

describe('SVG rendering', () => {
  it('is an SVG of exactly the image size, so it composites pixel for pixel', () => {
    const svg = renderSvg(doc, size);
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="1000" height="500" viewBox="0 0 1000 500">/);
  });

  it('draws a ring as an ellipse in pixels, outline under ink', () => {
    const svg = svgOf('g');
    expect(svg).toContain('cx="500" cy="250" rx="100" ry="100"');
    expect(svg.indexOf(PALETTE.cyan.outline)).toBeLessThan(svg.indexOf(PALETTE.cyan.ink));
  });

  it('draws an arrow as a shaft and a head whose tip is at the arrow’s end', () => {
    expect(svgOf('a')).toMatch(/<polygon points="400,50 /);
  });

  it('draws a pen stroke through every point', () => {
    expect(svgOf('p')).toContain('points="0,0 500,250 1000,0"');
  });

  it('escapes label text', () => {
    expect(svgOf('l')).toContain('Crack &lt;2 mm&gt; &amp; wear');
  });

  it('writes the calibrated length on a ruler: 350 px at 10 mm / 200 px = 17.5 mm', () => {
    expect(svgOf('r')).toContain('>17.5 mm</text>');
    expect(svgOf('s')).toContain('>= 10.0 mm</text>');
    expect(svgOf('s')).toContain('stroke-dasharray');
  });

  it('draws nothing for a blur box: the server pixelates the pixels themselves', () => {
    expect(svgOf('b')).toBe('');
  });

  it('says so on a ruler while the photo has no scale', () => {
    const noScale = { ...doc, shapes: shapes.filter((s) => s.kind !== 'scale') };
    expect(
      shapeToSvg(
        noScale,
        shapes.find((s) => s.id === 'r')!,
        size,
      ),
    ).toContain('>no scale</text>');
  });
});
