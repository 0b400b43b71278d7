import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../core/auth';

@ApiTags('health')
@Controller('health')
export class HealthController {
  @Get()
  @Public()
  health() {
    return { status: 'ok' };
  }
}
