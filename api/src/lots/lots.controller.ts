import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { AnyRole, Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { uuidParam } from '../common/id-param.js';
import { DispositionDto, LotQueryDto, ReopenDto } from './dto/lot.dto.js';
import type { Disposition } from './entities/disposition.entity.js';
import type { Lot } from './entities/lot.entity.js';
import { LotsService, type LotDetail } from './lots.service.js';

@Controller('lots')
export class LotsController {
  constructor(private readonly lots: LotsService) {}

  @Get()
  @AnyRole()
  list(@Query() query: LotQueryDto): Promise<Lot[]> {
    return this.lots.list(query);
  }

  @Get(':id')
  @AnyRole()
  get(@Param('id', uuidParam) id: string): Promise<LotDetail> {
    return this.lots.get(id);
  }

  @Post(':id/dispositions')
  @Roles('supervisor', 'quality')
  disposition(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: DispositionDto,
  ): Promise<Disposition> {
    return this.lots.disposition(actor.id, id, body);
  }

  @Post(':id/reopen')
  @HttpCode(200)
  @Roles('supervisor')
  reopen(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: ReopenDto,
  ): Promise<Lot> {
    return this.lots.reopen(actor.id, id, body.note);
  }
}
