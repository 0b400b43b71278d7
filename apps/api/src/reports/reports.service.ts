import { Inject, Injectable, type OnApplicationBootstrap } from '@nestjs/common';
import type { OutboxMessageDto, ReportDto, SendReportRequest, VerifyResult } from '@benchproof/contracts';
import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import { AuditService } from '../audit';
import type { AuthUser } from '../core/auth';
import { DomainError, notFound } from '../core/http';
import { CLOCK, type Clock } from '../core/clock';
import { PDF_PAGES, type PdfPageImages } from '../infra/pdf';
import { type ByteRange, STORAGE, type Storage } from '../infra/storage';
import { JobAccess } from '../jobs';
import { FindingsService } from '../findings';
import { MailService } from '../mail';
import { OwnerLinksService } from '../owner-links';
import { ShopsService } from '../shops';
import { ReportRenderService } from './report-render.service';
import { ReportSnapshotService } from './report-snapshot.service';
import { toReportDto } from './reports.mapper';
import { ReportsRepository, type ReportRow } from './reports.repository';
import { UnitOfWork } from '../core/db';

/** An issued report's PDF, for the mail feature (attachment) and downloads. */
export interface IssuedReportFile {
  reportId: number;
  jobId: number;
  version: number;
  filename: string;
  contentType: 'application/pdf';
  sha256: string;
  byteSize: number;
  storageKey: string;
  stream(): Readable;
  bytes(): Promise<Buffer>;
}

/** Drafts, issued versions and the public check of a job's bench report. */
@Injectable()
export class ReportsService implements OnApplicationBootstrap {
  constructor(
    private readonly repo: ReportsRepository,
    private readonly uow: UnitOfWork,
    private readonly snapshots: ReportSnapshotService,
    private readonly renderer: ReportRenderService,
    private readonly jobs: JobAccess,
    private readonly shops: ShopsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly ownerLinks: OwnerLinksService,
    private readonly findings: FindingsService,
    @Inject(STORAGE) private readonly storage: Storage,
    @Inject(PDF_PAGES) private readonly pages: PdfPageImages,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** Renders left unfinished by a restart are queued again (the render is idempotent). */
  onApplicationBootstrap(): void {
    for (const row of this.repo.listRendering()) this.renderer.enqueue(row);
  }

  list(actor: AuthUser, jobId: number): ReportDto[] {
    this.jobs.read(actor, jobId);
    return this.repo.listForJob(actor.shopId, jobId).map((r) => toReportDto(r, this.renderer.progress(r.id)));
  }

  get(actor: AuthUser, jobId: number, id: number): ReportDto {
    const row = this.owned(actor, jobId, id);
    const named = this.repo.listForJob(actor.shopId, jobId).find((r) => r.id === row.id) ?? { ...row, createdByName: null };
    return toReportDto(named, this.renderer.progress(row.id));
  }

  /** Freezes the job's records now and renders a draft in the background; answers at once. */
  async createDraft(actor: AuthUser, jobId: number): Promise<ReportDto> {
    this.jobs.read(actor, jobId);
    const snapshot = await this.snapshots.build(actor, jobId);
    const row = this.uow.run((tx) => {
      const draft = this.repo.insert({
        shopId: actor.shopId,
        jobId,
        kind: 'draft',
        state: 'rendering',
        pageSize: this.shops.settings(actor.shopId).pageSize,
        snapshot,
        createdBy: actor.id,
        createdAt: this.clock.now(),
      });
      this.renderer.enqueue(draft, tx);
      return draft;
    });
    return this.get(actor, jobId, row.id);
  }

  /**
   * Issues a rendered draft as the job's next version: same contents, now with a
   * version number, issue date and fingerprint. Earlier versions stay as they are.
   */
  issue(actor: AuthUser, jobId: number, draftId: number): ReportDto {
    const draft = this.owned(actor, jobId, draftId);
    if (draft.kind !== 'draft') throw new DomainError('CONFLICT', 'Only a draft can be issued.');
    if (draft.state !== 'ready') throw new DomainError('REPORT_NOT_READY');
    const issuedAt = this.clock.now();
    const row = this.uow.run((tx) => {
      const version = this.repo.nextVersion(actor.shopId, jobId);
      const fingerprint = createHash('sha256')
        .update(JSON.stringify({ shopId: actor.shopId, jobId, version, issuedAt: issuedAt.toISOString(), snapshot: draft.snapshot }))
        .digest('hex');
      const issued = this.repo.insert({
        shopId: actor.shopId,
        jobId,
        kind: 'issued',
        version,
        state: 'rendering',
        pageSize: draft.pageSize,
        snapshot: draft.snapshot,
        fromDraftId: draft.id,
        fingerprint,
        createdBy: actor.id,
        createdAt: issuedAt,
        issuedAt,
      });
      this.renderer.enqueue(issued, tx);
      this.audit.record(actor, {
        action: 'report.issued',
        entityType: 'report',
        entityId: issued.id,
        details: { jobId, version: issued.version, fingerprint: issued.fingerprint },
      });
      return issued;
    });
    return this.get(actor, jobId, row.id);
  }

  /** The PDF of a rendered draft or version, for preview and download. */
  pdf(actor: AuthUser, jobId: number, id: number): { open: (range?: ByteRange) => Readable; filename: string; sha256: string; byteSize: number } {
    const row = this.ready(this.owned(actor, jobId, id));
    const key = row.storageKey;
    return { open: (range) => this.storage.createReadStream(key, range), filename: this.filename(row), sha256: row.sha256, byteSize: row.byteSize };
  }

  /** One page as PNG, for browsers that show no PDF inline; null past the last page. */
  async pagePng(actor: AuthUser, jobId: number, id: number, page: number): Promise<Buffer | null> {
    const row = this.ready(this.owned(actor, jobId, id));
    return this.pages.pagePng(await buffer(this.storage.createReadStream(row.storageKey)), page);
  }

  /** For the mail feature: an issued, rendered version's PDF (NOT_FOUND outside the shop, REPORT_NOT_READY while rendering). */
  issuedPdf(shopId: number, reportId: number): IssuedReportFile {
    const found = this.repo.findById(reportId);
    if (!found || found.shopId !== shopId || found.kind !== 'issued' || found.version === null) throw notFound('Report');
    const row = this.ready(found);
    const key = row.storageKey;
    return {
      reportId: row.id,
      jobId: row.jobId,
      version: found.version,
      filename: this.filename(row),
      contentType: 'application/pdf',
      sha256: row.sha256,
      byteSize: row.byteSize,
      storageKey: key,
      stream: () => this.storage.createReadStream(key),
      bytes: () => buffer(this.storage.createReadStream(key)),
    };
  }

  /**
   * Queues the issued PDF to the owner through the mail outbox (attached by storage key and SHA-256) in
   * ONE e-mail with a fresh owner link, made as desk makes one; the wording follows the open items.
   */
  sendToOwner(actor: AuthUser, jobId: number, reportId: number, input: SendReportRequest): OutboxMessageDto {
    const f = this.issuedPdf(actor.shopId, reportId);
    if (f.jobId !== jobId) throw notFound('Report');
    const pdf = { reportId, jobId: f.jobId, version: f.version, filename: f.filename, storageKey: f.storageKey, sha256: f.sha256, size: f.byteSize };
    const openItems = this.findings.estimate(actor, jobId).items.filter((i) => i.recommendation.decisionStatus === 'pending').length;
    return this.ownerLinks.sendWithLink(actor, jobId, (link) => this.mail.sendReport(actor, jobId, { ...pdf, link, openItems }, input));
  }

  /** The newest issued version of a job (rendered or not), or null. */
  latestIssued(shopId: number, jobId: number): ReportDto | null {
    const row = this.repo.listForJob(shopId, jobId).find((r) => r.kind === 'issued');
    return row ? toReportDto(row, this.renderer.progress(row.id)) : null;
  }

  /** The public check: only shop name, job number, version and issue date, or "not ours". */
  verify(hash: string): VerifyResult {
    const row = this.repo.findIssuedByHash(hash);
    if (!row?.version || !row.issuedAt) return { issued: false };
    const snap = row.snapshot;
    return { issued: true, shopName: snap.shop.name, jobNumber: snap.job.number, version: row.version, issuedAt: row.issuedAt.toISOString() };
  }

  private owned(actor: Pick<AuthUser, 'shopId'>, jobId: number, id: number): ReportRow {
    this.jobs.read(actor, jobId);
    const row = this.repo.findInShop(actor.shopId, jobId, id);
    if (!row) throw notFound('Report');
    return row;
  }

  private ready(row: ReportRow): ReportRow & { storageKey: string; sha256: string; byteSize: number } {
    if (row.state !== 'ready' || !row.storageKey || !row.sha256 || row.byteSize === null) throw new DomainError('REPORT_NOT_READY');
    return row as ReportRow & { storageKey: string; sha256: string; byteSize: number };
  }

  private filename(row: ReportRow): string {
    const number = row.snapshot.job.number;
    return row.kind === 'issued' ? `bench-report-${number}-v${row.version}.pdf` : `bench-report-${number}-draft-${row.id}.pdf`;
  }
}
