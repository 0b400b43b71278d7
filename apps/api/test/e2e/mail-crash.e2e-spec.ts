import type { OutboxMessageDto } from '@benchproof/contracts';
import { DEMO_PASSWORD } from '@benchproof/seeds';
import Database from 'better-sqlite3';
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import request from 'supertest';
import { startMailCatcher, type MailCatcher } from '../../scripts/mail-catcher.mjs';
import { blackHole, eventually, freePort, makePdf, sha256 } from '../mail/mail-fixtures';
import { DEMO } from '../test-app';

const child = resolve(__dirname, '../support/mail-child.cjs');
const built = resolve(__dirname, '../../../../dist/apps/api/apps/api/src/main.js');

/**
 * The server dies (SIGKILL) with the report e-mail queued and its first attempt in flight (the
 * relay has not accepted a byte). After a restart on the same database the message goes out
 * exactly once; an owner-link e-mail likewise, and its row drops the link only after that.
 * Runs against the built API (npm run build:api), as a real crash needs a process.
 */
describe('mail: crash between queueing and sending', () => {
  beforeAll(() => {
    // npm test builds before the API e2e run; a missing build must fail here, never skip.
    if (!existsSync(built)) throw new Error(`No built API at ${built}: run npm run build:api first`);
  });
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-mail-crash-'));
  let server: ChildProcess | null = null;
  let hole: { close: () => Promise<void> } | null = null;
  let catcher: MailCatcher | null = null;
  afterAll(async () => {
    server?.kill('SIGKILL');
    await hole?.close();
    await catcher?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  async function boot(httpPort: number, smtpPort: number): Promise<ChildProcess> {
    const proc = spawn(process.execPath, [child], {
      env: {
        ...process.env,
        PORT: String(httpPort),
        DATABASE_PATH: join(dir, 'db.sqlite'),
        UPLOADS_DIR: join(dir, 'uploads'),
        WEB_DIST: join(dir, 'no-web'),
        SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
        TEST_REPORT_FILE: join(dir, 'report.json'),
        MAIL_SWEEP_MS: '100',
        MAIL_SEND_LEASE_MS: '1500',
        MAIL_RETRY_BASE_MS: '200',
        LOGIN_THROTTLE_LIMIT: '1000',
        // The killed process held the task's lease: a short one lets the restarted runner take it back soon.
        TASK_LEASE_MS: '1500',
      },
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    await new Promise<void>((ok, fail) => {
      proc.stdout?.on('data', (d: Buffer) => d.toString().includes('ready') && ok());
      proc.once('exit', (code) => fail(new Error(`server exited ${code}`)));
    });
    return proc;
  }

  const login = async (base: string) => {
    const agent = request.agent(base);
    const res = await agent.post('/api/auth/login').send({ email: DEMO.desk, password: DEMO_PASSWORD }).expect(200);
    agent.set('x-csrf-token', (res.body as { csrfToken: string }).csrfToken);
    return agent;
  };

  /** A server whose relay swallows every attempt (nothing is accepted), signed in as desk. */
  async function startStuck() {
    const [httpPort, smtpPort] = [await freePort(), await freePort()];
    hole = await blackHole(smtpPort);
    server = await boot(httpPort, smtpPort);
    const base = `http://127.0.0.1:${httpPort}`;
    return { httpPort, smtpPort, base, desk: await login(base) };
  }

  async function kill(): Promise<void> {
    if (!server || server.exitCode !== null || server.signalCode !== null) return;
    const exited = new Promise((r) => server?.once('exit', r));
    server.kill('SIGKILL');
    await exited;
  }

  /** SIGKILL mid-attempt, then the same database with a working relay. */
  async function crashAndRestart(httpPort: number, smtpPort: number): Promise<MailCatcher> {
    await kill();
    await hole?.close();
    catcher = await startMailCatcher({ smtpPort, httpPort: 0 });
    server = await boot(httpPort, smtpPort);
    return catcher;
  }

  const bookIn = async (desk: request.Agent, serialNumber: string) =>
    (
      await desk
        .post('/api/jobs')
        .send({
          newCustomer: { name: 'Halvard Nyquist', email: 'halvard@example.test', phone: null, preferredChannel: 'email', notes: null },
          newBike: {
            maker: 'Quillon Works',
            model: 'Stratus 11',
            year: 2022,
            frameMaterial: 'aluminium',
            size: 'M',
            colour: 'Slate',
            serialNumber,
            drivetrainSpeeds: 11,
            brakeType: 'hydraulic_disc',
            cableRouting: 'internal',
            dropoutType: 'vertical',
            tyreSize: '28-622',
          },
          reportedSymptoms: 'Creak from the bottom bracket',
          promisedOn: '2030-01-10',
        })
        .expect(201)
    ).body as { id: number };

  const messages = async (desk: request.Agent, jobId: number) => (await desk.get(`/api/jobs/${jobId}/messages`).expect(200)).body as OutboxMessageDto[];

  it('delivers the queued report exactly once after a restart', async () => {
    const { httpPort, smtpPort, base, desk } = await startStuck();
    const job = await bookIn(desk, 'QW-CRASH-1');
    const pdf = await makePdf('Crash report');
    writeFileSync(join(dir, 'report.pdf'), pdf);
    writeFileSync(join(dir, 'report.json'), JSON.stringify({ reportId: 9, jobId: job.id, pdf: join(dir, 'report.pdf') }));
    await desk.post(`/api/jobs/${job.id}/reports/9/send`).send({}).expect(202);
    const inFlight = await eventually(async () => (await messages(desk, job.id)).find((m) => m.status === 'sending'), 'attempt in flight');

    const caught = await crashAndRestart(httpPort, smtpPort);
    const again = await login(base);

    const [mail] = await caught.waitFor(1, 20_000);
    expect(mail.envelopeTo).toEqual(['halvard@example.test']);
    expect(mail.messageId).toBe(inFlight.messageId);
    expect(mail.attachments[0].sha256).toBe(sha256(pdf));
    const sent = await eventually(async () => (await messages(again, job.id)).find((m) => m.status === 'sent'), 'sent after restart');
    expect(sent.id).toBe(inFlight.id);
    await new Promise((r) => setTimeout(r, 1500));
    expect(caught.messages()).toHaveLength(1);
  }, 180_000);

  // The owner link leaves the outbox row only once the send is recorded, so the retry still carries it.
  it('delivers an owner-link e-mail caught mid-send once, with the link intact, then keeps no copy of it', async () => {
    // The first test's server and catcher go first: one process per database.
    await kill();
    await catcher?.close();
    const { httpPort, smtpPort, base, desk } = await startStuck();
    const job = await bookIn(desk, 'QW-CRASH-2');
    const created = (await desk.post(`/api/jobs/${job.id}/owner-links`).send({ expiresInDays: 7, send: true }).expect(201)).body as { url: string };
    const inFlight = await eventually(async () => (await messages(desk, job.id)).find((m) => m.status === 'sending'), 'attempt in flight');

    const caught = await crashAndRestart(httpPort, smtpPort);
    const again = await login(base);

    const [mail] = await caught.waitFor(1, 20_000);
    expect(mail.messageId).toBe(inFlight.messageId);
    expect(mail.text).toContain(created.url);
    await eventually(async () => (await messages(again, job.id)).find((m) => m.status === 'sent'), 'sent after restart');
    const token = created.url.split('/o/')[1];
    await request(base).get(`/api/owner/${token}`).expect(200);
    const db = new Database(join(dir, 'db.sqlite'), { readonly: true });
    try {
      const row = db.prepare('SELECT text_body, html_body, text_after_send FROM outbox_messages WHERE id = ?').get(inFlight.id);
      expect(JSON.stringify(row)).not.toContain(token.split('.')[0]);
      expect(row).toMatchObject({ text_after_send: null });
    } finally {
      db.close();
    }
    await new Promise((r) => setTimeout(r, 1500));
    expect(caught.messages()).toHaveLength(1);
  }, 180_000);
});
