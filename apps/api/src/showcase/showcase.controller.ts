import { Controller, Get, HttpCode, Param, ParseIntPipe, Patch, Post, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import {
  ShowcaseExportQuerySchema,
  ShowcaseQuerySchema,
  ShowcaseZipRequestSchema,
  UpdateShowcaseItemRequestSchema,
  type ShowcaseExportQuery,
  type ShowcaseQuery,
  type ShowcaseZipRequest,
  type UpdateShowcaseItemRequest,
} from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody, ZodQuery } from '../core/http';
import { ShowcaseExportTasks } from './showcase-export-tasks.service';
import { ShowcaseExportService } from './showcase-export.service';
import { ShowcaseService } from './showcase.service';

@ApiTags('showcase')
@Controller('showcase')
export class ShowcaseController {
  constructor(
    private readonly showcase: ShowcaseService,
    private readonly exports: ShowcaseExportService,
    private readonly tasks: ShowcaseExportTasks,
  ) {}

  @Get('items')
  @Can('showcase.view')
  list(@CurrentUser() user: AuthUser, @ZodQuery(ShowcaseQuerySchema) q: ShowcaseQuery) {
    return this.showcase.list(user, q);
  }

  @Patch('items/:pairId')
  @Can('showcase.manage')
  update(
    @CurrentUser() user: AuthUser,
    @Param('pairId', ParseIntPipe) pairId: number,
    @ZodBody(UpdateShowcaseItemRequestSchema) body: UpdateShowcaseItemRequest,
  ) {
    return this.showcase.update(user, pairId, body);
  }

  @Get('items/:pairId/caption-draft')
  @Can('showcase.manage')
  draft(@CurrentUser() user: AuthUser, @Param('pairId', ParseIntPipe) pairId: number) {
    return { caption: this.showcase.draft(user, pairId) };
  }

  /** One image made on request (small): a composed pair or one shot, at a named size. */
  @Get('items/:pairId/export')
  @Can('showcase.view')
  async file(
    @CurrentUser() user: AuthUser,
    @Param('pairId', ParseIntPipe) pairId: number,
    @ZodQuery(ShowcaseExportQuerySchema) q: ShowcaseExportQuery,
    @Res() res: Response,
  ) {
    const f = await this.exports.file(user, pairId, q);
    res.set({ 'Content-Type': 'image/jpeg', 'Content-Disposition': `attachment; filename="${f.name}"`, 'Cache-Control': 'no-store' }).send(f.data);
  }

  /** A zip of a selection, streamed as it is made. */
  @Post('zip')
  @HttpCode(200)
  @Can('showcase.view')
  async zip(@CurrentUser() user: AuthUser, @ZodBody(ShowcaseZipRequestSchema) body: ShowcaseZipRequest, @Res() res: Response) {
    for (const item of body.items) this.showcase.clear(user, item.pairId);
    res.set({ 'Content-Type': 'application/zip', 'Content-Disposition': 'attachment; filename="showcase.zip"', 'Cache-Control': 'no-store' });
    await this.exports.streamZip(user, body, res).catch(() => undefined);
  }

  /** A large selection as a background task with progress. */
  @Post('exports')
  @Can('showcase.view')
  start(@CurrentUser() user: AuthUser, @ZodBody(ShowcaseZipRequestSchema) body: ShowcaseZipRequest) {
    return this.tasks.start(user, body);
  }

  @Get('exports/:key')
  @Can('showcase.view')
  status(@CurrentUser() user: AuthUser, @Param('key') key: string) {
    return this.tasks.status(user, key);
  }

  @Get('exports/:key/download')
  @Can('showcase.view')
  async download(@CurrentUser() user: AuthUser, @Param('key') key: string, @Res() res: Response) {
    const stream = await this.tasks.download(user, key);
    res.set({ 'Content-Type': 'application/zip', 'Content-Disposition': 'attachment; filename="showcase.zip"' });
    stream.pipe(res);
  }

  /** What was exported from a job's items: the take-down list after a revocation. */
  @Get('jobs/:jobId/downloads')
  @Can('showcase.manage')
  downloads(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number) {
    return this.showcase.downloads(user, jobId);
  }
}
