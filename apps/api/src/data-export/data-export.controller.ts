import { Controller, Get, HttpCode, Param, ParseIntPipe, Post, Res } from '@nestjs/common';
import { EraseCustomerRequestSchema, type EraseCustomerRequest } from '@benchproof/contracts';
import { ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { CustomerErasureService } from './customer-erasure.service';
import { DataExportService } from './data-export.service';

/** Streams a zip to the client; a client that goes away stops the export (and frees its snapshot). */
async function sendZip(res: Response, file: { stream: Readable; filename: string }): Promise<void> {
  res.set({ 'Content-Type': 'application/zip', 'Content-Disposition': `attachment; filename="${file.filename}"`, 'Cache-Control': 'no-store' });
  await pipeline(file.stream, res).catch(() => file.stream.destroy());
}

@ApiTags('data-export')
@Controller()
export class DataExportController {
  constructor(
    private readonly exports: DataExportService,
    private readonly erasure: CustomerErasureService,
  ) {}

  /** Everything of the shop: records as JSON, original media, issued reports, manifest of SHA-256 sums. */
  @Get('shop/export')
  @Can('shop.export')
  async shop(@CurrentUser() user: AuthUser, @Res() res: Response) {
    await sendZip(res, this.exports.shop(user));
  }

  /** One customer's own data (their bikes, jobs, photos, reports), when they ask for it. */
  @Get('customers/:id/export')
  @Can('customers.export')
  async customer(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Res() res: Response) {
    await sendZip(res, this.exports.customer(user, id));
  }

  /** Erasure on request: personal data removed, consent withdrawn, the erasure audited without the erased data. */
  @Post('customers/:id/erase')
  @HttpCode(200)
  @Can('customers.erase')
  erase(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(EraseCustomerRequestSchema) body: EraseCustomerRequest) {
    return this.erasure.erase(user, id, body.confirmCustomerId);
  }
}
