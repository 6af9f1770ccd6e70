import { Module } from '@nestjs/common';
import { InspectionsModule } from '../inspections/inspections.module.js';
import { LotsModule } from '../lots/lots.module.js';
import { SyncController } from './sync.controller.js';
import { SyncService } from './sync.service.js';

@Module({
  imports: [LotsModule, InspectionsModule],
  controllers: [SyncController],
  providers: [SyncService],
})
export class SyncModule {}
