import { Module } from '@nestjs/common';
import { LotsModule } from '../lots/lots.module.js';
import { InspectionsService } from './inspections.service.js';

@Module({
  imports: [LotsModule],
  providers: [InspectionsService],
  exports: [InspectionsService],
})
export class InspectionsModule {}
