import { Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { MeasurementInputSchema, UpdateCheckpointRequestSchema, type MeasurementInputDto, type UpdateCheckpointRequest } from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { BikeHistoryService } from './bike-history.service';
import { InspectionService } from './inspection.service';

@ApiTags('inspection')
@Controller('jobs/:id')
export class InspectionController {
  constructor(private readonly inspection: InspectionService) {}

  @Get('inspection')
  @Can('inspection.view')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.inspection.get(user, id);
  }

  @Patch('checkpoints/:checkpointId')
  @Can('inspection.record')
  updateCheckpoint(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @Param('checkpointId', ParseIntPipe) checkpointId: number,
    @ZodBody(UpdateCheckpointRequestSchema) body: UpdateCheckpointRequest,
  ) {
    return this.inspection.updateCheckpoint(user, id, checkpointId, body);
  }

  @Post('checkpoints/:checkpointId/measurements')
  @Can('inspection.record')
  addMeasurement(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @Param('checkpointId', ParseIntPipe) checkpointId: number,
    @ZodBody(MeasurementInputSchema) body: MeasurementInputDto,
  ) {
    return this.inspection.addMeasurement(user, id, checkpointId, body);
  }

  /** The verdict as the mechanic types: this bike's speeds, this shop's limits, nothing stored. */
  @Post('measurements/preview')
  @Can('inspection.view')
  @HttpCode(200)
  preview(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(MeasurementInputSchema) body: MeasurementInputDto) {
    return this.inspection.preview(user, id, body);
  }

  @Delete('measurements/:measurementId')
  @Can('inspection.record')
  @HttpCode(204)
  deleteMeasurement(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Param('measurementId', ParseIntPipe) measurementId: number) {
    this.inspection.deleteMeasurement(user, id, measurementId);
  }
}

@ApiTags('bikes')
@Controller('bikes/:id/history')
export class BikeHistoryController {
  constructor(private readonly history: BikeHistoryService) {}

  /** Visits of the bike and its wear trend (lives here: the trend is made of inspection measurements). */
  @Get()
  @Can('inspection.view')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.history.history(user, id);
  }
}
