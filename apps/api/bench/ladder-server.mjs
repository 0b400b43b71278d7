// One rung of the cost ladder (ladder.bench.mjs): the signed-in GET `/api/auth/session` answered by a server
// built up layer by layer from the built app's own parts, so each layer's price shows in req/s and CPU µs.
// LADDER_STEP: express | nest | guards | passport | session | logging. The handler sends the same captured
// JSON (LADDER_PAYLOAD) at every rung; the rungs above `logging` are the real app (helmet, compression,
// cookies, CSRF token, every module) and the real jobs page.
import 'reflect-metadata';
import express from 'express';
import { createRequire } from 'node:module';
import { join } from 'node:path';

const root = process.env.LADDER_ROOT;
const req = createRequire(join(root, 'apps/api/package.json'));
const src = (p) => req(join(root, 'dist/apps/api/apps/api/src', p));
const step = process.env.LADDER_STEP;
const payload = JSON.parse(process.env.LADDER_PAYLOAD);
const RUNGS = ['express', 'nest', 'guards', 'passport', 'session', 'logging'];
const has = (rung) => RUNGS.indexOf(step) >= RUNGS.indexOf(rung);

function bareExpress() {
  const app = express();
  app.get(process.env.LADDER_PATH?.split('?')[0] ?? '/api/auth/session', (_req, res) => res.json(payload));
  return new Promise((ok) => {
    const s = app.listen(0, '127.0.0.1', () => ok(s.address().port));
  });
}

/** Stands in for the session guard below the passport rung: a fixed signed-in user. */
function fixedUserGuard(user) {
  return class FixedUser {
    canActivate(ctx) {
      ctx.switchToHttp().getRequest().user = user;
      return true;
    }
  };
}

async function nestApp() {
  const { Controller, Get, Module } = req('@nestjs/common');
  const { APP_GUARD, NestFactory } = req('@nestjs/core');
  const { PassportModule } = req('@nestjs/passport');
  const { loadConfig, ConfigModule, APP_CONFIG } = src('config');
  const auth = src('core/auth/index.js');
  const { CsrfGuard, CSRF, csrfFactory } = src('core/auth/csrf.js');
  const { JwtAuthGuard } = src('core/auth/jwt-auth.guard.js');
  const { JwtStrategy } = src('core/auth/jwt.strategy.js');
  const { DbModule } = src('core/db');
  const { ClockModule } = src('core/clock');
  const { createLogger, requestLog } = src('core/logging');
  const { LIVE_UPDATES } = src('core/events');
  const { InProcessLiveUpdates } = src('infra/live/in-process.live-updates.js');
  const cfg = loadConfig();

  class Probe {
    session() {
      return payload;
    }
  }
  Get('session')(Probe.prototype, 'session', Object.getOwnPropertyDescriptor(Probe.prototype, 'session'));
  auth.Can('session.view')(Probe.prototype, 'session', Object.getOwnPropertyDescriptor(Probe.prototype, 'session'));
  Controller('auth')(Probe);

  /** The passport rung: passport-jwt verifies the token; the user comes from its claims, no session row read. */
  class ClaimsOnly extends JwtStrategy {
    validate(c) {
      return typeof c.exp === 'number' ? { id: c.sub, shopId: c.shop, role: c.role, email: '', name: '' } : false;
    }
  }
  const imports = [ConfigModule.forRoot(cfg)];
  const providers = [];
  if (has('guards')) {
    providers.push({ provide: CSRF, inject: [APP_CONFIG], useFactory: csrfFactory });
    if (has('passport')) {
      imports.push(PassportModule, ClockModule, DbModule);
      // The session store tells other processes what to forget; one process here, so in-process delivery.
      providers.push({ provide: APP_GUARD, useClass: JwtAuthGuard }, auth.SessionStore, { provide: LIVE_UPDATES, useClass: InProcessLiveUpdates });
      providers.push(has('session') ? JwtStrategy : { provide: JwtStrategy, useClass: ClaimsOnly });
    } else {
      providers.push({ provide: APP_GUARD, useClass: fixedUserGuard(payload.user) });
    }
    providers.push({ provide: APP_GUARD, useClass: auth.PolicyGuard }, { provide: APP_GUARD, useClass: CsrfGuard });
  }
  class LadderModule {}
  Module({ imports, providers, controllers: [Probe] })(LadderModule);
  const app = await NestFactory.create(LadderModule, { logger: ['warn', 'error'] });
  if (has('logging')) app.use(requestLog(createLogger(cfg)));
  app.setGlobalPrefix('api');
  await app.listen(0, '127.0.0.1');
  return app.getHttpServer().address().port;
}

const port = step === 'express' ? await bareExpress() : await nestApp();
process.send({ port });
