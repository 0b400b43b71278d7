import { Inject, Injectable } from '@nestjs/common';
import type { MediaListQuery, MediaVariant } from '@benchproof/contracts';
import { and, asc, eq, inArray, isNull, sql } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { findingMedia, mediaAssets, mediaDerivatives } from '../db/schema';

export type MediaAssetRow = typeof mediaAssets.$inferSelect;
export type NewMediaAssetRow = typeof mediaAssets.$inferInsert;
export type MediaDerivativeRow = typeof mediaDerivatives.$inferSelect;
export type NewMediaDerivativeRow = typeof mediaDerivatives.$inferInsert;
/** What serving one file needs: the asset's scope and state, and the named derivative when there is one. */
export interface MediaFileRow {
  id: number;
  jobId: number;
  originalKey: string | null;
  sha256: string;
  mime: string;
  deletedAt: Date | null;
  purgedAt: Date | null;
  derivativeKey: string | null;
  derivativeSha256: string | null;
  derivativeBytes: number | null;
}
export type AssetPatch = Partial<
  Pick<MediaAssetRow, 'phase' | 'area' | 'caption' | 'derivativeStatus' | 'derivativeError' | 'deletedAt' | 'deletedBy' | 'purgedAt' | 'originalKey' | 'phash'>
>;

@Injectable()
export class MediaRepository {
  private readonly fileLookup;

  constructor(@Inject(DB) private readonly db: Db) {
    // Serving media runs this on every <img> request: one prepared statement, asset and derivative together.
    this.fileLookup = db
      .select({
        id: mediaAssets.id,
        jobId: mediaAssets.jobId,
        originalKey: mediaAssets.originalKey,
        sha256: mediaAssets.sha256,
        mime: mediaAssets.mime,
        deletedAt: mediaAssets.deletedAt,
        purgedAt: mediaAssets.purgedAt,
        derivativeKey: mediaDerivatives.key,
        derivativeSha256: mediaDerivatives.sha256,
        derivativeBytes: mediaDerivatives.bytes,
      })
      .from(mediaAssets)
      .leftJoin(mediaDerivatives, and(eq(mediaDerivatives.assetId, mediaAssets.id), eq(mediaDerivatives.variant, sql.placeholder('variant'))))
      .where(and(eq(mediaAssets.shopId, sql.placeholder('shopId')), eq(mediaAssets.id, sql.placeholder('id'))))
      .prepare();
  }

  /** An asset of this shop with its `variant` derivative (null fields when there is none, e.g. for 'original'). */
  findFile(shopId: number, id: number, variant: MediaVariant | 'original'): MediaFileRow | undefined {
    return this.fileLookup.get({ shopId, id, variant });
  }

  insert(row: NewMediaAssetRow): MediaAssetRow {
    return this.db.insert(mediaAssets).values(row).returning().all()[0];
  }

  findInShop(shopId: number, id: number): MediaAssetRow | undefined {
    return this.db
      .select()
      .from(mediaAssets)
      .where(and(eq(mediaAssets.shopId, shopId), eq(mediaAssets.id, id)))
      .get();
  }

  findByClientId(shopId: number, clientId: string): MediaAssetRow | undefined {
    return this.db
      .select()
      .from(mediaAssets)
      .where(and(eq(mediaAssets.shopId, shopId), eq(mediaAssets.clientId, clientId)))
      .get();
  }

  findById(id: number): MediaAssetRow | undefined {
    return this.db.select().from(mediaAssets).where(eq(mediaAssets.id, id)).get();
  }

  listForJob(shopId: number, jobId: number, q: MediaListQuery & { includeDeleted: boolean }): MediaAssetRow[] {
    const where = [eq(mediaAssets.shopId, shopId), eq(mediaAssets.jobId, jobId), isNull(mediaAssets.purgedAt)];
    if (!q.includeDeleted) where.push(isNull(mediaAssets.deletedAt));
    if (q.phase) where.push(eq(mediaAssets.phase, q.phase));
    if (q.area) where.push(eq(mediaAssets.area, q.area));
    if (q.kind) where.push(eq(mediaAssets.kind, q.kind));
    return this.db
      .select()
      .from(mediaAssets)
      .where(and(...where))
      .orderBy(asc(mediaAssets.uploadedAt), asc(mediaAssets.id))
      .all();
  }

  listByIds(shopId: number, jobId: number, ids: number[]): MediaAssetRow[] {
    if (!ids.length) return [];
    return this.db
      .select()
      .from(mediaAssets)
      .where(and(eq(mediaAssets.shopId, shopId), eq(mediaAssets.jobId, jobId), inArray(mediaAssets.id, ids), isNull(mediaAssets.deletedAt)))
      .all();
  }

  /** Image assets whose derivatives were never finished (crash recovery at boot). */
  listPending(): MediaAssetRow[] {
    return this.db
      .select()
      .from(mediaAssets)
      .where(and(eq(mediaAssets.derivativeStatus, 'pending'), isNull(mediaAssets.purgedAt)))
      .all();
  }

  /** Stills whose derivatives are ready but whose perceptual hash is missing (boot catch-up). */
  listMissingPhash(): MediaAssetRow[] {
    return this.db
      .select()
      .from(mediaAssets)
      .where(
        and(
          eq(mediaAssets.derivativeStatus, 'ready'),
          isNull(mediaAssets.phash),
          isNull(mediaAssets.purgedAt),
          inArray(mediaAssets.kind, ['photo', 'scope_still']),
        ),
      )
      .all();
  }

  update(id: number, patch: AssetPatch): MediaAssetRow {
    return this.db.update(mediaAssets).set(patch).where(eq(mediaAssets.id, id)).returning().all()[0];
  }

  derivativesOf(assetIds: number[]): MediaDerivativeRow[] {
    if (!assetIds.length) return [];
    return this.db.select().from(mediaDerivatives).where(inArray(mediaDerivatives.assetId, assetIds)).all();
  }

  findDerivative(assetId: number, variant: MediaVariant): MediaDerivativeRow | undefined {
    return this.db
      .select()
      .from(mediaDerivatives)
      .where(and(eq(mediaDerivatives.assetId, assetId), eq(mediaDerivatives.variant, variant)))
      .get();
  }

  upsertDerivative(row: NewMediaDerivativeRow): void {
    this.db
      .insert(mediaDerivatives)
      .values(row)
      .onConflictDoUpdate({
        target: [mediaDerivatives.assetId, mediaDerivatives.variant],
        set: { key: row.key, width: row.width, height: row.height, bytes: row.bytes, sha256: row.sha256 },
      })
      .run();
  }

  deleteDerivatives(assetId: number): void {
    this.db.delete(mediaDerivatives).where(eq(mediaDerivatives.assetId, assetId)).run();
  }

  linksOf(findingId: number): number[] {
    return this.db
      .select({ assetId: findingMedia.assetId })
      .from(findingMedia)
      .where(eq(findingMedia.findingId, findingId))
      .orderBy(asc(findingMedia.position))
      .all()
      .map((r) => r.assetId);
  }

  /** Two statements: call inside the caller's unit of work. */
  replaceLinks(findingId: number, assetIds: number[]): void {
    this.db.delete(findingMedia).where(eq(findingMedia.findingId, findingId)).run();
    assetIds.forEach((assetId, position) => this.db.insert(findingMedia).values({ findingId, assetId, position }).run());
  }

  /** Every original key a row still names (purged rows have none). */
  originalKeys(): Set<string> {
    const rows = this.db.select({ key: mediaAssets.originalKey }).from(mediaAssets).all();
    return new Set(rows.flatMap((r) => (r.key ? [r.key] : [])));
  }
}
