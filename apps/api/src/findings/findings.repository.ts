import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { decisions, findings, recommendations } from '../db/schema';

export type FindingRow = typeof findings.$inferSelect;
export type NewFindingRow = typeof findings.$inferInsert;
export type RecommendationRow = typeof recommendations.$inferSelect;
export type NewRecommendationRow = typeof recommendations.$inferInsert;
export type DecisionRow = typeof decisions.$inferSelect;
export type NewDecisionRow = typeof decisions.$inferInsert;

/** Findings, their recommendations and the owner's decisions; every query scoped by shop and job. */
@Injectable()
export class FindingsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  list(shopId: number, jobId: number): FindingRow[] {
    return this.db
      .select()
      .from(findings)
      .where(and(eq(findings.shopId, shopId), eq(findings.jobId, jobId)))
      .orderBy(asc(findings.id))
      .all();
  }

  find(shopId: number, jobId: number, id: number): FindingRow | undefined {
    return this.db
      .select()
      .from(findings)
      .where(and(eq(findings.shopId, shopId), eq(findings.jobId, jobId), eq(findings.id, id)))
      .get();
  }

  insert(row: NewFindingRow): FindingRow {
    return this.db.insert(findings).values(row).returning().all()[0];
  }

  update(shopId: number, id: number, patch: Partial<NewFindingRow>): FindingRow {
    return this.db
      .update(findings)
      .set(patch)
      .where(and(eq(findings.shopId, shopId), eq(findings.id, id)))
      .returning()
      .all()[0];
  }

  /** Removes a finding with its recommendation and decision history. */
  delete(shopId: number, id: number): void {
    const rec = this.recommendationOf(shopId, id);
    if (rec) {
      this.db
        .delete(decisions)
        .where(and(eq(decisions.shopId, shopId), eq(decisions.recommendationId, rec.id)))
        .run();
      this.db
        .delete(recommendations)
        .where(and(eq(recommendations.shopId, shopId), eq(recommendations.id, rec.id)))
        .run();
    }
    this.db
      .delete(findings)
      .where(and(eq(findings.shopId, shopId), eq(findings.id, id)))
      .run();
  }

  recommendations(shopId: number, jobId: number): RecommendationRow[] {
    return this.db
      .select()
      .from(recommendations)
      .where(and(eq(recommendations.shopId, shopId), eq(recommendations.jobId, jobId)))
      .all();
  }

  recommendationOf(shopId: number, findingId: number): RecommendationRow | undefined {
    return this.db
      .select()
      .from(recommendations)
      .where(and(eq(recommendations.shopId, shopId), eq(recommendations.findingId, findingId)))
      .get();
  }

  recommendation(shopId: number, jobId: number, id: number): RecommendationRow | undefined {
    return this.db
      .select()
      .from(recommendations)
      .where(and(eq(recommendations.shopId, shopId), eq(recommendations.jobId, jobId), eq(recommendations.id, id)))
      .get();
  }

  insertRecommendation(row: NewRecommendationRow): RecommendationRow {
    return this.db.insert(recommendations).values(row).returning().all()[0];
  }

  updateRecommendation(shopId: number, id: number, patch: Partial<NewRecommendationRow>): RecommendationRow {
    return this.db
      .update(recommendations)
      .set(patch)
      .where(and(eq(recommendations.shopId, shopId), eq(recommendations.id, id)))
      .returning()
      .all()[0];
  }

  decisions(shopId: number, recommendationIds: number[]): DecisionRow[] {
    if (recommendationIds.length === 0) return [];
    return this.db
      .select()
      .from(decisions)
      .where(and(eq(decisions.shopId, shopId), inArray(decisions.recommendationId, recommendationIds)))
      .orderBy(asc(decisions.recordedAt), asc(decisions.id))
      .all();
  }

  insertDecision(row: NewDecisionRow): DecisionRow {
    return this.db.insert(decisions).values(row).returning().all()[0];
  }
}
