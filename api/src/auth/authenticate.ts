import passport from 'passport';
import { Strategy as PassportStrategy } from 'passport-strategy';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import type { Request, RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { verifyAccessToken } from './access-token';
import { parseApiKey } from './api-key-format';
import { sameHash, sha256Hex } from './secrets';
import type { Principal } from './principal';
import { User } from '../accounts/user.entity';
import { ApiKey } from '../accounts/api-key.entity';
import { UnauthorizedError } from '../shared/errors';

type VerifierCallback = (error: Error | null, payload?: unknown) => void;

// passport-jwt verifies with jsonwebtoken by default; tokens here are signed and verified with jose.
(JwtStrategy as unknown as { JwtVerifier: (token: string, secret: string, options: unknown, cb: VerifierCallback) => void }).JwtVerifier = (
  token,
  secret,
  _options,
  cb,
) => {
  verifyAccessToken(token, secret).then(
    (claims) => cb(null, claims),
    (error: Error) => cb(error),
  );
};

/** Looks users up on every request, so deactivation and role changes apply at once. */
async function activeUser(dataSource: DataSource, id: string): Promise<User | null> {
  const user = await dataSource.getRepository(User).findOneBy({ id });
  return user && !user.deactivatedAt ? user : null;
}

class ApiKeyStrategy extends PassportStrategy {
  name = 'api-key';

  constructor(private readonly dataSource: DataSource) {
    super();
  }

  override authenticate(req: Request): void {
    const presented = req.get('x-api-key') ?? bearerToken(req) ?? '';
    const parsed = parseApiKey(presented);
    if (!parsed) return this.fail({ message: 'The API key is malformed' }, 401);
    this.verify(parsed.prefix, parsed.secret).then(
      (principal) => (principal ? this.success(principal) : this.fail({ message: 'The API key is not valid or has been revoked' }, 401)),
      (error: Error) => this.error(error),
    );
  }

  private async verify(prefix: string, secret: string): Promise<Principal | undefined> {
    const key = await this.dataSource
      .getRepository(ApiKey)
      .createQueryBuilder('k')
      .addSelect('k.secretHash')
      .where('k.prefix = :prefix', { prefix })
      .getOne();
    if (!key || key.revokedAt || (key.expiresAt && key.expiresAt < new Date())) return undefined;
    if (!sameHash(sha256Hex(secret), key.secretHash)) return undefined;
    const user = await activeUser(this.dataSource, key.userId);
    if (!user) return undefined;
    // Recording every use would turn each read into a write; once a minute is enough to tell.
    await this.dataSource.query(
      `UPDATE api_keys SET last_used_at = now() WHERE id = $1 AND (last_used_at IS NULL OR last_used_at < now() - interval '1 minute')`,
      [key.id],
    );
    return { kind: 'api-key', userId: user.id, email: user.email, name: user.displayName, roles: user.roles, scope: key.scope, apiKeyId: key.id };
  }
}

function bearerToken(req: Request): string | undefined {
  const header = req.get('authorization');
  const match = header ? /^Bearer\s+(.+)$/i.exec(header) : null;
  return match?.[1]?.trim();
}

/**
 * Reads the credentials a request carries, if any: an access token or an API key. No credentials
 * means anonymous; bad credentials are a 401, never a silent downgrade to anonymous.
 */
export function authenticate(dataSource: DataSource, jwtSecret: string): RequestHandler {
  const authenticator = new passport.Passport();
  authenticator.use(
    'jwt',
    new JwtStrategy({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: jwtSecret }, (claims: { sub: string }, done) => {
      activeUser(dataSource, claims.sub).then(
        (user) =>
          done(
            null,
            user
              ? ({ kind: 'user', userId: user.id, email: user.email, name: user.displayName, roles: user.roles, scope: 'write' } satisfies Principal)
              : false,
            user ? undefined : { message: 'This account is no longer active' },
          ),
        (error: Error) => done(error),
      );
    }),
  );
  authenticator.use('api-key', new ApiKeyStrategy(dataSource));
  const middleware = authenticator.initialize();

  return (req, res, next) => {
    const bearer = bearerToken(req);
    const apiKey = req.get('x-api-key');
    if (!bearer && !apiKey) return next();
    const strategy = apiKey || (bearer && parseApiKey(bearer)) ? 'api-key' : 'jwt';
    middleware(req, res, () => {
      authenticator.authenticate(strategy, { session: false }, (error: Error | null, principal: Principal | false, info?: { message?: string } | Error) => {
        if (error) return next(error);
        if (!principal) return next(new UnauthorizedError(info?.message ?? 'The credentials are not valid'));
        req.user = principal;
        next();
      })(req, res, next);
    });
  };
}
