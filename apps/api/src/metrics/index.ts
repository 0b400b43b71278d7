export { MetricsModule } from './metrics.module';
export { MetricsService } from './metrics.service';
