import type { Client } from 'pg';
import type { HttpRequestSpec } from './http-load';

/**
 * The requests of each benchmark, drawn from the data set itself (deterministically: ordered by a
 * hash of the id), so that every request is a different, realistic one.
 */
export interface Scenario {
  key: string;
  title: string;
  requests: HttpRequestSpec[];
}

/** Ten temperatures / K within every generated fit (200–3000 K at least). */
export const PROPERTY_TEMPERATURES = [298.15, 300, 400, 500, 600, 800, 1000, 1500, 2000, 2500];
const REACTION_TEMPERATURES = [298.15, 500, 1000, 1500];
const SAMPLE = 400;

export async function latestPublishedRelease(client: Client): Promise<{ id: string; label: string }> {
  const { rows } = await client.query(
    `SELECT id, label FROM releases WHERE status = 'published'
      ORDER BY split_part(label, '.', 1)::int DESC, split_part(label, '.', 2)::int DESC LIMIT 1`,
  );
  if (!rows[0]) throw new Error('The bench database has no published release');
  return rows[0];
}

export async function buildScenarios(client: Client): Promise<Scenario[]> {
  const release = await latestPublishedRelease(client);
  const inRelease = `EXISTS (SELECT 1 FROM species_phases sp JOIN release_members m ON m.species_phase_id = sp.id WHERE sp.species_id = s.id AND m.release_id = $1)`;

  const formulas: { formula: string }[] = (await client.query(
    `SELECT s.formula FROM species s WHERE ${inRelease} ORDER BY md5(s.id::text) LIMIT ${SAMPLE}`, [release.id])).rows;

  const names: { name: string }[] = (await client.query(
    `SELECT s.name FROM species s WHERE ${inRelease} ORDER BY md5(s.id::text || 'name') LIMIT ${SAMPLE}`, [release.id])).rows;
  const queries = names.map(({ name }, i) => {
    if (i % 10 < 5) return name;
    // what people type: a distinctive word of the name ("methylhexan", "sulfate"), sometimes misspelt
    const words = name.split(/[^A-Za-z()]+/).filter((w) => w.length >= 5).sort((a, b) => b.length - a.length);
    const word = words[0] ?? name;
    return i % 10 < 8 ? word : word.slice(0, Math.floor(word.length / 2)) + word.slice(Math.floor(word.length / 2) + 1);
  });

  const elementSets = ['C,H', 'C,H,O', 'C,H,N', 'C,H,N,O', 'C,H,Cl', 'C,H,O,S', 'C,H,F', 'C,H,Br', 'C,H,Cl,O', 'C,H,N,O,S', 'Cl,Na', 'Cu,O,S', 'H,O', 'C,H,I', 'C,H,O,Si'];

  const gases: { id: string }[] = (await client.query(
    `SELECT s.id FROM species s JOIN species_phases sp ON sp.species_id = s.id AND sp.phase = 'g'
      WHERE EXISTS (SELECT 1 FROM release_members m WHERE m.species_phase_id = sp.id AND m.release_id = $1 AND m.member_kind = 'fit')
      ORDER BY md5(s.id::text || 'properties') LIMIT ${SAMPLE}`, [release.id])).rows;

  // Fuels for combustion equations: C/H/O/N gases whose Hill formula names one gas only in the release.
  const fuels: { formula: string; composition: Record<string, number> }[] = (await client.query(
    `SELECT s.formula, s.composition FROM species s JOIN species_phases sp ON sp.species_id = s.id AND sp.phase = 'g'
      WHERE s.charge = 0 AND s.element_symbols <@ ARRAY['C','H','N','O'] AND s.element_symbols @> ARRAY['C','H']
        AND EXISTS (SELECT 1 FROM release_members m WHERE m.species_phase_id = sp.id AND m.release_id = $1 AND m.member_kind = 'fit' AND m.is_recommended)
        AND NOT EXISTS (SELECT 1 FROM species o JOIN species_phases op ON op.species_id = o.id AND op.phase = 'g'
                         WHERE o.hill_formula = s.hill_formula AND o.id <> s.id)
      ORDER BY md5(s.id::text || 'reaction') LIMIT ${SAMPLE}`, [release.id])).rows;
  const equations = fuels.map(({ formula, composition }) => combustion(formula, composition)).filter((e): e is string => e !== null);

  const get = (path: string): HttpRequestSpec => ({ method: 'GET', path });
  const q = encodeURIComponent;
  return [
    { key: 'search-formula', title: 'Species search by formula', requests: formulas.map((f) => get(`/api/v1/species?formula=${q(f.formula)}`)) },
    { key: 'search-name', title: 'Species search by name (q)', requests: queries.map((text) => get(`/api/v1/species?q=${q(text)}`)) },
    { key: 'search-elements', title: 'Species search by elements (only)', requests: elementSets.map((e) => get(`/api/v1/species?elements=${e}&elementsMode=only`)) },
    {
      key: 'properties',
      title: 'Properties at 10 temperatures (g)',
      requests: gases.map((g) => get(`/api/v1/species/${g.id}/properties?phase=g&T=${PROPERTY_TEMPERATURES.join(',')}`)),
    },
    {
      key: 'reaction',
      title: 'Reaction evaluation (combustion, 4 T)',
      requests: equations.map((equation) => ({ method: 'POST', path: '/api/v1/reactions/evaluate', body: JSON.stringify({ equation, temperatures: REACTION_TEMPERATURES }) })),
    },
    { key: 'export-filtered', title: 'CSV export filtered by formula', requests: formulas.map((f) => get(`/api/v1/export?format=csv&formula=${q(f.formula)}`)) },
  ];
}

/**
 * CcHhOoNn(g) + (c + h/4 − o/2) O2(g) → c CO2(g) + h/2 H2O(g) + n/2 N2(g), written with the
 * smallest whole coefficients; null when the fuel needs no oxygen.
 */
export function combustion(formula: string, composition: Record<string, number>): string | null {
  const c = composition.C ?? 0, h = composition.H ?? 0, o = composition.O ?? 0, n = composition.N ?? 0;
  const terms = [4, 4 * c + h - 2 * o, 4 * c, 2 * h, 2 * n];
  if (terms[1] <= 0) return null;
  const divisor = terms.filter((t) => t > 0).reduce(gcd);
  const [fuel, oxygen, co2, water, nitrogen] = terms.map((t) => t / divisor);
  const coefficient = (k: number) => (k === 1 ? '' : `${k} `);
  const products = [`${coefficient(co2)}CO2(g)`, `${coefficient(water)}H2O(g)`, ...(nitrogen ? [`${coefficient(nitrogen)}N2(g)`] : [])];
  return `${coefficient(fuel)}${formula}(g) + ${coefficient(oxygen)}O2(g) -> ${products.join(' + ')}`;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}
