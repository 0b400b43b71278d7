import { Document, Page, renderToBuffer, Text } from '@react-pdf/renderer';
import { createHash } from 'node:crypto';
import { createServer, type Server, type Socket } from 'node:net';
import { Readable } from 'node:stream';
import { createElement } from 'react';
import type { IssuedPdf, ReportFiles } from '../../src/mail';

export const sha256 = (b: Buffer): string => createHash('sha256').update(b).digest('hex');

/** A real, small PDF (react-pdf, the renderer the report uses), padded with a text page per `pages`. */
export async function makePdf(title: string, pages = 1): Promise<Buffer> {
  const body = Array.from({ length: pages }, (_, i) => createElement(Page, { key: i, size: 'A4' }, createElement(Text, null, `${title} — page ${i + 1}`)));
  return renderToBuffer(createElement(Document, null, ...body));
}

/** Stands in for the reports feature (another branch): issued PDFs by report id. */
export class FakeReportFiles implements ReportFiles {
  private readonly reports = new Map<number, { jobId: number; bytes: Buffer; link: string | null; shopId: number }>();

  issue(reportId: number, shopId: number, jobId: number, bytes: Buffer, link: string | null = null): void {
    this.reports.set(reportId, { jobId, bytes, link, shopId });
  }

  getIssuedPdf(shopId: number, reportId: number): Promise<IssuedPdf | null> {
    const r = this.reports.get(reportId);
    if (!r || r.shopId !== shopId) return Promise.resolve(null);
    return Promise.resolve({
      reportId,
      jobId: r.jobId,
      version: 1,
      filename: `bench-report-${reportId}.pdf`,
      sha256: sha256(r.bytes),
      size: r.bytes.length,
      link: r.link,
      open: () => Readable.from([r.bytes]),
    });
  }
}

/** A free loopback port with nothing listening on it (an SMTP relay that is down). */
export const freePort = (): Promise<number> =>
  new Promise((ok, fail) => {
    const srv = createServer();
    srv.once('error', fail);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => ok(port));
    });
  });

/** Accepts TCP connections and never says a word: an SMTP attempt hangs before the relay accepts anything. */
export async function blackHole(port: number): Promise<{ close: () => Promise<void> }> {
  const sockets = new Set<Socket>();
  const srv: Server = createServer((s) => {
    sockets.add(s);
    s.on('close', () => sockets.delete(s));
  });
  await new Promise<void>((ok) => srv.listen(port, '127.0.0.1', () => ok()));
  return {
    close: () =>
      new Promise<void>((ok) => {
        sockets.forEach((s) => s.destroy());
        srv.close(() => ok());
      }),
  };
}

/** Polls until `check` returns a value (not undefined) or the time is up. */
export async function eventually<T>(check: () => Promise<T | undefined>, what: string, timeoutMs = 15_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const v = await check();
    if (v !== undefined) return v;
    if (Date.now() > until) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}
