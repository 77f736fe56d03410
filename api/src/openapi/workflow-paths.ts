import { PROPOSAL_ITEM_KINDS, PROPOSAL_STATES, REVIEW_DECISIONS } from '../proposals/proposal-vocabulary';
import { QUANTITIES } from '../values/value-vocabulary';
import { enumOf, int, json, num, object, ref, str, uuid, type Schema } from './schema-helpers';

/**
 * The editorial workflow (proposals, reviews, evidence, release editing, sources, bulk import) and
 * each user's own records (watchlist, saved reactions, preferences). Requests are described field
 * by field; answers as open objects whose main fields are named, since these routes are not
 * checked against the document (the read and compute routes are).
 */
export const workflowSchemas: Record<string, Schema> = {
  Proposal: {
    type: 'object',
    description: 'A proposal: title, summary, state, author, items (each with its kind, payload, checks and evidence), reviews, version.',
    properties: { id: uuid(), title: str(), summary: str(), state: enumOf(PROPOSAL_STATES), version: int() },
  },
  ProposalItem: {
    type: 'object',
    description: 'One change a proposal makes, with the consistency checks run on it.',
    properties: { id: uuid(), kind: enumOf(PROPOSAL_ITEM_KINDS), payload: { type: 'object' }, checks: { type: ['array', 'null'] } },
  },
  OpenRecord: { type: 'object', description: 'See the summary of the operation.' },
};

const errors = { default: json(ref('Error'), 'Error') };
const body = (schema: Schema) => ({ required: true, content: { 'application/json': { schema } } });
const upload = (fields: Record<string, Schema>) => ({
  required: true,
  content: { 'multipart/form-data': { schema: { type: 'object', properties: { file: str('the file', { format: 'binary' }), ...fields }, required: ['file'] } } },
});
const path = (name: string, description: string, schema: Schema = str(undefined, { format: 'uuid' })) => ({ name, in: 'path', required: true, description, schema });
const query = (name: string, description: string, schema: Schema = str()) => ({ name, in: 'query', description, schema });
const open = (description: string) => json(ref('OpenRecord'), description);
const noContent = { 204: { description: 'Done' } };
const proposalId = path('id', 'proposal id');
const itemId = path('itemId', 'proposal item id');
const label = path('label', 'release label', str(undefined, { pattern: '^[0-9]{4}\\.[1-9][0-9]*$' }));
const version = object({ version: int('the proposal version the author saw (optimistic lock)', { minimum: 1 }) }, { optional: ['version'] });

export const workflowPaths: Record<string, Record<string, Schema>> = {
  '/proposals': {
    get: {
      tags: ['Proposals'], summary: 'Proposals visible to the caller (the review queue, the author\'s own)',
      parameters: [
        query('state', `Comma-separated states: ${PROPOSAL_STATES.join(', ')}.`),
        query('mine', 'true: only the caller\'s own.', enumOf(['true', 'false'])),
        query('assignedToMe', 'true: only those awaiting the caller\'s review.', enumOf(['true', 'false'])),
        query('sort', 'updatedAt, -updatedAt (default), createdAt, -createdAt, submittedAt, …'),
        query('limit', '1–500 (default 50).'),
        query('offset', 'from 0.'),
      ],
      responses: { 200: open('{items, total}'), ...errors },
    },
    post: {
      tags: ['Proposals'], summary: 'Start a draft proposal',
      requestBody: body(object({ title: str(undefined, { minLength: 1, maxLength: 300 }), summary: str(undefined, { maxLength: 20000 }) }, { optional: ['summary'] })),
      responses: { 201: json(ref('Proposal')), ...errors },
    },
  },
  '/proposals/{id}': {
    get: {
      tags: ['Proposals'], summary: 'A proposal with its items (paged), checks, reviews and evidence',
      parameters: [proposalId, query('itemOffset', 'from 0.'), query('itemLimit', '1–5000 (default 500).')],
      responses: { 200: json(ref('Proposal')), ...errors },
    },
  },
  '/proposals/{id}/items': {
    post: {
      tags: ['Proposals'], summary: 'Add an item (new species, phase, value, revision, retirement, fit, recommendation)',
      parameters: [proposalId],
      requestBody: body(object({ kind: enumOf(PROPOSAL_ITEM_KINDS), payload: { type: 'object' }, sourceId: { type: ['string', 'null'], format: 'uuid' } }, { optional: ['sourceId'] })),
      responses: { 201: json(ref('ProposalItem')), ...errors },
    },
  },
  '/proposals/{id}/items/{itemId}': {
    patch: {
      tags: ['Proposals'], summary: 'Change an item\'s payload or source (drafts and proposals sent back for changes)',
      parameters: [proposalId, itemId],
      requestBody: body(object({ payload: { type: 'object' }, sourceId: { type: ['string', 'null'], format: 'uuid' } }, { optional: ['payload', 'sourceId'] })),
      responses: { 200: json(ref('ProposalItem')), ...errors },
    },
    delete: { tags: ['Proposals'], summary: 'Remove an item', parameters: [proposalId, itemId], responses: { ...noContent, ...errors } },
  },
  '/proposals/{id}/items/{itemId}/evidence': {
    post: {
      tags: ['Proposals'], summary: 'Attach an evidence file to an item (multipart/form-data: file, description)',
      parameters: [proposalId, itemId],
      requestBody: upload({ description: str(undefined, { maxLength: 2000 }) }),
      responses: { 201: open('the evidence record: file name, media type, size, SHA-256'), ...errors },
    },
  },
  '/proposals/{id}/submit': {
    post: { tags: ['Proposals'], summary: 'Submit a draft for review (runs the consistency checks)', parameters: [proposalId], requestBody: body(version), responses: { 200: json(ref('Proposal')), ...errors } },
  },
  '/proposals/{id}/resubmit': {
    post: { tags: ['Proposals'], summary: 'Resubmit after changes were requested', parameters: [proposalId], requestBody: body(version), responses: { 200: json(ref('Proposal')), ...errors } },
  },
  '/proposals/{id}/withdraw': {
    post: { tags: ['Proposals'], summary: 'Withdraw a proposal', parameters: [proposalId], requestBody: body(version), responses: { 200: json(ref('Proposal')), ...errors } },
  },
  '/proposals/{id}/reviews': {
    post: {
      tags: ['Proposals'], summary: 'Review: approve, request changes or reject (never one\'s own proposal)',
      parameters: [proposalId],
      requestBody: body(object({
        decision: enumOf(REVIEW_DECISIONS),
        comment: str(undefined, { maxLength: 20000 }),
        justification: str('why failing checks are accepted', { minLength: 1, maxLength: 20000 }),
        version: int('the proposal version reviewed', { minimum: 1 }),
      }, { optional: ['comment', 'justification'] })),
      responses: { 201: open('the review and the proposal\'s new state'), ...errors },
    },
  },
  '/proposals/{id}/comments': {
    get: { tags: ['Proposals'], summary: 'Comments, oldest first', parameters: [proposalId], responses: { 200: open('{items}'), ...errors } },
    post: {
      tags: ['Proposals'], summary: 'Comment on a proposal or one of its items',
      parameters: [proposalId],
      requestBody: body(object({ body: str(undefined, { minLength: 1, maxLength: 20000 }), itemId: uuid() }, { optional: ['itemId'] })),
      responses: { 201: open('the comment'), ...errors },
    },
  },
  '/proposals/{id}/impact': {
    get: { tags: ['Proposals'], summary: 'Effect of the proposal on saved reactions and watched species', parameters: [proposalId], responses: { 200: open('{proposalId, …}'), ...errors } },
  },
  '/evidence/{id}': {
    get: {
      tags: ['Proposals'], summary: 'Download an evidence file (or ?meta=true for its record)',
      parameters: [path('id', 'evidence file id'), query('meta', 'true: the record (name, media type, size, SHA-256) instead of the bytes.', enumOf(['true', 'false']))],
      responses: { 200: { description: 'The file as uploaded (ETag = SHA-256), or its record' }, ...errors },
    },
  },
  '/releases': {
    post: {
      tags: ['Releases'], summary: 'Open a release in preparation (carries the latest published release over)',
      requestBody: body(object({ label: str('year and number, e.g. 2027.2', { pattern: '^[0-9]{4}\\.[1-9][0-9]*$' }), notes: str(undefined, { maxLength: 50000 }) }, { optional: ['notes'] })),
      responses: { 201: open('the release'), ...errors },
    },
  },
  '/releases/{label}': {
    patch: { tags: ['Releases'], summary: 'Edit the notes of a release in preparation', parameters: [label], requestBody: body(object({ notes: str(undefined, { maxLength: 50000 }) })), responses: { 200: open('the release'), ...errors } },
  },
  '/releases/{label}/workspace': {
    get: {
      tags: ['Releases'], summary: 'The editor\'s view of a release: its proposals, the species phases and quantities still needing one recommended value, and the change log so far',
      parameters: [label],
      responses: { 200: open('the release with proposals, needsRecommendation and changeLog'), ...errors },
    },
  },
  '/releases/{label}/proposals': {
    post: { tags: ['Releases'], summary: 'Assemble an approved proposal into a release in preparation', parameters: [label], requestBody: body(object({ proposalId: uuid() })), responses: { 200: open('the release'), ...errors } },
  },
  '/releases/{label}/recommended': {
    put: {
      tags: ['Releases'], summary: 'Choose the recommended value or fit of a species phase and quantity',
      parameters: [label],
      requestBody: body(object({ speciesPhaseId: uuid(), quantity: enumOf(QUANTITIES), valueId: uuid(), fitId: uuid() }, { optional: ['valueId', 'fitId'] })),
      responses: { 200: open('the release'), ...errors },
    },
  },
  '/releases/{label}/publish': {
    post: {
      tags: ['Releases'], summary: 'Publish a release: from then on it never changes',
      parameters: [label],
      requestBody: body(object({ confirm: { const: true }, version: int(undefined, { minimum: 1 }) }, { optional: ['version'] })),
      responses: { 200: open('the published release with its change log'), ...errors },
    },
  },
  '/sources': {
    get: {
      tags: ['Sources'], summary: 'Search bibliographic sources',
      parameters: [query('q', 'key, title, author or DOI'), query('limit', '1–500 (default 50).'), query('offset', 'from 0.')],
      responses: { 200: open('{items, total}'), ...errors },
    },
    post: {
      tags: ['Sources'], summary: 'Create a source by hand (CSL-JSON fields) or from a DOI',
      requestBody: body({ type: 'object', description: 'shortKey, title, year, doi, csl (CSL-JSON)…' }),
      responses: { 201: open('the source'), ...errors },
    },
  },
  '/sources/import': {
    post: {
      tags: ['Sources'], summary: 'Import sources from BibTeX or RIS text',
      requestBody: body(object({ text: str(undefined, { minLength: 1, maxLength: 1000000 }), format: enumOf(['bibtex', 'ris']) }, { optional: ['format'] })),
      responses: { 201: open('the sources created and the entries skipped'), ...errors },
    },
  },
  '/sources/{id}': {
    get: {
      tags: ['Sources'], summary: 'A source as JSON, CSL-JSON or BibTeX',
      parameters: [path('id', 'source id'), query('format', 'json (default), csl-json or bibtex.', enumOf(['json', 'csl-json', 'bibtex']))],
      responses: { 200: { description: 'The source', content: { 'application/json': { schema: ref('OpenRecord') }, 'application/vnd.citationstyles.csl+json': { schema: { type: 'object' } }, 'application/x-bibtex': { schema: str() } } }, ...errors },
    },
  },
  '/sources/{id}/merge': {
    post: { tags: ['Sources'], summary: 'Merge a duplicate source into the one kept', parameters: [path('id', 'the duplicate')], requestBody: body(object({ intoId: uuid('the source to keep') })), responses: { 200: open('the source kept'), ...errors } },
  },
  '/imports': {
    get: { tags: ['Sources'], summary: 'The caller\'s bulk imports', responses: { 200: open('{items}'), ...errors } },
    post: {
      tags: ['Sources'], summary: 'Bulk import a CSV or JSON file of values (multipart/form-data)',
      description: 'dryRun=true answers every problem with its line and writes nothing; dryRun=false answers 202 with a job that creates one draft proposal.',
      parameters: [query('dryRun', 'true: check only; false: create a draft proposal.', enumOf(['true', 'false']))],
      requestBody: upload({ title: str('title of the draft proposal') }),
      responses: { 200: open('the dry run\'s problems'), 202: open('the import job'), ...errors },
    },
  },
  '/imports/{id}': {
    get: { tags: ['Sources'], summary: 'An import job and its progress', parameters: [path('id', 'import job id')], responses: { 200: open('the job: status, rows processed, errors, proposal'), ...errors } },
  },
  '/watchlist': {
    get: { tags: ['Your records'], summary: 'Species the caller watches', responses: { 200: open('{items}'), ...errors } },
  },
  '/watchlist/{speciesId}': {
    put: { tags: ['Your records'], summary: 'Watch a species (told when its values change)', parameters: [path('speciesId', 'species id')], responses: { 200: open('already watched'), 201: open('now watched'), ...errors } },
    delete: { tags: ['Your records'], summary: 'Stop watching a species', parameters: [path('speciesId', 'species id')], responses: { ...noContent, ...errors } },
  },
  '/saved-reactions': {
    get: { tags: ['Your records'], summary: 'The caller\'s saved reactions', responses: { 200: open('{items}'), ...errors } },
    post: {
      tags: ['Your records'], summary: 'Save a reaction',
      requestBody: body(object({ name: str(undefined, { minLength: 1, maxLength: 200 }), equation: str(undefined, { minLength: 1, maxLength: 2000 }), tMin: num('K'), tMax: num('K') })),
      responses: { 201: open('the saved reaction'), ...errors },
    },
  },
  '/saved-reactions/{id}': {
    delete: { tags: ['Your records'], summary: 'Delete a saved reaction', parameters: [path('id', 'saved reaction id')], responses: { ...noContent, ...errors } },
  },
  '/me/preferences': {
    get: { tags: ['Your records'], summary: 'The caller\'s display preferences', responses: { 200: json(object({ energyUnit: enumOf(['kJ', 'kcal']) }, { open: true })), ...errors } },
    put: {
      tags: ['Your records'], summary: 'Replace the caller\'s display preferences (the API itself always answers in SI)',
      requestBody: body(object({ energyUnit: enumOf(['kJ', 'kcal']) })),
      responses: { 200: json(object({ energyUnit: enumOf(['kJ', 'kcal']) }, { open: true })), ...errors },
    },
  },
};

export const WORKFLOW_TAGS = [
  { name: 'Proposals', description: 'Drafting, submitting and reviewing changes, with evidence' },
  { name: 'Sources', description: 'Bibliographic sources and bulk import' },
  { name: 'Your records', description: 'Watchlist, saved reactions, preferences' },
];

