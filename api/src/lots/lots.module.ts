import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { SpecsModule } from '../specs/specs.module.js';
import { Disposition } from './entities/disposition.entity.js';
import { Lot } from './entities/lot.entity.js';
import { LotsController } from './lots.controller.js';
import { LotsService } from './lots.service.js';

@Module({
  imports: [SpecsModule, TypeOrmModule.forFeature([Lot, Disposition])],
  controllers: [LotsController],
  providers: [LotsService],
  exports: [LotsService],
})
export class LotsModule {}
