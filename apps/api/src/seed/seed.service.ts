import { Inject, Injectable, Logger } from '@nestjs/common';
import { eq } from 'drizzle-orm';
import { DEMO_PASSWORD, DEMO_SHOPS, type DemoShop } from '@benchproof/seeds';
import { DB, type Db } from '../core/db';
import { shops, users } from '../db/schema';
import { backdateJob, forgetReplayedTexts } from './seed-backdate';
import { SeedRecords, type ShopActors } from './seed-records';
import { CLOCK, type Clock } from '../core/clock';
import { hashPassword } from '../users';
import { DemoMediaSeeder } from './demo-media.seeder';
import { DemoShowcaseSeeder } from './demo-showcase.seeder';

/**
 * Loads the invented demo scenario into an empty database. Staff and shops are
 * inserted directly (there is no sign-up flow); everything after that goes through
 * the feature services so the demo obeys the same rules as real use.
 */
@Injectable()
export class SeedService {
  private readonly logger = new Logger('Seed');

  constructor(
    @Inject(DB) private readonly db: Db,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly demoMedia: DemoMediaSeeder,
    private readonly demoShowcase: DemoShowcaseSeeder,
    private readonly records: SeedRecords,
  ) {}

  isEmpty(): boolean {
    return !this.db.select({ id: shops.id }).from(shops).limit(1).get();
  }

  async seedDemo(): Promise<void> {
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    let jobs = 0;
    for (const demo of DEMO_SHOPS) {
      const shopId = this.insertShop(demo, passwordHash);
      const seeded = this.records.seedShop(demo.key, this.actors(shopId));
      for (const [jobId, daysAgo] of seeded) backdateJob(this.db, jobId, daysAgo);
      forgetReplayedTexts(this.db, shopId);
      jobs += seeded.length;
    }
    this.logger.log(`Seeded ${DEMO_SHOPS.length} demo shops with ${jobs} jobs`);
    await this.seedDemoMedia();
  }

  /** Generated before/after shots and scope stills for the most recent demo jobs of each shop. */
  async seedDemoMedia(): Promise<void> {
    await this.demoMedia.seed();
    this.demoShowcase.seed();
  }

  /** The demo staff as request actors, the way the session guard would see them. */
  private actors(shopId: number): ShopActors {
    const staff = this.db.select().from(users).where(eq(users.shopId, shopId)).all();
    const byEmail = new Map(staff.map((u) => [u.email, { id: u.id, shopId, role: u.role, email: u.email, name: u.name }]));
    const first = (role: string) => [...byEmail.values()].find((u) => u.role === role);
    const manager = first('manager');
    if (!manager) throw new Error('Demo shop without a manager');
    return { manager, desk: first('desk') ?? manager, byEmail };
  }

  private insertShop(demo: DemoShop, passwordHash: string): number {
    const { staff, key: _key, ...settings } = demo;
    const now = this.clock.now();
    const shop = this.db
      .insert(shops)
      .values({ ...settings, createdAt: now })
      .returning()
      .all()[0];
    for (const s of staff) {
      this.db
        .insert(users)
        .values({ ...s, shopId: shop.id, passwordHash, active: true, createdAt: now })
        .run();
    }
    return shop.id;
  }
}
