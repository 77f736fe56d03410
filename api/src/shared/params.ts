import { BadRequestError } from './errors';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A path parameter that must be a record id; anything else is a 400 naming the parameter. */
export function uuidParam(value: string | string[] | undefined, name = 'id'): string {
  const text = Array.isArray(value) ? value[0] : value;
  if (!text || !UUID.test(text)) throw new BadRequestError(`${name} must be a UUID, got "${text ?? ''}"`);
  return text.toLowerCase();
}
