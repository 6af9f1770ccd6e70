import { Module } from '@nestjs/common';
import { LotsModule } from '../lots/lots.module.js';
import { SpecsModule } from '../specs/specs.module.js';
import { ReportsController } from './reports.controller.js';
import { ReportsService } from './reports.service.js';

@Module({
  imports: [LotsModule, SpecsModule],
  controllers: [ReportsController],
  providers: [ReportsService],
})
export class ReportsModule {}
