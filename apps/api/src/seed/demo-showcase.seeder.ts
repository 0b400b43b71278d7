import { Inject, Injectable, Logger } from '@nestjs/common';
import { CONSENT_WORDING } from '@benchproof/contracts';
import { DEMO_SHOTS } from '@benchproof/seeds';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { consents, mediaAssets, shops, shotPairs } from '../db/schema';
import { CLOCK, type Clock } from '../core/clock';

/**
 * Showcase demo: in every shop the older job with shots gets its true before/after
 * pairs and a granted consent (make and model may be named); in the second shop the
 * newer one gets pairs and no consent, so the showcase has something to leave out.
 * The first shop's newer job stays unpaired: the pair builder's suggestions start there.
 */
@Injectable()
export class DemoShowcaseSeeder {
  private readonly logger = new Logger('Seed');

  constructor(
    @Inject(DB) private readonly db: Db,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  seed(): void {
    let pairs = 0;
    for (const [i, shop] of this.db.select({ id: shops.id }).from(shops).orderBy(asc(shops.id)).all().entries()) {
      const jobIds = [
        ...new Set(
          this.db
            .select({ jobId: mediaAssets.jobId })
            .from(mediaAssets)
            .where(eq(mediaAssets.shopId, shop.id))
            .orderBy(asc(mediaAssets.jobId))
            .all()
            .map((r) => r.jobId),
        ),
      ];
      if (jobIds[0]) {
        pairs += this.pairUp(shop.id, jobIds[0]);
        this.grant(shop.id, jobIds[0]);
      }
      if (i > 0 && jobIds[1]) pairs += this.pairUp(shop.id, jobIds[1]);
    }
    if (pairs) this.logger.log(`Seeded ${pairs} showcase demo pairs`);
  }

  private pairUp(shopId: number, jobId: number): number {
    const shots = this.db
      .select()
      .from(mediaAssets)
      .where(and(eq(mediaAssets.shopId, shopId), eq(mediaAssets.jobId, jobId), inArray(mediaAssets.phase, ['before', 'after'])))
      .all();
    const byCaption = new Map(shots.map((s) => [s.caption, s]));
    const now = this.clock.now();
    let position = 0;
    for (const before of DEMO_SHOTS.filter((s) => s.phase === 'before' && !s.decoy)) {
      const after = DEMO_SHOTS.find((s) => s.phase === 'after' && s.scene === before.scene && !s.decoy);
      const b = byCaption.get(before.caption);
      const a = after && byCaption.get(after.caption);
      if (!b || !a) continue;
      this.db
        .insert(shotPairs)
        .values({
          shopId,
          jobId,
          beforeAssetId: b.id,
          afterAssetId: a.id,
          caption: '',
          position: position++,
          createdBy: b.uploadedBy,
          createdAt: now,
          updatedAt: now,
        })
        .run();
    }
    return position;
  }

  private grant(shopId: number, jobId: number): void {
    this.db
      .insert(consents)
      .values({
        shopId,
        jobId,
        granted: true,
        nameMakeModel: true,
        wordingVersion: CONSENT_WORDING.version,
        method: 'in_person',
        givenByName: 'The owner, at the counter (demo)',
        recordedBy: null,
        ownerLinkId: null,
        at: this.clock.now(),
      })
      .run();
  }
}
