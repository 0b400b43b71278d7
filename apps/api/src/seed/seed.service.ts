import { Inject, Injectable, Logger } from '@nestjs/common';
import { DEMO_PASSWORD, DEMO_SHOPS, type DemoShop } from '@benchproof/seeds';
import { DB, type Db } from '../core/db';
import { shops, users } from '../db/schema';
import { CLOCK, type Clock } from '../infra/clock';
import { hashPassword } from '../users';

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
  ) {}

  isEmpty(): boolean {
    return !this.db.select({ id: shops.id }).from(shops).limit(1).get();
  }

  async seedDemo(): Promise<void> {
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    for (const demo of DEMO_SHOPS) this.insertShop(demo, passwordHash);
    this.logger.log(`Seeded ${DEMO_SHOPS.length} demo shops`);
  }

  private insertShop(demo: DemoShop, passwordHash: string): number {
    const { staff, key: _key, ...settings } = demo;
    const now = this.clock.now();
    const shop = this.db.insert(shops).values({ ...settings, createdAt: now }).returning().get();
    for (const s of staff) {
      this.db.insert(users).values({ ...s, shopId: shop.id, passwordHash, active: true, createdAt: now }).run();
    }
    return shop.id;
  }
}
