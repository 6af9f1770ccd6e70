import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Inspection } from '../inspections/entities/inspection.entity.js';
import { Lot } from '../lots/entities/lot.entity.js';
import { Press } from '../presses/entities/press.entity.js';
import { TrendsController } from './trends.controller.js';
import { TrendsService } from './trends.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Lot, Inspection, Press])],
  controllers: [TrendsController],
  providers: [TrendsService],
})
export class TrendsModule {}
