export const ROLES = ['reader', 'steward', 'reviewer', 'editor', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** Who is calling: a signed-in user (access token) or a downstream tool (API key). */
export interface Principal {
  kind: 'user' | 'api-key';
  userId: string;
  email: string;
  name: string;
  roles: Role[];
  /** API keys are read-only unless created with the write scope. */
  scope: 'read' | 'write';
  apiKeyId?: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport types `req.user` as Express.User; ours is a Principal.
    interface User extends Principal {}
  }
}
