import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** Text of every page (pdfjs-dist, Mozilla's PDF reader), one string per page. */
export async function pdfPages(pdf: Buffer): Promise<{ text: string; width: number; height: number }[]> {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await pdfjs.getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false }).promise;
  const pages = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    const content = await page.getTextContent();
    const text = content.items
      .map((it) => ('str' in it ? it.str : ''))
      .join(' ')
      .replace(/\s+/g, ' ');
    const [x0, y0, x1, y1] = page.view;
    pages.push({ text, width: x1 - x0, height: y1 - y0 });
  }
  await doc.destroy();
  return pages;
}

function withFile<T>(pdf: Buffer, fn: (path: string, dir: string) => T): T {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-pdf-'));
  try {
    const path = join(dir, 'r.pdf');
    writeFileSync(path, pdf);
    return fn(path, dir);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** poppler's pdffonts: one row per font with its type and whether it is embedded. */
export function pdffonts(pdf: Buffer): { name: string; type: string; embedded: boolean }[] {
  const out = withFile(pdf, (p) => execFileSync('pdffonts', [p], { encoding: 'utf8' }));
  return out
    .split('\n')
    .slice(2)
    .filter((l) => l.trim())
    .map((l) => {
      const cols = l.trim().split(/\s+/);
      // name type… encoding emb sub uni object ID: emb is the 5th column from the end
      return { name: cols[0], type: cols.slice(1, cols.length - 6).join(' '), embedded: cols[cols.length - 5] === 'yes' };
    });
}

/** poppler's pdfimages -all: every embedded image as stored, with its SHA-256 and pixel size (-list). */
export function pdfimages(pdf: Buffer): { sha256: string; width: number; height: number; ext: string }[] {
  return withFile(pdf, (p, dir) => {
    const list = execFileSync('pdfimages', ['-list', p], { encoding: 'utf8' })
      .split('\n')
      .slice(2)
      .filter((l) => l.trim());
    execFileSync('pdfimages', ['-all', p, join(dir, 'img')]);
    const files = readdirSync(dir)
      .filter((f) => f.startsWith('img-'))
      .sort();
    return files.map((f, i) => {
      const cols = list[i].trim().split(/\s+/);
      return {
        sha256: createHash('sha256')
          .update(readFileSync(join(dir, f)))
          .digest('hex'),
        width: Number(cols[3]),
        height: Number(cols[4]),
        ext: f.split('.').pop() ?? '',
      };
    });
  });
}

export const sha256 = (b: Buffer): string => createHash('sha256').update(b).digest('hex');
