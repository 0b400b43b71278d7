import type { OutboxMessageDto } from '@benchproof/contracts';
import { DEMO_PASSWORD } from '@benchproof/seeds';
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
 * exactly once. Runs against the built API (npm run build:api), as a real crash needs a process.
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

  it('delivers the queued report exactly once after a restart', async () => {
    const [httpPort, smtpPort] = [await freePort(), await freePort()];
    hole = await blackHole(smtpPort);
    server = await boot(httpPort, smtpPort);
    const base = `http://127.0.0.1:${httpPort}`;
    const login = async () => {
      const agent = request.agent(base);
      const res = await agent.post('/api/auth/login').send({ email: DEMO.desk, password: DEMO_PASSWORD }).expect(200);
      agent.set('x-csrf-token', (res.body as { csrfToken: string }).csrfToken);
      return agent;
    };
    let desk = await login();
    const job = (
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
            serialNumber: 'QW-CRASH-1',
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
    const pdf = await makePdf('Crash report');
    writeFileSync(join(dir, 'report.pdf'), pdf);
    writeFileSync(join(dir, 'report.json'), JSON.stringify({ reportId: 9, jobId: job.id, pdf: join(dir, 'report.pdf') }));
    await desk.post(`/api/jobs/${job.id}/reports/9/send`).send({}).expect(202);
    const list = async () => (await desk.get(`/api/jobs/${job.id}/messages`).expect(200)).body as OutboxMessageDto[];
    const inFlight = await eventually(async () => (await list()).find((m) => m.status === 'sending'), 'attempt in flight');

    server.kill('SIGKILL');
    await new Promise((r) => server?.once('exit', r));
    await hole.close();
    catcher = await startMailCatcher({ smtpPort, httpPort: 0 });
    server = await boot(httpPort, smtpPort);
    desk = await login();

    const [mail] = await catcher.waitFor(1, 20_000);
    expect(mail.envelopeTo).toEqual(['halvard@example.test']);
    expect(mail.messageId).toBe(inFlight.messageId);
    expect(mail.attachments[0].sha256).toBe(sha256(pdf));
    const sent = await eventually(async () => (await list()).find((m) => m.status === 'sent'), 'sent after restart');
    expect(sent.id).toBe(inFlight.id);
    await new Promise((r) => setTimeout(r, 1500));
    expect(catcher.messages()).toHaveLength(1);
  }, 180_000);
});
