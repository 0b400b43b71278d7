import { type DynamicModule, Module } from '@nestjs/common';
import { ThrottlerModule } from '@nestjs/throttler';
import { AuditModule } from './audit';
import { AuthModule } from './auth';
import { BikesModule } from './bikes';
import { type AppConfig, ConfigModule } from './config';
import { AuthCoreModule } from './core/auth';
import { DbModule } from './core/db';
import { CustomersModule } from './customers';
import { FindingsModule } from './findings';
import { HealthController } from './health/health.controller';
import { MediaModule } from './media';
import { ClockModule } from './infra/clock';
import { TasksModule } from './infra/tasks';
import { InspectionModule } from './inspection';
import { JobsModule } from './jobs';
import { MailModule } from './mail';
import { SeedModule } from './seed';
import { ShopsModule } from './shops';
import { UsersModule } from './users';
import { WorkLogModule } from './work-log';

/** Feature modules, one per product noun (DESIGN.md). Add new features here. */
const FEATURES = [AuditModule, AuthModule, UsersModule, ShopsModule, MediaModule, CustomersModule, BikesModule, JobsModule, InspectionModule, FindingsModule, WorkLogModule, MailModule];

@Module({})
export class AppModule {
  static register(cfg: AppConfig): DynamicModule {
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot(cfg),
        ClockModule,
        TasksModule,
        DbModule,
        AuthCoreModule,
        ThrottlerModule.forRoot([{ ttl: 60_000, limit: cfg.LOGIN_THROTTLE_LIMIT }]),
        ...FEATURES,
        SeedModule,
      ],
      controllers: [HealthController],
    };
  }
}
