import { Module } from '@nestjs/common';
import { LotsModule } from '../lots/lots.module.js';
import { SpecsModule } from '../specs/specs.module.js';
import { InspectionsService } from './inspections.service.js';

@Module({
  imports: [LotsModule, SpecsModule],
  providers: [InspectionsService],
  exports: [InspectionsService],
})
export class InspectionsModule {}
