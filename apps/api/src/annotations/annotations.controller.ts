import { Controller, Get, Param, ParseIntPipe, Post, Put, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  AnnotatedSizeSchema,
  ChainFromPhotoSchema,
  SaveAnnotationSchema,
  type AnnotatedSize,
  type ChainFromPhotoRequest,
  type SaveAnnotationRequest,
} from '@benchproof/contracts';
import type { Request, Response } from 'express';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { sendFile, ZodBody, ZodParam } from '../core/http';
import { AnnotationFilesService } from './annotation-files.service';
import { AnnotationsService } from './annotations.service';

@ApiTags('annotations')
@Controller()
export class AnnotationsController {
  constructor(
    private readonly annotations: AnnotationsService,
    private readonly files: AnnotationFilesService,
  ) {}

  @Get('annotations/:mediaId')
  @Can('media.view')
  get(@CurrentUser() user: AuthUser, @Param('mediaId', ParseIntPipe) mediaId: number) {
    return this.annotations.get(user, mediaId);
  }

  /** Autosave: every save is a new version; the original photo is never changed. */
  @Put('annotations/:mediaId')
  @Can('annotations.edit')
  save(@CurrentUser() user: AuthUser, @Param('mediaId', ParseIntPipe) mediaId: number, @ZodBody(SaveAnnotationSchema) body: SaveAnnotationRequest) {
    return this.annotations.save(user, mediaId, body);
  }

  @Post('annotations/:mediaId/chain-reading')
  @Can('inspection.record')
  chain(@CurrentUser() user: AuthUser, @Param('mediaId', ParseIntPipe) mediaId: number, @ZodBody(ChainFromPhotoSchema) body: ChainFromPhotoRequest) {
    return this.annotations.chainReading(user, mediaId, body);
  }

  /** The annotated JPEG (blur boxes pixelated, shapes burned in); the plain derivative when not annotated. */
  @Get('media/:id/annotated/:size')
  @Can('media.view')
  async annotated(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @ZodParam('size', AnnotatedSizeSchema) size: AnnotatedSize,
    @Req() req: Request,
    @Res() res: Response,
  ): Promise<void> {
    await sendFile(req, res, await this.files.open(user.shopId, id, size));
  }
}
