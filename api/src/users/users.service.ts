import { randomUUID } from 'node:crypto';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import bcrypt from 'bcryptjs';
import { Repository, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { AuthService } from '../auth/auth.service.js';
import { Transactions } from '../database/transactions.js';
import type { CreateUserDto } from './dto/create-user.dto.js';
import { User, type Role } from './entities/user.entity.js';
import { publicUser, type PublicUser } from './public-user.js';

export const BCRYPT_COST = 10;

@Injectable()
export class UsersService {
  constructor(
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    private readonly auth: AuthService,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {}

  async list(): Promise<PublicUser[]> {
    return (await this.users.find({ order: { email: 'ASC' } })).map(publicUser);
  }

  async create(actorId: string | null, dto: CreateUserDto): Promise<PublicUser> {
    const passwordHash = await bcrypt.hash(dto.password, BCRYPT_COST);
    return this.transactions.run((manager) => this.insert(manager, actorId, dto, passwordHash));
  }

  /** Also used by the demo seed, inside its own transaction. */
  async insert(
    manager: EntityManager,
    actorId: string | null,
    { email, name, role }: Omit<CreateUserDto, 'password'>,
    passwordHash: string,
  ): Promise<PublicUser> {
    const user: User = {
      id: randomUUID(),
      email,
      name,
      role,
      passwordHash,
      active: true,
      createdAt: new Date(),
    };
    await manager.insert(User, user);
    const shown = publicUser(user);
    await this.audit.record(manager, actorId, 'user.create', 'user', user.id, null, shown);
    return shown;
  }

  changeRole(actorId: string, id: string, role: Role): Promise<PublicUser> {
    return this.change(actorId, id, 'user.role', { role });
  }

  deactivate(actorId: string, id: string): Promise<PublicUser> {
    return this.change(actorId, id, 'user.deactivate', { active: false });
  }

  private change(
    actorId: string,
    id: string,
    action: string,
    patch: Partial<Pick<User, 'role' | 'active'>>,
  ): Promise<PublicUser> {
    return this.transactions.run(async (manager) => {
      const user = await manager.findOneBy(User, { id });
      if (!user) throw new NotFoundException(`No user ${id}`);
      const before = publicUser(user);
      const after = publicUser({ ...user, ...patch });
      await manager.update(User, { id }, patch);
      if (patch.active === false) await this.auth.revokeAll(manager, id, 'deactivated');
      await this.audit.record(manager, actorId, action, 'user', id, before, after);
      return after;
    });
  }
}
