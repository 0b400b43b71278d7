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

  it('answers 403 to desk and mechanic users on every manager-only route', async () => {
    const managerOnly = ops.filter((o) => o.roles && !o.roles.includes('desk') && !o.roles.includes('mechanic'));
    expect(managerOnly.length).toBeGreaterThan(0);
    for (const email of [DEMO.desk, DEMO.mechanic]) {
      const { agent } = await t.signIn(email);
      for (const op of managerOnly) {
        const res = await agent[op.method as 'get'](concrete(op.path)).send({});
        expect({ route: `${op.method} ${op.path}`, who: email, status: res.status }).toEqual({ route: `${op.method} ${op.path}`, who: email, status: 403 });
        expect(res.body.code).toBe('FORBIDDEN');
      }
    }
  });

  it('lets public routes answer without a session', async () => {
    await t.http().get('/api/health').expect(200, { status: 'ok' });
  });
});
