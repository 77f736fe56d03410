import { intrinsicReferenceValues, R, type HeatCapacityFunction } from '../thermo';

/** Differences below this are the tables' rounding, not worth a shift or a note / (J mol⁻¹ K⁻¹). */
const NEGLIGIBLE = 1e-9;

/**
 * NASA and Shomate fits carry their own S(298.15 K). Where a release recommends an S° value for the
 * same species phase, that value is the one the editor chose, so the fit's entropy constant is moved
 * (the same shift in every range keeps S continuous at the joints) to make S(298.15 K) equal it;
 * Cp and H − H(298.15 K) are untouched. Returns the function and the shift / (J mol⁻¹ K⁻¹).
 */
export function anchorFitEntropy(fn: HeatCapacityFunction, recommendedS298: number): { fn: HeatCapacityFunction; shift: number } {
  // Fits are immutable and cached by id, so the anchored copy is kept too (the engine compiles per object).
  let byEntropy = anchored.get(fn);
  if (!byEntropy) anchored.set(fn, (byEntropy = new Map()));
  let result = byEntropy.get(recommendedS298);
  if (!result) byEntropy.set(recommendedS298, (result = shifted(fn, recommendedS298)));
  return result;
}

const anchored = new WeakMap<HeatCapacityFunction, Map<number, { fn: HeatCapacityFunction; shift: number }>>();

function shifted(fn: HeatCapacityFunction, recommendedS298: number): { fn: HeatCapacityFunction; shift: number } {
  const intrinsic = intrinsicReferenceValues(fn);
  if (!intrinsic) return { fn, shift: 0 };
  const shift = recommendedS298 - intrinsic.entropy;
  if (Math.abs(shift) < NEGLIGIBLE) return { fn, shift: 0 };
  switch (fn.kind) {
    case 'nasa7':
      return {
        shift,
        fn: { ...fn, ranges: fn.ranges.map((r) => ({ ...r, coefficients: r.coefficients.map((c, i) => (i === 6 ? c + shift / R : c)) })) },
      };
    case 'nasa9':
      return { shift, fn: { ...fn, ranges: fn.ranges.map((r) => ({ ...r, b2: r.b2 + shift / R })) } };
    case 'shomate':
      return { shift, fn: { ...fn, ranges: fn.ranges.map((r) => ({ ...r, G: r.G + shift })) } };
    default:
      return { fn, shift: 0 };
  }
}
