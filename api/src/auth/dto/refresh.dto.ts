import { Matches } from 'class-validator';

export class RefreshDto {
  @Matches(/^[0-9a-f-]{36}\.[A-Za-z0-9_-]{43}$/, { message: 'refreshToken is not a refresh token' })
  refreshToken: string;
}
