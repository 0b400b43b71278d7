import { ESLint } from 'eslint';
import { resolve } from 'node:path';
import tseslint from 'typescript-eslint';

const ROOT = resolve(__dirname, '../../../..');

/**
 * Lints probe sources as if they sat at `filePath`, with the repository's real
 * eslint.config.mjs. Type-aware rules are switched off for the probe: the file
 * does not exist on disk, and the boundary rule needs only the resolver.
 */
const eslint = new ESLint({ cwd: ROOT, overrideConfig: [{ files: ['**/*.{ts,tsx}'], ...tseslint.configs.disableTypeChecked }] });

async function lintProbe(filePath: string, code: string, ruleId = 'import-x/no-restricted-paths'): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath: resolve(ROOT, filePath) });
  return result.messages.filter((m) => m.ruleId === ruleId).map((m) => m.message);
}

// The first lint loads the whole config and resolver, which takes seconds on a shared machine.
describe('import boundaries hold on resolved paths (STYLE.md dependency rules)', { timeout: 60_000 }, () => {
  it('refuses a web feature importing another feature through a deep relative path', async () => {
    const messages = await lintProbe(
      'apps/web/src/features/jobs/components/probe.tsx',
      "import { CustomerForm } from '../../../features/customers/components/customer-form';\nexport const x = CustomerForm;\n",
    );
    expect(messages).toEqual([expect.stringMatching(/No cross-feature imports/)]);
  });

  it('refuses it even when the path takes a detour through app/', async () => {
    const messages = await lintProbe(
      'apps/web/src/features/jobs/components/probe.tsx',
      "import * as c from '../../../app/../features/customers';\nexport const x = c;\n",
    );
    expect(messages).toEqual([expect.stringMatching(/No cross-feature imports/)]);
  });

  it("refuses an api feature reaching past another feature's index.ts, but allows the index", async () => {
    const deep = await lintProbe(
      'apps/api/src/jobs/probe.ts',
      "import { CustomersRepository } from '../customers/customers.repository';\nexport const x = CustomersRepository;\n",
    );
    expect(deep).toEqual([expect.stringMatching(/only through its index\.ts/)]);
    const viaIndex = await lintProbe('apps/api/src/jobs/probe.ts', "import { CustomersService } from '../customers';\nexport const x = CustomersService;\n");
    expect(viaIndex).toEqual([]);
  });

  it('refuses react-konva outside features/annotate', async () => {
    const messages = await lintProbe('apps/web/src/features/media/components/probe.tsx', "import { Stage } from 'react-konva';\nexport const x = Stage;\n");
    expect(messages).toEqual([expect.stringMatching(/Only features\/annotate draws with Konva/)]);
  });

  it('refuses core/ importing a feature', async () => {
    const messages = await lintProbe('apps/api/src/core/http/probe.ts', "import { JobsService } from '../../jobs';\nexport const x = JobsService;\n");
    expect(messages).toEqual([expect.stringMatching(/core\/ and infra\/ never import features/)]);
  });

  it('refuses core/ importing infra/ (ports live in core, adapters in infra)', async () => {
    const messages = await lintProbe('apps/api/src/core/db/probe.ts', "import { TASK_RUNNER } from '../../infra/tasks';\nexport const x = TASK_RUNNER;\n");
    expect(messages).toEqual([expect.stringMatching(/core\/ never imports infra\//)]);
    const infraUsesCore = await lintProbe('apps/api/src/infra/tasks/probe.ts', "import { UnitOfWork } from '../../core/db';\nexport const x = UnitOfWork;\n");
    expect(infraUsesCore).toEqual([]);
  });

  it('refuses mail reaching reports, even through its index.ts', async () => {
    const messages = await lintProbe('apps/api/src/mail/probe.ts', "import { ReportsService } from '../reports';\nexport const x = ReportsService;\n");
    expect(messages).toEqual([expect.stringMatching(/mail never reaches reports/)]);
    const reportsUseMail = await lintProbe('apps/api/src/reports/probe.ts', "import { MailService } from '../mail';\nexport const x = MailService;\n");
    expect(reportsUseMail).toEqual([]);
  });

  it('refuses .returning().get() in the API (a failed commit on a full disk would be lost), allows .returning().all()', async () => {
    const file = 'apps/api/src/findings/probe.ts';
    const get = await lintProbe(file, 'declare const q: any;\nexport const row = q.insert(1).values(2).returning().get();\n', 'no-restricted-syntax');
    expect(get).toEqual([expect.stringMatching(/No \.returning\(\)\.get\(\)/)]);
    const all = await lintProbe(file, 'declare const q: any;\nexport const row = q.insert(1).values(2).returning().all()[0];\n', 'no-restricted-syntax');
    expect(all).toEqual([]);
  });

  it('refuses a zod pipe handed to @Body/@Query/@Param: a route names its input schema once, with @ZodBody/@ZodQuery/@ZodParam', async () => {
    const file = 'apps/api/src/findings/probe.ts';
    const head =
      "import { Body } from '@nestjs/common';\nimport { ZodBody, ZodPipe } from '../core/http';\nimport { z } from 'zod';\nconst S = z.object({});\n";
    const twice = await lintProbe(
      file,
      `${head}export class C {\n  a(@Body(new ZodPipe(S)) b: unknown) {\n    return [b, ZodBody];\n  }\n}\n`,
      'no-restricted-syntax',
    );
    expect(twice).toEqual([expect.stringMatching(/@ZodBody\(Schema\)/)]);
    const once = await lintProbe(
      file,
      `${head}export class C {\n  a(@ZodBody(S) b: unknown) {\n    return [b, Body, ZodPipe];\n  }\n}\n`,
      'no-restricted-syntax',
    );
    expect(once).toEqual([]);
  });
});
