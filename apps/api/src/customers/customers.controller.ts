import { Body, Controller, Get, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  CustomerInputSchema,
  CustomerListQuerySchema,
  UpdateCustomerRequestSchema,
  type CustomerInput,
  type CustomerListQuery,
  type UpdateCustomerRequest,
} from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ApiZodBody, ApiZodQuery, zod } from '../core/http';
import { CustomersService } from './customers.service';

@ApiTags('customers')
@Controller('customers')
export class CustomersController {
  constructor(private readonly customers: CustomersService) {}

  @Get()
  @Can('customers.view')
  @ApiZodQuery(CustomerListQuerySchema)
  list(@CurrentUser() user: AuthUser, @Query(zod(CustomerListQuerySchema)) query: CustomerListQuery) {
    return this.customers.list(user, query);
  }

  @Post()
  @Can('customers.edit')
  @ApiZodBody(CustomerInputSchema)
  create(@CurrentUser() user: AuthUser, @Body(zod(CustomerInputSchema)) body: CustomerInput) {
    return this.customers.create(user, body);
  }

  @Get(':id')
  @Can('customers.view')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.customers.get(user, id);
  }

  @Patch(':id')
  @Can('customers.edit')
  @ApiZodBody(UpdateCustomerRequestSchema)
  update(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @Body(zod(UpdateCustomerRequestSchema)) body: UpdateCustomerRequest) {
    return this.customers.update(user, id, body);
  }
}
