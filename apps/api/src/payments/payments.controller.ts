import { Controller, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { RecordPaymentRequestSchema, RefundRequestSchema, type RecordPaymentRequest, type RefundRequest } from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { PaymentsService } from './payments.service';

@ApiTags('payments')
@Controller('jobs/:jobId/payments')
export class PaymentsController {
  constructor(private readonly payments: PaymentsService) {}

  /** The balance and every payment and refund of the job. */
  @Get()
  @Can('payments.view')
  list(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number) {
    return this.payments.forJob(user, jobId);
  }

  /** Money taken at the counter (card terminal, cash, bank transfer). */
  @Post()
  @HttpCode(201)
  @Can('payments.record')
  record(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @ZodBody(RecordPaymentRequestSchema) body: RecordPaymentRequest) {
    return this.payments.recordInShop(user, jobId, body);
  }

  @Post(':paymentId/refunds')
  @HttpCode(201)
  @Can('payments.refund')
  refund(
    @CurrentUser() user: AuthUser,
    @Param('jobId', ParseIntPipe) jobId: number,
    @Param('paymentId', ParseIntPipe) paymentId: number,
    @ZodBody(RefundRequestSchema) body: RefundRequest,
  ) {
    return this.payments.refund(user, jobId, paymentId, body);
  }
}
