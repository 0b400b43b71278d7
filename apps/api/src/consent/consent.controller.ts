import { Controller, Get, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { RecordConsentRequestSchema, type RecordConsentRequest } from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { ConsentService } from './consent.service';

@ApiTags('consent')
@Controller('jobs/:jobId/consent')
export class ConsentController {
  constructor(private readonly consent: ConsentService) {}

  @Get()
  @Can('consent.view')
  status(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number) {
    return this.consent.status(user, jobId);
  }

  /** Desk or manager record a consent the owner gave (or withdrew) in person. */
  @Post()
  @Can('consent.record')
  record(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @ZodBody(RecordConsentRequestSchema) body: RecordConsentRequest) {
    return this.consent.recordInPerson(user, jobId, body);
  }
}
