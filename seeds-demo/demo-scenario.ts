import type { ProposalItemKind, ProposalState, ReviewDecision, StoredCheckResult } from '../api/src/proposals/proposal-vocabulary';
import type { Quantity, TransitionKind } from '../api/src/values/value-vocabulary';
import type { ReferenceSpecies } from './reference-set';

/**
 * The demo scenario — everything here is INVENTED for the Kelvindex demo: the company, its people
 * (see demo-accounts.ts), its reports and every number its "lab" measured. None of it is a
 * measurement, none of it may be used as a check value, and none of it leaves the demo.
 *
 * Quillmere Process Chemicals (an invented solvent maker) runs a small thermochemistry data team.
 * Its 2025–26 calorimetry campaign (combustion series TC-03, DSC series DSC-07) produced values for
 * three process solvents. The team's proposals sit in every workflow state: one released in
 * 2026.2, one approved and assembled into 2027.1 (in preparation), the rest on their way.
 */

export const DEMO_COMPANY = 'Quillmere Process Chemicals (invented)';

export const DEMO_SOURCES = [
  {
    key: 'qpc-tc03-2025',
    title: 'Combustion calorimetry of three process solvents, campaign TC-03 (invented demo report)',
    year: 2025,
    csl: {
      type: 'report',
      title: 'Combustion calorimetry of three process solvents, campaign TC-03',
      author: [{ family: 'Okafor', given: 'Tomasz' }, { family: 'Pohjala', given: 'Greta' }],
      publisher: DEMO_COMPANY,
      number: 'QPC-TC-03',
      issued: { 'date-parts': [[2025, 11]] },
      note: 'Invented for the Kelvindex demo; not a real report.',
    },
    notes: 'Invented internal report of the demo company. Not a measurement; never a check value.',
  },
  {
    key: 'qpc-dsc07-2026',
    title: 'Liquid heat capacities of process solvents by DSC, series DSC-07 (invented demo report)',
    year: 2026,
    csl: {
      type: 'report',
      title: 'Liquid heat capacities of process solvents by DSC, series DSC-07',
      author: [{ family: 'Pohjala', given: 'Greta' }],
      publisher: DEMO_COMPANY,
      number: 'QPC-DSC-07',
      issued: { 'date-parts': [[2026, 3]] },
      note: 'Invented for the Kelvindex demo; not a real report.',
    },
    notes: 'Invented internal report of the demo company. Not a measurement; never a check value.',
  },
  {
    key: 'qpc-est01-2026',
    title: 'Group-additivity estimates for C4 alcohols (invented demo memo)',
    year: 2026,
    csl: {
      type: 'report',
      title: 'Group-additivity estimates for C4 alcohols',
      author: [{ family: 'Okafor', given: 'Tomasz' }],
      publisher: DEMO_COMPANY,
      number: 'QPC-EST-01',
      issued: { 'date-parts': [[2026, 4]] },
      note: 'Invented for the Kelvindex demo; not a real memo.',
    },
    notes: 'Invented memo of the demo company. Never a check value.',
  },
];

/** Real substances the demo company works with; their identifiers are from memory. */
export const DEMO_SPECIES: ReferenceSpecies[] = [
  { key: 'C3H7OH', formula: 'CH3CH2CH2OH', name: 'propan-1-ol', synonyms: ['1-propanol', 'n-propyl alcohol'], casRn: '71-23-8',
    inchi: 'InChI=1S/C3H8O/c1-2-3-4/h4H,2-3H2,1H3', inchikey: 'BDERNNFJNOPAEC-UHFFFAOYSA-N', smiles: 'CCCO', phases: [{ phase: 'l' }] },
  { key: 'EtOAc', formula: 'CH3COOCH2CH3', name: 'ethyl acetate', synonyms: ['ethyl ethanoate', 'acetic acid ethyl ester'], casRn: '141-78-6',
    inchi: 'InChI=1S/C4H8O2/c1-3-6-4(2)5/h3H2,1-2H3', inchikey: 'XEKOWRVHYACXOJ-UHFFFAOYSA-N', smiles: 'CCOC(C)=O', phases: [{ phase: 'l' }] },
];

/** An invented value that a proposal brings in (a value row exists once the proposal is approved). */
export interface DemoValue {
  key: string;
  species: string;
  phase: string;
  quantity: Quantity;
  transitionKind?: TransitionKind;
  value: string;
  uncertainty: string;
  unit: 'kJ/mol' | 'J/(mol·K)';
  source: string;
}

export interface DemoItem {
  key: string;
  kind: ProposalItemKind;
  payload: Record<string, unknown>;
  source?: string;
  /** species / phase keys the item refers to (existing records) */
  species?: string;
  phase?: string;
  /** for revise_value: the demo value it revises (the loader adds its id to the payload as `valueId`) */
  targetValue?: string;
  /** the value row the item created (approved and released proposals) */
  resultValue?: DemoValue;
  /** species created by an add_species item of an approved proposal */
  resultSpecies?: string;
  resultPhase?: string;
  checks?: StoredCheckResult[];
  evidence?: DemoEvidence[];
}

export interface DemoEvidence {
  key: string;
  fileName: string;
  mediaType: string;
  description: string;
  content: string;
  /** attach to this source as well as to the item */
  source?: string;
}

export interface DemoReview {
  reviewer: string;
  decision: ReviewDecision;
  comment: string;
  at: string;
  justification?: string;
}

export interface DemoProposal {
  key: string;
  title: string;
  summary: string;
  state: ProposalState;
  author: string;
  createdAt: string;
  submittedAt?: string;
  decidedAt?: string;
  /** release it was assembled into */
  release?: '2026.2' | '2027.1';
  items: DemoItem[];
  reviews: DemoReview[];
  comments: { author: string; body: string; at: string; item?: string }[];
}

const STEWARD = 'steward@kelvindex.test';
const REVIEWER = 'reviewer@kelvindex.test';
const REVIEWER2 = 'reviewer2@kelvindex.test';

const pass = (code: string, message: string): StoredCheckResult => ({ code, status: 'pass', message });
const warn = (code: string, message: string, details?: Record<string, unknown>): StoredCheckResult => ({ code, status: 'warn', message, details });

// Invented calorimetry output (demo only).
const TC03_PROPANOL = `run,sample_mass_g,corrected_temperature_rise_K,massic_energy_of_combustion_J_per_g
C-101,0.81243,1.53318,-33584.2
C-102,0.79877,1.50741,-33590.7
C-103,0.80512,1.51925,-33579.9
C-104,0.80066,1.51097,-33588.1
C-105,0.81520,1.53824,-33582.6
# invented demo data (Quillmere Process Chemicals, campaign TC-03); not a measurement
`;
const TC03_ETHYL_ACETATE = `run,sample_mass_g,corrected_temperature_rise_K,massic_energy_of_combustion_J_per_g
C-111,0.90115,1.40312,-25453.8
C-112,0.89764,1.39771,-25460.2
C-113,0.90402,1.40749,-25449.5
C-114,0.89951,1.40058,-25457.9
# invented demo data (Quillmere Process Chemicals, campaign TC-03); not a measurement
`;
const DSC07_PROPANOL = `T_K,Cp_J_per_mol_K
280.00,136.9
290.00,140.6
298.15,144.2
310.00,148.1
320.00,151.9
330.00,155.8
340.00,159.9
# invented demo data (Quillmere Process Chemicals, series DSC-07); not a measurement
`;
const DSC07_BUTANOL_CALIBRATION = `DSC-07 calibration note, butan-1-ol runs B-21 to B-26 (invented demo text)

Heat-flow calibration: synthetic sapphire disc, 3 runs before and 3 after the sample series,
drift of the calibration factor 0.4 % over the day. Sample purity by GC 99.8 % (area),
water by Karl Fischer 0.03 % (mass). Pans hermetically sealed, 10 K/min, 270-330 K.
`;

export const DEMO_PROPOSALS: DemoProposal[] = [
  {
    key: 'released-propanol',
    title: 'Propan-1-ol (l): ΔfH° and Cp° from campaigns TC-03 and DSC-07',
    summary: 'First values for propan-1-ol in our catalogue, from our own combustion and DSC runs.',
    state: 'released',
    author: STEWARD,
    createdAt: '2026-03-02T09:12:00Z',
    submittedAt: '2026-03-04T14:30:00Z',
    decidedAt: '2026-03-11T10:05:00Z',
    release: '2026.2',
    items: [
      { key: 'add-species', kind: 'add_species', payload: { formula: 'CH3CH2CH2OH', name: 'propan-1-ol', casRn: '71-23-8' }, resultSpecies: 'C3H7OH' },
      { key: 'add-phase', kind: 'add_phase', payload: { species: 'propan-1-ol', phase: 'l' }, resultSpecies: 'C3H7OH', resultPhase: 'l' },
      {
        key: 'dfH', kind: 'add_value', source: 'qpc-tc03-2025',
        payload: { species: 'propan-1-ol', phase: 'l', quantity: 'dfH', value: '-302.9', uncertainty: '0.5', uncertaintyKind: 'expanded', coverageFactor: 2, unit: 'kJ/mol', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
        resultValue: { key: 'demo:propanol(l):dfH', species: 'C3H7OH', phase: 'l', quantity: 'dfH', value: '-302.9', uncertainty: '0.5', unit: 'kJ/mol', source: 'qpc-tc03-2025' },
        checks: [pass('plausible-magnitude', 'ΔfH° is in the usual range for a C3 alcohol liquid'), warn('compare-other-sources', 'No other source holds ΔfH° of propan-1-ol (l) yet')],
        evidence: [{ key: 'tc03-propanol', fileName: 'tc03-propan-1-ol-combustion.csv', mediaType: 'text/csv', description: 'Combustion runs C-101 to C-105 (invented demo data)', content: TC03_PROPANOL, source: 'qpc-tc03-2025' }],
      },
      {
        key: 'Cp', kind: 'add_value', source: 'qpc-dsc07-2026',
        payload: { species: 'propan-1-ol', phase: 'l', quantity: 'Cp', value: '144.2', uncertainty: '1.2', uncertaintyKind: 'expanded', coverageFactor: 2, unit: 'J/(mol·K)', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
        resultValue: { key: 'demo:propanol(l):Cp', species: 'C3H7OH', phase: 'l', quantity: 'Cp', value: '144.2', uncertainty: '1.2', unit: 'J/(mol·K)', source: 'qpc-dsc07-2026' },
        checks: [pass('heat-capacity-positive', 'Cp° > 0')],
      },
    ],
    reviews: [{ reviewer: REVIEWER, decision: 'approve', comment: 'Runs agree within 0.03 %; corrections to standard state documented in TC-03. Approved.', at: '2026-03-11T10:05:00Z' }],
    comments: [{ author: REVIEWER, body: 'Is the Washburn correction included in the massic energies?', at: '2026-03-09T08:40:00Z', item: 'dfH' },
      { author: STEWARD, body: 'Yes — section 4.2 of the TC-03 report.', at: '2026-03-09T11:02:00Z', item: 'dfH' }],
  },
  {
    key: 'approved-ethyl-acetate',
    title: 'Ethyl acetate (l): ΔfH° and Cp° from campaign TC-03',
    summary: 'Combustion series C-111 to C-114 and DSC series DSC-07 on our solvent-grade ethyl acetate.',
    state: 'approved',
    author: STEWARD,
    createdAt: '2026-09-14T08:00:00Z',
    submittedAt: '2026-09-15T16:20:00Z',
    decidedAt: '2026-10-02T13:45:00Z',
    release: '2027.1',
    items: [
      { key: 'add-species', kind: 'add_species', payload: { formula: 'CH3COOCH2CH3', name: 'ethyl acetate', casRn: '141-78-6' }, resultSpecies: 'EtOAc' },
      { key: 'add-phase', kind: 'add_phase', payload: { species: 'ethyl acetate', phase: 'l' }, resultSpecies: 'EtOAc', resultPhase: 'l' },
      {
        key: 'dfH', kind: 'add_value', source: 'qpc-tc03-2025',
        payload: { species: 'ethyl acetate', phase: 'l', quantity: 'dfH', value: '-479.6', uncertainty: '0.9', uncertaintyKind: 'expanded', coverageFactor: 2, unit: 'kJ/mol', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
        resultValue: { key: 'demo:ethyl-acetate(l):dfH', species: 'EtOAc', phase: 'l', quantity: 'dfH', value: '-479.6', uncertainty: '0.9', unit: 'kJ/mol', source: 'qpc-tc03-2025' },
        checks: [pass('plausible-magnitude', 'ΔfH° is in the usual range for an ester liquid')],
        evidence: [{ key: 'tc03-ethyl-acetate', fileName: 'tc03-ethyl-acetate-combustion.csv', mediaType: 'text/csv', description: 'Combustion runs C-111 to C-114 (invented demo data)', content: TC03_ETHYL_ACETATE }],
      },
      {
        key: 'Cp', kind: 'add_value', source: 'qpc-dsc07-2026',
        payload: { species: 'ethyl acetate', phase: 'l', quantity: 'Cp', value: '169.8', uncertainty: '1.5', uncertaintyKind: 'expanded', coverageFactor: 2, unit: 'J/(mol·K)', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
        resultValue: { key: 'demo:ethyl-acetate(l):Cp', species: 'EtOAc', phase: 'l', quantity: 'Cp', value: '169.8', uncertainty: '1.5', unit: 'J/(mol·K)', source: 'qpc-dsc07-2026' },
        checks: [pass('heat-capacity-positive', 'Cp° > 0')],
      },
    ],
    reviews: [{ reviewer: REVIEWER2, decision: 'approve', comment: 'Consistent with the propan-1-ol series run on the same bomb. Approved.', at: '2026-10-02T13:45:00Z' }],
    comments: [],
  },
  {
    key: 'resubmitted-butanol-cp',
    title: 'Butan-1-ol (l): Cp° by DSC',
    summary: 'DSC series B-21 to B-26 at 298.15 K.',
    state: 'resubmitted',
    author: STEWARD,
    createdAt: '2026-10-06T09:30:00Z',
    submittedAt: '2026-10-07T10:00:00Z',
    items: [
      { key: 'add-species', kind: 'add_species', payload: { formula: 'CH3CH2CH2CH2OH', name: 'butan-1-ol', casRn: '71-36-3', inchikey: 'LRHPLDYGYMQRHN-UHFFFAOYSA-N' } },
      { key: 'add-phase', kind: 'add_phase', payload: { species: 'butan-1-ol', phase: 'l' } },
      {
        key: 'Cp', kind: 'add_value', source: 'qpc-dsc07-2026',
        payload: { species: 'butan-1-ol', phase: 'l', quantity: 'Cp', value: '177.6', uncertainty: '1.4', uncertaintyKind: 'expanded', coverageFactor: 2, unit: 'J/(mol·K)', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
        checks: [pass('heat-capacity-positive', 'Cp° > 0'), warn('compare-other-sources', 'No other source holds Cp° of butan-1-ol (l) yet')],
        evidence: [{ key: 'dsc07-butanol-calibration', fileName: 'dsc07-butan-1-ol-calibration.txt', mediaType: 'text/plain', description: 'Calibration and sample-purity note (invented demo text)', content: DSC07_BUTANOL_CALIBRATION }],
      },
    ],
    reviews: [{ reviewer: REVIEWER2, decision: 'request_changes', comment: 'Please state the sample purity and water content, and how the DSC was calibrated.', at: '2026-10-12T15:10:00Z' }],
    comments: [{ author: STEWARD, body: 'Calibration and purity note attached to the Cp° item.', at: '2026-10-20T09:00:00Z', item: 'Cp' }],
  },
  {
    key: 'changes-requested-propanol-cp',
    title: 'Revise Cp° of propan-1-ol (l) after DSC recalibration',
    summary: 'The DSC-07 cell was recalibrated in September; re-running the propan-1-ol series gives a lower Cp°.',
    state: 'changes_requested',
    author: STEWARD,
    createdAt: '2026-10-21T08:15:00Z',
    submittedAt: '2026-10-21T17:40:00Z',
    items: [
      {
        key: 'Cp', kind: 'revise_value', source: 'qpc-dsc07-2026', targetValue: 'demo:propanol(l):Cp',
        payload: { value: '143.8', uncertainty: '1.0', uncertaintyKind: 'expanded', coverageFactor: 2, unit: 'J/(mol·K)', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
        checks: [pass('heat-capacity-positive', 'Cp° > 0'), pass('compare-previous-version', 'Within the combined uncertainty of version 1 (z = 0.26)')],
      },
    ],
    reviews: [{ reviewer: REVIEWER, decision: 'request_changes', comment: 'Attach the sapphire calibration runs from before and after the recalibration, so the change can be judged.', at: '2026-10-27T11:30:00Z' }],
    comments: [],
  },
  {
    key: 'in-review-propanol-fit',
    title: 'Tabulated Cp° of propan-1-ol (l), 280–340 K',
    summary: 'Seven DSC points for engineers who need Cp(T) of the liquid over the plant range.',
    state: 'in_review',
    author: STEWARD,
    createdAt: '2026-11-03T10:00:00Z',
    submittedAt: '2026-11-04T09:20:00Z',
    items: [
      {
        key: 'fit', kind: 'add_fit', source: 'qpc-dsc07-2026', species: 'C3H7OH', phase: 'l',
        payload: { species: 'propan-1-ol', phase: 'l', form: 'tabulated', tMin: 280, tMax: 340, ranges: [{ tMin: 280, tMax: 340, points: [[280, 136.9], [290, 140.6], [298.15, 144.2], [310, 148.1], [320, 151.9], [330, 155.8], [340, 159.9]] }], method: 'measured' },
        checks: [pass('heat-capacity-positive', 'Cp > 0 over 280–340 K'), pass('reproduces-own-values', 'Cp(298.15 K) equals the released Cp° (144.2 J/(mol·K))')],
        evidence: [{ key: 'dsc07-propanol', fileName: 'dsc07-propan-1-ol-cp.csv', mediaType: 'text/csv', description: 'DSC points 280–340 K (invented demo data)', content: DSC07_PROPANOL, source: 'qpc-dsc07-2026' }],
      },
    ],
    reviews: [],
    comments: [{ author: REVIEWER2, body: 'The 330 and 340 K points curve upward slightly; is that the liquid or the pan?', at: '2026-11-05T14:00:00Z', item: 'fit' }],
  },
  {
    key: 'submitted-ethyl-acetate-vap',
    title: 'Ethyl acetate: ΔvapH at 298.15 K',
    summary: 'From our vapour-pressure runs (Clausius–Clapeyron over 285–315 K).',
    state: 'submitted',
    author: STEWARD,
    createdAt: '2026-11-16T09:00:00Z',
    submittedAt: '2026-11-17T08:45:00Z',
    items: [
      {
        key: 'vap', kind: 'add_value', source: 'qpc-tc03-2025', species: 'EtOAc', phase: 'l',
        payload: { species: 'ethyl acetate', phase: 'l', quantity: 'dtrsH', transitionKind: 'vap', value: '35.4', uncertainty: '0.3', uncertaintyKind: 'expanded', coverageFactor: 2, unit: 'kJ/mol', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
        checks: [pass('transition-enthalpy-positive', 'ΔvapH > 0'), warn('compare-other-sources', 'No other source holds ΔvapH of ethyl acetate yet')],
      },
    ],
    reviews: [],
    comments: [],
  },
  {
    key: 'draft-butanol-dfH',
    title: 'Butan-1-ol (l): ΔfH° from combustion series C-118',
    summary: 'Draft: runs C-118 to C-122 are still being worked up.',
    state: 'draft',
    author: STEWARD,
    createdAt: '2026-11-24T13:00:00Z',
    items: [
      {
        key: 'dfH', kind: 'add_value', source: 'qpc-tc03-2025',
        payload: { species: 'butan-1-ol', phase: 'l', quantity: 'dfH', value: '', unit: 'kJ/mol', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
      },
    ],
    reviews: [],
    comments: [],
  },
  {
    key: 'rejected-butanol-estimate',
    title: 'Butan-1-ol (l): estimated ΔfH° by group additivity',
    summary: 'Interim estimate until series C-118 is measured.',
    state: 'rejected',
    author: STEWARD,
    createdAt: '2026-04-20T10:00:00Z',
    submittedAt: '2026-04-20T10:30:00Z',
    decidedAt: '2026-04-24T09:15:00Z',
    items: [
      {
        key: 'dfH', kind: 'add_value', source: 'qpc-est01-2026',
        payload: { species: 'butan-1-ol', phase: 'l', quantity: 'dfH', value: '-327', uncertainty: '4', uncertaintyKind: 'standard', unit: 'kJ/mol', temperatureK: 298.15, pressurePa: 100000, method: 'estimated' },
        checks: [warn('uncertainty-large', 'Standard uncertainty 4 kJ/mol is above 1 % of the value')],
      },
    ],
    reviews: [{ reviewer: REVIEWER2, decision: 'reject', comment: 'An estimate with u = 4 kJ/mol would mislead heat balances more than a gap does; wait for series C-118.', at: '2026-04-24T09:15:00Z' }],
    comments: [],
  },
  {
    key: 'withdrawn-duplicate',
    title: 'Ethyl acetate (l): Cp° from DSC-07',
    summary: 'Duplicate of the ethyl acetate proposal.',
    state: 'withdrawn',
    author: STEWARD,
    createdAt: '2026-09-14T08:05:00Z',
    submittedAt: '2026-09-14T08:20:00Z',
    decidedAt: '2026-09-14T09:00:00Z',
    items: [
      {
        key: 'Cp', kind: 'add_value', source: 'qpc-dsc07-2026',
        payload: { species: 'ethyl acetate', phase: 'l', quantity: 'Cp', value: '169.8', uncertainty: '1.5', uncertaintyKind: 'expanded', coverageFactor: 2, unit: 'J/(mol·K)', temperatureK: 298.15, pressurePa: 100000, method: 'measured' },
      },
    ],
    reviews: [],
    comments: [{ author: STEWARD, body: 'Submitted twice by mistake; the Cp° is in the ethyl acetate proposal. Withdrawing.', at: '2026-09-14T09:00:00Z' }],
  },
];

/** Species each demo user watches (keys of reference or demo species). */
export const DEMO_WATCHES: { user: string; species: string }[] = [
  { user: 'reader@kelvindex.test', species: 'H2O' },
  { user: 'reader@kelvindex.test', species: 'CH4' },
  { user: 'reader@kelvindex.test', species: 'C3H7OH' },
  { user: 'reviewer@kelvindex.test', species: 'CO2' },
  { user: STEWARD, species: 'EtOAc' },
];

/** Saved reactions with their terms (species key, phase, stoichiometric number; reactants negative). */
export const DEMO_SAVED_REACTIONS: {
  user: string;
  name: string;
  equation: string;
  temperaturesK: number[];
  pinnedRelease?: string;
  notes?: string;
  terms: [string, string, number][];
}[] = [
  { user: 'reader@kelvindex.test', name: 'Methane combustion', equation: 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)', temperaturesK: [298.15],
    terms: [['CH4', 'g', -1], ['O2', 'g', -2], ['CO2', 'g', 1], ['H2O', 'l', 2]] },
  { user: 'reader@kelvindex.test', name: 'Steam reforming', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperaturesK: [298.15, 700, 900, 1100],
    notes: 'Reformer outlet screening, plant R-2 (demo).', terms: [['CH4', 'g', -1], ['H2O', 'g', -1], ['CO', 'g', 1], ['H2', 'g', 3]] },
  { user: 'reader@kelvindex.test', name: 'Water-gas shift', equation: 'CO(g) + H2O(g) -> CO2(g) + H2(g)', temperaturesK: [298.15, 500, 700], pinnedRelease: '2026.2',
    terms: [['CO', 'g', -1], ['H2O', 'g', -1], ['CO2', 'g', 1], ['H2', 'g', 1]] },
  { user: 'reader@kelvindex.test', name: 'Ammonia synthesis', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperaturesK: [298.15, 700],
    terms: [['N2', 'g', -1], ['H2', 'g', -3], ['NH3', 'g', 2]] },
  { user: 'reader@kelvindex.test', name: 'Propan-1-ol combustion', equation: 'CH3CH2CH2OH(l) + 4.5 O2(g) -> 3 CO2(g) + 4 H2O(l)', temperaturesK: [298.15],
    notes: 'Solvent incinerator heat balance (demo).', terms: [['C3H7OH', 'l', -1], ['O2', 'g', -4.5], ['CO2', 'g', 3], ['H2O', 'l', 4]] },
  { user: 'reviewer2@kelvindex.test', name: 'Ethanol combustion', equation: 'C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)', temperaturesK: [298.15],
    terms: [['C2H5OH', 'l', -1], ['O2', 'g', -3], ['CO2', 'g', 2], ['H2O', 'l', 3]] },
];

/** A bulk-import dry run the steward made (its problems are invented). */
export const DEMO_IMPORT_JOB = {
  user: STEWARD,
  fileName: 'dsc07-batch-2.csv',
  format: 'csv' as const,
  dryRun: true,
  status: 'succeeded' as const,
  totalRows: 12,
  processedRows: 12,
  errors: [
    { line: 5, field: 'uncertainty', message: 'must be zero or positive (got -0.8)' },
    { line: 9, field: 'pressure', message: 'standard pressure must be 100000 Pa or 101325 Pa (got 100)' },
  ],
  createdAt: '2026-11-10T15:00:00Z',
};
