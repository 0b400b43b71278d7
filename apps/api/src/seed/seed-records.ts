import { Inject, Injectable } from '@nestjs/common';
import { DEMO_BIKES, DEMO_JOBS, DEMO_OWNERS, type DemoJob } from '@benchproof/seeds';
import { FINAL_CHECK_ITEMS, type JobStatus } from '@benchproof/domain';
import { type AuthUser } from '../core/auth';
import { FindingsService } from '../findings';
import { CLOCK, type Clock } from '../core/clock';
import { InspectionService } from '../inspection';
import { JobsService } from '../jobs';
import { WorkLogService } from '../work-log';

/** The path each demo job walks to reach its status (cancelled jobs are cancelled from booked in). */
const PATH: JobStatus[] = ['on_stand', 'waiting_owner', 'in_work', 'final_check', 'ready', 'collected'];
const ALL_PASS = Object.fromEntries(FINAL_CHECK_ITEMS.map((i) => [i, true])) as Record<(typeof FINAL_CHECK_ITEMS)[number], boolean>;
const DAY_MS = 86_400_000;

export interface ShopActors {
  desk: AuthUser;
  manager: AuthUser;
  byEmail: Map<string, AuthUser>;
}

/** Creates the demo records through the feature services, so they obey the same rules as real use. */
@Injectable()
export class SeedRecords {
  constructor(
    private readonly jobs: JobsService,
    private readonly inspection: InspectionService,
    private readonly findings: FindingsService,
    private readonly workLog: WorkLogService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /** Seeds one shop's jobs; returns [jobId, daysAgo] pairs so the caller can backdate them. */
  seedShop(shopKey: string, actors: ShopActors): [number, number][] {
    const bikeIds = new Map<string, { customerId: number; bikeId: number }>();
    const out: [number, number][] = [];
    for (const job of DEMO_JOBS.filter((j) => j.shop === shopKey)) {
      out.push([this.seedJob(job, actors, bikeIds), job.daysAgo]);
    }
    return out;
  }

  private bookIn(job: DemoJob, a: ShopActors, known: Map<string, { customerId: number; bikeId: number }>) {
    const promised = new Date(this.clock.now().getTime() + (job.promisedAfterDays - job.daysAgo) * DAY_MS).toISOString().slice(0, 10);
    const mechanicId = job.mechanic ? (a.byEmail.get(job.mechanic)?.id ?? null) : null;
    const base = { reportedSymptoms: job.symptoms, promisedOn: promised, mechanicId };
    const seen = known.get(job.bike);
    if (seen) return this.jobs.bookIn(a.desk, { ...base, customerId: seen.customerId, bikeId: seen.bikeId });
    const bike = DEMO_BIKES.find((b) => b.key === job.bike);
    const owner = DEMO_OWNERS.find((o) => o.key === bike?.owner);
    if (!bike || !owner) throw new Error(`Demo job refers to unknown bike ${job.bike}`);
    const { key: _k, owner: _o, ...spec } = bike;
    const { key: _ok, ...customer } = owner;
    const detail = this.jobs.bookIn(a.desk, { ...base, newCustomer: { ...customer, notes: null }, newBike: spec });
    known.set(job.bike, { customerId: detail.customer.id, bikeId: detail.bike.id });
    return detail;
  }

  private seedJob(job: DemoJob, a: ShopActors, known: Map<string, { customerId: number; bikeId: number }>): number {
    const { id } = this.bookIn(job, a, known);
    const mechanic = (job.mechanic && a.byEmail.get(job.mechanic)) || a.manager;
    if (job.status === 'cancelled') {
      this.jobs.transition(a.manager, id, { to: 'cancelled', note: 'Owner decided to wait' });
      return id;
    }
    // Without findings there is nothing to ask the owner: straight from the stand to work.
    const steps = PATH.slice(0, PATH.indexOf(job.status) + 1).filter((s) => s !== 'waiting_owner' || job.findings?.length);
    for (const to of steps) {
      if (to === 'ready') {
        const checker = a.byEmail.get(job.checker ?? '') ?? a.manager;
        this.jobs.recordFinalCheck(checker, id, { items: ALL_PASS, passed: true, testRideNotes: 'Short loop round the yard', note: null });
      }
      // Demo history predates reports and payments, so its hand-overs are confirmed without a report and, where
      // approved work is still due, with desk's reason (the UNPAID_BALANCE rule holds for the seed too).
      const handover = to === 'collected' ? { confirmNoReport: true, unpaidReason: 'Settled before payments were recorded here' } : {};
      this.jobs.transition(to === 'collected' ? a.desk : mechanic, id, { to, note: null, ...handover });
      if (to === 'on_stand') this.inspect(job, id, mechanic, a);
      if (to === 'in_work') this.logWork(job, id, mechanic);
    }
    return id;
  }

  private inspect(job: DemoJob, jobId: number, mech: AuthUser, a: ShopActors): void {
    const insp = this.inspection.get(mech, jobId);
    const cps = new Map(insp.areas.flatMap((ar) => ar.checkpoints).map((c) => [c.key, c.id]));
    for (const [key, condition] of Object.entries(job.conditions ?? {})) {
      const cp = cps.get(key);
      if (cp) this.inspection.updateCheckpoint(mech, jobId, cp, { condition });
    }
    for (const m of job.measurements ?? []) {
      const cp = cps.get(m.checkpoint);
      if (cp) this.inspection.addMeasurement(mech, jobId, cp, m.input);
    }
    for (const f of job.findings ?? []) {
      const finding = this.findings.create(mech, jobId, { area: f.area, condition: f.condition, description: f.description, checkpointId: null });
      if (!f.recommendation) continue;
      const { decision, ...rec } = f.recommendation;
      const r = this.findings.setRecommendation(a.desk, jobId, finding.id, rec);
      if (decision) this.findings.recordDecision(a.desk, jobId, r.id, { ...decision, note: '' });
    }
  }

  private logWork(job: DemoJob, jobId: number, mech: AuthUser): void {
    for (const w of job.work ?? []) this.workLog.addWork(mech, jobId, { chargeable: false, ...w });
    for (const t of job.torque ?? []) {
      // The entry is backdated by the job's daysAgo afterwards; the calibration day is counted from then.
      const toolCalibratedOn = t.toolCalibratedDaysBefore === undefined ? undefined : this.daysBeforeNow(job.daysAgo + t.toolCalibratedDaysBefore);
      this.workLog.addTorque(mech, jobId, {
        fastener: t.fastener,
        specified: { min: t.spec, max: null, unit: t.unit },
        applied: { value: t.applied, unit: t.unit },
        specSource: t.specSource,
        tool: t.tool,
        toolCalibratedOn,
        threadlocker: t.threadlocker,
        carbonPart: t.carbonPart,
      });
    }
  }

  private daysBeforeNow(days: number): string {
    return new Date(this.clock.now().getTime() - days * DAY_MS).toISOString().slice(0, 10);
  }
}
