import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { AnyRole, Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { uuidParam } from '../common/id-param.js';
import { AgingService } from './aging.service.js';
import { CompoundsService, type CompoundDetail } from './compounds.service.js';
import { CreateAgingSetDto } from './dto/aging.dto.js';
import {
  CreateCompoundDto,
  CreateFitDto,
  CreateTestSetDto,
  PublishFitDto,
  UpdateCompoundDto,
} from './dto/compound.dto.js';
import type { AgingSet } from './entities/aging-set.entity.js';
import type { CompoundFit } from './entities/compound-fit.entity.js';
import type { Compound } from './entities/compound.entity.js';
import type { TestSet } from './entities/test-set.entity.js';
import { FitsService } from './fits.service.js';

@Controller('compounds')
export class CompoundsController {
  constructor(
    private readonly compounds: CompoundsService,
    private readonly fits: FitsService,
    private readonly aging: AgingService,
  ) {}

  @Get()
  @AnyRole()
  list(): Promise<Compound[]> {
    return this.compounds.list();
  }

  @Get(':id')
  @AnyRole()
  get(@Param('id', uuidParam) id: string): Promise<CompoundDetail> {
    return this.compounds.get(id);
  }

  @Post()
  @Roles('quality')
  create(@CurrentUser() actor: AuthUser, @Body() body: CreateCompoundDto): Promise<Compound> {
    return this.compounds.create(actor.id, body);
  }

  @Patch(':id')
  @Roles('quality')
  update(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: UpdateCompoundDto,
  ): Promise<Compound> {
    return this.compounds.update(actor.id, id, body);
  }

  @Post(':id/test-sets')
  @Roles('quality')
  addTestSet(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: CreateTestSetDto,
  ): Promise<TestSet> {
    return this.compounds.addTestSet(actor.id, id, body);
  }

  @Post(':id/fits')
  @Roles('quality')
  fit(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: CreateFitDto,
  ): Promise<CompoundFit> {
    return this.fits.fit(actor.id, id, body);
  }

  @Post(':id/fits/:fitId/publish')
  @HttpCode(200)
  @Roles('quality')
  publish(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Param('fitId', uuidParam) fitId: string,
    @Body() body: PublishFitDto,
  ): Promise<Compound> {
    return this.compounds.publish(actor.id, id, fitId, body.note);
  }

  @Get(':id/aging')
  @AnyRole()
  listAging(@Param('id', uuidParam) id: string): Promise<AgingSet[]> {
    return this.aging.list(id);
  }

  @Post(':id/aging')
  @Roles('quality')
  addAging(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: CreateAgingSetDto,
  ): Promise<AgingSet> {
    return this.aging.add(actor.id, id, body);
  }
}
