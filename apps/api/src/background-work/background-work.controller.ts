import { Controller, Get, HttpCode, Inject, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { FailedWork } from '@benchproof/contracts';
import { AuditService } from '../audit';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { notFound } from '../core/http';
import { TASK_RUNNER, type FailedTask, type TaskRunner } from '../infra/tasks';
import { WorkJobsRepository, type WorkJob } from './work-jobs.repository';

const toDto = (t: FailedTask, job: WorkJob | null): FailedWork => ({
  id: t.id,
  kind: t.kind,
  key: t.key,
  jobId: job?.jobId ?? null,
  jobNumber: job?.jobNumber ?? null,
  attempts: t.attempts,
  lastError: t.lastError,
  nextTryAt: t.nextRunAt,
  failedAt: t.updatedAt,
});

/** The manager's view of failed background work of the shop, and "run it again". */
@ApiTags('background-work')
@Controller('background-work')
export class BackgroundWorkController {
  constructor(
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    private readonly audit: AuditService,
    private readonly jobs: WorkJobsRepository,
  ) {}

  @Get('failed')
  @Can('work.retry')
  failed(@CurrentUser() user: AuthUser): FailedWork[] {
    return (this.tasks.failed?.(user.shopId) ?? []).map((t) => toDto(t, this.jobs.jobOf(user.shopId, t.kind, t.key)));
  }

  /** Queues the failed task again at once with fresh attempts (a failed report draft renders again; derivatives are made). */
  @Post('failed/:id/retry')
  @HttpCode(202)
  @Can('work.retry')
  retry(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number): { queued: true } {
    if (!this.tasks.retry?.(user.shopId, id)) throw notFound('Failed task');
    this.audit.record(user, { action: 'work.retried', entityType: 'task', entityId: id });
    return { queued: true };
  }
}
