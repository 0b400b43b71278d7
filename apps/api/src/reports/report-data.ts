// The snapshot's shape lives beside its column (db/schema/report-snapshot.ts), so reads of reports.snapshot are typed.
export type { ReportSnapshot, ShotRef, SnapshotFinding, SnapshotPayment, SnapshotRecommendation, SnapshotTotals } from '../db/schema/report-snapshot';
/** What an issued version adds on top of the snapshot. */
export interface IssueStamp {
  version: number;
  issuedAt: string;
  fingerprint: string;
  verifyUrl: string;
}

/** JPEG bytes ready to embed as they are (no re-encoding in the PDF step). */
export interface ReportImage {
  data: Buffer;
  width: number;
  height: number;
}
