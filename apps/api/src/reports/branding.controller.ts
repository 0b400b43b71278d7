import { Controller, Delete, Get, Post, Res, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ApiZodForm } from '../core/http';
import { BrandingService } from './branding.service';

/** The shop's report logo (manager settings); lives with reports because it goes through the media intake. */
@ApiTags('shop')
@Controller('shop/logo')
export class BrandingController {
  constructor(private readonly branding: BrandingService) {}

  @Post()
  @Can('shop.edit')
  @UseInterceptors(FileInterceptor('file'))
  @ApiZodForm({ field: 'file' })
  upload(@CurrentUser() user: AuthUser, @UploadedFile() file: Express.Multer.File | undefined) {
    return this.branding.setLogo(user, file && { path: file.path, originalName: file.originalname, size: file.size });
  }

  @Delete()
  @Can('shop.edit')
  remove(@CurrentUser() user: AuthUser) {
    return this.branding.removeLogo(user);
  }

  @Get()
  @Can('shop.view')
  get(@CurrentUser() user: AuthUser, @Res() res: Response) {
    const logo = this.branding.logo(user);
    res.set({ 'Content-Type': 'image/jpeg', ETag: `"${logo.sha256}"`, 'Cache-Control': 'private, max-age=3600' });
    logo.stream.on('error', () => res.destroy());
    logo.stream.pipe(res);
  }
}
