import { Controller, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
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
import { ZodBody, ZodQuery } from '../core/http';
import { JobsService } from './jobs.service';

@ApiTags('jobs')
@Controller('jobs')
export class JobsController {
  constructor(private readonly jobs: JobsService) {}

  @Get()
  @Can('jobs.view')
  list(@CurrentUser() user: AuthUser, @ZodQuery(JobListQuerySchema) query: JobListQuery) {
    return this.jobs.list(user, query);
  }

  /** Book-in: existing or new customer and bike, in one transaction. */
  @Post()
  @Can('jobs.book_in')
  bookIn(@CurrentUser() user: AuthUser, @ZodBody(BookInRequestSchema) body: BookInRequest) {
    return this.jobs.bookIn(user, body);
  }

  @Get(':id')
  @Can('jobs.view')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.jobs.get(user, id);
  }

  @Patch(':id')
  @Can('jobs.edit')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(UpdateJobRequestSchema) body: UpdateJobRequest) {
    return this.jobs.update(user, id, body);
  }

  @Post(':id/transitions')
  @Can('jobs.transition')
  @HttpCode(200)
  transition(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(TransitionRequestSchema) body: TransitionRequest) {
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
  finalCheck(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(FinalCheckRequestSchema) body: FinalCheckRequest) {
    return this.jobs.recordFinalCheck(user, id, body);
  }
}
