import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { AuditQuerySchema, type AuditQuery } from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodQuery } from '../core/http';
import { AuditService } from './audit.service';

@ApiTags('audit')
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @Can('audit.view')
  list(@CurrentUser() user: AuthUser, @ZodQuery(AuditQuerySchema) q: AuditQuery) {
    return this.audit.list(user.shopId, q.entityType, q.entityId);
  }
}
