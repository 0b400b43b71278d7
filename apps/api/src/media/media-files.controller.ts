import { Controller, Get, Headers, HttpCode, Param, ParseIntPipe, Post, Res } from '@nestjs/common';
import { ApiParam, ApiTags } from '@nestjs/swagger';
import { MEDIA_VARIANTS, MediaVariantSchema, type MediaVariant } from '@benchproof/contracts';
import type { Response } from 'express';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { zod } from '../core/http';
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
  original(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Headers() h: Record<string, string | undefined>, @Res() res: Response) {
    return this.send(user, id, 'original', h, res);
  }

  @Get(':id/:variant')
  @Can('media.view')
  @ApiParam({ name: 'variant', enum: MEDIA_VARIANTS })
  variant(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @Param('variant', zod(MediaVariantSchema)) variant: MediaVariant,
    @Headers() h: Record<string, string | undefined>,
    @Res() res: Response,
  ) {
    return this.send(user, id, variant, h, res);
  }

  /** Removes the files of a soft-deleted asset for good (manager only; audited). */
  @Post(':id/purge')
  @Can('media.purge')
  @HttpCode(204)
  purge(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.media.purge(user, id);
  }

  private async send(user: AuthUser, id: number, variant: MediaVariant | 'original', h: Record<string, string | undefined>, res: Response): Promise<void> {
    const reply = await this.files.open(user, id, variant, { range: h.range, ifNoneMatch: h['if-none-match'] });
    // writeHead adds these to what the middleware already set, without Express's per-header work.
    res.writeHead(reply.status, reply.headers);
    if (!reply.body || Buffer.isBuffer(reply.body)) {
      res.end(reply.body ?? undefined);
      return;
    }
    reply.body.on('error', () => res.destroy());
    reply.body.pipe(res);
  }
}
