import { IsIn } from 'class-validator';
import { ROLES, type Role } from '../entities/user.entity.js';

export class ChangeRoleDto {
  @IsIn(ROLES)
  role: Role;
}
