import { Controller, Get, Inject } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { sql } from 'drizzle-orm';
import { Can, Public } from '../core/auth';
import { DB, type Db } from '../core/db';
import { DomainError } from '../core/http';
import { DiskSpace } from '../infra/disk';
import { TASK_RUNNER, type TaskRunner, type TaskRunnerHealth } from '../infra/tasks';

type Check = { ok: boolean; error?: string };

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    @Inject(DB) private readonly db: Db,
    @Inject(TASK_RUNNER) private readonly tasks: TaskRunner,
    private readonly disk: DiskSpace,
  ) {}

  /** Liveness: the process answers. */
  @Get()
  @Public()
  health() {
    return { status: 'ok' };
  }

  /**
   * Readiness (for a load balancer or orchestrator): the database answers and the task runner is
   * polling; 503 NOT_READY otherwise. Low free space (DISK_LOW_MB) on the database's or the uploads'
   * disk is reported in `checks.disk` without taking the server out: reads still work on a full disk.
   */
  @Get('ready')
  @Public()
  async ready() {
    const checks = { database: this.database(), tasks: this.runner(), disk: await this.disk.check() };
    if (!checks.database.ok || !checks.tasks.ok) throw new DomainError('NOT_READY', undefined, checks);
    return { status: 'ready', checks };
  }

  /** Free space for the manager's low-space warning in the app. */
  @Get('disk')
  @Can('storage.view')
  diskSpace() {
    return this.disk.check();
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
