import { DEMO, startTestApp, type TestApp } from '../test-app';

interface Operation {
  path: string;
  method: string;
  public: boolean;
  roles: string[] | undefined;
}

/** Every operation in the OpenAPI document, so routes added later are covered automatically. */
async function operations(t: TestApp): Promise<Operation[]> {
  const doc = (await t.http().get('/api/docs-json').expect(200)).body as {
    paths: Record<string, Record<string, { 'x-public'?: boolean; 'x-roles'?: string[] }>>;
  };
  return Object.entries(doc.paths).flatMap(([path, ops]) =>
    Object.entries(ops).map(([method, op]) => ({ path, method, public: op['x-public'] === true, roles: op['x-roles'] })),
  );
}

/** Fills `{id}`-style path parameters with an id that exists in the demo shop (1). */
const concrete = (path: string) => path.replace(/\{[^}]+\}/g, '1');

describe('route matrix from the OpenAPI document', () => {
  let t: TestApp;
  let ops: Operation[];
  beforeAll(async () => {
    t = await startTestApp();
    ops = await operations(t);
  });
  afterAll(() => t.close());

  it('documents the foundation routes', () => {
    const listed = ops.map((o) => `${o.method.toUpperCase()} ${o.path}`);
    expect(listed).toEqual(expect.arrayContaining(['GET /api/health', 'POST /api/auth/login', 'GET /api/users', 'PATCH /api/users/{id}', 'GET /api/shop/settings']));
  });

  it('answers 401 with the standard error body on every non-public route without a session', async () => {
    const guarded = ops.filter((o) => !o.public);
    expect(guarded.length).toBeGreaterThan(3);
    for (const op of guarded) {
      const res = await t.http()[op.method as 'get'](concrete(op.path)).send({});
      expect({ route: `${op.method} ${op.path}`, status: res.status }).toEqual({ route: `${op.method} ${op.path}`, status: 401 });
      expect(res.body).toMatchObject({ code: 'UNAUTHENTICATED', message: expect.any(String) });
    }
  });

  it('answers 403 to every role a route does not list', async () => {
    const limited = ops.filter((o) => o.roles?.length);
    expect(limited.some((o) => o.roles?.length === 1 && o.roles[0] === 'manager')).toBe(true);
    const users = { manager: await t.signIn(DEMO.manager), desk: await t.signIn(DEMO.desk), mechanic: await t.signIn(DEMO.mechanic) };
    for (const op of limited) {
      for (const role of (['manager', 'desk', 'mechanic'] as const).filter((r) => !op.roles?.includes(r))) {
        const res = await users[role].agent[op.method as 'get'](concrete(op.path)).send({});
        expect({ route: `${op.method} ${op.path}`, role, status: res.status }).toEqual({ route: `${op.method} ${op.path}`, role, status: 403 });
        expect(res.body.code).toBe('FORBIDDEN');
      }
    }
  });

  it('lets public routes answer without a session', async () => {
    await t.http().get('/api/health').expect(200, { status: 'ok' });
  });
});
