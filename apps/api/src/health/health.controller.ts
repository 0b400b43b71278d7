import { Controller, Get, Inject } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { sql } from 'drizzle-orm';
import { Public } from '../core/auth';
import { DB, type Db } from '../core/db';
import { DomainError } from '../core/http';
import { TASK_RUNNER, type TaskRunner, type TaskRunnerHealth } from '../infra/tasks';

type Check = { ok: boolean; error?: string };

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    @Inject(DB) private readonly db: Db,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
  ) {}

  /** Liveness: the process answers. */
  @Get()
  @Public()
  health() {
    return { status: 'ok' };
  }

  /** Readiness (for a load balancer or orchestrator): the database answers and the task runner is polling. 503 NOT_READY otherwise. */
  @Get('ready')
  @Public()
  ready() {
    const checks = { database: this.database(), tasks: this.runner() };
    if (!checks.database.ok || !checks.tasks.ok) throw new DomainError('NOT_READY', undefined, checks);
    return { status: 'ready', checks };
  }

  private database(): Check {
    try {
      this.db.get(sql`select 1`);
      return { ok: true };
    } catch (err) {
      return { ok: false, error: (err as Error).message };
    }
  }

  private runner(): Check & Partial<TaskRunnerHealth> {
    try {
      return this.tasks.health?.() ?? { ok: true };
    } catch (err) {
      return { ok: false, error: (err as Error).message };
    }
  }
}
