import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { BackupsService } from './backups.service';

@ApiTags('backups')
@Controller('backups')
export class BackupsController {
  constructor(private readonly backups: BackupsService) {}

  @Get()
  @Can('backups.manage')
  list() {
    return this.backups.list();
  }

  @Post()
  @HttpCode(201)
  @Can('backups.manage')
  run(@CurrentUser() user: AuthUser) {
    return this.backups.runNow(user);
  }
}
