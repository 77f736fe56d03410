/**
 * Thermochemistry engine benchmark (issue 3 targets): formulas parsed per second (≥ 100 000/s)
 * and the time to evaluate a 10-species reaction at 1 000 temperatures (≤ 5 ms, median).
 * Run after building: node dist/server/api/bench/engine-bench.js
 */
import {
  checkBalance,
  compileReaction,
  CompiledReaction,
  hillFormula,
  intrinsicReferenceValues,
  molarMass,
  parseFormula,
  parseReaction,
  stoichiometricNumbers,
  type HeatCapacityFunction,
  type ReactionParticipant,
} from '../src/thermo';
import { TM4513 } from '../src/thermo/testing/published-values';

const FORMULAS = [
  'H2O', 'CO2', 'CH4', 'CH3OH', 'C2H5OH', 'Ca(OH)2', 'CuSO4·5H2O', 'CuSO4.5H2O', 'NH4+', 'SO4-2', 'SO4^2-',
  'SO4--', 'e-', 'K4[Fe(CN)6]', 'Al2(SO4)3·18H2O', 'Mg3(PO4)2', 'C6H12O6', 'NaCl', 'Fe2O3', 'D2O', 'Fe0.947O', 'UF6',
];

function nowMs(): number {
  return Number(process.hrtime.bigint()) / 1e6;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
}

/** Formulas per second over `rounds` timed batches; the median batch rate is reported. */
function benchFormulas(work: (text: string) => unknown, rounds = 15, perRound = 44_000): { median: number; best: number } {
  let sink = 0;
  for (let i = 0; i < 20_000; i++) sink += work(FORMULAS[i % FORMULAS.length]) ? 1 : 0;
  const rates: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const start = nowMs();
    for (let i = 0; i < perRound; i++) sink += work(FORMULAS[i % FORMULAS.length]) ? 1 : 0;
    rates.push(perRound / ((nowMs() - start) / 1000));
  }
  if (sink < 0) console.log(sink);
  return { median: median(rates), best: Math.max(...rates) };
}

/** A 10-species reaction on TM-4513 NASA-7 sets, balanced by the engine itself. */
function tenSpeciesReaction(): ReactionParticipant[] {
  const equation = 'CH4 + 5/2 O2 + N2 + H + O -> CO2 + H2O + 2 NO + H2 + OH';
  const reaction = parseReaction(equation);
  const check = checkBalance(reaction);
  if (!check.balanced) throw new Error(`benchmark reaction: ${check.message}`);
  const functions: Record<string, HeatCapacityFunction> = TM4513;
  return stoichiometricNumbers(reaction).map(({ label, nu, species }) => {
    const heatCapacity = functions[label];
    const reference = intrinsicReferenceValues(heatCapacity)!;
    return {
      nu,
      data: {
        label,
        elements: species.formula.elements,
        formationEnthalpy: { value: reference.formationEnthalpy, uncertainty: 100 },
        entropy: { value: reference.entropy, uncertainty: 0.01 },
        heatCapacity,
        heatCapacityUncertainty: 0.05,
      },
    };
  });
}

function benchReaction(runs = 400): { evaluate: number[]; compileAndEvaluate: number[] } {
  const participants = tenSpeciesReaction();
  const temperatures = Float64Array.from({ length: 1000 }, (_, i) => 300 + (5700 * i) / 999);
  const compiled = compileReaction(participants);
  const profile = CompiledReaction.allocateProfile(temperatures.length);
  for (let i = 0; i < 50; i++) compiled.evaluateInto(temperatures, profile);
  const evaluate: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = nowMs();
    compiled.evaluateInto(temperatures, profile);
    evaluate.push(nowMs() - start);
  }
  const compileAndEvaluate: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = nowMs();
    compileReaction(participants).evaluate(temperatures);
    compileAndEvaluate.push(nowMs() - start);
  }
  return { evaluate, compileAndEvaluate };
}

const parse = benchFormulas((text) => parseFormula(text));
const full = benchFormulas((text) => {
  const f = parseFormula(text);
  return hillFormula(f).length + molarMass(f);
});
const reaction = benchReaction();
const fmt = (n: number) => Math.round(n).toLocaleString('en-US');
const ms = (n: number) => n.toFixed(3);

console.log('Kelvindex thermochemistry engine benchmark');
console.log(`node ${process.version}, ${FORMULAS.length} distinct formulas, reaction: 10 species × 1000 temperatures (300–6000 K)`);
console.log('');
console.log(`formulas parsed per second (median of 15 batches): ${fmt(parse.median)}/s  (best ${fmt(parse.best)}/s; target ≥ 100,000/s: ${parse.median >= 100_000 ? 'met' : 'NOT MET'})`);
console.log(`  parse + Hill formula + molar mass:               ${fmt(full.median)}/s`);
console.log(`10-species reaction at 1000 T, precompiled (median of ${reaction.evaluate.length}): ${ms(median(reaction.evaluate))} ms` +
  `  (p95 ${ms(percentile(reaction.evaluate, 0.95))} ms; target ≤ 5 ms: ${median(reaction.evaluate) <= 5 ? 'met' : 'NOT MET'})`);
console.log(`  including compilation and a fresh profile (median):  ${ms(median(reaction.compileAndEvaluate))} ms` +
  `  (p95 ${ms(percentile(reaction.compileAndEvaluate, 0.95))} ms)`);
