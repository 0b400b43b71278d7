import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  BookInRequestSchema,
  FinalCheckRequestSchema,
  JobListQuerySchema,
  TransitionRequestSchema,
  UpdateJobRequestSchema,
  type BookInRequest,
  type FinalCheckRequest,
  type JobListQuery,
  type TransitionRequest,
  type UpdateJobRequest,
} from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ApiZodBody, ApiZodQuery, zod } from '../core/http';
import { JobsService } from './jobs.service';

@ApiTags('jobs')
@Controller('jobs')
export class JobsController {
  constructor(private readonly jobs: JobsService) {}

  @Get()
  @Can('jobs.view')
  @ApiZodQuery(JobListQuerySchema)
  list(@CurrentUser() user: AuthUser, @Query(zod(JobListQuerySchema)) query: JobListQuery) {
    return this.jobs.list(user, query);
  }

  /** Book-in: existing or new customer and bike, in one transaction. */
  @Post()
  @Can('jobs.book_in')
  @ApiZodBody(BookInRequestSchema)
  bookIn(@CurrentUser() user: AuthUser, @Body(zod(BookInRequestSchema)) body: BookInRequest) {
    return this.jobs.bookIn(user, body);
  }

  @Get(':id')
  @Can('jobs.view')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.jobs.get(user, id);
  }

  @Patch(':id')
  @Can('jobs.edit')
  @ApiZodBody(UpdateJobRequestSchema)
  update(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body(zod(UpdateJobRequestSchema)) body: UpdateJobRequest) {
    return this.jobs.update(user, id, body);
  }

  @Post(':id/transitions')
  @Can('jobs.transition')
  @HttpCode(200)
  @ApiZodBody(TransitionRequestSchema)
  transition(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body(zod(TransitionRequestSchema)) body: TransitionRequest) {
    return this.jobs.transition(user, id, body);
  }

  @Get(':id/events')
  @Can('jobs.view')
  events(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.jobs.events(user, id);
  }

  /** The final check belongs to the job's flow: ready needs a passed one. */
  @Post(':id/final-check')
  @Can('jobs.final_check')
  @ApiZodBody(FinalCheckRequestSchema)
  finalCheck(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body(zod(FinalCheckRequestSchema)) body: FinalCheckRequest) {
    return this.jobs.recordFinalCheck(user, id, body);
  }
}
