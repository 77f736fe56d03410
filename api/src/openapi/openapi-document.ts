import { declaredRoutes, type Access, type DeclaredRoute } from '../auth/access';
import { APP_VERSION } from '../version';
import { accountPaths, accountSchemas } from './account-paths';
import { catalogueParameters, cataloguePaths } from './catalogue-paths';
import { catalogueSchemas } from './catalogue-schemas';
import { json, ref, type Schema } from './schema-helpers';
import { WORKFLOW_TAGS, workflowPaths, workflowSchemas } from './workflow-paths';

type Operation = Record<string, unknown>;
type Paths = Record<string, Record<string, Operation>>;

/** Paths whose requests (and, in tests, responses) the validator checks against this document. */
export const VALIDATED_OPERATIONS: readonly string[] = [
  'get /releases', 'get /releases/{label}', 'get /releases/{a}/diff/{b}',
  'get /species', 'get /species/{id}', 'get /species/{id}/properties',
  'post /reactions/evaluate', 'post /reactions/balance', 'post /reactions/derive-formation', 'post /reactions/adiabatic-rise',
  'get /export',
];

const DESCRIPTION = `Kelvindex: a curated, versioned database of thermochemical reference values.

All numbers are SI inside the API (J/mol, J/(mol·K), K, Pa) unless an endpoint offers other units; standard pressure 1 bar.

**Releases.** Every read endpoint answers from one release: \`release=<label>\` (e.g. \`2026.2\`), by default the latest published
release. A published release never changes, so answers for a release named in the request carry an ETag and
\`Cache-Control: public, max-age=31536000, immutable\`; pin the release in scripts so a calculation can be repeated exactly.

**Access.** Each operation states \`x-kelvindex-access\`: \`public\`, \`read\` (anyone when public reading is on, otherwise any
signed-in role; API keys with read scope may call the compute POSTs), \`signed-in\`, or the roles it needs. Send an access token as
\`Authorization: Bearer <token>\` (from POST /auth/login) or an API key as \`X-API-Key: <key>\`.

**Errors** are \`{error, message, details}\` with the HTTP status: 400 a malformed parameter (details name it), 401/403 access,
404 an unknown release or record, 409 a conflict, 422 something that cannot be computed or stored (details say what).`;

function openApiPath(path: string): string {
  return path.replace(/:(\w+)/g, '{$1}');
}

function securityFor(access: Access): { security: unknown[]; 'x-kelvindex-access': unknown } {
  if (access === 'public') return { security: [{}], 'x-kelvindex-access': 'public' };
  const signedIn = [{ bearerAuth: [] }, { apiKey: [] }];
  if (access === 'read') return { security: [{}, ...signedIn], 'x-kelvindex-access': 'read' };
  if (access === 'signed-in') return { security: signedIn, 'x-kelvindex-access': 'signed-in' };
  return { security: signedIn, 'x-kelvindex-access': access.roles };
}

/** An operation for a declared route nobody has described yet, so that the document lists every route. */
function placeholder(route: DeclaredRoute, path: string): Operation {
  const params = [...path.matchAll(/\{(\w+)\}/g)].map((m) => ({ name: m[1], in: 'path', required: true, schema: { type: 'string' } }));
  return {
    tags: [path.split('/')[1] ?? 'Other'],
    summary: `${route.method.toUpperCase()} ${path}`,
    description: 'Declared by the API; its request and response are not described here yet.',
    'x-kelvindex-undocumented': true,
    ...(params.length ? { parameters: params } : {}),
    ...(route.method === 'get' || route.method === 'delete' ? {} : { requestBody: { content: { 'application/json': { schema: { type: 'object' } } } } }),
    responses: { '2XX': { description: 'Success' }, default: json(ref('Error'), 'Error') },
  };
}

/**
 * The OpenAPI 3.1 document: hand-written descriptions of each feature's routes, the access each
 * route declares (from the route table every secured router fills), and a placeholder for any
 * declared route not described yet. Build it after every router exists (on first request).
 */
export function buildOpenApiDocument(routes: readonly DeclaredRoute[] = declaredRoutes): Schema {
  const paths: Paths = {};
  for (const source of [accountPaths, cataloguePaths, workflowPaths]) {
    for (const [path, operations] of Object.entries(source)) {
      paths[path] = { ...(paths[path] ?? {}), ...structuredClone(operations) };
    }
  }
  for (const route of routes) {
    const path = openApiPath(route.path);
    paths[path] ??= {};
    paths[path][route.method] ??= placeholder(route, path);
    Object.assign(paths[path][route.method], securityFor(route.access));
  }
  // Served by plain routers (no access declaration): public.
  for (const path of ['/health']) {
    for (const operation of Object.values(paths[path] ?? {})) Object.assign(operation, securityFor('public'));
  }
  const sorted: Paths = {};
  for (const path of Object.keys(paths).sort()) sorted[path] = paths[path];
  return {
    openapi: '3.1.0',
    info: {
      title: 'Kelvindex API',
      version: APP_VERSION,
      description: DESCRIPTION,
      license: { name: 'MIT', identifier: 'MIT' },
    },
    servers: [{ url: '/api/v1' }],
    tags: [
      { name: 'Species', description: 'Search, detail and property tables' },
      { name: 'Reactions', description: 'Reaction thermochemistry, balancing, Hess-law derivation, adiabatic rise' },
      { name: 'Releases', description: 'Published releases, change logs and differences' },
      { name: 'Export', description: 'CSV, JSON, XML and NASA-7 exports' },
      ...WORKFLOW_TAGS,
      { name: 'Sign-in' },
      { name: 'API keys' },
      { name: 'Administration' },
      { name: 'Service' },
    ],
    paths: sorted,
    components: {
      schemas: { ...catalogueSchemas, ...accountSchemas, ...workflowSchemas },
      parameters: catalogueParameters,
      securitySchemes: {
        bearerAuth: { type: 'http', scheme: 'bearer', bearerFormat: 'JWT', description: 'Access token from POST /auth/login' },
        apiKey: { type: 'apiKey', in: 'header', name: 'X-API-Key', description: 'API key from POST /api-keys (also accepted as a Bearer token)' },
      },
    },
  };
}

/** The document reduced to the operations the validator checks (fewer routes to match per request). */
export function validationDocument(document: Schema): Schema {
  const copy = structuredClone(document) as { paths: Paths };
  const paths: Paths = {};
  for (const key of VALIDATED_OPERATIONS) {
    const [method, path] = key.split(' ');
    const operation = copy.paths[path]?.[method];
    if (!operation) throw new Error(`The OpenAPI document does not describe ${key}`);
    paths[path] ??= {};
    paths[path][method] = operation;
  }
  copy.paths = paths;
  return copy;
}

let cached: Schema | undefined;

/** The document, built once (after the app has declared its routes). */
export function openApiDocument(): Schema {
  cached ??= buildOpenApiDocument();
  return cached;
}
