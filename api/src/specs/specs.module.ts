import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Spec } from './entities/spec.entity.js';
import { SpecRevision } from './entities/spec-revision.entity.js';
import { SpecsController } from './specs.controller.js';
import { SpecsService } from './specs.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Spec, SpecRevision])],
  controllers: [SpecsController],
  providers: [SpecsService],
  exports: [SpecsService],
})
export class SpecsModule {}
