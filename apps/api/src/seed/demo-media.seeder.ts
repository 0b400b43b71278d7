import { Inject, Injectable, Logger } from '@nestjs/common';
import { DEMO_MEDIA_JOBS_PER_SHOP, DEMO_SHOTS, drawScene, type DemoShot } from '@benchproof/seeds';
import { and, asc, desc, eq, inArray, notInArray } from 'drizzle-orm';
import type { AuthUser } from '../core/auth';
import { DB, type Db } from '../core/db';
import { jobs, shops, users } from '../db/schema';
import { IMAGE, type ImageAdapter } from '../infra/image';
import { UPLOAD_TEMP, type UploadTemp } from '../infra/storage';
import { MediaIntakeService } from '../media';
import { PairsService } from '../pairs';

/**
 * Demo media for the demo jobs: SVG scenes from seeds/ rendered by sharp, some written
 * as a phone would (pixels stored turned, EXIF Orientation 3/6/8, GPS, capture time),
 * then sent through the same intake as an upload, so derivatives show them upright
 * and clean.
 */
@Injectable()
export class DemoMediaSeeder {
  private readonly logger = new Logger('Seed');

  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly intake: MediaIntakeService,
    @Inject(IMAGE) private readonly image: ImageAdapter,
    @Inject(UPLOAD_TEMP) private readonly temp: UploadTemp,
    private readonly pairs: PairsService,
  ) {}

  async seed(): Promise<void> {
    let count = 0;
    for (const shop of this.db.select({ id: shops.id }).from(shops).all()) {
      const actor = this.mechanicOf(shop.id);
      if (!actor) continue;
      const underWay = this.jobsWithWorkDone(shop.id);
      for (const job of underWay) {
        for (const shot of DEMO_SHOTS) {
          await this.upload(actor, job.id, shot);
          count++;
        }
      }
      count += await this.seedFinishedWithPairs(
        actor,
        shop.id,
        underWay.map((j) => j.id),
      );
    }
    if (count) this.logger.log(`Seeded ${count} demo media assets`);
  }

  /** Jobs far enough along to have before and after shots (not booked-in, cancelled or collected). */
  private jobsWithWorkDone(shopId: number): { id: number }[] {
    return this.db
      .select({ id: jobs.id })
      .from(jobs)
      .where(and(eq(jobs.shopId, shopId), inArray(jobs.status, ['waiting_owner', 'in_work', 'final_check', 'ready'])))
      .orderBy(asc(jobs.id))
      .limit(DEMO_MEDIA_JOBS_PER_SHOP)
      .all();
  }

  /**
   * The newest job whose work is finished (ready for collection) gets the shots and
   * their before/after pairs, so its bench report and owner page show the slider.
   * The jobs above stay unpaired: they are where the pair builder is demonstrated.
   */
  private async seedFinishedWithPairs(actor: AuthUser, shopId: number, skip: number[]): Promise<number> {
    const job = this.db
      .select({ id: jobs.id })
      .from(jobs)
      .where(and(eq(jobs.shopId, shopId), eq(jobs.status, 'ready'), notInArray(jobs.id, skip)))
      .orderBy(desc(jobs.id))
      .limit(1)
      .get();
    if (!job) return 0;
    const shots = DEMO_SHOTS.filter((s) => !s.decoy);
    const ids = new Map<DemoShot, number>();
    for (const shot of shots) ids.set(shot, await this.upload(actor, job.id, shot));
    for (const before of shots.filter((s) => s.phase === 'before')) {
      const after = shots.find((s) => s.phase === 'after' && s.scene === before.scene);
      if (after)
        this.pairs.create(actor, job.id, { beforeAssetId: ids.get(before)!, afterAssetId: ids.get(after)!, caption: `${before.caption} → ${after.caption}` });
    }
    return shots.length;
  }

  private mechanicOf(shopId: number): AuthUser | null {
    const u = this.db
      .select()
      .from(users)
      .where(and(eq(users.shopId, shopId), eq(users.role, 'mechanic')))
      .get();
    return u ? { id: u.id, shopId: u.shopId, role: u.role, email: u.email, name: u.name } : null;
  }

  private async upload(actor: AuthUser, jobId: number, shot: DemoShot): Promise<number> {
    const upright = Buffer.from(drawScene(shot.scene, shot.phase === 'before' ? 'before' : 'after', shot.framing));
    const stored = await this.image.storedForOrientation(upright, shot.orientation);
    const jpeg = await this.image.jpegWithExif(stored, {
      orientation: shot.orientation,
      gps: shot.gps ?? undefined,
      takenAt: new Date(shot.takenAt),
      make: 'BenchProof demo camera',
    });
    const file = await this.temp.write(jpeg);
    const { scene, orientation: _o, gps: _g, takenAt: _t, framing: _f, decoy: _d, ...tags } = shot;
    return (await this.intake.intake(actor, jobId, { ...file, originalName: `${scene}-${shot.phase}.jpg` }, tags, 'multipart')).id;
  }
}
