import { Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { TorqueEntryRequestSchema, WorkEntryRequestSchema, type TorqueEntryRequest, type WorkEntryRequest } from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { WorkLogService } from './work-log.service';

@ApiTags('work-log')
@Controller('jobs/:id')
export class WorkLogController {
  constructor(private readonly log: WorkLogService) {}

  @Get('work-entries')
  @Can('work_log.view')
  listWork(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.log.listWork(user, id);
  }

  @Post('work-entries')
  @Can('work_log.record')
  addWork(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(WorkEntryRequestSchema) body: WorkEntryRequest) {
    return this.log.addWork(user, id, body);
  }

  @Delete('work-entries/:entryId')
  @Can('work_log.record')
  @HttpCode(204)
  deleteWork(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Param('entryId', ParseIntPipe) entryId: number) {
    this.log.deleteWork(user, id, entryId);
  }

  @Get('torque-entries')
  @Can('work_log.view')
  listTorque(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.log.listTorque(user, id);
  }

  @Post('torque-entries')
  @Can('work_log.record')
  addTorque(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(TorqueEntryRequestSchema) body: TorqueEntryRequest) {
    return this.log.addTorque(user, id, body);
  }
}
