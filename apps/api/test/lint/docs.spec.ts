import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';

const ROOT = resolve(__dirname, '../../../..');
const read = (f: string) => readFileSync(resolve(ROOT, f), 'utf8');

describe('the docs stand on their own and say what exists', () => {
  it('DEVELOPERS.md and README.md send no reader outside the repository (no ../ paths, no machine paths)', () => {
    for (const doc of ['DEVELOPERS.md', 'README.md']) {
      const outside = read(doc).match(/(\.\.\/shared\S*|\]\(\.\.\/[^)]*|\/work\/\S+)/g) ?? [];
      expect(outside, doc).toEqual([]);
    }
  });

  it('every repository file a doc links to exists', () => {
    for (const doc of ['DEVELOPERS.md', 'README.md']) {
      const links = [...read(doc).matchAll(/\]\(([^)#:]+)\)/g)].map((m) => m[1]);
      expect(
        links.filter((l) => !existsSync(resolve(ROOT, l))),
        doc,
      ).toEqual([]);
    }
  });

  it('README lists no built feature as "still to come", and tours the demo', () => {
    const readme = read('README.md');
    expect(readme).not.toMatch(/still to come/i);
    for (const feature of ['Annotation', 'Before/after pairs', 'The bench report', 'The owner page', 'Showcase']) expect(readme).toContain(`**${feature}**`);
    expect(readme).toContain('### A tour of the demo');
  });
});
