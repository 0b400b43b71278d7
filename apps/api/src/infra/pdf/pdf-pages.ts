import { execFile } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);

/**
 * Page images of a PDF for browsers that show no PDF inline: Debian poppler-utils'
 * pdftoppm (GPL, a separate program run as a process; nothing is linked).
 */
export class PdfPageImages {
  /** One page (1-based) as PNG at `dpi`; null when the page does not exist. */
  async pagePng(pdf: Buffer, page: number, dpi = 110): Promise<Buffer | null> {
    const dir = await mkdtemp(join(tmpdir(), 'benchproof-pages-'));
    try {
      const input = join(dir, 'in.pdf');
      await writeFile(input, pdf);
      await run('pdftoppm', ['-png', '-r', String(dpi), '-f', String(page), '-l', String(page), '-singlefile', input, join(dir, 'page')]);
      return await readFile(join(dir, 'page.png'));
    } catch {
      return null;
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  }
}

export const PDF_PAGES = Symbol('PDF_PAGES');
