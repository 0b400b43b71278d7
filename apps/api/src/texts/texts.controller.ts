import { Controller, Get, Param, ParseIntPipe } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { TextsService } from './texts.service';

/** Desk's view of the texts: every text of a job, or of a customer, with where it got to. */
@ApiTags('texts')
@Controller()
export class TextsController {
  constructor(private readonly texts: TextsService) {}

  @Get('jobs/:jobId/texts')
  @Can('owner_links.view')
  forJob(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number) {
    return this.texts.listForJob(user, jobId);
  }

  @Get('customers/:customerId/texts')
  @Can('customers.view')
  forCustomer(@CurrentUser() user: AuthUser, @Param('customerId', ParseIntPipe) customerId: number) {
    return this.texts.listForCustomer(user, customerId);
  }
}
