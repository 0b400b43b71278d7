import { ACCESS_POLICY } from '@benchproof/contracts';
import { documentTitle, MENU, PUBLIC_PAGES, SIGNED_IN_PAGES } from './route-table';

import source from './route-table.ts?raw';

const routeFiles = import.meta.glob<string>('./routes/**/*.route.tsx', { query: '?raw', import: 'default', eager: true });

describe('the route table', () => {
  it('names, for every signed-in page, a route file that exports that component', () => {
    const refs = [...source.matchAll(/inFrame\('([^']+)', '(\w+)'\)/g)];
    expect(refs).toHaveLength(SIGNED_IN_PAGES.length);
    for (const [, file, name] of refs) {
      const page = routeFiles[`./routes/${file}.route.tsx`] ?? '';
      expect(page, `${file} exports ${name}`).toMatch(new RegExp(`export function ${name}\\b`));
    }
  });

  it('gives every page its own path and a title', () => {
    const pages = [...SIGNED_IN_PAGES, ...PUBLIC_PAGES];
    expect(new Set(pages.map((p) => p.path)).size).toBe(pages.length);
    for (const p of pages) expect(p.title.trim(), p.path).not.toBe('');
  });

  it('guards only with actions the access policy knows', () => {
    for (const p of SIGNED_IN_PAGES) if (p.action) expect(ACCESS_POLICY, p.path).toHaveProperty([p.action]);
  });

  it('derives the menu from the pages that ask for one, with their guard action', () => {
    expect(MENU.map((m) => m.to)).toEqual(['/jobs', '/customers', '/showcase', '/settings/users', '/settings/shop', '/settings/data', '/settings/work']);
    expect(MENU.find((m) => m.to === '/settings/users')?.action).toBe('users.manage');
    expect(MENU.find((m) => m.to === '/jobs')?.action).toBeUndefined();
  });

  it('titles the tab after the deepest matched page', () => {
    expect(documentTitle([{ handle: undefined }, { handle: { title: 'Job' } }])).toBe('Job · BenchProof');
    expect(documentTitle([{ handle: { title: 'Jobs' } }, { handle: { title: 'Job' } }])).toBe('Job · BenchProof');
    expect(documentTitle([{}])).toBe('BenchProof');
  });
});
