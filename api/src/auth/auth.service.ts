import type { Request } from 'express';
import type { DataSource, EntityManager } from 'typeorm';
import { User } from '../accounts/user.entity';
import { recordAudit } from '../audit/audit.service';
import type { AppContext } from '../app-context';
import { ConflictError, UnauthorizedError, UnprocessableError } from '../shared/errors';
import { accountMails } from '../mail/messages';
import { signAccessToken } from './access-token';
import { checkPassword, hashPassword } from './passwords';
import { issueRefreshToken, revokeAllForUser, revokeBySecret, rotateRefreshToken } from './refresh-tokens';
import { issueOneTimeToken, spendOneTimeToken } from './one-time-tokens';
import type { Principal, Role } from './principal';

export interface SignedIn {
  accessToken: string;
  expiresIn: number;
  refreshSecret: string;
  user: { id: string; email: string; name: string; roles: Role[] };
}

const WRONG_CREDENTIALS = 'E-mail or password is wrong';

export class AuthService {
  private readonly dataSource: DataSource;

  constructor(private readonly ctx: AppContext) {
    this.dataSource = ctx.dataSource;
  }

  async signIn(email: string, password: string, req: Request): Promise<SignedIn> {
    const address = email.trim().toLowerCase();
    const user = await this.dataSource.getRepository(User).createQueryBuilder('u').addSelect('u.passwordHash').where('u.email = :address', { address }).getOne();
    const ok = await checkPassword(password, user?.passwordHash);
    if (!user || !ok || user.deactivatedAt) {
      await recordAudit(this.dataSource.manager, { action: 'auth.sign_in_failed', actor: user ? { userId: user.id, email: user.email } : null, actorLabel: address, details: { reason: !user ? 'unknown address' : !ok ? 'wrong password' : 'deactivated' } }, req);
      throw new UnauthorizedError(WRONG_CREDENTIALS);
    }
    return this.dataSource.transaction(async (manager) => {
      await manager.update(User, { id: user.id }, { lastSignInAt: new Date() });
      await recordAudit(manager, { action: 'auth.sign_in', actor: { userId: user.id, email: user.email } }, req);
      return this.session(manager, user, req);
    });
  }

  async refresh(secret: string | undefined, req: Request): Promise<SignedIn> {
    if (!secret) throw new UnauthorizedError('No refresh token: sign in again');
    const outcome = await this.dataSource.transaction((manager) =>
      rotateRefreshToken(manager, secret, this.ctx.config.refreshTokenDays, { userAgent: req.get('user-agent'), ip: req.ip }),
    );
    if (outcome.kind === 'reused') {
      await recordAudit(this.dataSource.manager, { action: 'auth.refresh_reuse_detected', actor: { userId: outcome.userId, email: '' }, entityType: 'refresh_token_family', entityId: outcome.familyId }, req);
      throw new UnauthorizedError('This sign-in was ended for safety (a refresh token was used twice): sign in again');
    }
    if (outcome.kind === 'invalid') throw new UnauthorizedError('The session has ended: sign in again');
    const user = await this.dataSource.getRepository(User).findOneBy({ id: outcome.userId });
    if (!user || user.deactivatedAt) throw new UnauthorizedError('This account is no longer active');
    await recordAudit(this.dataSource.manager, { action: 'auth.refresh', actor: { userId: user.id, email: user.email } }, req);
    return { ...(await this.accessFor(user)), refreshSecret: outcome.secret };
  }

  async signOut(secret: string | undefined, principal: Principal | undefined, req: Request): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      if (secret) await revokeBySecret(manager, secret, 'signed out');
      await recordAudit(manager, { action: 'auth.sign_out', actor: principal ?? null }, req);
    });
  }

  /** Always answers the same way, so the answer never tells whether the address has an account. */
  async requestPasswordReset(email: string, req: Request): Promise<void> {
    const address = email.trim().toLowerCase();
    const user = await this.dataSource.getRepository(User).findOneBy({ email: address });
    await this.dataSource.transaction(async (manager) => {
      await recordAudit(manager, { action: 'auth.password_reset_requested', actorLabel: address, details: { known: !!user && !user.deactivatedAt } }, req);
      if (!user || user.deactivatedAt) return;
      const secret = await issueOneTimeToken(manager, { purpose: 'password_reset', email: address, userId: user.id });
      await this.ctx.mail?.enqueue(accountMails.passwordReset(address, this.link('/reset-password', secret)));
    });
  }

  async confirmPasswordReset(secret: string, password: string, req: Request): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const token = await spendOneTimeToken(manager, 'password_reset', secret);
      if (!token?.userId) throw new UnprocessableError('This reset link is not valid: it may have been used already or have expired');
      await manager.update(User, { id: token.userId }, { passwordHash: await hashPassword(password), passwordChangedAt: new Date() });
      await revokeAllForUser(manager, token.userId, 'password reset');
      await recordAudit(manager, { action: 'auth.password_reset', actor: { userId: token.userId, email: token.email } }, req);
    });
  }

  async acceptInvitation(secret: string, name: string, password: string, req: Request): Promise<SignedIn> {
    return this.dataSource.transaction(async (manager) => {
      const token = await spendOneTimeToken(manager, 'invitation', secret);
      if (!token) throw new UnprocessableError('This invitation link is not valid: it may have been used already or have expired');
      const taken = await manager.getRepository(User).findOneBy({ email: token.email });
      if (taken) throw new ConflictError('An account with this e-mail address exists already: sign in instead');
      const now = new Date();
      const user = manager.getRepository(User).create({
        email: token.email,
        displayName: name.trim(),
        passwordHash: await hashPassword(password),
        roles: token.roles.length ? token.roles : ['reader'],
        emailVerifiedAt: now,
        passwordChangedAt: now,
        lastSignInAt: now,
      });
      await manager.save(user);
      await recordAudit(manager, { action: 'auth.invitation_accepted', actor: { userId: user.id, email: user.email }, entityType: 'user', entityId: user.id }, req);
      return this.session(manager, user, req);
    });
  }

  async changePassword(principal: Principal, current: string, next: string, req: Request): Promise<void> {
    if (principal.kind !== 'user') throw new UnauthorizedError('Passwords are changed by a signed-in person, not with an API key');
    const user = await this.dataSource.getRepository(User).createQueryBuilder('u').addSelect('u.passwordHash').where('u.id = :id', { id: principal.userId }).getOne();
    if (!user || !(await checkPassword(current, user.passwordHash))) {
      await recordAudit(this.dataSource.manager, { action: 'auth.password_change_failed', actor: principal }, req);
      throw new UnprocessableError('The current password is wrong');
    }
    await this.dataSource.transaction(async (manager) => {
      await manager.update(User, { id: user.id }, { passwordHash: await hashPassword(next), passwordChangedAt: new Date() });
      await revokeAllForUser(manager, user.id, 'password changed');
      await recordAudit(manager, { action: 'auth.password_changed', actor: principal }, req);
    });
  }

  async requestEmailVerification(principal: Principal, req: Request): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const secret = await issueOneTimeToken(manager, { purpose: 'email_verification', email: principal.email, userId: principal.userId });
      await this.ctx.mail?.enqueue(accountMails.emailVerification(principal.email, this.link('/verify-email', secret)));
      await recordAudit(manager, { action: 'auth.email_verification_requested', actor: principal }, req);
    });
  }

  async confirmEmailVerification(secret: string, req: Request): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const token = await spendOneTimeToken(manager, 'email_verification', secret);
      if (!token?.userId) throw new UnprocessableError('This confirmation link is not valid: it may have been used already or have expired');
      await manager.update(User, { id: token.userId, email: token.email }, { emailVerifiedAt: new Date() });
      await recordAudit(manager, { action: 'auth.email_verified', actor: { userId: token.userId, email: token.email } }, req);
    });
  }

  private async session(manager: EntityManager, user: User, req: Request): Promise<SignedIn> {
    const refresh = await issueRefreshToken(manager, user.id, this.ctx.config.refreshTokenDays, { userAgent: req.get('user-agent'), ip: req.ip });
    return { ...(await this.accessFor(user)), refreshSecret: refresh.secret };
  }

  private async accessFor(user: User): Promise<Omit<SignedIn, 'refreshSecret'>> {
    const seconds = this.ctx.config.accessTokenSeconds;
    const accessToken = await signAccessToken({ sub: user.id, email: user.email, name: user.displayName, roles: user.roles }, this.ctx.config.jwtSecret, seconds);
    return { accessToken, expiresIn: seconds, user: { id: user.id, email: user.email, name: user.displayName, roles: user.roles } };
  }

  private link(path: string, secret: string): string {
    return `${this.ctx.config.appUrl}${path}?token=${encodeURIComponent(secret)}`;
  }
}
