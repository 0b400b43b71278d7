import { Module } from '@nestjs/common';
import { AuditModule } from '../audit';
import { BackgroundWorkController } from './background-work.controller';

/** Failed background tasks of a shop for the manager, with retry (the tasks themselves belong to their features). */
@Module({ imports: [AuditModule], controllers: [BackgroundWorkController] })
export class BackgroundWorkModule {}
