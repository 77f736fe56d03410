import type { Request } from 'express';
import type { DataSource } from 'typeorm';
import type { AppContext } from '../app-context';
import { User } from './user.entity';
import { recordAudit } from '../audit/audit.service';
import { issueOneTimeToken } from '../auth/one-time-tokens';
import { revokeAllForUser } from '../auth/refresh-tokens';
import type { Principal, Role } from '../auth/principal';
import { ConflictError, NotFoundError, UnprocessableError } from '../shared/errors';
import { accountMails } from '../mail/messages';

export interface UserView {
  id: string;
  email: string;
  name: string;
  roles: Role[];
  active: boolean;
  emailVerified: boolean;
  lastSignInAt: Date | null;
  createdAt: Date;
}

export function userView(u: User): UserView {
  return { id: u.id, email: u.email, name: u.displayName, roles: u.roles, active: !u.deactivatedAt, emailVerified: !!u.emailVerifiedAt, lastSignInAt: u.lastSignInAt, createdAt: u.createdAt };
}

/** Administration of accounts: who may do what, invitations, deactivation. */
export class UsersService {
  private readonly dataSource: DataSource;

  constructor(private readonly ctx: AppContext) {
    this.dataSource = ctx.dataSource;
  }

  async list(): Promise<UserView[]> {
    const users = await this.dataSource.getRepository(User).find({ order: { email: 'ASC' } });
    return users.map(userView);
  }

  async invite(admin: Principal, email: string, roles: Role[], req: Request): Promise<{ email: string; roles: Role[]; expiresInHours: number }> {
    const address = email.trim().toLowerCase();
    if (await this.dataSource.getRepository(User).findOneBy({ email: address })) {
      throw new ConflictError(`${address} already has an account`);
    }
    await this.dataSource.transaction(async (manager) => {
      const secret = await issueOneTimeToken(manager, { purpose: 'invitation', email: address, roles, createdBy: admin.userId });
      await this.ctx.mail?.enqueue(accountMails.invitation(address, `${this.ctx.config.appUrl}/accept-invitation?token=${encodeURIComponent(secret)}`, admin.name, roles));
      await recordAudit(manager, { action: 'user.invited', actor: admin, entityType: 'invitation', entityId: address, details: { roles } }, req);
    });
    return { email: address, roles, expiresInHours: 7 * 24 };
  }

  async setRoles(admin: Principal, userId: string, roles: Role[], req: Request): Promise<UserView> {
    if (userId === admin.userId && !roles.includes('admin')) {
      throw new UnprocessableError('You cannot remove your own admin role; ask another admin');
    }
    return this.dataSource.transaction(async (manager) => {
      const user = await manager.getRepository(User).findOne({ where: { id: userId }, lock: { mode: 'pessimistic_write' } });
      if (!user) throw new NotFoundError(`No user ${userId}`);
      const before = user.roles;
      await manager.update(User, { id: userId }, { roles });
      await recordAudit(manager, { action: 'user.roles_changed', actor: admin, entityType: 'user', entityId: userId, details: { before, after: roles } }, req);
      return userView({ ...user, roles } as User);
    });
  }

  async setActive(admin: Principal, userId: string, active: boolean, req: Request): Promise<UserView> {
    if (userId === admin.userId && !active) throw new UnprocessableError('You cannot deactivate your own account');
    return this.dataSource.transaction(async (manager) => {
      const user = await manager.getRepository(User).findOne({ where: { id: userId }, lock: { mode: 'pessimistic_write' } });
      if (!user) throw new NotFoundError(`No user ${userId}`);
      const deactivatedAt = active ? null : new Date();
      await manager.update(User, { id: userId }, { deactivatedAt });
      if (!active) {
        await revokeAllForUser(manager, userId, 'account deactivated');
        await manager.query(`UPDATE api_keys SET revoked_at = now() WHERE user_id = $1 AND revoked_at IS NULL`, [userId]);
      }
      await recordAudit(manager, { action: active ? 'user.reactivated' : 'user.deactivated', actor: admin, entityType: 'user', entityId: userId }, req);
      return userView({ ...user, deactivatedAt } as User);
    });
  }
}
