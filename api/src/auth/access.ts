import { SetMetadata } from '@nestjs/common';
import { ROLES, type Role } from '../users/entities/user.entity.js';

export const ACCESS_KEY = 'gumshoe:access';

/** Who may call a route. Every route declares one; a route without it is refused to everyone. */
export type Access = 'public' | readonly Role[];

export const Public = () => SetMetadata(ACCESS_KEY, 'public' satisfies Access);
export const Roles = (...roles: Role[]) => SetMetadata(ACCESS_KEY, roles satisfies Access);
export const AnyRole = () => Roles(...ROLES);

/** The signed-in person as the access guard leaves it on the request. */
export interface AuthUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  sessionId: string;
  deviceId: string | null;
}
