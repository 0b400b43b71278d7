import { Controller, Get, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  BikeListQuerySchema,
  BikeInputSchema,
  UpdateBikeRequestSchema,
  type BikeListQuery,
  type BikeInput,
  type UpdateBikeRequest,
} from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody, ZodQuery } from '../core/http';
import { BikesService } from './bikes.service';

@ApiTags('bikes')
@Controller('bikes')
export class BikesController {
  constructor(private readonly bikes: BikesService) {}

  @Get()
  @Can('bikes.view')
  list(@CurrentUser() user: AuthUser, @ZodQuery(BikeListQuerySchema) query: BikeListQuery) {
    return this.bikes.list(user, query);
  }

  @Post()
  @Can('bikes.edit')
  create(@CurrentUser() user: AuthUser, @ZodBody(BikeInputSchema) body: BikeInput) {
    return this.bikes.create(user, body);
  }

  @Get(':id')
  @Can('bikes.view')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.bikes.get(user, id);
  }

  @Patch(':id')
  @Can('bikes.edit')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(UpdateBikeRequestSchema) body: UpdateBikeRequest) {
    return this.bikes.update(user, id, body);
  }
}

@ApiTags('customers')
@Controller('customers/:id/bikes')
export class CustomerBikesController {
  constructor(private readonly bikes: BikesService) {}

  @Get()
  @Can('bikes.view')
  list(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.bikes.listForCustomer(user, id);
  }
}
