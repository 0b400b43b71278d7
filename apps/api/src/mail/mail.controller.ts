import { Controller, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { MailService } from './mail.service';

@ApiTags('mail')
@Controller('jobs/:jobId')
export class MailController {
  constructor(private readonly mail: MailService) {}

  /** Every e-mail of the job with its delivery status. */
  @Get('messages')
  @Can('reports.view')
  list(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number) {
    return this.mail.listForJob(user, jobId);
  }

  @Post('messages/:messageId/resend')
  @HttpCode(200)
  @Can('reports.issue')
  resend(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @Param('messageId', ParseIntPipe) messageId: number) {
    return this.mail.resend(user, jobId, messageId);
  }
}
