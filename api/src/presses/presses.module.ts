import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Press } from './entities/press.entity.js';
import { PressesController } from './presses.controller.js';
import { PressesService } from './presses.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([Press])],
  controllers: [PressesController],
  providers: [PressesService],
  exports: [PressesService],
})
export class PressesModule {}
