import { plainToInstance, type ClassConstructor } from 'class-transformer';
import { validate, type ValidationError } from 'class-validator';
import { BadRequestError } from './errors';

/**
 * Turns a request body into a validated DTO instance; a 400 lists every field's problem.
 * Unknown properties are refused so that typos do not pass silently.
 */
export async function validateBody<T extends object>(dto: ClassConstructor<T>, body: unknown): Promise<T> {
  if (typeof body !== 'object' || body === null || Array.isArray(body)) {
    throw new BadRequestError('The request body must be a JSON object');
  }
  const instance = plainToInstance(dto, body);
  const errors = await validate(instance, { whitelist: true, forbidNonWhitelisted: true });
  if (errors.length > 0) {
    const fields = flatten(errors);
    throw new BadRequestError(`Invalid request: ${fields.map((f) => f.message).join('; ')}`, { fields });
  }
  return instance;
}

function flatten(errors: ValidationError[], parent = ''): { field: string; message: string }[] {
  return errors.flatMap((e) => {
    const field = parent ? `${parent}.${e.property}` : e.property;
    const own = Object.values(e.constraints ?? {}).map((message) => ({ field, message }));
    return [...own, ...flatten(e.children ?? [], field)];
  });
}
