import { Inject, Injectable } from '@nestjs/common';
import type { ConsentDto, FindingDto, OwnerConsentRequest, OwnerDecisionsRequest, OwnerPageDto, OwnerShot } from '@benchproof/contracts';
import { MEASUREMENT_PLAIN_WORDS, statusAfterOwnerAnswer } from '@benchproof/domain';
import { BikesService } from '../bikes';
import { ConsentService } from '../consent';
import { DomainError } from '../core/http';
import { CustomersService } from '../customers';
import { FindingsService } from '../findings';
import { CLOCK, type Clock } from '../core/clock';
import { InspectionService } from '../inspection';
import { JobAccess, JobsService } from '../jobs';
import { ShopsService } from '../shops';
import { UnitOfWork } from '../core/db';
import type { OwnerActor } from '../owner-links';
import { OWNER_MEDIA, OWNER_PAIRS, OWNER_REPORT, type OwnerMediaPort, type OwnerPairsPort, type OwnerReportPort, type OwnerShotSource } from './owner.ports';

/**
 * Everything the owner page shows and does, for one owner actor (one job).
 * Only owner-facing fields are copied into the answer: no staff names, no
 * internal notes, no originals — shots are URLs of the owner media route.
 */
@Injectable()
export class OwnerPageService {
  constructor(
    private readonly jobs: JobsService,
    private readonly access: JobAccess,
    private readonly shops: ShopsService,
    private readonly customers: CustomersService,
    private readonly bikes: BikesService,
    private readonly findings: FindingsService,
    private readonly inspection: InspectionService,
    private readonly consent: ConsentService,
    @Inject(OWNER_MEDIA) private readonly media: OwnerMediaPort,
    @Inject(OWNER_PAIRS) private readonly pairs: OwnerPairsPort,
    @Inject(OWNER_REPORT) private readonly report: OwnerReportPort,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly uow: UnitOfWork,
  ) {}

  page(owner: OwnerActor & { expiresAt: Date }, token: string): OwnerPageDto {
    const scope = { shopId: owner.shopId, jobId: owner.jobId };
    const job = this.jobs.ownerFacing(owner, owner.jobId);
    const shop = this.shops.settings(owner.shopId);
    const bike = this.bikes.get(owner, job.bikeId);
    const shot = (s: OwnerShotSource): OwnerShot => ({
      ...s,
      thumbUrl: `/api/owner/${token}/media/${s.id}/thumb`,
      screenUrl: `/api/owner/${token}/media/${s.id}/screen`,
    });
    const report = this.report.latest(scope);
    return {
      shop: {
        name: shop.name,
        phone: shop.phone,
        email: shop.email,
        brandPrimary: shop.brandPrimary,
        brandAccent: shop.brandAccent,
        dateLocale: shop.dateLocale,
      },
      job: { number: job.number, status: job.status, reportedSymptoms: job.reportedSymptoms, promisedOn: job.promisedOn },
      bike: { maker: bike.maker, model: bike.model, year: bike.year, colour: bike.colour },
      ownerName: this.customers.get(owner, job.customerId).name,
      expiresAt: owner.expiresAt.toISOString(),
      findings: this.ownerFindings(owner, shot),
      measurements: this.ownerMeasurements(owner),
      pairs: this.pairs.pairsOf(scope).map((p) => ({ id: p.id, caption: p.caption, before: shot(p.before), after: shot(p.after) })),
      report: report && { issuedAt: report.issuedAt.toISOString(), pdfUrl: `/api/owner/${token}/report.pdf` },
      consent: this.consent.currentConsent(owner.shopId, owner.jobId),
    };
  }

  /** Findings with only their owner-facing fields; shots as owner media URLs. */
  private ownerFindings(owner: OwnerActor, shot: (s: OwnerShotSource) => OwnerShot): OwnerPageDto['findings'] {
    const findings = this.findings.list(owner, owner.jobId);
    const shots = this.media.shotsOfFindings(
      { shopId: owner.shopId, jobId: owner.jobId },
      findings.map((f) => f.id),
    );
    return findings.map((f) => ({
      id: f.id,
      area: f.area,
      condition: f.condition,
      description: f.description,
      doNotRide: f.doNotRide,
      cautions: f.cautions,
      shots: (shots.get(f.id) ?? []).map(shot),
      recommendation: f.recommendation && {
        id: f.recommendation.id,
        summary: f.recommendation.summary,
        urgency: f.recommendation.urgency,
        currency: f.recommendation.currency,
        totals: f.recommendation.totals,
        decisionStatus: f.recommendation.decisionStatus,
        updatedAt: f.recommendation.updatedAt,
      },
    }));
  }

  private ownerMeasurements(owner: OwnerActor): OwnerPageDto['measurements'] {
    return this.inspection.measurementsOfJobs(owner, [owner.jobId]).map((m) => ({
      id: m.id,
      kind: m.kind,
      condition: m.result.condition,
      verdict: typeof m.result.message === 'string' ? m.result.message : '',
      explanation: MEASUREMENT_PLAIN_WORDS[m.kind],
    }));
  }

  /**
   * The owner's answers, all or nothing by construction: one transaction holds every
   * decision, its audit entry and the job's move, so a refusal of any item (closed
   * job, already decided, price changed, unconfirmed safety decline) stores nothing.
   * Each goes through FindingsService.decide, the same method staff use, with the
   * owner actor, so JobAccess applies the closed-job rule to the owner as to staff.
   */
  decide(owner: OwnerActor, input: OwnerDecisionsRequest): void {
    const decidedAt = this.clock.now();
    this.uow.run((tx) => {
      const job = this.access.change(owner, owner.jobId, 'decision', tx);
      const byRec = new Map(this.findings.list(owner, owner.jobId).flatMap((f) => (f.recommendation ? [[f.recommendation.id, f] as const] : [])));
      const ownerName = this.customers.get(owner, job.customerId).name;
      for (const item of input.items) {
        this.check(byRec.get(item.recommendationId), item);
        this.findings.decide(owner, owner.jobId, item.recommendationId, {
          status: item.status,
          channel: 'owner_link',
          decidedByName: ownerName,
          recordedBy: null,
          decidedAt,
          note: '',
          seen: { updatedAt: item.seenUpdatedAt, grossMinor: item.seenGrossMinor },
        });
      }
      this.moveJobOn(owner);
    });
  }

  private check(f: FindingDto | undefined, item: OwnerDecisionsRequest['items'][number]): void {
    const rec = f?.recommendation;
    if (!rec) throw new DomainError('NOT_FOUND', 'That item is not part of this job.', { recommendationId: item.recommendationId });
    if (rec.decisionStatus !== 'pending')
      throw new DomainError('CONFLICT', 'This item was already decided.', { recommendationId: rec.id, decisionStatus: rec.decisionStatus });
    if (rec.updatedAt !== item.seenUpdatedAt || rec.totals.grossMinor !== item.seenGrossMinor) {
      throw new DomainError('PRICE_CHANGED', undefined, {
        recommendationId: rec.id,
        grossMinor: rec.totals.grossMinor,
        currency: rec.currency,
        updatedAt: rec.updatedAt,
      });
    }
    if (item.status === 'declined' && rec.urgency === 'safety' && !item.safetyConfirmed) {
      throw new DomainError('SAFETY_CONFIRMATION_REQUIRED', undefined, { recommendationId: rec.id, cautions: f.cautions });
    }
  }

  /** Per the status machine: nothing pending any more → the job leaves "Waiting on owner". */
  private moveJobOn(owner: OwnerActor): void {
    const pending = this.findings.list(owner, owner.jobId).filter((f) => f.recommendation?.decisionStatus === 'pending').length;
    const next = statusAfterOwnerAnswer(this.access.read(owner, owner.jobId).status, pending);
    if (next) this.jobs.transitionByOwner(owner, owner.jobId, next, 'The owner answered every item on the owner page.');
  }

  setConsent(owner: OwnerActor, input: OwnerConsentRequest): ConsentDto {
    const job = this.access.read(owner, owner.jobId);
    const name = this.customers.get(owner, job.customerId).name;
    return this.consent.record(owner, owner.jobId, input, { method: 'owner_link', ownerLinkId: owner.linkId, givenByName: name });
  }
}
