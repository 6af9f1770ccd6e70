import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { PartSpec } from './entities/part-spec.entity.js';
import { SpecRevision } from './entities/spec-revision.entity.js';
import { SpecsController } from './specs.controller.js';
import { SpecsService } from './specs.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([PartSpec, SpecRevision])],
  controllers: [SpecsController],
  providers: [SpecsService],
  exports: [SpecsService],
})
export class SpecsModule {}
