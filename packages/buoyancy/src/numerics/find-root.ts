import { ComputationError } from '../errors.js';

export interface RootOptions {
  /** Absolute tolerance on x. */
  readonly xTolerance?: number;
  readonly maxIterations?: number;
}

/**
 * Root of f in [a, b] by Brent's method (R. P. Brent, Algorithms for Minimization without
 * Derivatives, Prentice-Hall 1973, ch. 4): inverse quadratic interpolation and secant steps,
 * falling back to bisection, so it converges whenever f(a) and f(b) differ in sign.
 * @throws ComputationError when f(a) and f(b) have the same sign or f is not finite
 */
export function findRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  options: RootOptions = {},
): number {
  const xTolerance = options.xTolerance ?? 1e-12 * Math.max(1, Math.abs(a), Math.abs(b));
  const maxIterations = options.maxIterations ?? 200;
  let fa = f(a);
  let fb = f(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) {
    throw new ComputationError(`findRoot: f is not finite at the bracket ends (${fa}, ${fb})`);
  }
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (Math.sign(fa) === Math.sign(fb)) {
    throw new ComputationError(`findRoot: f(${a}) and f(${b}) have the same sign`);
  }
  if (Math.abs(fa) < Math.abs(fb)) {
    [a, b] = [b, a];
    [fa, fb] = [fb, fa];
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let bisected = true;
  for (let iteration = 0; iteration < maxIterations; iteration += 1) {
    if (fb === 0 || Math.abs(b - a) <= xTolerance) return b;
    let s: number;
    if (fa !== fc && fb !== fc) {
      s =
        (a * fb * fc) / ((fa - fb) * (fa - fc)) +
        (b * fa * fc) / ((fb - fa) * (fb - fc)) +
        (c * fa * fb) / ((fc - fa) * (fc - fb));
    } else {
      s = b - (fb * (b - a)) / (fb - fa);
    }
    const between = (s - (3 * a + b) / 4) * (s - b) < 0;
    if (
      !between ||
      (bisected && Math.abs(s - b) >= Math.abs(b - c) / 2) ||
      (!bisected && Math.abs(s - b) >= Math.abs(c - d) / 2) ||
      (bisected && Math.abs(b - c) < xTolerance) ||
      (!bisected && Math.abs(c - d) < xTolerance)
    ) {
      s = (a + b) / 2;
      bisected = true;
    } else {
      bisected = false;
    }
    const fs = f(s);
    if (!Number.isFinite(fs)) throw new ComputationError(`findRoot: f is not finite at ${s}`);
    d = c;
    c = b;
    fc = fb;
    if (Math.sign(fa) === Math.sign(fs)) {
      a = s;
      fa = fs;
    } else {
      b = s;
      fb = fs;
    }
    if (Math.abs(fa) < Math.abs(fb)) {
      [a, b] = [b, a];
      [fa, fb] = [fb, fa];
    }
  }
  throw new ComputationError(`findRoot: no convergence in ${maxIterations} iterations`);
}
