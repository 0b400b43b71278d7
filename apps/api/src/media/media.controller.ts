import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  ParseIntPipe,
  Patch,
  Post,
  Put,
  Res,
  UploadedFile,
  UploadedFiles,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor, FilesInterceptor } from '@nestjs/platform-express';
import { ApiTags } from '@nestjs/swagger';
import {
  FindingMediaRequestSchema,
  MediaListQuerySchema,
  RetagOneRequestSchema,
  RetagRequestSchema,
  UploadMetaSchema,
  type FindingMediaRequest,
  type MediaListQuery,
  type RetagOneRequest,
  type RetagRequest,
} from '@benchproof/contracts';
import type { Response } from 'express';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ApiZodForm, ZodBody, ZodQuery } from '../core/http';
import { MediaUploadService } from './media-upload.service';
import { MediaService } from './media.service';
import { MAX_FILES_PER_BATCH, toIncoming } from './upload-form';

@ApiTags('media')
@Controller()
export class MediaController {
  constructor(
    private readonly media: MediaService,
    private readonly uploads: MediaUploadService,
  ) {}

  /** Several files in `files` plus the tags; 201 all stored, 207 some stored (see UploadBatchResult). */
  @Post('jobs/:jobId/media')
  @Can('media.upload')
  @UseInterceptors(FilesInterceptor('files', MAX_FILES_PER_BATCH))
  @ApiZodForm({ field: 'files', many: true }, UploadMetaSchema)
  async upload(
    @CurrentUser() user: AuthUser,
    @Param('jobId') jobId: string,
    @UploadedFiles() files: Express.Multer.File[] | undefined,
    @Body() fields: unknown,
    @Res({ passthrough: true }) res: Response,
  ) {
    const { status, body } = await this.uploads.uploadBatch(user, jobId, (files ?? []).map(toIncoming), fields);
    res.status(status);
    return body;
  }

  @Get('jobs/:jobId/media')
  @Can('media.view')
  list(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @ZodQuery(MediaListQuerySchema) q: MediaListQuery) {
    return this.media.list(user, jobId, q);
  }

  @Patch('jobs/:jobId/media')
  @Can('media.edit')
  retag(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @ZodBody(RetagRequestSchema) body: RetagRequest) {
    return this.media.retag(user, jobId, body);
  }

  @Get('jobs/:jobId/media/:id')
  @Can('media.view')
  get(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @Param('id', ParseIntPipe) id: number) {
    return this.media.get(user, jobId, id);
  }

  @Patch('jobs/:jobId/media/:id')
  @Can('media.edit')
  retagOne(
    @CurrentUser() user: AuthUser,
    @Param('jobId', ParseIntPipe) jobId: number,
    @Param('id', ParseIntPipe) id: number,
    @ZodBody(RetagOneRequestSchema) body: RetagOneRequest,
  ) {
    return this.media.retagOne(user, jobId, id, body);
  }

  @Delete('jobs/:jobId/media/:id')
  @Can('media.edit')
  @HttpCode(204)
  remove(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @Param('id', ParseIntPipe) id: number): void {
    this.media.softDelete(user, jobId, id);
  }

  /** The poster frame of a video, captured in the browser (field `file`, an image). */
  @Put('jobs/:jobId/media/:id/poster')
  @Can('media.upload')
  @UseInterceptors(FileInterceptor('file'))
  @ApiZodForm({ field: 'file' })
  poster(@CurrentUser() user: AuthUser, @Param('jobId') jobId: string, @Param('id') id: string, @UploadedFile() file: Express.Multer.File | undefined) {
    return this.uploads.setPoster(user, jobId, id, file && toIncoming(file));
  }

  @Get('jobs/:jobId/findings/:findingId/media')
  @Can('media.view')
  findingMedia(@CurrentUser() user: AuthUser, @Param('jobId', ParseIntPipe) jobId: number, @Param('findingId', ParseIntPipe) findingId: number) {
    return this.media.findingMedia(user, jobId, findingId);
  }

  @Put('jobs/:jobId/findings/:findingId/media')
  @Can('media.edit')
  linkFindingMedia(
    @CurrentUser() user: AuthUser,
    @Param('jobId', ParseIntPipe) jobId: number,
    @Param('findingId', ParseIntPipe) findingId: number,
    @ZodBody(FindingMediaRequestSchema) body: FindingMediaRequest,
  ) {
    return this.media.linkToFinding(user, jobId, findingId, body.assetIds);
  }
}
