import { Controller, Get, Param, ParseIntPipe, Patch } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { UpdateUserRequestSchema, type UpdateUserRequest } from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { UsersService } from './users.service';

@ApiTags('users')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  /** Every role can list the shop's staff (pickers for mechanic and final checker). */
  @Get()
  @Can('users.view')
  list(@CurrentUser() user: AuthUser) {
    return this.users.list(user);
  }

  @Patch(':id')
  @Can('users.manage')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseIntPipe) id: number, @ZodBody(UpdateUserRequestSchema) body: UpdateUserRequest) {
    return this.users.update(user, id, body);
  }
}
