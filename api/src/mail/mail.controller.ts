import { Controller, Get } from '@nestjs/common';
import { Roles } from '../auth/access.js';
import { MailService, type KeptMessage } from './mail.service.js';

@Controller('admin/mail')
export class MailController {
  constructor(private readonly mail: MailService) {}

  @Get()
  @Roles('admin')
  list(): Promise<KeptMessage[]> {
    return this.mail.kept();
  }
}
