import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { JobsModule } from '../jobs';
import { ConsentController } from './consent.controller';
import { ConsentRepository } from './consent.repository';
import { ConsentService } from './consent.service';

@Module({
  imports: [AuditModule, JobsModule],
  controllers: [ConsentController],
  providers: [ConsentRepository, ConsentService],
  exports: [ConsentService],
})
export class ConsentModule {}
