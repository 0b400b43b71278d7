import { Inject, Injectable } from '@nestjs/common';
import type { BikeHistory, JobDto, WearSeries } from '@benchproof/contracts';
import { chainDueEstimate, chainWearLimits } from '@benchproof/domain';
import { BikesService } from '../bikes';
import type { AuthUser } from '../core/auth';
import { CLOCK, type Clock } from '../core/clock';
import { JobsService } from '../jobs';
import { ShopsService } from '../shops';
import { InspectionRepository, type MeasurementRow } from './inspection.repository';

const DAY_MS = 86_400_000;
const isoDay = (day: number): string => new Date(day * DAY_MS).toISOString().slice(0, 10);

/** A bike's visits and its repeated measurements across them, for the wear-trend chart. */
@Injectable()
export class BikeHistoryService {
  constructor(
    private readonly repo: InspectionRepository,
    private readonly jobs: JobsService,
    private readonly bikes: BikesService,
    private readonly shops: ShopsService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  history(actor: AuthUser, bikeId: number): BikeHistory {
    const bike = this.bikes.get(actor, bikeId);
    const jobs = this.jobs.listForBike(actor, bikeId).filter((j) => j.status !== 'cancelled');
    const series = this.series(
      jobs,
      this.repo.measurements(
        actor.shopId,
        jobs.map((j) => j.id),
      ),
    );
    const { chainLimits } = this.shops.settings(actor.shopId);
    const limitPct = chainWearLimits(bike.drivetrainSpeeds, chainLimits ?? undefined).replaceAtPct;
    return { bike, jobs: this.jobs.listForBike(actor, bikeId), series, nextChainDue: this.chainDue(series, limitPct) };
  }

  private series(jobs: JobDto[], rows: MeasurementRow[]): WearSeries[] {
    const byJob = new Map(jobs.map((j) => [j.id, j]));
    const out = new Map<string, WearSeries>();
    for (const m of rows) {
      const trend = m.result.trend;
      const job = byJob.get(m.jobId);
      if (!trend || !job) continue;
      const s = out.get(trend.key) ?? { key: trend.key, kind: trend.kind, label: trend.label, unit: trend.unit, limit: trend.limit, points: [] };
      s.limit = trend.limit;
      s.points.push({ jobId: job.id, jobNumber: job.number, at: m.at.toISOString(), value: trend.value, condition: m.result.condition });
      out.set(trend.key, s);
    }
    return [...out.values()];
  }

  /** From the chain series' slope against the current limit; null when the readings cannot say (libs/domain chainDueEstimate). */
  private chainDue(series: WearSeries[], limitPct: number): BikeHistory['nextChainDue'] {
    const chain = series.find((s) => s.key === 'chain_elongation');
    if (!chain) return null;
    const points = chain.points.map((p) => ({ day: Math.floor(Date.parse(p.at) / DAY_MS), pct: p.value }));
    const est = chainDueEstimate(points, limitPct);
    if (!est) return null;
    const today = Math.floor(this.clock.now().getTime() / DAY_MS);
    const basis = est.alreadyDue
      ? 'The latest reading is at or past the replace-at limit: replace the chain now.'
      : `Straight line through ${est.pointsUsed} readings of the current chain; an estimate for planning, not a verdict. Measure again at each visit.`;
    return {
      dueOn: isoDay(Math.max(est.dueDay, est.alreadyDue ? est.dueDay : today)),
      limitPct,
      ratePctPer30Days: Math.round(est.pctPerDay * 30 * 10_000) / 10_000,
      basis,
    };
  }
}
