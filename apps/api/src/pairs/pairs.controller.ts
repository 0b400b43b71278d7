import { Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post, Put } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  CreatePairRequestSchema,
  ReorderPairsRequestSchema,
  UpdatePairRequestSchema,
  type CreatePairRequest,
  type ReorderPairsRequest,
  type UpdatePairRequest,
} from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { PairsService } from './pairs.service';

@ApiTags('pairs')
@Controller('jobs/:id')
export class PairsController {
  constructor(private readonly pairs: PairsService) {}

  @Get('pairs')
  @Can('pairs.view')
  list(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.pairs.list(user, id);
  }

  @Get('pair-suggestions')
  @Can('pairs.view')
  suggestions(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.pairs.suggestions(user, id);
  }

  @Post('pairs')
  @Can('pairs.edit')
  create(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(CreatePairRequestSchema) body: CreatePairRequest) {
    return this.pairs.create(user, id, body);
  }

  @Put('pairs/order')
  @Can('pairs.edit')
  reorder(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(ReorderPairsRequestSchema) body: ReorderPairsRequest) {
    return this.pairs.reorder(user, id, body);
  }

  @Patch('pairs/:pairId')
  @Can('pairs.edit')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIntPipe) id: number,
    @Param('pairId', ParseIntPipe) pairId: number,
    @ZodBody(UpdatePairRequestSchema) body: UpdatePairRequest,
  ) {
    return this.pairs.update(user, id, pairId, body);
  }

  @Delete('pairs/:pairId')
  @HttpCode(204)
  @Can('pairs.edit')
  remove(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Param('pairId', ParseIntPipe) pairId: number) {
    this.pairs.delete(user, id, pairId);
  }
}
