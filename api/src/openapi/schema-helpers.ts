/** Small builders that keep the OpenAPI document readable. JSON Schema 2020-12 as OpenAPI 3.1 uses it. */
export type Schema = Record<string, unknown>;

export const ref = (name: string): Schema => ({ $ref: `#/components/schemas/${name}` });
export const str = (description?: string, extra: Schema = {}): Schema => ({ type: 'string', ...(description ? { description } : {}), ...extra });
export const num = (description?: string, extra: Schema = {}): Schema => ({ type: 'number', ...(description ? { description } : {}), ...extra });
export const int = (description?: string, extra: Schema = {}): Schema => ({ type: 'integer', ...(description ? { description } : {}), ...extra });
export const bool = (description?: string): Schema => ({ type: 'boolean', ...(description ? { description } : {}) });
export const dateTime = (description?: string): Schema => str(description, { format: 'date-time' });
export const uuid = (description?: string): Schema => str(description, { format: 'uuid' });
export const array = (items: Schema, description?: string): Schema => ({ type: 'array', items, ...(description ? { description } : {}) });
export const enumOf = (values: readonly string[], description?: string): Schema => ({ type: 'string', enum: [...values], ...(description ? { description } : {}) });

/** The schema, or null. */
export function nullable(schema: Schema): Schema {
  // A formatted string (date-time) stays a plain schema inside anyOf, where the validator's
  // serializer turns Date objects into text before checking.
  if (typeof schema.$ref === 'string' || schema.format !== undefined) return { anyOf: [schema, { type: 'null' }] };
  const type = schema.type;
  if (typeof type === 'string') {
    const out: Schema = { ...schema, type: [type, 'null'] };
    if (Array.isArray(schema.enum)) out.enum = [...(schema.enum as unknown[]), null];
    return out;
  }
  return { anyOf: [schema, { type: 'null' }] };
}

/**
 * A closed object: every listed property is required unless named in `optional`, and nothing
 * else may appear (so the response validator catches a field the document does not describe).
 */
export function object(properties: Record<string, Schema>, options: { optional?: string[]; description?: string; open?: boolean } = {}): Schema {
  const optional = new Set(options.optional ?? []);
  return {
    type: 'object',
    ...(options.description ? { description: options.description } : {}),
    properties,
    required: Object.keys(properties).filter((k) => !optional.has(k)),
    additionalProperties: options.open ?? false,
  };
}

export const json = (schema: Schema, description = 'OK') => ({ description, content: { 'application/json': { schema } } });
