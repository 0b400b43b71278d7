import { Controller, Get, HttpCode, Param, ParseIntPipe, Post, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { MediaVariantSchema, type MediaVariant } from '@benchproof/contracts';
import type { Request, Response } from 'express';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { sendFile, ZodParam } from '../core/http';
import { MediaFilesService } from './media-files.service';
import { MediaService } from './media.service';

/** The bytes of media, for <img> and <video> tags: authorised by the session cookie. */
@ApiTags('media')
@Controller('media')
export class MediaFilesController {
  constructor(
    private readonly files: MediaFilesService,
    private readonly media: MediaService,
  ) {}

  @Get(':id/original')
  @Can('media.view')
  async original(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Req() req: Request, @Res() res: Response) {
    await sendFile(req, res, await this.files.open(user, id, 'original'));
  }

  @Get(':id/:variant')
  @Can('media.view')
  async variant(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @ZodParam('variant', MediaVariantSchema) variant: MediaVariant,
    @Req() req: Request,
    @Res() res: Response,
  ) {
    await sendFile(req, res, await this.files.open(user, id, variant));
  }

  /** Removes the files of a soft-deleted asset for good (manager only; audited). */
  @Post(':id/purge')
  @Can('media.purge')
  @HttpCode(204)
  purge(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.media.purge(user, id);
  }
}
