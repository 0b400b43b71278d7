export { WorkLogModule } from './work-log.module';
export { WorkLogService } from './work-log.service';
