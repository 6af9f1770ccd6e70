import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import { Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { TestMailDto } from './dto/test-mail.dto.js';
import { MailService, type KeptMessage, type MailSettings } from './mail.service.js';

@Controller('admin/mail')
@Roles('admin')
export class MailController {
  constructor(private readonly mail: MailService) {}

  @Get()
  list(): Promise<KeptMessage[]> {
    return this.mail.kept();
  }

  @Get('settings')
  settings(): Promise<MailSettings> {
    return this.mail.settings();
  }

  /** Sends one message now; its outcome shows in the queue counts (and, locally, in the list). */
  @Post('test')
  @HttpCode(202)
  async test(@CurrentUser() actor: AuthUser, @Body() body: TestMailDto): Promise<{ queued: true }> {
    await this.mail.sendTest(actor.id, body.to);
    return { queued: true };
  }
}
