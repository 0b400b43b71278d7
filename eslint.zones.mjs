// STYLE.md's dependency rules as import-x/no-restricted-paths zones. Paths are resolved files,
// so a rule holds however the import is spelled (alias, deep relative path, re-export).
import { readdirSync } from 'node:fs';
import { join } from 'node:path';

const dirs = (root, parent) =>
  readdirSync(join(root, parent), { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => d.name);

/** Api folders that are not features: shared plumbing every feature may use. */
const API_SHARED = ['core', 'infra', 'config', 'db'];

/** Package-level rules 1–4 as a table: [target, from, message]. */
const PACKAGE_RULES = [
  ['libs/domain', ['libs/contracts', 'libs/annotation', 'apps', 'seeds'], 'libs/domain is pure: it imports nothing of the repo (rule 1).'],
  ['libs/annotation', ['libs/contracts', 'apps', 'seeds'], 'libs/annotation may use only libs/domain (rule 2).'],
  ['libs/contracts', ['apps', 'seeds'], 'libs/contracts depends only on zod, libs/domain and libs/annotation (rule 3).'],
  ['apps/api', 'apps/web', 'The apps never import each other (rule 4).'],
  ['apps/web', 'apps/api', 'The apps never import each other (rule 4).'],
];

/** Rule 5: features meet only through index.ts; core/ and infra/ know no features. */
function apiZones(apiFeatures) {
  return [
    ...apiFeatures.flatMap((f) =>
      apiFeatures
        .filter((g) => g !== f)
        .map((g) => ({
          target: `apps/api/src/${f}`,
          from: `apps/api/src/${g}`,
          except: ['./index.ts'],
          message: `A feature uses another only through its index.ts (rule 5): import ../${g}.`,
        })),
    ),
    {
      target: ['apps/api/src/core', 'apps/api/src/infra'],
      from: apiFeatures.map((f) => `apps/api/src/${f}`),
      message: 'core/ and infra/ never import features (rule 5).',
    },
    // The layering inside the API: core (ports: clock, DbTx, unit of work, auth, errors) < infra (adapters) < features.
    {
      target: 'apps/api/src/core',
      from: 'apps/api/src/infra',
      message: 'core/ never imports infra/: the port belongs in core, its adapter in infra (API layering).',
    },
    // Mail sits below reports: a report e-mail names its PDF by storage key and SHA-256, it never calls reports.
    ...(apiFeatures.includes('mail') && apiFeatures.includes('reports')
      ? [{ target: 'apps/api/src/mail', from: 'apps/api/src/reports', message: 'mail never reaches reports, not even through its index.ts (API layering).' }]
      : []),
  ];
}

/** Rule 6: no cross-feature imports, app/ on top, shared UI and lib at the bottom. */
function webZones(webFeatures) {
  return [
    ...webFeatures.map((f) => ({
      target: `apps/web/src/features/${f}`,
      from: webFeatures.filter((g) => g !== f).map((g) => `apps/web/src/features/${g}`),
      message: 'No cross-feature imports: features meet in app/routes through props and slots (rule 6).',
    })),
    // app/theme.ts is the one exception: component tests render inside the real theme.
    { target: 'apps/web/src/features', from: 'apps/web/src/app', except: ['./theme.ts'], message: 'Features do not reach up into app/ (rule 6).' },
    { target: ['apps/web/src/components', 'apps/web/src/lib'], from: 'apps/web/src/features', message: 'Shared UI and lib know no features (rule 6).' },
    {
      target: ['apps/web/src/components', 'apps/web/src/lib'],
      from: 'apps/web/src/app',
      except: ['./theme.ts'],
      message: 'Shared UI and lib know no features or app/ (rule 6).',
    },
  ];
}

/** Konva stays inside features/annotate. */
function konvaZone(root, webFeatures) {
  return {
    // Everything in the web app except features/annotate: its other folders, its root files and the other features.
    target: [
      ...dirs(root, 'apps/web/src')
        .filter((d) => d !== 'features')
        .map((d) => `apps/web/src/${d}`),
      'apps/web/src/*.{ts,tsx}',
      ...webFeatures.filter((f) => f !== 'annotate').map((f) => `apps/web/src/features/${f}`),
    ],
    from: ['node_modules/react-konva', 'node_modules/konva', 'apps/web/node_modules/react-konva', 'apps/web/node_modules/konva'],
    message: 'Only features/annotate draws with Konva (STYLE.md layout).',
  };
}

/** The zones for a repository checked out at `root`. */
export function boundaryZones(root) {
  const apiFeatures = dirs(root, 'apps/api/src').filter((d) => !API_SHARED.includes(d));
  const webFeatures = dirs(root, 'apps/web/src/features');
  return [
    ...PACKAGE_RULES.map(([target, from, message]) => ({ target, from, message })),
    ...apiZones(apiFeatures),
    ...webZones(webFeatures),
    konvaZone(root, webFeatures),
  ];
}
