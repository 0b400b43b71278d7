import { Controller, Get, HttpCode, Param, ParseIntPipe, Post, Query, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { IssueReportRequestSchema, SendReportRequestSchema, type IssueReportRequest, type SendReportRequest } from '@benchproof/contracts';
import type { Request, Response } from 'express';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { notFound, sendFile, ZodBody } from '../core/http';
import { ReportsService } from './reports.service';

/** A job's bench report: drafts to preview, issued versions to keep and send. */
@ApiTags('reports')
@Controller('jobs/:jobId/reports')
export class ReportsController {
  constructor(private readonly reports: ReportsService) {}

  @Get()
  @Can('reports.view')
  list(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number) {
    return this.reports.list(user, jobId);
  }

  /** 202: the draft renders in the background; poll the list for progress. */
  @Post('drafts')
  @Can('reports.issue')
  @HttpCode(202)
  draft(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number) {
    return this.reports.createDraft(user, jobId);
  }

  @Post('issue')
  @Can('reports.issue')
  @HttpCode(202)
  issue(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @ZodBody(IssueReportRequestSchema) body: IssueReportRequest) {
    return this.reports.issue(user, jobId, body.draftId);
  }

  /** Queues the issued report to the owner's e-mail; 202: it goes out through the outbox. */
  @Post(':reportId/send')
  @HttpCode(202)
  @Can('reports.issue')
  send(
    @CurrentUser() user: AuthUser,
    @Param('jobId', ParseIntPipe) jobId: number,
    @Param('reportId', ParseIntPipe) reportId: number,
    @ZodBody(SendReportRequestSchema) body: SendReportRequest,
  ) {
    return this.reports.sendToOwner(user, jobId, reportId, body);
  }

  @Get(':id')
  @Can('reports.view')
  get(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @Param('id', ParseIntPipe) id: number) {
    return this.reports.get(user, jobId, id);
  }

  @Get(':id/pdf')
  @Can('reports.view')
  pdf(
    @CurrentUser() user: AuthUser,
    @Param('jobId', ParseIntPipe) jobId: number,
    @Param('id', ParseIntPipe) id: number,
    @Query('download') download: string | undefined,
    @Req() req: Request,
    @Res() res: Response,
  ) {
    const file = this.reports.pdf(user, jobId, id);
    return sendFile(req, res, {
      size: file.byteSize,
      etag: `"${file.sha256}"`,
      contentType: 'application/pdf',
      cacheControl: 'private, max-age=300',
      disposition: `${download ? 'attachment' : 'inline'}; filename="${file.filename}"`,
      open: file.open,
    });
  }

  /** Page images for browsers without an inline PDF viewer. */
  @Get(':id/pages/:page')
  @Can('reports.view')
  async page(
    @CurrentUser() user: AuthUser,
    @Param('jobId', ParseIntPipe) jobId: number,
    @Param('id', ParseIntPipe) id: number,
    @Param('page') pageParam: string,
    @Res() res: Response,
  ) {
    const page = /^(\d{1,3})\.png$/.exec(pageParam);
    const png = page ? await this.reports.pagePng(user, jobId, id, Number(page[1])) : null;
    if (!png) throw notFound('Page');
    res.set({ 'Content-Type': 'image/png', 'Cache-Control': 'private, max-age=300' }).send(png);
  }
}
