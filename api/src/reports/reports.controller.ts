import { Controller, Get, Header, Param, Res } from '@nestjs/common';
import type { Response } from 'express';
import { Roles } from '../auth/access.js';
import { uuidParam } from '../common/id-param.js';
import { ReportsService, type LotReport } from './reports.service.js';

@Controller('lots')
@Roles('supervisor', 'quality')
export class ReportsController {
  constructor(private readonly reports: ReportsService) {}

  @Get(':id/report')
  report(@Param('id', uuidParam) id: string): Promise<LotReport> {
    return this.reports.report(id);
  }

  @Get(':id/report.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  async csv(
    @Param('id', uuidParam) id: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<string> {
    const { fileName, text } = await this.reports.csv(id);
    res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
    return text;
  }
}
