// One worker process of the two-process task test: the built BullMQ runner (npm run build) on the
// shared SQLite file and Redis, handling the made-up kind 'demo.count' (80 ms of work, then one
// effect row written idempotently). Prints "ready" once its workers run; SIGTERM stops it cleanly.
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
require('reflect-metadata');
const dist = process.env.API_DIST;
const { openDb } = require(`${dist}/core/db/index.js`);
const { systemClock } = require(`${dist}/core/clock/index.js`);
const { RedisConnections } = require(`${dist}/infra/redis/index.js`);
const { BullMqTaskRunner, TaskStore } = require(`${dist}/infra/tasks/index.js`);
const { Logger } = require('@nestjs/common');

Logger.overrideLogger(false);
const { db, sqlite } = openDb(process.env.DATABASE_PATH);
const redis = new RedisConnections(process.env.REDIS_URL, process.env.REDIS_PREFIX);
const lease = Number(process.env.TASK_LEASE_MS);
const opts = { pollMs: 100, leaseMs: lease, backoff: { baseMs: 200, maxMs: 200 }, longBackoff: { baseMs: 3_600_000, maxMs: 86_400_000 }, maxAttempts: 5 };
const runner = new BullMqTaskRunner(new TaskStore(db), redis, systemClock, opts, db);
const run = sqlite.prepare('insert into demo_runs (key, pid, phase, at) values (?, ?, ?, ?)');
const effect = sqlite.prepare('insert or ignore into demo_effects (key, pid) values (?, ?)');

runner.register(
  'demo.count',
  async (task) => {
    run.run(task.key, process.pid, 'start', Date.now());
    await new Promise((r) => setTimeout(r, 80));
    effect.run(task.key, process.pid);
    run.run(task.key, process.pid, 'end', Date.now());
  },
  { concurrency: 4 },
);
runner.start();
console.log('ready');

process.on('SIGTERM', async () => {
  await runner.stop();
  await redis.close();
  sqlite.close();
  process.exit(0);
});
