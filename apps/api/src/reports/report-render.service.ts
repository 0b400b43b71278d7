import { Inject, Injectable } from '@nestjs/common';
import pMap from 'p-map';
import { createElement } from 'react';
import { Readable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import { APP_CONFIG, type AppConfig } from '../config';
import { CLOCK, type Clock } from '../core/clock';
import type { DbTx } from '../core/db';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { PDF, type PdfAdapter } from '../infra/pdf';
import { STORAGE, type Storage } from '../infra/storage';
import { TASK_RUNNER, type TaskContext, TaskHandler, type TaskRunner } from '../infra/tasks';
import type { IssueStamp, ReportImage } from './report-data';
import { ANNOTATED_IMAGE_SOURCE, type AnnotatedImageSource } from './report-sources';
import { ReportsRepository, type ReportRow } from './reports.repository';

export const RENDER_TASK = 'report.render' as const;
const SHOT_READS_AT_ONCE = 6;

/**
 * Renders a report row to PDF in the background (task kind 'report.render', keyed
 * by report id). Idempotent: a row already `ready` is never rendered again, so an
 * issued PDF and its SHA-256 never change.
 */
@Injectable()
export class ReportRenderService {
  constructor(
    private readonly repo: ReportsRepository,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    @Inject(PDF) private readonly pdf: PdfAdapter,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    @Inject(ANNOTATED_IMAGE_SOURCE) private readonly shots: AnnotatedImageSource,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(APP_CONFIG) private readonly cfg: AppConfig,
  ) {}

  /** The shots are read in the report's own shop; the snapshot already says what to print. */
  enqueue(row: Pick<ReportRow, 'id' | 'shopId'>, tx?: DbTx): void {
    this.tasks.enqueue({ kind: RENDER_TASK, key: String(row.id), shopId: row.shopId, payload: { reportId: row.id } }, tx);
  }

  progress(reportId: number): number {
    return this.tasks.status(RENDER_TASK, String(reportId))?.progress ?? 0;
  }

  @TaskHandler(RENDER_TASK, { concurrency: 1, maxAttempts: 3 })
  async run(task: TaskContext<typeof RENDER_TASK>): Promise<void> {
    const row = this.repo.findById(task.payload.reportId);
    if (!row || row.state === 'ready') return;
    if (row.state === 'failed') this.repo.update(row.id, { state: 'rendering', error: null });
    try {
      const pdf = await this.renderPdf(row, (f) => task.progress(f));
      const stored = await this.storage.put(`reports/${row.shopId}/${row.id}.pdf`, Readable.from([pdf]));
      this.repo.update(row.id, {
        state: 'ready',
        storageKey: stored.key,
        sha256: stored.sha256,
        byteSize: stored.bytes,
        pageCount: await this.pdf.pageCount(pdf),
        renderedAt: this.clock.now(),
      });
      task.progress(1);
    } catch (err) {
      this.repo.update(row.id, { state: 'failed', error: (err as Error).message.slice(0, 500) });
      throw err;
    }
  }

  /** Loads every shot (the prepared print JPEGs), then lays out and writes the PDF. */
  async renderPdf(row: ReportRow, progress: (f: number) => void = () => undefined): Promise<Buffer> {
    const snap = row.snapshot;
    const ids = [
      ...new Set([...snap.findings.flatMap((f) => f.shots), ...snap.pairs.flatMap((p) => [p.before, p.after]), ...snap.scopeStills].map((s) => s.assetId)),
    ];
    const images = await this.loadShots(row.shopId, ids, progress);
    const logo = await this.logo(snap.shop.logoKey);
    // The document and react-pdf load with the first render: most processes never render a report (see DEVELOPERS.md, memory).
    const { ReportDocument } = await import('./pdf/report.pdf.js');
    const doc = createElement(ReportDocument, { snap, pageSize: row.pageSize, images, logo, stamp: this.stamp(row) });
    progress(0.7);
    const pdf = await this.pdf.render(doc);
    progress(0.95);
    return pdf;
  }

  /**
   * Reads the shots a few at a time: one after another, 40 small file reads and their
   * lookups took about as long as a fifth of the layout, mostly waiting on the disk.
   */
  private async loadShots(shopId: number, ids: number[], progress: (f: number) => void): Promise<Map<number, ReportImage>> {
    let done = 0;
    const read = await pMap(
      ids,
      async (id) => {
        const img = await this.shots.printJpeg(shopId, id);
        progress(0.05 + (0.6 * ++done) / ids.length);
        return [id, img] as const;
      },
      { concurrency: SHOT_READS_AT_ONCE },
    );
    return new Map(read.filter((entry): entry is readonly [number, ReportImage] => entry[1] !== null));
  }

  private stamp(row: ReportRow): IssueStamp | null {
    if (row.kind !== 'issued' || !row.version || !row.issuedAt || !row.fingerprint) return null;
    return { version: row.version, issuedAt: row.issuedAt.toISOString(), fingerprint: row.fingerprint, verifyUrl: this.verifyUrl(row.fingerprint) };
  }

  /** The short link printed on the last page: 16 hex of the fingerprint (64 bits) is enough to find one report. */
  verifyUrl(fingerprint: string): string {
    const base = this.cfg.publicUrl;
    return `${base}/verify?c=${fingerprint.slice(0, 16)}`;
  }

  private async logo(key: string | null): Promise<ReportImage | null> {
    if (!key) return null;
    try {
      const data = await buffer(this.storage.createReadStream(key));
      return { data, ...(await this.image.size(data)) };
    } catch {
      return null;
    }
  }
}
