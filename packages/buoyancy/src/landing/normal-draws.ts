import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

/** A source of standard normal numbers (mean 0, standard deviation 1). */
export type NormalDraw = () => number;

/**
 * Standard normal numbers from a seeded generator: xoroshiro128+ (Blackman & Vigna, "Scrambled
 * linear pseudorandom number generators", ACM TOMS 47(4), 2021; the `pure-rand` implementation)
 * for uniform numbers with 53 random bits, turned into normal ones by the Box–Muller transform
 * (G. E. P. Box and M. E. Muller, "A note on the generation of random normal deviates", Ann. Math.
 * Statist. 29 (2), 1958, 610–611): z₀ = √(−2 ln u₁)·cos(2π u₂), z₁ = √(−2 ln u₁)·sin(2π u₂).
 * The same seed gives the same numbers on every platform (integer arithmetic, then IEEE doubles).
 * @param seed integer, 0 to 2³¹ − 1
 */
export function seededNormals(seed: number): NormalDraw {
  const generator = xoroshiro128plus(seed);
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const value = spare;
      spare = undefined;
      return value;
    }
    // 1 − u lies in (0, 1], so the logarithm is finite.
    const u1 = 1 - uniformFloat64(generator);
    const u2 = uniformFloat64(generator);
    const radius = Math.sqrt(-2 * Math.log(u1));
    spare = radius * Math.sin(2 * Math.PI * u2);
    return radius * Math.cos(2 * Math.PI * u2);
  };
}
