import { Controller, Get, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
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
import { ZodBody, ZodQuery } from '../core/http';
import { CustomersService } from './customers.service';

@ApiTags('customers')
@Controller('customers')
export class CustomersController {
  constructor(private readonly customers: CustomersService) {}

  @Get()
  @Can('customers.view')
  list(@CurrentUser() user: AuthUser, @ZodQuery(CustomerListQuerySchema) query: CustomerListQuery) {
    return this.customers.list(user, query);
  }

  @Post()
  @Can('customers.edit')
  create(@CurrentUser() user: AuthUser, @ZodBody(CustomerInputSchema) body: CustomerInput) {
    return this.customers.create(user, body);
  }

  @Get(':id')
  @Can('customers.view')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number) {
    return this.customers.get(user, id);
  }

  @Patch(':id')
  @Can('customers.edit')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(UpdateCustomerRequestSchema) body: UpdateCustomerRequest) {
    return this.customers.update(user, id, body);
  }
}
