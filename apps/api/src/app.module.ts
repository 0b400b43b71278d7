import { type DynamicModule, Module } from '@nestjs/common';
import { EventEmitterModule } from '@nestjs/event-emitter';
import { ScheduleModule } from '@nestjs/schedule';
import { AnnotationsModule } from './annotations';
import { AuditModule } from './audit';
import { BackgroundWorkModule } from './background-work';
import { AuthModule } from './auth';
import { BackupsModule } from './backups';
import { DataExportModule } from './data-export';
import { BikesModule } from './bikes';
import { type AppConfig, ConfigModule } from './config';
import { AuthCoreModule } from './core/auth';
import { DbModule } from './core/db';
import { CustomersModule } from './customers';
import { FindingsModule } from './findings';
import { HealthController } from './health/health.controller';
import { MediaModule } from './media';
import { PairsModule } from './pairs';
import { ConsentModule } from './consent';
import { ShowcaseModule } from './showcase';
import { OwnerModule } from './owner';
import { OwnerLinksModule } from './owner-links';
import { ClockModule } from './core/clock';
import { DiskSpace } from './infra/disk';
import { TasksModule } from './infra/tasks';
import { RedisModule } from './infra/redis';
import { LiveUpdatesModule } from './infra/live';
import { InspectionModule } from './inspection';
import { JobsModule } from './jobs';
import { ReportsModule } from './reports';
import { MailModule } from './mail';
import { PaymentsModule } from './payments';
import { PaymentProviderModule } from './infra/payments';
import { TextProviderModule } from './infra/texts';
import { TextsModule } from './texts';
import { SeedModule } from './seed';
import { ShopsModule } from './shops';
import { UsersModule } from './users';
import { WorkLogModule } from './work-log';
import { InvitationsModule } from './invitations';
import { PasswordResetsModule } from './password-resets';
import { SetupModule } from './setup';
import { ImportsModule } from './imports';
import { TwoFactorModule } from './two-factor';
import { MetricsModule } from './metrics';

/** Feature modules, one per product noun (DESIGN.md). Add new features here. */
const FEATURES = [
  AuditModule,
  BackgroundWorkModule,
  AuthModule,
  UsersModule,
  ShopsModule,
  MediaModule,
  CustomersModule,
  BikesModule,
  JobsModule,
  InspectionModule,
  FindingsModule,
  WorkLogModule,
  PairsModule,
  ConsentModule,
  OwnerLinksModule,
  OwnerModule,
  AnnotationsModule,
  ReportsModule,
  MailModule,
  ShowcaseModule,
  BackupsModule,
  DataExportModule,
  TwoFactorModule,
  InvitationsModule,
  PasswordResetsModule,
  SetupModule,
  ImportsModule,
  PaymentsModule,
  TextsModule,
  MetricsModule,
];

@Module({})
export class AppModule {
  static register(cfg: AppConfig): DynamicModule {
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot(cfg),
        ClockModule,
        RedisModule,
        LiveUpdatesModule,
        TasksModule,
        ScheduleModule.forRoot(),
        PaymentProviderModule,
        TextProviderModule,
        EventEmitterModule.forRoot(),
        DbModule,
        AuthCoreModule,
        ...FEATURES,
        SeedModule,
      ],
      controllers: [HealthController],
      providers: [DiskSpace],
    };
  }
}
