import { BadRequestError } from './errors';

/** At most this many temperatures per request (a 1 K grid over 2000 K, say). */
export const MAX_TEMPERATURES = 2000;
/** Above this a temperature is surely a typing slip (no published table goes beyond 20 000 K). */
const MAX_KELVIN = 1e5;

function kelvin(value: unknown, parameter: string, index?: number): number {
  const text = typeof value === 'string' ? value.trim() : value;
  const n = typeof text === 'number' ? text : text === '' ? Number.NaN : Number(text);
  const where = index === undefined ? parameter : `${parameter}[${index}]`;
  if (!Number.isFinite(n) || n <= 0 || n > MAX_KELVIN) {
    throw new BadRequestError(`${where} must be a temperature in kelvin, above 0 and at most ${MAX_KELVIN} K, got "${String(value)}"`, {
      parameter,
      ...(index === undefined ? {} : { index }),
    });
  }
  return n;
}

/**
 * Temperatures / K from an explicit list or from a grid Tmin, Tmin + Tstep, … ≤ Tmax (Tmax is
 * included when the steps land on it). Either a list or all three grid limits; nothing is the
 * reference temperature alone.
 *
 * @param names the parameter names used in messages (query `T`, `Tmin`… or body `temperatures`, `tMin`…)
 * @throws BadRequestError naming the parameter (and the position in a list) that is wrong
 */
export function temperatures(
  input: { list?: unknown[]; tMin?: unknown; tMax?: unknown; tStep?: unknown },
  names: { list: string; tMin: string; tMax: string; tStep: string },
  fallback: number[] = [298.15],
): number[] {
  const grid = [input.tMin, input.tMax, input.tStep].some((v) => v !== undefined);
  if (input.list !== undefined && grid) {
    throw new BadRequestError(`give either ${names.list} or ${names.tMin}, ${names.tMax} and ${names.tStep}, not both`, { parameter: names.list });
  }
  if (input.list !== undefined) {
    if (input.list.length === 0) throw new BadRequestError(`${names.list} must list at least one temperature`, { parameter: names.list });
    if (input.list.length > MAX_TEMPERATURES) {
      throw new BadRequestError(`${names.list} lists ${input.list.length} temperatures; at most ${MAX_TEMPERATURES} are allowed`, { parameter: names.list });
    }
    return input.list.map((v, i) => kelvin(v, names.list, i));
  }
  if (!grid) return fallback;
  for (const [value, name] of [[input.tMin, names.tMin], [input.tMax, names.tMax], [input.tStep, names.tStep]] as const) {
    if (value === undefined) throw new BadRequestError(`${name} is required with ${names.tMin}, ${names.tMax} and ${names.tStep}`, { parameter: name });
  }
  const tMin = kelvin(input.tMin, names.tMin);
  const tMax = kelvin(input.tMax, names.tMax);
  const tStep = kelvin(input.tStep, names.tStep);
  if (tMin > tMax) throw new BadRequestError(`${names.tMin} (${tMin} K) must not exceed ${names.tMax} (${tMax} K)`, { parameter: names.tMin });
  const count = Math.floor((tMax - tMin) / tStep + 1e-9) + 1;
  if (count > MAX_TEMPERATURES) {
    throw new BadRequestError(`${names.tMin}–${names.tMax} in steps of ${names.tStep} gives ${count} temperatures; at most ${MAX_TEMPERATURES} are allowed`, { parameter: names.tStep });
  }
  // Rounded to 1e-9 K so that 298.15 + 0.1·k prints as a person typed it.
  return Array.from({ length: count }, (_, k) => Math.round((tMin + k * tStep) * 1e9) / 1e9);
}

/** The comma-separated `T` list of a query string, as texts. */
export function splitList(text: string | undefined): string[] | undefined {
  return text === undefined ? undefined : text.split(',');
}
