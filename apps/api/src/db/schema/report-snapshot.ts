// Type-only imports (erased when drizzle-kit loads the schema): the shape of reports.snapshot.
import type { Condition, ReportPalette, Urgency } from '@benchproof/domain';

/** A shot placed in the report, by asset id; bytes are fetched when rendering. */
export interface ShotRef {
  assetId: number;
  caption: string;
}

export interface SnapshotFinding {
  id: number;
  title: string;
  condition: Condition;
  description: string;
  doNotRide: boolean;
  cautions: string[];
  shots: ShotRef[];
}

export interface SnapshotRecommendation {
  findingTitle: string;
  summary: string;
  urgency: Urgency;
  safety: boolean;
  status: 'pending' | 'approved' | 'declined';
  grossMinor: number;
}

export interface SnapshotTotals {
  approvedMinor: number;
  declinedMinor: number;
  pendingMinor: number;
  taxMinor: number;
}

/**
 * Everything a bench report shows, frozen when the draft is made (JSON in
 * reports.snapshot). Issuing re-renders from this, never from live records.
 */
export interface ReportSnapshot {
  schemaVersion: 1;
  shop: {
    name: string;
    contact: string;
    footer: string;
    palette: ReportPalette;
    logoKey: string | null;
    units: 'metric' | 'imperial';
    currency: string;
    /** How dates are written (ShopLocale); absent in snapshots frozen before it existed: from the currency. */
    locale?: string;
  };
  job: { id: number; number: string; bookedAt: string; readyAt: string | null; promisedOn: string; symptoms: string; mechanic: string | null };
  owner: { name: string };
  bike: { title: string; detail: string; serial: string | null };
  overall: Condition | null;
  findings: SnapshotFinding[];
  measurements: { label: string; verdict: string; message: string; condition: Condition }[];
  torque: {
    fastener: string;
    specified: string;
    applied: string;
    verdict: 'within' | 'under' | 'over';
    source: string;
    tool: string;
    calibratedOn: string | null;
  }[];
  work: { description: string; parts: string; minutes: number; by: string | null }[];
  recommendations: SnapshotRecommendation[];
  totals: SnapshotTotals;
  scopeStills: (ShotRef & { timecodeMs: number | null })[];
  pairs: { before: ShotRef; after: ShotRef; caption: string }[];
  finalCheck: { checker: string; passed: boolean; at: string; notes: string | null } | null;
  cautions: string[];
  madeAt: string;
}
