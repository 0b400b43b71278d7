import { Controller, Get, Patch } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { UpdateShopSettingsRequestSchema, type UpdateShopSettingsRequest } from '@benchproof/contracts';
import { Can, CurrentUser, type AuthUser } from '../core/auth';
import { ZodBody } from '../core/http';
import { ShopsService } from './shops.service';

@ApiTags('shop')
@Controller('shop')
export class ShopsController {
  constructor(private readonly shops: ShopsService) {}

  @Get('settings')
  @Can('shop.view')
  settings(@CurrentUser() user: AuthUser) {
    return this.shops.settings(user.shopId);
  }

  @Patch('settings')
  @Can('shop.edit')
  update(@CurrentUser() user: AuthUser, @ZodBody(UpdateShopSettingsRequestSchema) body: UpdateShopSettingsRequest) {
    return this.shops.update(user, body);
  }
}
