import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import { AnyRole, Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { uuidParam } from '../common/id-param.js';
import { CreatePressDto, UpdatePressDto } from './dto/press.dto.js';
import type { Press } from './entities/press.entity.js';
import { PressesService } from './presses.service.js';

@Controller('presses')
export class PressesController {
  constructor(private readonly presses: PressesService) {}

  @Get()
  @AnyRole()
  list(): Promise<Press[]> {
    return this.presses.list();
  }

  @Post()
  @Roles('admin')
  create(@CurrentUser() actor: AuthUser, @Body() body: CreatePressDto): Promise<Press> {
    return this.presses.create(actor.id, body);
  }

  @Patch(':id')
  @Roles('admin')
  update(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: UpdatePressDto,
  ): Promise<Press> {
    return this.presses.update(actor.id, id, body);
  }
}
