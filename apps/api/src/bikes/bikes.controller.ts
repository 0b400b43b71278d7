import { Body, Controller, Get, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
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
import { ApiZodBody, ApiZodQuery, zod } from '../core/http';
import { BikesService } from './bikes.service';

@ApiTags('bikes')
@Controller('bikes')
export class BikesController {
  constructor(private readonly bikes: BikesService) {}

  @Get()
  @Can('bikes.view')
  @ApiZodQuery(BikeListQuerySchema)
  list(@CurrentUser() user: AuthUser, @Query(zod(BikeListQuerySchema)) query: BikeListQuery) {
    return this.bikes.list(user, query);
  }

  @Post()
  @Can('bikes.edit')
  @ApiZodBody(BikeInputSchema)
  create(@CurrentUser() user: AuthUser, @Body(zod(BikeInputSchema)) body: BikeInput) {
    return this.bikes.create(user, body);
  }

  @Get(':id')
  @Can('bikes.view')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.bikes.get(user, id);
  }

  @Patch(':id')
  @Can('bikes.edit')
  @ApiZodBody(UpdateBikeRequestSchema)
  update(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body(zod(UpdateBikeRequestSchema)) body: UpdateBikeRequest) {
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
