import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { REPO_ROOT, SETTING_NAMES } from './app-config';

describe('DEVELOPERS.md, Deployment', () => {
  const doc = readFileSync(resolve(REPO_ROOT, 'DEVELOPERS.md'), 'utf8');
  const deployment = doc.slice(doc.indexOf('## Deployment'), doc.indexOf('\n## ', doc.indexOf('## Deployment') + 1));

  it('lists every setting the config reads, so an operator never has to read the code to find one', () => {
    expect(SETTING_NAMES.length).toBeGreaterThan(50);
    expect(SETTING_NAMES.filter((name) => !deployment.includes(`\`${name}\``))).toEqual([]);
  });
});
