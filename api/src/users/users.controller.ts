import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { uuidParam } from '../common/id-param.js';
import { ChangeRoleDto } from './dto/change-role.dto.js';
import { CreateUserDto } from './dto/create-user.dto.js';
import type { PublicUser } from './public-user.js';
import { UsersService } from './users.service.js';

@Controller('users')
@Roles('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(): Promise<PublicUser[]> {
    return this.users.list();
  }

  @Post()
  create(@CurrentUser() actor: AuthUser, @Body() body: CreateUserDto): Promise<PublicUser> {
    return this.users.create(actor.id, body);
  }

  @Patch(':id/role')
  changeRole(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: ChangeRoleDto,
  ): Promise<PublicUser> {
    return this.users.changeRole(actor.id, id, body.role);
  }

  @Post(':id/deactivate')
  @HttpCode(200)
  deactivate(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
  ): Promise<PublicUser> {
    return this.users.deactivate(actor.id, id);
  }
}
