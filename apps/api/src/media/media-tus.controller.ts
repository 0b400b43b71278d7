import { Controller, Delete, Get, Param, Patch, Post, Req, Res } from '@nestjs/common';
import { ApiHeader, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { MediaTusService } from './media-tus.service';

/**
 * Resumable uploads (tus 1.0.0) for large videos, delegated to @tus/server. The session
 * cookie authorises them like any route, and POST/PATCH/DELETE carry the CSRF header.
 * HEAD (the tus offset check) reaches the GET route (Express answers HEAD with GET
 * routes) and is passed to tus; a plain GET returns the upload's state as JSON.
 */
@ApiTags('media')
@ApiHeader({ name: 'Tus-Resumable', required: false, description: '1.0.0 on every tus request' })
@Controller('media/tus')
export class MediaTusController {
  constructor(private readonly tus: MediaTusService) {}

  @Post()
  @Can('media.upload')
  @ApiOperation({ summary: 'Create a resumable upload; Upload-Metadata carries jobId, phase, area, source, caption, filename' })
  create(@CurrentUser() user: AuthUser, @Req() req: Request, @Res() res: Response) {
    return this.tus.handle(user, null, req, res);
  }

  @Get(':uploadId')
  @Can('media.upload')
  @ApiOperation({ summary: 'GET: state of the upload (JSON). HEAD: tus offset check.' })
  async state(@CurrentUser() user: AuthUser, @Param('uploadId') uploadId: string, @Req() req: Request, @Res() res: Response) {
    if (req.method === 'HEAD') return this.tus.handle(user, uploadId, req, res);
    res.json(await this.tus.status(user, uploadId));
  }

  @Patch(':uploadId')
  @Can('media.upload')
  @ApiOperation({ summary: 'Append bytes at Upload-Offset (Content-Type: application/offset+octet-stream)' })
  append(@CurrentUser() user: AuthUser, @Param('uploadId') uploadId: string, @Req() req: Request, @Res() res: Response) {
    return this.tus.handle(user, uploadId, req, res);
  }

  @Delete(':uploadId')
  @Can('media.upload')
  @ApiOperation({ summary: 'Abandon an unfinished upload (tus termination)' })
  terminate(@CurrentUser() user: AuthUser, @Param('uploadId') uploadId: string, @Req() req: Request, @Res() res: Response) {
    return this.tus.handle(user, uploadId, req, res);
  }
}
