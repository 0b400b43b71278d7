import { Document, Page, renderToBuffer, Text } from '@react-pdf/renderer';
import { createHash } from 'node:crypto';
import { createServer, type Server, type Socket } from 'node:net';
import { Readable } from 'node:stream';
import { createElement } from 'react';
import type { INestApplicationContext } from '@nestjs/common';
import { STORAGE, type Storage } from '../../src/infra/storage';
import { type IssuedReportFile, ReportsService } from '../../src/reports';

export const sha256 = (b: Buffer): string => createHash('sha256').update(b).digest('hex');

/** A real, small PDF (react-pdf, the renderer the report uses), padded with a text page per `pages`. */
export async function makePdf(title: string, pages = 1): Promise<Buffer> {
  const body = Array.from({ length: pages }, (_, i) => createElement(Page, { key: i, size: 'A4' }, createElement(Text, null, `${title} — page ${i + 1}`)));
  return renderToBuffer(createElement(Document, null, ...body));
}

/**
 * Issued report PDFs without drafting a whole report: the bytes go into the app's storage and the
 * reports feature's issuedPdf answers for these ids (the report e-mail then attaches them by key).
 */
export class FakeReportFiles {
  private readonly reports = new Map<number, { jobId: number; bytes: Buffer; shopId: number; key: string }>();
  private readonly storage: Storage;

  constructor(app: INestApplicationContext) {
    this.storage = app.get<Storage>(STORAGE);
    const svc = app.get(ReportsService);
    const real = svc.issuedPdf.bind(svc);
    svc.issuedPdf = (shopId: number, reportId: number) => this.find(shopId, reportId) ?? real(shopId, reportId);
  }

  async issue(reportId: number, shopId: number, jobId: number, bytes: Buffer): Promise<void> {
    const key = `reports/${shopId}/fake-${reportId}.pdf`;
    await this.storage.put(key, Readable.from([bytes]));
    this.reports.set(reportId, { jobId, bytes, shopId, key });
  }

  private find(shopId: number, reportId: number): IssuedReportFile | null {
    const r = this.reports.get(reportId);
    if (!r || r.shopId !== shopId) return null;
    return {
      reportId,
      jobId: r.jobId,
      version: 1,
      filename: `bench-report-${reportId}.pdf`,
      contentType: 'application/pdf',
      sha256: sha256(r.bytes),
      byteSize: r.bytes.length,
      storageKey: r.key,
      stream: () => Readable.from([r.bytes]),
      bytes: () => Promise.resolve(r.bytes),
    };
  }

  sha256(reportId: number): string | undefined {
    const r = this.reports.get(reportId);
    return r && sha256(r.bytes);
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
