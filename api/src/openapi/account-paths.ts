import { ROLES } from '../auth/principal';
import { array, bool, dateTime, enumOf, int, json, nullable, object, ref, str, uuid, type Schema } from './schema-helpers';

/** Schemas and paths of health, sign-in, accounts, API keys, the audit trail and the dev outbox. */
export const accountSchemas: Record<string, Schema> = {
  Health: object({ status: enumOf(['ok', 'degraded']), database: enumOf(['up', 'down']), version: str() }),
  SessionUser: object({ id: uuid(), email: str(), name: str(), roles: array(enumOf(ROLES)) }),
  SignedIn: object({ accessToken: str('JWT for the Authorization: Bearer header'), expiresIn: int('seconds'), user: ref('SessionUser') }),
  Me: object({ id: uuid(), email: str(), name: str(), roles: array(enumOf(ROLES)), via: enumOf(['user', 'api-key']) }),
  User: object({
    id: uuid(), email: str(), name: str(), roles: array(enumOf(ROLES)), active: bool(), emailVerified: bool(),
    lastSignInAt: nullable(dateTime()), createdAt: dateTime(),
  }),
  Invitation: object({ email: str(), roles: array(enumOf(ROLES)), expiresInHours: int() }),
  ApiKey: object({
    id: uuid(), name: str(), scope: enumOf(['read', 'write']), prefix: str(), createdAt: dateTime(), lastUsedAt: nullable(dateTime()),
    revokedAt: nullable(dateTime()), owner: object({ id: uuid(), email: str() }),
  }, { optional: ['owner'] }),
  ApiKeyCreated: {
    allOf: [ref('ApiKey')],
    type: 'object',
    properties: { secret: str('shown once: send it as X-API-Key (or Authorization: Bearer)') },
    required: ['secret'],
  },
  AuditEntry: {
    type: 'object',
    properties: {
      id: str(), occurredAt: dateTime(), actorUserId: nullable(uuid()), actorApiKeyId: nullable(uuid()), actorLabel: nullable(str()),
      action: str(), entityType: nullable(str()), entityId: nullable(str()), details: { type: 'object' }, ipAddress: nullable(str()),
      userAgent: nullable(str()), requestId: nullable(str()),
    },
  },
  Message: object({ message: str() }),
  OutboxMail: {
    type: 'object',
    properties: { id: str(), receivedAt: dateTime(), from: str(), to: array(str()), subject: str(), text: str(), html: str() },
  },
};

const errors = { default: json(ref('Error'), 'Error') };
const body = (schema: Schema) => ({ required: true, content: { 'application/json': { schema } } });
const noContent = { 204: { description: 'Done' } };
const idParam = (description: string) => ({ name: 'id', in: 'path', required: true, description, schema: str(undefined, { format: 'uuid' }) });
const password = str(undefined, { minLength: 1 });

export const accountPaths: Record<string, Record<string, Schema>> = {
  '/health': {
    get: { tags: ['Service'], summary: 'Liveness and database reachability', responses: { 200: json(ref('Health')), 503: json(ref('Health'), 'The database is unreachable') } },
  },
  '/auth/login': {
    post: {
      tags: ['Sign-in'], summary: 'Sign in with e-mail and password',
      description: 'Answers an access token and sets the refresh cookie (kx_refresh, HttpOnly, path /api/v1/auth). Throttled per address and client.',
      requestBody: body(object({ email: str(undefined, { format: 'email' }), password })),
      responses: { 200: json(ref('SignedIn')), ...errors },
    },
  },
  '/auth/refresh': {
    post: { tags: ['Sign-in'], summary: 'New access token from the refresh cookie (rotates the cookie)', responses: { 200: json(ref('SignedIn')), ...errors } },
  },
  '/auth/logout': {
    post: { tags: ['Sign-in'], summary: 'Sign out: revokes the refresh cookie', responses: { ...noContent, ...errors } },
  },
  '/auth/me': {
    get: { tags: ['Sign-in'], summary: 'Who is calling (user or API key)', responses: { 200: json(ref('Me')), ...errors } },
  },
  '/auth/password-reset/request': {
    post: {
      tags: ['Sign-in'], summary: 'Send a password-reset link', description: 'Answers 202 whether or not the address has an account.',
      requestBody: body(object({ email: str(undefined, { format: 'email' }) })),
      responses: { 202: json(ref('Message')), ...errors },
    },
  },
  '/auth/password-reset/confirm': {
    post: {
      tags: ['Sign-in'], summary: 'Set a new password with a reset token',
      requestBody: body(object({ token: str(), password })),
      responses: { ...noContent, ...errors },
    },
  },
  '/auth/invitations/accept': {
    post: {
      tags: ['Sign-in'], summary: 'Accept an invitation: create the account and sign in',
      requestBody: body(object({ token: str(), name: str(), password })),
      responses: { 201: json(ref('SignedIn')), ...errors },
    },
  },
  '/auth/change-password': {
    post: {
      tags: ['Sign-in'], summary: 'Change your password',
      requestBody: body(object({ currentPassword: password, newPassword: password })),
      responses: { ...noContent, ...errors },
    },
  },
  '/auth/verify-email/request': {
    post: { tags: ['Sign-in'], summary: 'Send an e-mail confirmation link', responses: { 202: json(ref('Message')), ...errors } },
  },
  '/auth/verify-email/confirm': {
    post: { tags: ['Sign-in'], summary: 'Confirm an e-mail address with its token', requestBody: body(object({ token: str() })), responses: { ...noContent, ...errors } },
  },
  '/users': {
    get: { tags: ['Administration'], summary: 'List users', responses: { 200: json(object({ items: array(ref('User')) })), ...errors } },
  },
  '/users/invitations': {
    post: {
      tags: ['Administration'], summary: 'Invite a user by e-mail with roles',
      requestBody: body(object({ email: str(undefined, { format: 'email' }), roles: array(enumOf(ROLES)) })),
      responses: { 201: json(ref('Invitation')), ...errors },
    },
  },
  '/users/{id}/roles': {
    put: {
      tags: ['Administration'], summary: "Set a user's roles", parameters: [idParam('user id')],
      requestBody: body(object({ roles: array(enumOf(ROLES)) })),
      responses: { 200: json(ref('User')), ...errors },
    },
  },
  '/users/{id}/deactivate': {
    post: { tags: ['Administration'], summary: 'Deactivate a user (their sessions and keys stop working)', parameters: [idParam('user id')], responses: { 200: json(ref('User')), ...errors } },
  },
  '/users/{id}/reactivate': {
    post: { tags: ['Administration'], summary: 'Reactivate a user', parameters: [idParam('user id')], responses: { 200: json(ref('User')), ...errors } },
  },
  '/api-keys': {
    get: { tags: ['API keys'], summary: 'Your API keys', responses: { 200: json(object({ items: array(ref('ApiKey')) })), ...errors } },
    post: {
      tags: ['API keys'], summary: 'Create an API key (the secret is shown once)',
      requestBody: body(object({ name: str(undefined, { minLength: 1, maxLength: 100 }), scope: enumOf(['read', 'write']) }, { optional: ['scope'] })),
      responses: { 201: json(ref('ApiKeyCreated')), ...errors },
    },
  },
  '/api-keys/all': {
    get: { tags: ['API keys'], summary: "Every user's API keys (admins)", responses: { 200: json(object({ items: array(ref('ApiKey')) })), ...errors } },
  },
  '/api-keys/{id}': {
    delete: { tags: ['API keys'], summary: 'Revoke one of your API keys', parameters: [idParam('API key id')], responses: { ...noContent, ...errors } },
  },
  '/audit': {
    get: {
      tags: ['Administration'], summary: 'The audit trail, newest first',
      parameters: ['user', 'action', 'entityType', 'entityId', 'from', 'to', 'page', 'pageSize'].map((name) => ({ name, in: 'query', schema: str() })),
      responses: { 200: json({ type: 'object', properties: { items: array(ref('AuditEntry')), total: int(), page: int(), pageSize: int() } }), ...errors },
    },
  },
  '/dev/outbox': {
    get: {
      tags: ['Service'], summary: 'E-mails captured by the local SMTP catcher (development only)',
      parameters: [{ name: 'to', in: 'query', schema: str() }],
      responses: { 200: json({ type: 'object', properties: { items: array(ref('OutboxMail')) } }), ...errors },
    },
  },
  '/openapi.json': {
    get: { tags: ['Service'], summary: 'This document (OpenAPI 3.1)', responses: { 200: json({ type: 'object' }) } },
  },
  '/docs': {
    get: { tags: ['Service'], summary: 'Interactive API reference (HTML)', responses: { 200: { description: 'HTML page', content: { 'text/html': { schema: str() } } } } },
  },
  '/docs/reference.js': {
    get: { tags: ['Service'], summary: 'Script of the API reference page', responses: { 200: { description: 'JavaScript', content: { 'text/javascript': { schema: str() } } } } },
  },
};
