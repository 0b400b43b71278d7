import type { DecisionDto, FindingDto, MoneyTotals, RecommendationDto } from '@benchproof/contracts';
import { areaCautions, defaultUrgency, estimateTotals, lineTotalMinor, type Condition, type EstimateLine } from '@benchproof/domain';
import type { DecisionRow, FindingRow, RecommendationRow } from './findings.repository';

/** Labour is stored in hundredths of an hour; libs/domain takes decimal hours (exact to 4 decimals). */
const hours = (hundredths: number): number => hundredths / 100;

/** Totals of one recommendation with libs/domain money: lines rounded once each, tax once on the net. */
export function recommendationTotals(r: Pick<RecommendationRow, 'parts' | 'labourHundredths' | 'labourRateMinor' | 'taxRateBp'>): MoneyTotals {
  const lines: EstimateLine[] = [
    ...r.parts.map((p) => ({ kind: 'part' as const, qty: p.qty, unitPriceMinor: p.unitPriceMinor })),
    { kind: 'labour', hours: hours(r.labourHundredths), rateMinorPerHour: r.labourRateMinor },
  ];
  return { ...estimateTotals(lines, r.taxRateBp) };
}

export const ZERO_TOTALS: MoneyTotals = { partsMinor: 0, labourMinor: 0, netMinor: 0, taxMinor: 0, grossMinor: 0 };

export function addTotals(a: MoneyTotals, b: MoneyTotals): MoneyTotals {
  return {
    partsMinor: a.partsMinor + b.partsMinor,
    labourMinor: a.labourMinor + b.labourMinor,
    netMinor: a.netMinor + b.netMinor,
    taxMinor: a.taxMinor + b.taxMinor,
    grossMinor: a.grossMinor + b.grossMinor,
  };
}

export const toDecisionDto = (d: DecisionRow): DecisionDto => ({
  id: d.id,
  status: d.status,
  channel: d.channel,
  decidedByName: d.decidedByName,
  recordedById: d.recordedBy,
  note: d.note,
  decidedAt: d.decidedAt.toISOString(),
  recordedAt: d.recordedAt.toISOString(),
});

/** `condition` is the finding's: rows from before urgency existed read as its default. */
export function toRecommendationDto(r: RecommendationRow, decisions: DecisionRow[], condition: Condition): RecommendationDto {
  return {
    id: r.id,
    findingId: r.findingId,
    summary: r.summary,
    urgency: r.urgency ?? defaultUrgency(condition),
    parts: r.parts.map((p) => ({ ...p, totalMinor: lineTotalMinor(p.qty, p.unitPriceMinor) })),
    labourHundredths: r.labourHundredths,
    labourRateMinor: r.labourRateMinor,
    taxRateBp: r.taxRateBp,
    currency: r.currency,
    totals: recommendationTotals(r),
    decisionStatus: r.decisionStatus,
    decisions: decisions.filter((d) => d.recommendationId === r.id).map(toDecisionDto),
    updatedAt: r.updatedAt.toISOString(),
  };
}

export function toFindingDto(f: FindingRow, rec: RecommendationRow | undefined, decisions: DecisionRow[], carbonFrame: boolean): FindingDto {
  return {
    id: f.id,
    jobId: f.jobId,
    checkpointId: f.checkpointId,
    area: f.area,
    condition: f.condition,
    description: f.description,
    doNotRide: f.condition === 'unsafe',
    cautions: areaCautions(f.area, { carbonFrame }),
    recommendation: rec ? toRecommendationDto(rec, decisions, f.condition) : null,
    createdAt: f.createdAt.toISOString(),
    updatedAt: f.updatedAt.toISOString(),
  };
}
