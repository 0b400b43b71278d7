import Database from 'better-sqlite3';
import { execFileSync } from 'node:child_process';
import { closeSync, mkdtempSync, openSync, rmSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DEMO, type SignedIn, startTestApp, type TestApp } from '../test-app';
import { derivativesSettled, solidJpeg } from '../media/media-fixtures';
import { bookIn } from './records-helpers';

/**
 * Issue 20 item 1: with the database's disk really full, no write may answer 2xx without its row.
 * better-sqlite3 in autocommit returns an INSERT … RETURNING row from its first step when read
 * with .get(), and the failed COMMIT is lost at the statement's reset; SQLite's max_page_count
 * fails earlier and does not reproduce it, so the database sits on a small tmpfs that is filled.
 * Needs root to mount (CI runs as root); elsewhere the suite is skipped with the reason printed.
 */
const dir = mkdtempSync(join(tmpdir(), 'benchproof-full-'));
const dbPath = join(dir, 'full.sqlite');
const filler = join(dir, 'filler');

function mountTmpfs(): string | null {
  if (process.getuid?.() !== 0) return 'not running as root, so no tmpfs can be mounted';
  try {
    execFileSync('mount', ['-t', 'tmpfs', '-o', 'size=48m', 'tmpfs', dir], { stdio: 'pipe' });
    return null;
  } catch (err) {
    return `mount -t tmpfs failed: ${(err as Error).message.split('\n')[0]}`;
  }
}

/** Writes zeros until the filesystem answers ENOSPC, big chunks first, then small ones. */
function fillDisk(): void {
  const fd = openSync(filler, 'a');
  try {
    for (const size of [1 << 20, 1 << 12, 512]) {
      const chunk = Buffer.alloc(size);
      try {
        for (;;) writeSync(fd, chunk);
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code !== 'ENOSPC') throw err;
      }
    }
  } finally {
    closeSync(fd);
  }
}

const skipReason = mountTmpfs();
if (skipReason) console.log(`disk-full e2e skipped: ${skipReason}`);

describe.skipIf(skipReason !== null)('a full database disk: no 2xx without a stored row (issue 20)', () => {
  let t: TestApp;
  let desk: SignedIn;
  let mech: SignedIn;
  let jobId: number;
  let assetId: number;
  let recId: number;
  /** Ids the API answered 2xx for, per table, checked again after a restart. */
  const claimed: Record<string, number[]> = { findings: [], jobs: [], decisions: [], annotation_versions: [], reports: [], outbox_messages: [] };
  let refused = 0;

  beforeAll(async () => {
    // The outbox needs a mail service to write to; nothing is delivered (no server listens there).
    t = await startTestApp({ DATABASE_PATH: dbPath, SMTP_URL: 'smtp://127.0.0.1:9', MAIL_CATCHER: 'false' });
    desk = await t.signIn(DEMO.desk);
    mech = await t.signIn(DEMO.mechanic);
    jobId = (await bookIn(desk)).id;
    await desk.agent.post(`/api/jobs/${jobId}/transitions`).send({ to: 'on_stand' }).expect(200);
    const finding = (
      await mech.agent.post(`/api/jobs/${jobId}/findings`).send({ area: 'drivetrain', condition: 'worn', description: 'Chain worn' }).expect(201)
    ).body as { id: number };
    recId = (
      await desk.agent
        .post(`/api/jobs/${jobId}/findings/${finding.id}/recommendation`)
        .send({ summary: 'Replace chain', parts: [], labourHundredths: 25 })
        .expect(201)
    ).body.id;
    const upload = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'before')
      .field('area', 'drivetrain')
      .attach('files', await solidJpeg(640, 480), 'chain.jpg')
      .expect(201);
    assetId = upload.body.assets[0].id;
    await derivativesSettled(t);
    fillDisk();
  });

  afterAll(async () => {
    await t?.close().catch(() => undefined);
    if (!skipReason) execFileSync('umount', [dir]);
    rmSync(dir, { recursive: true, force: true });
  });

  /** Calls `write` until it is refused (the WAL's spare pages are used up) or `max` times; keeps the 2xx ids. */
  async function untilRefused(table: string, max: number, write: (i: number) => Promise<{ status: number; body: { id?: number } }>) {
    for (let i = 0; i < max; i++) {
      const res = await write(i);
      if (res.status >= 200 && res.status < 300) claimed[table].push(Number(res.body.id));
      else {
        expect(res.status).toBeGreaterThanOrEqual(500);
        refused++;
        return;
      }
    }
  }

  it('answers findings, jobs, decisions, annotations, reports and outbox writes only when their row is stored', async () => {
    await untilRefused('findings', 2000, (i) =>
      mech.agent.post(`/api/jobs/${jobId}/findings`).send({ area: 'brakes', condition: 'worn', description: `Pad ${i} `.padEnd(400, 'x') }),
    );
    await untilRefused('jobs', 50, () => desk.agent.post('/api/jobs').send(BOOK_IN));
    await untilRefused('decisions', 50, () =>
      desk.agent.post(`/api/jobs/${jobId}/recommendations/${recId}/decision`).send({ status: 'approved', channel: 'phone', decidedByName: 'Ottilie Fernsby' }),
    );
    await untilRefused('annotation_versions', 50, async (i) => {
      const res = await mech.agent.put(`/api/annotations/${assetId}`).send({ baseVersion: claimed.annotation_versions.length, document: annotation(i) });
      return { status: res.status, body: { id: res.body.version as number } };
    });
    await untilRefused('reports', 20, () => desk.agent.post(`/api/jobs/${jobId}/reports/drafts`));
    await untilRefused('outbox_messages', 20, async () => {
      const res = await desk.agent.post(`/api/jobs/${jobId}/owner-links`).send({ expiresInDays: 7, send: true });
      const messages = (await desk.agent.get(`/api/jobs/${jobId}/messages`).expect(200)).body as { id: number }[];
      // A 2xx that says "queued" claims an outbox row: the newest message.
      const newest = Math.max(0, ...messages.map((m) => m.id));
      if (res.status < 300) expect(res.body.mail?.status).toBe('queued');
      return { status: res.status, body: { id: newest } };
    });
    console.log(
      `disk-full: answered 2xx before the refusal: ${Object.entries(claimed)
        .map(([k, v]) => `${k} ${v.length}`)
        .join(', ')}`,
    );
    // The disk really was full: every path was refused at least once.
    expect(refused).toBe(6);
    // What was answered 2xx reads back through the API.
    const findings = (await mech.agent.get(`/api/jobs/${jobId}/findings`).expect(200)).body as { id: number }[];
    expect(claimed.findings.filter((id) => !findings.some((f) => f.id === id))).toEqual([]);
    expect(new Set(claimed.findings).size).toBe(claimed.findings.length);
  });

  it('keeps every row it answered 2xx for after a restart with space back, and the database is sound', async () => {
    await t.close();
    rmSync(filler);
    const db = new Database(dbPath);
    try {
      expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
      for (const [table, ids] of Object.entries(claimed)) {
        const column = table === 'annotation_versions' ? 'version' : 'id';
        const extra = table === 'annotation_versions' ? ` AND asset_id = ${assetId}` : '';
        const missing = ids.filter((id) => !db.prepare(`SELECT 1 FROM ${table} WHERE ${column} = ?${extra}`).get(id));
        expect({ table, missing }).toEqual({ table, missing: [] });
      }
    } finally {
      db.close();
    }
  });
});

const BOOK_IN = {
  newCustomer: { name: 'Ada Fullstop', email: 'ada@example.test', phone: null, preferredChannel: 'email', notes: null },
  newBike: {
    maker: 'Quillon Works',
    model: 'Stratus 11',
    year: 2022,
    frameMaterial: 'aluminium',
    size: 'M',
    colour: 'Slate',
    serialNumber: null,
    drivetrainSpeeds: 11,
    brakeType: 'hydraulic_disc',
    cableRouting: 'internal',
    dropoutType: 'vertical',
    tyreSize: '28-622',
  },
  reportedSymptoms: 'Chain skips under load',
  promisedOn: '2030-01-10',
};

/** A one-arrow annotation on the 4:3 photo. */
const annotation = (i: number) => ({
  schemaVersion: 2,
  image: { width: 640, height: 480 },
  shapes: [{ colour: 'amber', width: 'medium', id: `a${i}`, kind: 'arrow', from: { x: 0.1, y: 0.1 }, to: { x: 0.5, y: 0.5 } }],
});
