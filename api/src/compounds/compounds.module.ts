import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AgingService } from './aging.service.js';
import { CompoundsController } from './compounds.controller.js';
import { CompoundsService } from './compounds.service.js';
import { AgingSet } from './entities/aging-set.entity.js';
import { CompoundFit } from './entities/compound-fit.entity.js';
import { Compound } from './entities/compound.entity.js';
import { TestSet } from './entities/test-set.entity.js';
import { FitsService } from './fits.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Compound, TestSet, CompoundFit, AgingSet])],
  controllers: [CompoundsController],
  providers: [CompoundsService, FitsService, AgingService],
  exports: [CompoundsService, FitsService],
})
export class CompoundsModule {}
