import { Inject, Injectable } from '@nestjs/common';
import type { EstimateDto, FindingDto, InspectionDto, JobDetail, TorqueEntryDto } from '@benchproof/contracts';
import {
  CONDITIONS,
  GENERAL_SAFETY,
  INSPECTION_AREA_LABELS,
  MEASUREMENT_KIND_LABELS,
  SCOPE_CAUTION,
  TORQUE_CAUTION,
  formatTorque,
  reportPalette,
  worstCondition,
} from '@benchproof/domain';
import type { AuthUser } from '../core/auth';
import { FindingsService } from '../findings';
import { CLOCK, type Clock } from '../core/clock';
import { InspectionService } from '../inspection';
import { JobsService } from '../jobs';
import { MediaService } from '../media';
import { ShopsService } from '../shops';
import { WorkLogService } from '../work-log';
import type { ReportSnapshot, SnapshotRecommendation } from './report-data';
import { PAIRS_SOURCE, type PairsSource } from './report-sources';

/** Gathers a job's records through the other features' services into one frozen snapshot. */
@Injectable()
export class ReportSnapshotService {
  constructor(
    private readonly jobs: JobsService,
    private readonly shops: ShopsService,
    private readonly findings: FindingsService,
    private readonly inspection: InspectionService,
    private readonly workLog: WorkLogService,
    private readonly media: MediaService,
    @Inject(PAIRS_SOURCE) private readonly pairs: PairsSource,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  async build(actor: AuthUser, jobId: number): Promise<ReportSnapshot> {
    const job = this.jobs.get(actor, jobId);
    const inspection = this.inspection.get(actor, jobId);
    const findings = this.findings.list(actor, jobId);
    const estimate = this.findings.estimate(actor, jobId);
    const torque = this.workLog.listTorque(actor, jobId);
    const scope = this.media.list(actor, jobId, { kind: 'scope_still' });
    const checkpointLabels = new Map(inspection.areas.flatMap((a) => a.checkpoints.map((c) => [c.id, c.label] as const)));
    const title = (f: FindingDto) => (f.checkpointId !== null ? checkpointLabels.get(f.checkpointId) : undefined) ?? INSPECTION_AREA_LABELS[f.area];
    return {
      schemaVersion: 1,
      shop: this.shopPart(actor.shopId),
      job: this.jobPart(job),
      owner: { name: job.customer.name },
      bike: this.bikePart(job),
      overall: worstCondition(findings.map((f) => f.condition)),
      findings: this.findingsPart(actor, jobId, findings, title),
      measurements: this.measurementsPart(inspection),
      torque: torque.map((t) => this.torqueRow(t)),
      work: this.workLog.listWork(actor, jobId).map((w) => ({ description: w.description, parts: w.partsUsed, minutes: w.minutes, by: w.userName })),
      ...this.moneyPart(estimate, title),
      scopeStills: scope.map((s) => ({ assetId: s.id, caption: s.caption, timecodeMs: s.timecodeMs })),
      pairs: await this.pairs.listPairs(actor, jobId),
      finalCheck: job.finalCheck
        ? { checker: job.finalCheck.checker.name, passed: job.finalCheck.passed, at: job.finalCheck.at, notes: job.finalCheck.testRideNotes }
        : null,
      cautions: this.cautions(findings, torque.length > 0, scope.length > 0),
      madeAt: this.clock.now().toISOString(),
      payment: this.paymentPart(actor.shopId, jobId),
    };
  }

  /** The balance as the payments feature answers it through the jobs feature's port (reports never imports payments). */
  private paymentPart(shopId: number, jobId: number): ReportSnapshot['payment'] {
    return this.jobs.balances.settlement(shopId, jobId) ?? undefined;
  }

  private shopPart(shopId: number): ReportSnapshot['shop'] {
    const shop = this.shops.settings(shopId);
    return {
      name: shop.name,
      contact: [shop.address, shop.phone, shop.email].filter(Boolean).join(' · '),
      footer: shop.reportFooter,
      palette: reportPalette(shop.brandPrimary, shop.brandAccent),
      logoKey: this.shops.logo(shopId)?.key ?? null,
      units: shop.units,
      currency: shop.currency,
      locale: shop.dateLocale,
    };
  }

  /** Worst condition first; still shots only (a video cannot go on paper). */
  private findingsPart(actor: AuthUser, jobId: number, findings: FindingDto[], title: (f: FindingDto) => string): ReportSnapshot['findings'] {
    return findings
      .slice()
      .sort((a, b) => CONDITIONS.indexOf(b.condition) - CONDITIONS.indexOf(a.condition))
      .map((f) => ({
        id: f.id,
        title: title(f),
        condition: f.condition,
        description: f.description,
        doNotRide: f.doNotRide,
        cautions: f.cautions,
        shots: this.media
          .findingMedia(actor, jobId, f.id)
          .assets.filter((a) => a.kind !== 'video' && a.kind !== 'scope_video')
          .map((a) => ({ assetId: a.id, caption: a.caption })),
      }));
  }

  private jobPart(job: JobDetail): ReportSnapshot['job'] {
    return {
      id: job.id,
      number: job.number,
      bookedAt: job.statusTimes.booked_in ?? job.createdAt,
      readyAt: job.statusTimes.ready ?? null,
      promisedOn: job.promisedOn,
      symptoms: job.reportedSymptoms,
      mechanic: job.mechanic?.name ?? null,
    };
  }

  private bikePart(job: JobDetail): ReportSnapshot['bike'] {
    const b = job.bikeDetail;
    const detail = [b.year, b.colour, b.size && `size ${b.size}`, b.tyreSize, `${b.drivetrainSpeeds}-speed`].filter(Boolean).join(' · ');
    return { title: `${b.maker} ${b.model}`.trim(), detail, serial: b.serialNumber };
  }

  private measurementsPart(inspection: InspectionDto): ReportSnapshot['measurements'] {
    return inspection.areas.flatMap((a) =>
      a.checkpoints.flatMap((c) =>
        c.measurements.map((m) => ({
          label: MEASUREMENT_KIND_LABELS[m.kind],
          verdict: m.result.verdict,
          message: m.result.message,
          condition: m.result.condition,
        })),
      ),
    );
  }

  private torqueRow(t: TorqueEntryDto): ReportSnapshot['torque'][number] {
    const spec =
      t.specified.max !== null ? `${t.specified.min}–${formatTorque(t.specified.max, t.specified.unit)}` : formatTorque(t.specified.min, t.specified.unit);
    return {
      fastener: t.fastener,
      specified: spec,
      applied: formatTorque(t.applied.value, t.applied.unit),
      verdict: t.verdict,
      source: t.specSource,
      tool: t.tool,
      calibratedOn: t.toolCalibratedOn,
    };
  }

  private moneyPart(estimate: EstimateDto, title: (f: FindingDto) => string): Pick<ReportSnapshot, 'recommendations' | 'totals'> {
    const recommendations: SnapshotRecommendation[] = estimate.items.map((f) => ({
      findingTitle: title(f),
      summary: f.recommendation.summary,
      urgency: f.recommendation.urgency,
      safety: f.recommendation.urgency === 'safety' || f.condition === 'unsafe',
      status: f.recommendation.decisionStatus,
      grossMinor: f.recommendation.totals.grossMinor,
    }));
    const t = estimate.totals;
    return {
      recommendations,
      totals: { approvedMinor: t.approved.grossMinor, declinedMinor: t.declined.grossMinor, pendingMinor: t.pending.grossMinor, taxMinor: t.approved.taxMinor },
    };
  }

  /** Each caution once: the findings' own, torque and scope where they apply, the general one last. */
  private cautions(findings: FindingDto[], torqued: boolean, scoped: boolean): string[] {
    const all = findings.flatMap((f) => f.cautions);
    if (torqued) all.push(TORQUE_CAUTION);
    if (scoped) all.push(SCOPE_CAUTION);
    all.push(GENERAL_SAFETY);
    return [...new Set(all)];
  }
}
