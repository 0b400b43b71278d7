import { Controller, Get, Header, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ImportRequestSchema, type ImportRequest } from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { ImportsService } from './imports.service';

@ApiTags('imports')
@Controller()
export class ImportsController {
  constructor(private readonly imports: ImportsService) {}

  /** What the file would do with this column mapping (or the suggested one): nothing is written. */
  @Post('imports/customers/preview')
  @Can('customers.import')
  @HttpCode(200)
  preview(@CurrentUser() user: AuthUser, @ZodBody(ImportRequestSchema) body: ImportRequest) {
    return this.imports.preview(user, body.csv, body.mapping);
  }

  @Post('imports/customers')
  @Can('customers.import')
  commit(@CurrentUser() user: AuthUser, @ZodBody(ImportRequestSchema) body: ImportRequest) {
    return this.imports.commit(user, body.csv, body.mapping);
  }

  @Get('imports/customers.csv')
  @Can('customers.import')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="customers.csv"')
  export(@CurrentUser() user: AuthUser): string {
    return this.imports.exportCsv(user);
  }
}
