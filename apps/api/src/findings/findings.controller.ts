import { Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  CreateFindingRequestSchema,
  RecommendationRequestSchema,
  RecordDecisionRequestSchema,
  UpdateFindingRequestSchema,
  type CreateFindingRequest,
  type RecommendationRequest,
  type RecordDecisionRequest,
  type UpdateFindingRequest,
} from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { FindingsService } from './findings.service';

@ApiTags('findings')
@Controller('jobs/:id')
export class FindingsController {
  constructor(private readonly findings: FindingsService) {}

  @Get('findings')
  @Can('findings.view')
  list(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.findings.list(user, id);
  }

  @Post('findings')
  @Can('findings.edit')
  create(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(CreateFindingRequestSchema) body: CreateFindingRequest) {
    return this.findings.create(user, id, body);
  }

  @Patch('findings/:findingId')
  @Can('findings.edit')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @Param('findingId', ParseIntPipe) findingId: number,
    @ZodBody(UpdateFindingRequestSchema) body: UpdateFindingRequest,
  ) {
    return this.findings.update(user, id, findingId, body);
  }

  @Delete('findings/:findingId')
  @Can('findings.edit')
  @HttpCode(204)
  remove(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Param('findingId', ParseIntPipe) findingId: number) {
    this.findings.delete(user, id, findingId);
  }

  /** Create or replace; prices at the shop's current rates. Desk may price too (it builds the estimate). */
  @Post('findings/:findingId/recommendation')
  @Can('findings.recommend')
  setRecommendation(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @Param('findingId', ParseIntPipe) findingId: number,
    @ZodBody(RecommendationRequestSchema) body: RecommendationRequest,
  ) {
    return this.findings.setRecommendation(user, id, findingId, body);
  }

  @Get('estimate')
  @Can('findings.view')
  estimate(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.findings.estimate(user, id);
  }

  @Post('recommendations/:recId/decision')
  @Can('recommendations.decide')
  decide(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @Param('recId', ParseIntPipe) recId: number,
    @ZodBody(RecordDecisionRequestSchema) body: RecordDecisionRequest,
  ) {
    return this.findings.recordDecision(user, id, recId, body);
  }
}
