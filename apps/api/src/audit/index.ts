export { AuditModule } from './audit.module';
export { AuditService, type AuditEntry } from './audit.service';
