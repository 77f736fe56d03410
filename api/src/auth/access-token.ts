import { SignJWT, jwtVerify, errors } from 'jose';
import type { Role } from './principal';

const ISSUER = 'kelvindex';
const AUDIENCE = 'kelvindex-api';

export interface AccessClaims {
  sub: string;
  email: string;
  name: string;
  roles: Role[];
}

function key(secret: string): Uint8Array {
  return new TextEncoder().encode(secret);
}

/** Signs a short-lived HS256 access token. */
export async function signAccessToken(claims: AccessClaims, secret: string, lifetimeSeconds: number): Promise<string> {
  return new SignJWT({ email: claims.email, name: claims.name, roles: claims.roles })
    .setProtectedHeader({ alg: 'HS256', typ: 'JWT' })
    .setSubject(claims.sub)
    .setIssuer(ISSUER)
    .setAudience(AUDIENCE)
    .setIssuedAt()
    .setExpirationTime(`${lifetimeSeconds}s`)
    .sign(key(secret));
}

/** Verifies signature, issuer, audience and expiry; throws a message fit for a 401 answer. */
export async function verifyAccessToken(token: string, secret: string): Promise<AccessClaims> {
  try {
    const { payload } = await jwtVerify(token, key(secret), { issuer: ISSUER, audience: AUDIENCE, algorithms: ['HS256'] });
    return {
      sub: String(payload.sub),
      email: String(payload.email),
      name: String(payload.name),
      roles: (payload.roles as Role[]) ?? [],
    };
  } catch (error) {
    if (error instanceof errors.JWTExpired) throw new Error('The access token has expired');
    throw new Error('The access token is not valid');
  }
}
