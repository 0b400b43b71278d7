import { ACCESS_POLICY, ACTIONS, MEDIA_VARIANTS, ROLES, roleCan, type Action } from '@benchproof/contracts';
import { DEMO, startTestApp, type SignedIn, type TestApp } from '../test-app';

interface Operation {
  route: string;
  path: string;
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  public: boolean;
  /** Called with an owner link (`/api/owner/{token}/…`), not a staff session. */
  ownerLink: boolean;
  action: Action | undefined;
}

/** Every operation in the OpenAPI document, so routes added later are covered automatically. */
async function operations(t: TestApp): Promise<Operation[]> {
  const doc = (await t.http().get('/api/docs-json').expect(200)).body as {
    paths: Record<string, Record<string, { 'x-public'?: boolean; 'x-owner-link'?: boolean; 'x-action'?: Action }>>;
  };
  return Object.entries(doc.paths).flatMap(([path, ops]) =>
    Object.entries(ops).map(([method, op]) => ({
      route: `${method.toUpperCase()} ${path}`,
      path,
      method: method as Operation['method'],
      public: op['x-public'] === true,
      ownerLink: op['x-owner-link'] === true,
      action: op['x-action'],
    })),
  );
}

/** Fills `{id}`-style path parameters with an id that exists in the demo shop (1), and a real variant name. */
const concrete = (path: string) =>
  path
    .replace('{variant}', MEDIA_VARIANTS[0])
    .replace('{size}', 'screen')
    .replace(/\{[^}]+\}/g, '1');
/** A server-sent events stream never ends when let through: an open stream after 1.5 s counts as let through. */
const call = async (who: SignedIn, op: Operation): Promise<{ status: number; body: { code?: string } }> => {
  if (!op.path.endsWith('-events')) return who.agent[op.method](concrete(op.path)).send({});
  try {
    return await who.agent.get(concrete(op.path)).timeout({ deadline: 1500 });
  } catch {
    return { status: 200, body: {} };
  }
};

describe('route matrix from the OpenAPI document and ACCESS_POLICY', () => {
  let t: TestApp;
  let ops: Operation[];
  let guarded: Operation[];
  let owner: Operation[];
  beforeAll(async () => {
    t = await startTestApp();
    ops = await operations(t);
    guarded = ops.filter((o) => !o.public && !o.ownerLink);
    owner = ops.filter((o) => o.ownerLink);
  });
  afterAll(() => t.close());

  it('documents the foundation routes', () => {
    expect(ops.map((o) => o.route)).toEqual(
      expect.arrayContaining(['GET /api/health', 'POST /api/auth/login', 'GET /api/users', 'PATCH /api/users/{id}', 'GET /api/shop/settings']),
    );
  });

  it('serves the OpenAPI page, its script and its stylesheet', async () => {
    expect((await t.http().get('/api/docs').expect(200)).text).toContain('swagger-ui-init.js');
    expect((await t.http().get('/api/docs/swagger-ui-init.js').expect(200)).text).toContain('/api/health');
    expect((await t.http().get('/api/docs/swagger-ui.css').expect(200)).headers['content-type']).toMatch(/text\/css/);
  });

  it('names a policy action on every signed-in route', () => {
    expect(guarded.length).toBeGreaterThan(3);
    expect(guarded.filter((o) => !o.action || !ACTIONS.includes(o.action)).map((o) => o.route)).toEqual([]);
  });

  it('answers 401 with the standard error body on every non-public route without a session', async () => {
    for (const op of guarded) {
      const res = await t.http()[op.method](concrete(op.path)).send({});
      expect({ route: op.route, status: res.status }).toEqual({ route: op.route, status: 401 });
      expect(res.body).toMatchObject({ code: 'UNAUTHENTICATED', message: expect.any(String) });
    }
  });

  it('never lets staff call an owner-only action', () => {
    const ownerOnly = guarded.filter((o) => o.action && ROLES.every((r) => !roleCan(r, o.action!)));
    expect(ownerOnly.map((o) => o.route)).toEqual([]);
  });

  it('answers 404 to staff of another shop on every route that names a record', async () => {
    const strangers = [await t.signIn(DEMO.otherShopManager), await t.signIn(DEMO.otherShopMechanic)];
    const named = guarded.filter((o) => o.path.includes('{') && !o.path.includes('/tus/'));
    expect(named.length).toBeGreaterThan(10);
    for (const op of named) {
      for (const who of strangers.filter((s) => roleCan(s.user.role as 'manager', op.action!))) {
        const res = await call(who, op);
        // A bad body may be refused before the lookup (400); it must never succeed or reveal the record.
        const expected = op.method === 'get' || op.method === 'delete' || op.route.endsWith('/purge') ? [404] : [400, 404];
        expect({ route: op.route, role: who.user.role, status: expected.includes(res.status) ? 'hidden' : res.status }).toEqual({
          route: op.route,
          role: who.user.role,
          status: 'hidden',
        });
      }
    }
  });

  it('answers 403 FORBIDDEN exactly to the roles ACCESS_POLICY leaves out, and lets the others through', async () => {
    const users = { manager: await t.signIn(DEMO.manager), desk: await t.signIn(DEMO.desk), mechanic: await t.signIn(DEMO.mechanic) };
    for (const op of guarded) {
      for (const role of ROLES) {
        const allowed = ACCESS_POLICY[op.action!].staff.some((r) => r === role);
        const res = await call(users[role], op);
        const seen = res.status === 403 && res.body.code === 'FORBIDDEN' ? 'forbidden' : 'let through';
        expect({ route: op.route, role, seen }).toEqual({ route: op.route, role, seen: allowed ? 'let through' : 'forbidden' });
      }
    }
  }, 120_000); // every route × every role: about 400 requests

  it('names an owner action from ACCESS_POLICY on every owner-link route', () => {
    expect(owner.map((o) => o.route)).toEqual(expect.arrayContaining(['GET /api/owner/{token}', 'POST /api/owner/{token}/decisions']));
    expect(owner.filter((o) => !o.path.startsWith('/api/owner/{token}')).map((o) => o.route)).toEqual([]);
    expect(owner.filter((o) => !o.action || !ACCESS_POLICY[o.action].owner).map((o) => ({ route: o.route, action: o.action }))).toEqual([]);
  });

  it('answers every owner-link route with the owner actor exactly as ACCESS_POLICY says, and refuses it to a staff session', async () => {
    const desk = await t.signIn(DEMO.desk);
    const job = (await desk.agent.get('/api/jobs?open=true').expect(200)).body as { items: { id: number }[] };
    const created = (await desk.agent.post(`/api/jobs/${job.items[0].id}/owner-links`).send({ expiresInDays: 7, send: false }).expect(201)).body as {
      url: string;
    };
    const token = created.url.split('/o/')[1];
    for (const op of owner) {
      const path = concrete(op.path.replace('{token}', token));
      const res = await t.http()[op.method](path).send({});
      const seen = res.status === 403 && (res.body as { code?: string }).code === 'FORBIDDEN' ? 'forbidden' : 'let through';
      expect({ route: op.route, seen }).toEqual({ route: op.route, seen: ACCESS_POLICY[op.action!].owner ? 'let through' : 'forbidden' });
      // A staff session is no owner link: without a real token the route does not exist for it.
      const staff = await desk.agent[op.method](concrete(op.path)).send({});
      expect({ route: op.route, status: staff.status, code: (staff.body as { code?: string }).code }).toEqual({
        route: op.route,
        status: 404,
        code: 'OWNER_LINK_INVALID',
      });
    }
  });

  it('lets public routes answer without a session', async () => {
    await t.http().get('/api/health').expect(200, { status: 'ok' });
  });
});
