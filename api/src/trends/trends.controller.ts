import { Controller, Get, Query } from '@nestjs/common';
import { Roles } from '../auth/access.js';
import { MeasurementsQueryDto } from './dto/measurements-query.dto.js';
import { TrendsService, type MeasurementRow } from './trends.service.js';

@Controller('trends')
@Roles('supervisor', 'quality')
export class TrendsController {
  constructor(private readonly trends: TrendsService) {}

  @Get('measurements')
  measurements(@Query() query: MeasurementsQueryDto): Promise<MeasurementRow[]> {
    return this.trends.measurements(query);
  }
}
