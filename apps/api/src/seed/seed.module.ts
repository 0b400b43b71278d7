import { Module } from '@nestjs/common';
import { FindingsModule } from '../findings';
import { InspectionModule } from '../inspection';
import { JobsModule } from '../jobs';
import { MediaModule } from '../media';
import { PairsModule } from '../pairs';
import { WorkLogModule } from '../work-log';
import { DemoMediaSeeder } from './demo-media.seeder';
import { DemoShowcaseSeeder } from './demo-showcase.seeder';
import { SeedRecords } from './seed-records';
import { SeedService } from './seed.service';

@Module({
  imports: [JobsModule, InspectionModule, FindingsModule, WorkLogModule, MediaModule, PairsModule],
  providers: [SeedService, SeedRecords, DemoMediaSeeder, DemoShowcaseSeeder],
  exports: [SeedService],
})
export class SeedModule {}
