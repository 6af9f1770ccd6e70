import type { Role, User } from './entities/user.entity.js';

export interface PublicUser {
  id: string;
  name: string;
  email: string;
  role: Role;
  active: boolean;
}

/** What other people and the audit log may see of a user: never the password hash. */
export function publicUser({ id, name, email, role, active }: User): PublicUser {
  return { id, name, email, role, active };
}
