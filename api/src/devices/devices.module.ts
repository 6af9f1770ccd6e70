import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Session } from '../auth/entities/session.entity.js';
import { AppliedOp } from '../sync/entities/applied-op.entity.js';
import { DevicesController } from './devices.controller.js';
import { DevicesService } from './devices.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Session, AppliedOp])],
  controllers: [DevicesController],
  providers: [DevicesService],
})
export class DevicesModule {}
