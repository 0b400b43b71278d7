import { Controller, Get, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import { VerifyHashSchema } from '@benchproof/contracts';
import { Public } from '../core/auth';
import { ZodParam } from '../core/http';
import { ReportsService } from './reports.service';

/** Per client IP and minute: enough for a warranty desk checking a pile, too few to walk the hash space. */
export const VERIFY_LIMIT_PER_MINUTE = 30;

/** Public: anyone holding a report may ask whether we issued it, and learns nothing else. */
@ApiTags('verify')
@Controller('verify')
export class VerifyController {
  constructor(private readonly reports: ReportsService) {}

  @Get(':hash')
  @Public()
  @UseGuards(ThrottlerGuard)
  @Throttle({ default: { limit: VERIFY_LIMIT_PER_MINUTE, ttl: 60_000 } })
  verify(@ZodParam('hash', VerifyHashSchema) hash: string) {
    return this.reports.verify(hash);
  }
}
