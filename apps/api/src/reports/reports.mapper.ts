import type { ReportDto } from '@benchproof/contracts';
import type { ReportRow } from './reports.repository';

/** Row → contract; URLs only once the PDF exists. */
export function toReportDto(r: ReportRow & { createdByName: string | null }, progress: number): ReportDto {
  const base = `/api/jobs/${r.jobId}/reports/${r.id}`;
  const ready = r.state === 'ready';
  return {
    id: r.id,
    jobId: r.jobId,
    kind: r.kind,
    version: r.version,
    state: r.state,
    progress: ready ? 1 : progress,
    error: r.error,
    pageSize: r.pageSize,
    pageCount: r.pageCount,
    byteSize: r.byteSize,
    sha256: r.sha256,
    fingerprint: r.fingerprint,
    fromDraftId: r.fromDraftId,
    createdAt: r.createdAt.toISOString(),
    createdBy: r.createdBy !== null && r.createdByName !== null ? { id: r.createdBy, name: r.createdByName } : null,
    issuedAt: r.issuedAt?.toISOString() ?? null,
    urls: ready
      ? { pdf: `${base}/pdf`, download: `${base}/pdf?download=1`, pagePng: `${base}/pages/{page}.png` }
      : { pdf: null, download: null, pagePng: null },
  };
}
