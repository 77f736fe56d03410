import { LN10, R, T_REF } from './constants';
import { OutOfRangeError, ThermoInputError } from './errors';
import { compileHeatCapacity } from './heat-capacity';
import { brentRoot } from './root-finding';
import type { SpeciesThermoData } from './species-data';
import type { ThermoKernel } from './thermo-kernel';
import type { UncertainValue } from './uncertain-value';

/** A participant of a reaction: signed stoichiometric number ν (< 0 for reactants, 0 for a catalyst). */
export interface ReactionParticipant {
  readonly nu: number;
  readonly data: SpeciesThermoData;
}

/**
 * Which terms of ΔrG° = ΔrH° − T·ΔrS° favour the reaction (make ΔrG° more negative):
 * the enthalpy term when ΔrH° < 0, the entropy term when ΔrS° > 0; 'both' or 'neither'.
 */
export type FavouredBy = 'enthalpy' | 'entropy' | 'both' | 'neither';

/** The larger in magnitude of ΔrH° and T·ΔrS°: the term that sets the sign of ΔrG°. */
export type DominantTerm = 'enthalpy' | 'entropy';

/** Reaction quantities at many temperatures, as columns (SI units). */
export interface ReactionProfile {
  readonly temperatures: Float64Array;
  /** ΔrH° / (J mol⁻¹) and its standard uncertainty */
  readonly deltaH: Float64Array;
  readonly deltaHUncertainty: Float64Array;
  /** ΔrS° / (J mol⁻¹ K⁻¹) */
  readonly deltaS: Float64Array;
  readonly deltaSUncertainty: Float64Array;
  /** ΔrG° / (J mol⁻¹) */
  readonly deltaG: Float64Array;
  readonly deltaGUncertainty: Float64Array;
  /** ΔrCp° / (J mol⁻¹ K⁻¹) */
  readonly deltaCp: Float64Array;
  readonly deltaCpUncertainty: Float64Array;
  /** log10 K and u(log10 K) = u(ΔrG°)/(R·T·ln 10) */
  readonly log10K: Float64Array;
  readonly log10KUncertainty: Float64Array;
  /** K = 10^log10K (Infinity or 0 when it overflows a double; log10 K stays exact) and u(K) */
  readonly k: Float64Array;
  readonly kUncertainty: Float64Array;
  readonly favouredBy: FavouredBy[];
  readonly dominantTerm: DominantTerm[];
  /** 1 where some participant was extrapolated beyond its valid range */
  readonly extrapolated: Uint8Array;
}

/** Reaction quantities at one temperature. */
export interface ReactionAtTemperature {
  readonly temperature: number;
  readonly deltaH: UncertainValue;
  readonly deltaS: UncertainValue;
  readonly deltaG: UncertainValue;
  readonly deltaCp: UncertainValue;
  readonly log10K: UncertainValue;
  readonly k: UncertainValue;
  readonly favouredBy: FavouredBy;
  readonly dominantTerm: DominantTerm;
  readonly extrapolated: boolean;
}

/** Where ΔrG° = 0, or why there is no such temperature. */
export type CrossoverResult =
  | {
      readonly found: true;
      /** T / K where ΔrG° = 0 (the root closest to the first guess when there are several) */
      readonly temperature: number;
      /** u(T) = u(ΔrG°)/|ΔrS°| at the root / K */
      readonly uncertainty: number;
      /** every root found in the range / K, ascending */
      readonly roots: readonly number[];
      /** ΔrH°(298.15)/ΔrS°(298.15) / K, or null when ΔrS° = 0 */
      readonly firstGuess: number | null;
    }
  | { readonly found: false; readonly temperature: null; readonly reason: string; readonly firstGuess: number | null };

/**
 * Which terms favour the reaction, from ΔrH° / (J mol⁻¹) and ΔrS° / (J mol⁻¹ K⁻¹): enthalpy
 * when ΔrH° < 0, entropy when ΔrS° > 0 (both, or neither).
 */
export function favouredBy(deltaH: number, deltaS: number): FavouredBy {
  const h = deltaH < 0;
  const s = deltaS > 0;
  return h && s ? 'both' : h ? 'enthalpy' : s ? 'entropy' : 'neither';
}

/**
 * A reaction prepared for fast evaluation: kernels compiled, ν and the 298.15 K sums
 * precomputed, so a profile at many temperatures runs without allocating in its loop.
 */
export class CompiledReaction {
  /** valid range of the reaction: the intersection of its participants' ranges / K */
  readonly tMin: number;
  readonly tMax: number;
  private readonly kernels: ThermoKernel[];
  private readonly nu: Float64Array;
  private readonly deltaH298: number;
  private readonly varH298: number;
  private readonly varS298: number;
  private readonly varCp: number;
  private readonly scratch = new Float64Array(3);
  private readonly sums = new Float64Array(4);

  constructor(private readonly participants: readonly ReactionParticipant[]) {
    if (participants.length === 0) throw new ThermoInputError('participants', 'a reaction needs at least one species');
    participants.forEach((p, i) => {
      // ν = 0 is allowed: a catalyst written on both sides takes no part.
      if (!Number.isFinite(p.nu)) throw new ThermoInputError(`participants[${i}].nu`, `must be a finite number, got ${p.nu}`);
    });
    this.kernels = participants.map((p) => compileHeatCapacity(p.data.heatCapacity, p.data.entropy.value));
    this.nu = Float64Array.from(participants, (p) => p.nu);
    this.tMin = Math.max(...this.kernels.map((k) => k.tMin));
    this.tMax = Math.min(...this.kernels.map((k) => k.tMax));
    let h = 0, vH = 0, vS = 0, vCp = 0;
    for (const { nu, data } of participants) {
      h += nu * data.formationEnthalpy.value;
      vH += nu * nu * data.formationEnthalpy.uncertainty ** 2;
      vS += nu * nu * data.entropy.uncertainty ** 2;
      vCp += nu * nu * (data.heatCapacityUncertainty ?? 0) ** 2;
    }
    this.deltaH298 = h;
    this.varH298 = vH;
    this.varS298 = vS;
    this.varCp = vCp;
  }

  /** Σν·Cp, ΔrH°, Σν·S into `sums` [cp, h, s, extrapolated]. */
  private accumulate(temperature: number): void {
    const out = this.scratch;
    const sums = this.sums;
    let cp = 0, h = this.deltaH298, s = 0, extrapolated = 0;
    for (let i = 0; i < this.kernels.length; i++) {
      if (this.kernels[i].evaluate(temperature, out, 0)) extrapolated = 1;
      const nu = this.nu[i];
      cp += nu * out[0];
      h += nu * out[1];
      s += nu * out[2];
    }
    sums[0] = cp;
    sums[1] = h;
    sums[2] = s;
    sums[3] = extrapolated;
  }

  private rangeError(temperature: number): OutOfRangeError {
    const i = this.kernels.findIndex((k) => temperature < k.tMin || temperature > k.tMax);
    const k = this.kernels[Math.max(i, 0)];
    return new OutOfRangeError(temperature, k.tMin, k.tMax, this.participants[Math.max(i, 0)].data.label ?? `participant ${i}`);
  }

  private checkTemperature(temperature: number): void {
    if (!(Number.isFinite(temperature) && temperature > 0)) {
      throw new ThermoInputError('temperature', `must be a positive number of kelvin, got ${temperature}`);
    }
  }

  /** An empty profile for `n` temperatures, to reuse with `evaluateInto`. */
  static allocateProfile(n: number): ReactionProfile {
    const f = () => new Float64Array(n);
    return {
      temperatures: f(), deltaH: f(), deltaHUncertainty: f(), deltaS: f(), deltaSUncertainty: f(),
      deltaG: f(), deltaGUncertainty: f(), deltaCp: f(), deltaCpUncertainty: f(), log10K: f(),
      log10KUncertainty: f(), k: f(), kUncertainty: f(),
      favouredBy: new Array<FavouredBy>(n).fill('neither'),
      dominantTerm: new Array<DominantTerm>(n).fill('enthalpy'),
      extrapolated: new Uint8Array(n),
    };
  }

  /** Reaction quantities at every temperature (K). @throws OutOfRangeError unless `extrapolate` */
  evaluate(temperatures: ArrayLike<number>, options: { extrapolate?: boolean } = {}): ReactionProfile {
    const profile = CompiledReaction.allocateProfile(temperatures.length);
    this.evaluateInto(temperatures, profile, options);
    return profile;
  }

  /**
   * Fills a profile allocated by `allocateProfile(temperatures.length)`; the loop allocates
   * nothing. Uncertainties (GUM, uncorrelated): u²(ΔrH) = Σν²[u²(ΔfH°) + u²(Cp)(T − 298.15)²],
   * u²(ΔrS) = Σν²[u²(S°) + u²(Cp) ln²(T/298.15)], u²(ΔrG) = u²(ΔrH) + T²u²(ΔrS),
   * u(log10 K) = u(ΔrG)/(RT ln 10), u(K) = K·ln 10·u(log10 K).
   */
  evaluateInto(temperatures: ArrayLike<number>, profile: ReactionProfile, options: { extrapolate?: boolean } = {}): void {
    const n = temperatures.length;
    if (profile.temperatures.length !== n) throw new ThermoInputError('profile', `allocated for ${profile.temperatures.length} temperatures, not ${n}`);
    const extrapolate = options.extrapolate ?? false;
    const sums = this.sums;
    const uCp = Math.sqrt(this.varCp);
    for (let j = 0; j < n; j++) {
      const t = temperatures[j];
      this.checkTemperature(t);
      this.accumulate(t);
      if (sums[3] !== 0 && !extrapolate) throw this.rangeError(t);
      const dCp = sums[0], dH = sums[1], dS = sums[2];
      const dG = dH - t * dS;
      const lnRatio = Math.log(t / T_REF);
      const dt = t - T_REF;
      const uH = Math.sqrt(this.varH298 + this.varCp * dt * dt);
      const uS = Math.sqrt(this.varS298 + this.varCp * lnRatio * lnRatio);
      const uG = Math.sqrt(uH * uH + t * t * uS * uS);
      const rtln10 = R * t * LN10;
      const log10K = -dG / rtln10;
      const uLog10K = uG / rtln10;
      const k = Math.pow(10, log10K);
      profile.temperatures[j] = t;
      profile.deltaH[j] = dH;
      profile.deltaHUncertainty[j] = uH;
      profile.deltaS[j] = dS;
      profile.deltaSUncertainty[j] = uS;
      profile.deltaG[j] = dG;
      profile.deltaGUncertainty[j] = uG;
      profile.deltaCp[j] = dCp;
      profile.deltaCpUncertainty[j] = uCp;
      profile.log10K[j] = log10K;
      profile.log10KUncertainty[j] = uLog10K;
      profile.k[j] = k;
      profile.kUncertainty[j] = k * LN10 * uLog10K;
      profile.favouredBy[j] = favouredBy(dH, dS);
      profile.dominantTerm[j] = Math.abs(dH) >= Math.abs(t * dS) ? 'enthalpy' : 'entropy';
      profile.extrapolated[j] = sums[3];
    }
  }

  /** Reaction quantities at one temperature (K). */
  at(temperature: number, options: { extrapolate?: boolean } = {}): ReactionAtTemperature {
    const p = this.evaluate([temperature], options);
    const v = (value: Float64Array, u: Float64Array): UncertainValue => ({ value: value[0], uncertainty: u[0] });
    return {
      temperature,
      deltaH: v(p.deltaH, p.deltaHUncertainty),
      deltaS: v(p.deltaS, p.deltaSUncertainty),
      deltaG: v(p.deltaG, p.deltaGUncertainty),
      deltaCp: v(p.deltaCp, p.deltaCpUncertainty),
      log10K: v(p.log10K, p.log10KUncertainty),
      k: v(p.k, p.kUncertainty),
      favouredBy: p.favouredBy[0],
      dominantTerm: p.dominantTerm[0],
      extrapolated: p.extrapolated[0] === 1,
    };
  }

  /** ΔrG° / (J mol⁻¹) at T, extrapolating silently (for root finding inside the range). */
  private deltaGAt(temperature: number): number {
    this.accumulate(temperature);
    return this.sums[1] - temperature * this.sums[2];
  }

  /**
   * The temperature where ΔrG° = 0 inside the valid range (or [tMin, tMax] given, which must
   * lie inside it unless `extrapolate`). ΔrG° is sampled on a grid including the first guess
   * ΔrH°(298.15)/ΔrS°(298.15); each sign change is refined with Brent's method to 1e-9 K.
   */
  crossover(options: { tMin?: number; tMax?: number; samples?: number; extrapolate?: boolean } = {}): CrossoverResult {
    const lo = options.tMin ?? this.tMin;
    const hi = options.tMax ?? this.tMax;
    if (!(lo > 0 && hi > lo)) throw new ThermoInputError('range', `invalid search range ${lo}–${hi} K`);
    if (!options.extrapolate && (lo < this.tMin || hi > this.tMax)) {
      throw new OutOfRangeError(lo < this.tMin ? lo : hi, this.tMin, this.tMax, 'reaction');
    }
    this.accumulate(T_REF);
    const s298 = this.sums[2];
    const firstGuess = s298 === 0 ? null : this.deltaH298 / s298;
    const samples = Math.max(8, options.samples ?? 256);
    const grid: number[] = [];
    for (let i = 0; i <= samples; i++) grid.push(lo + ((hi - lo) * i) / samples);
    if (firstGuess !== null && firstGuess > lo && firstGuess < hi) grid.push(firstGuess);
    grid.sort((a, b) => a - b);

    const f = (t: number) => this.deltaGAt(t);
    const roots: number[] = [];
    let previousT = grid[0];
    let previousG = f(previousT);
    if (previousG === 0) roots.push(previousT);
    for (let i = 1; i < grid.length; i++) {
      const t = grid[i];
      const g = f(t);
      if (g === 0) roots.push(t);
      else if (previousG !== 0 && Math.sign(g) !== Math.sign(previousG)) {
        const root = brentRoot(f, previousT, t, 1e-9);
        if (root !== null) roots.push(root);
      }
      previousT = t;
      previousG = g;
    }
    if (roots.length === 0) {
      const sign = previousG < 0 ? 'negative (the reaction is favoured)' : 'positive (the reaction is not favoured)';
      const guess = firstGuess === null
        ? 'ΔrS°(298.15) = 0, so there is no first guess'
        : `the first guess ΔrH°/ΔrS° = ${firstGuess.toFixed(1)} K ${firstGuess > lo && firstGuess < hi ? 'does not survive the temperature dependence' : 'lies outside this range'}`;
      return {
        found: false,
        temperature: null,
        firstGuess,
        reason: `ΔrG° is ${sign} at every temperature from ${lo} K to ${hi} K; ${guess}`,
      };
    }
    const target = firstGuess ?? (lo + hi) / 2;
    const temperature = roots.reduce((best, r) => (Math.abs(r - target) < Math.abs(best - target) ? r : best), roots[0]);
    const at = this.at(temperature, { extrapolate: true });
    const slope = Math.abs(at.deltaS.value);
    return {
      found: true,
      temperature,
      uncertainty: slope > 0 ? at.deltaG.uncertainty / slope : Number.POSITIVE_INFINITY,
      roots,
      firstGuess,
    };
  }
}

/** Compiles a reaction for repeated evaluation. */
export function compileReaction(participants: readonly ReactionParticipant[]): CompiledReaction {
  return new CompiledReaction(participants);
}

/** Reaction quantities at one temperature / K. */
export function reactionAt(
  participants: readonly ReactionParticipant[],
  temperature: number,
  options: { extrapolate?: boolean } = {},
): ReactionAtTemperature {
  return compileReaction(participants).at(temperature, options);
}

/** Reaction quantities at many temperatures / K. */
export function reactionProfile(
  participants: readonly ReactionParticipant[],
  temperatures: ArrayLike<number>,
  options: { extrapolate?: boolean } = {},
): ReactionProfile {
  return compileReaction(participants).evaluate(temperatures, options);
}

/** The temperature where ΔrG° = 0 inside the valid range, or why there is none. */
export function crossoverTemperature(
  participants: readonly ReactionParticipant[],
  options: { tMin?: number; tMax?: number; samples?: number; extrapolate?: boolean } = {},
): CrossoverResult {
  return compileReaction(participants).crossover(options);
}
