import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsString, Length, MaxLength } from 'class-validator';
import { ROLES, type Role } from '../entities/user.entity.js';

export class CreateUserDto {
  @IsEmail()
  @MaxLength(254)
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.trim().toLowerCase() : value,
  )
  email: string;

  @IsString()
  @Length(1, 120)
  name: string;

  @IsIn(ROLES)
  role: Role;

  // bcrypt reads only the first 72 bytes, so a longer password would be silently cut.
  @IsString()
  @Length(10, 72)
  password: string;
}
