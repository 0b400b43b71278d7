export { FindingsModule } from './findings.module';
export { FindingsService, type DecisionInput } from './findings.service';
