import { Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { uuidParam } from '../common/id-param.js';
import { DevicesService, type Device, type DeviceRevoked } from './devices.service.js';

@Controller('admin/devices')
@Roles('admin')
export class DevicesController {
  constructor(private readonly devices: DevicesService) {}

  @Get()
  list(): Promise<Device[]> {
    return this.devices.list();
  }

  /** For a lost or stolen tablet: every sign-in on it ends at once. */
  @Post(':deviceId/revoke')
  @HttpCode(200)
  revoke(
    @CurrentUser() actor: AuthUser,
    @Param('deviceId', uuidParam) deviceId: string,
  ): Promise<DeviceRevoked> {
    return this.devices.revoke(actor.id, deviceId);
  }
}
