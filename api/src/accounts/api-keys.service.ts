import type { Request } from 'express';
import type { DataSource } from 'typeorm';
import { IsNull } from 'typeorm';
import { ApiKey } from './api-key.entity';
import { recordAudit } from '../audit/audit.service';
import type { Principal } from '../auth/principal';
import { randomAlphanumeric, randomSecret, sha256Hex } from '../auth/secrets';
import { ForbiddenError, NotFoundError } from '../shared/errors';

export interface ApiKeyView {
  id: string;
  name: string;
  scope: 'read' | 'write';
  prefix: string;
  createdAt: Date;
  lastUsedAt: Date | null;
  revokedAt: Date | null;
  owner?: { id: string; email: string };
}

const view = (k: ApiKey): ApiKeyView => ({ id: k.id, name: k.name, scope: k.scope, prefix: k.prefix, createdAt: k.createdAt, lastUsedAt: k.lastUsedAt, revokedAt: k.revokedAt });

/** Keys for downstream tools: the secret is shown once at creation and only its hash is kept. */
export class ApiKeysService {
  constructor(private readonly dataSource: DataSource) {}

  async listOwn(principal: Principal): Promise<ApiKeyView[]> {
    const keys = await this.dataSource.getRepository(ApiKey).find({ where: { userId: principal.userId }, order: { createdAt: 'DESC' } });
    return keys.map(view);
  }

  async listAll(): Promise<ApiKeyView[]> {
    const keys = await this.dataSource.getRepository(ApiKey).find({ relations: { user: true }, order: { createdAt: 'DESC' } });
    return keys.map((k) => ({ ...view(k), owner: { id: k.user.id, email: k.user.email } }));
  }

  async create(principal: Principal, name: string, scope: 'read' | 'write', req: Request): Promise<ApiKeyView & { secret: string }> {
    if (principal.kind !== 'user') throw new ForbiddenError('API keys are created by a signed-in person, not by another key');
    const prefix = `kx${randomAlphanumeric(10)}`;
    const secret = randomSecret(32);
    return this.dataSource.transaction(async (manager) => {
      const key = manager.getRepository(ApiKey).create({ userId: principal.userId, name: name.trim(), scope, prefix, secretHash: sha256Hex(secret) });
      await manager.save(key);
      await recordAudit(manager, { action: 'api_key.created', actor: principal, entityType: 'api_key', entityId: key.id, details: { name: key.name, scope } }, req);
      const saved = await manager.getRepository(ApiKey).findOneByOrFail({ id: key.id });
      return { ...view(saved), secret: `${prefix}.${secret}` };
    });
  }

  /** Owners revoke their own keys; admins may revoke anyone's. */
  async revoke(principal: Principal, id: string, req: Request): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const key = await manager.getRepository(ApiKey).findOneBy({ id });
      const mayRevoke = key && (key.userId === principal.userId || principal.roles.includes('admin'));
      if (!key || !mayRevoke) throw new NotFoundError(`No API key ${id}`);
      await manager.update(ApiKey, { id, revokedAt: IsNull() }, { revokedAt: new Date() });
      await recordAudit(manager, { action: 'api_key.revoked', actor: principal, entityType: 'api_key', entityId: id }, req);
    });
  }
}
