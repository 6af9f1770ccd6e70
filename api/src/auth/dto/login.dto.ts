import { IsEmail, IsString, IsUUID, MaxLength } from 'class-validator';
import { Optional } from '../../common/optional.js';

export class LoginDto {
  @IsEmail()
  @MaxLength(254)
  email: string;

  // No minimum here: a short password is simply wrong, and saying so would tell what the rule is.
  @IsString()
  @MaxLength(200)
  password: string;

  /** The tablet's stable id; binds this sign-in to the device for sync authorship. */
  @Optional()
  @IsUUID()
  deviceId?: string;
}
