import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Users and their credentials: refresh tokens (rotating, in families), API keys and single-use
 * tokens for invitations, password resets and e-mail verification. Secrets are never stored:
 * token and key columns hold the SHA-256 of the secret as 64 lower-case hex digits (the secrets
 * are long random strings, so a fast hash is the right tool; passwords use bcrypt).
 */
export class Accounts1764800100000 implements MigrationInterface {
  name = 'Accounts1764800100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email text NOT NULL,
        display_name text NOT NULL,
        password_hash text,
        roles text[] NOT NULL DEFAULT '{reader}',
        email_verified_at timestamptz,
        deactivated_at timestamptz,
        last_sign_in_at timestamptz,
        password_changed_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1,
        CONSTRAINT users_email_unique UNIQUE (email),
        CONSTRAINT users_email_format CHECK (email = lower(email) AND email ~ '^[^@\\s]+@[^@\\s]+\\.[^@\\s]+$'),
        CONSTRAINT users_display_name_present CHECK (length(btrim(display_name)) > 0),
        CONSTRAINT users_roles_known CHECK (roles <@ ARRAY['reader', 'steward', 'reviewer', 'editor', 'admin']::text[])
      )`);
    await q.query(`CREATE TRIGGER users_bump_version BEFORE UPDATE ON users FOR EACH ROW EXECUTE FUNCTION kx_bump_version()`);

    await q.query(`
      CREATE TABLE refresh_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        family_id uuid NOT NULL,
        token_hash text NOT NULL,
        issued_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        revoked_at timestamptz,
        revoked_reason text,
        replaced_by_id uuid REFERENCES refresh_tokens (id) ON DELETE SET NULL,
        user_agent text,
        ip_address inet,
        CONSTRAINT refresh_tokens_hash_unique UNIQUE (token_hash),
        CONSTRAINT refresh_tokens_hash_format CHECK (token_hash ~ '^[0-9a-f]{64}$'),
        CONSTRAINT refresh_tokens_expiry_after_issue CHECK (expires_at > issued_at),
        CONSTRAINT refresh_tokens_revocation_reason CHECK (revoked_reason IS NULL OR revoked_at IS NOT NULL)
      )`);
    await q.query(`CREATE INDEX refresh_tokens_family ON refresh_tokens (family_id)`);
    await q.query(`CREATE INDEX refresh_tokens_user ON refresh_tokens (user_id)`);

    await q.query(`
      CREATE TABLE api_keys (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        name text NOT NULL,
        prefix text NOT NULL,
        secret_hash text NOT NULL,
        scope text NOT NULL DEFAULT 'read',
        created_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz,
        last_used_at timestamptz,
        revoked_at timestamptz,
        CONSTRAINT api_keys_prefix_unique UNIQUE (prefix),
        CONSTRAINT api_keys_prefix_format CHECK (prefix ~ '^[A-Za-z0-9_]{6,32}$'),
        CONSTRAINT api_keys_secret_hash_format CHECK (secret_hash ~ '^[0-9a-f]{64}$'),
        CONSTRAINT api_keys_name_present CHECK (length(btrim(name)) BETWEEN 1 AND 100),
        CONSTRAINT api_keys_scope_known CHECK (scope IN ('read', 'write'))
      )`);
    await q.query(`CREATE UNIQUE INDEX api_keys_active_name_unique ON api_keys (user_id, lower(name)) WHERE revoked_at IS NULL`);

    await q.query(`
      CREATE TABLE one_time_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        purpose text NOT NULL,
        email text NOT NULL,
        user_id uuid REFERENCES users (id) ON DELETE CASCADE,
        token_hash text NOT NULL,
        roles text[] NOT NULL DEFAULT '{}',
        created_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        CONSTRAINT one_time_tokens_hash_unique UNIQUE (token_hash),
        CONSTRAINT one_time_tokens_hash_format CHECK (token_hash ~ '^[0-9a-f]{64}$'),
        CONSTRAINT one_time_tokens_purpose_known CHECK (purpose IN ('invitation', 'password_reset', 'email_verification')),
        CONSTRAINT one_time_tokens_email_lower CHECK (email = lower(email)),
        CONSTRAINT one_time_tokens_user_for_purpose CHECK (purpose = 'invitation' OR user_id IS NOT NULL),
        CONSTRAINT one_time_tokens_roles_known CHECK (roles <@ ARRAY['reader', 'steward', 'reviewer', 'editor', 'admin']::text[]),
        CONSTRAINT one_time_tokens_expiry_after_creation CHECK (expires_at > created_at)
      )`);
    await q.query(`CREATE INDEX one_time_tokens_email ON one_time_tokens (email, purpose)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE one_time_tokens`);
    await q.query(`DROP TABLE api_keys`);
    await q.query(`DROP TABLE refresh_tokens`);
    await q.query(`DROP TABLE users`);
  }
}
