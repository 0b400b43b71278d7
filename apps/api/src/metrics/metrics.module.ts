import { Module } from '@nestjs/common';
import { MetricsService } from './metrics.service';

/** Prometheus metrics (off unless METRICS_PORT or METRICS_TOKEN is set); createApp installs them. */
@Module({ providers: [MetricsService], exports: [MetricsService] })
export class MetricsModule {}
