import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import ts from 'typescript';

const ROOT = resolve(__dirname, '../../../..');

/** Source that can put words in front of a user: the web app, the API (PDF, e-mail, errors) and the shared libs. */
const SOURCES = ['apps/web/src', 'apps/api/src', 'libs/domain/src', 'libs/contracts/src', 'libs/annotation/src'];
const isTest = (f: string) => /\.(test|spec|e2e-spec)\.tsx?$/.test(f);

function files(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = join(dir, e.name);
    if (e.isDirectory()) return files(p);
    return /\.tsx?$/.test(e.name) && !isTest(e.name) ? [p] : [];
  });
}

/** Every string literal, template piece and JSX text of a file: what can reach a screen, a PDF or an e-mail (comments cannot). */
function userText(path: string): string[] {
  const src = ts.createSourceFile(path, readFileSync(path, 'utf8'), ts.ScriptTarget.Latest, true, path.endsWith('x') ? ts.ScriptKind.TSX : ts.ScriptKind.TS);
  const out: string[] = [];
  const visit = (n: ts.Node) => {
    if (ts.isStringLiteralLike(n) || ts.isJsxText(n) || ts.isTemplateHead(n) || ts.isTemplateMiddle(n) || ts.isTemplateTail(n)) out.push(n.text);
    ts.forEachChild(n, visit);
  };
  visit(src);
  return out;
}

/**
 * Source notes ("common practice, no source", the internal facts sheet's section numbers) belong in
 * code comments, tests and docs. A user reads plain advice, so no literal may carry them.
 */
const MARKERS = [/no source/i, /CHECKS\.md/, /\bfrom memory\b/i];

describe('trade-source markers stay out of user-facing text', { timeout: 60_000 }, () => {
  it('no string, template or JSX text in the product carries a source marker', () => {
    const hits = SOURCES.flatMap((d) => files(resolve(ROOT, d))).flatMap((f) =>
      userText(f)
        .filter((t) => MARKERS.some((m) => m.test(t)))
        .map((t) => `${relative(ROOT, f)}: ${t.trim().slice(0, 80)}`),
    );
    expect(hits).toEqual([]);
  });

  it('the scan sees JSX text (a probe with a marker is found)', () => {
    const probe = join(ROOT, 'apps/web/src/app/routes/jobs/jobs.route.tsx');
    expect(userText(probe).length).toBeGreaterThan(5);
    const src = ts.createSourceFile('p.tsx', '<p>Common practice, no source: x</p>', ts.ScriptTarget.Latest, true, ts.ScriptKind.TSX);
    const texts: string[] = [];
    const visit = (n: ts.Node) => {
      if (ts.isJsxText(n)) texts.push(n.text);
      ts.forEachChild(n, visit);
    };
    visit(src);
    expect(texts.some((t) => MARKERS[0].test(t))).toBe(true);
  });
});
