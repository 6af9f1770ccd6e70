import { Body, Controller, Get, HttpCode, Param, Post, Put } from '@nestjs/common';
import { AnyRole, Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { uuidParam } from '../common/id-param.js';
import { SpecBody } from './dto/spec-body.dto.js';
import { CreateSpecDto } from './dto/spec.dto.js';
import type { Spec } from './entities/spec.entity.js';
import type { SpecRevision } from './entities/spec-revision.entity.js';
import { SpecsService, type SpecDetail } from './specs.service.js';

@Controller('specs')
export class SpecsController {
  constructor(private readonly specs: SpecsService) {}

  @Get()
  @AnyRole()
  list(): Promise<Spec[]> {
    return this.specs.list();
  }

  @Get(':id')
  @AnyRole()
  get(@Param('id', uuidParam) id: string): Promise<SpecDetail> {
    return this.specs.get(id);
  }

  @Post()
  @Roles('quality')
  create(@CurrentUser() actor: AuthUser, @Body() body: CreateSpecDto): Promise<Spec> {
    return this.specs.create(actor.id, body);
  }

  @Post(':id/revisions')
  @Roles('quality')
  addRevision(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Body() body: SpecBody,
  ): Promise<SpecRevision> {
    return this.specs.addRevision(actor.id, id, body);
  }

  @Put(':id/revisions/:revisionId')
  @Roles('quality')
  updateRevision(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Param('revisionId', uuidParam) revisionId: string,
    @Body() body: SpecBody,
  ): Promise<SpecRevision> {
    return this.specs.updateRevision(actor.id, id, revisionId, body);
  }

  @Post(':id/revisions/:revisionId/release')
  @HttpCode(200)
  @Roles('quality')
  release(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam) id: string,
    @Param('revisionId', uuidParam) revisionId: string,
  ): Promise<SpecRevision> {
    return this.specs.release(actor.id, id, revisionId);
  }
}
