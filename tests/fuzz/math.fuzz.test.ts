/**
 * Fuzz: the numerics of tanklight/advanced (lib/math) — elliptic integrals, quadrature, Lambert W,
 * Kelvin functions, real and complex LU, complex arithmetic, the seeded random stream. Bad and
 * extreme arguments give a clear TanklightInputError naming the function and the argument, or a
 * finite result; never a TypeError, NaN, a silently accepted bad argument or a hang
 * (framework: tests/fuzz/framework.ts).
 *
 * Functions that write into a caller's array (`out`, in-place LU) are called through a wrapper
 * that copies the inputs and returns the written array, so NaN written there is seen.
 */
import { fuzzSuite } from "./framework.ts";
import {
  ellipticK, ellipticE, ellipticKE, ellipticKEComplement, ellipticKEInto,
  gaussLegendre, integrateGaussLegendre, integrateAdaptive, lambertW, lambertWOfLog,
  complexMul, complexMulConj, complexDiv, complexInv, complexAbs, complexArg, complexSqrt, complexFromPolar,
  solveComplex, complexLuFactor, complexLuSolve, luFactor, luSolve, solveLinear,
  createRandom, createRandomFromState, kelvin, kelvinScaled, ber, bei, berPrime, beiPrime,
} from "../../lib/advanced.ts";

/** copies a typed array argument (the functions under test write into theirs) */
const fresh = <T>(v: T): T => (ArrayBuffer.isView(v) ? ((v as unknown as Float64Array).slice() as unknown as T) : v);
/** a function writing into out[offset], out[offset + 1], called on a copy of out; returns the copy */
const into = (fn: (...a: never[]) => void, outAt: number) => (...args: unknown[]) => {
  const a = args.map(fresh);
  (fn as (...x: unknown[]) => void)(...a);
  return a[outAt];
};
const out2 = () => new Float64Array(2);
const A2 = Float64Array.of(2, 1, 1, 3);
const factored = (() => { const a = A2.slice(); const p = new Int32Array(2); luFactor(a, 2, p); return { a, p }; })();
const cfactored = (() => {
  const re = Float64Array.of(1, 0, 0, 1), im = Float64Array.of(0, 1, 1, 0), p = new Int32Array(2);
  complexLuFactor(re, im, 2, p);
  return { re, im, p };
})();
const c = (re: number, im: number) => ({ re, im });
/** the output array's elements are places to write, not inputs: not mutated */
const outAt = (i: number) => [`${i}.0`, `${i}.1`];

fuzzSuite("math", [
  // elliptic integrals: K(1) = +∞ is the documented limit
  { name: "ellipticK", call: ellipticK, valid: [0.5], params: ["m"], allowInfinite: true },
  { name: "ellipticE", call: ellipticE, valid: [0.5], params: ["m"] },
  { name: "ellipticKE", call: ellipticKE, valid: [0.5], params: ["m"], allowInfinite: true },
  { name: "ellipticKEComplement", call: ellipticKEComplement, valid: [1e-6], params: ["m1"], allowInfinite: true },
  { name: "ellipticKEInto", skip: outAt(2), call: into(ellipticKEInto, 2), valid: [0.25, 0.75, out2(), 0], params: ["m", "m1", "out", "offset"], allowInfinite: true },
  // quadrature
  { name: "gaussLegendre", call: gaussLegendre, valid: [8], params: ["n"] },
  { name: "integrateGaussLegendre", call: integrateGaussLegendre, valid: [(x: number) => x * x, 0, 1, 4], params: ["f", "a", "b", "n"], bad: [[() => NaN, 0, 1, 4], [(x: number) => 1 / x, -1, 1, 3]] },
  {
    name: "integrateAdaptive", call: integrateAdaptive, valid: [Math.sqrt, 0, 1, { absTol: 1e-12, relTol: 1e-10, maxIntervals: 100 }], params: ["f", "a", "b", "options"],
    bad: [[() => NaN, 0, 1], [(x: number) => 1 / x, -1, 1]],
    extreme: [[(x: number) => Math.sin(1 / x), 0, 1, { absTol: 0, relTol: 0, maxIntervals: 20000 }]],
    budgetMs: 4000,
  },
  // Lambert W
  { name: "lambertW", call: lambertW, valid: [1], params: ["x"] },
  { name: "lambertWOfLog", call: lambertWOfLog, valid: [3], params: ["y"] },
  // complex arithmetic (results written into out at offset)
  { name: "complexMul", skip: outAt(4), call: into(complexMul, 4), valid: [1, 2, 3, -1, out2(), 0], params: ["ar", "ai", "br", "bi", "out", "offset"] },
  { name: "complexMulConj", skip: outAt(4), call: into(complexMulConj, 4), valid: [1, 2, 3, -1, out2(), 0], params: ["ar", "ai", "br", "bi", "out", "offset"] },
  { name: "complexDiv", skip: outAt(4), call: into(complexDiv, 4), valid: [5, 5, 3, -1, out2(), 0], params: ["ar", "ai", "br", "bi", "out", "offset"] },
  { name: "complexInv", skip: outAt(2), call: into(complexInv, 2), valid: [3, -1, out2(), 0], params: ["br", "bi", "out", "offset"] },
  { name: "complexAbs", call: complexAbs, valid: [3, 4], params: ["ar", "ai"] },
  { name: "complexArg", call: complexArg, valid: [3, 4], params: ["ar", "ai"] },
  { name: "complexSqrt", skip: outAt(2), call: into(complexSqrt, 2), valid: [-4, 0, out2(), 0], params: ["ar", "ai", "out", "offset"] },
  { name: "complexFromPolar", skip: outAt(2), call: into(complexFromPolar, 2), valid: [2, 0.5, out2(), 0], params: ["r", "theta", "out", "offset"] },
  // linear algebra
  { name: "solveComplex", call: solveComplex, valid: [[[c(1, 0), c(0, 1)], [c(0, 1), c(1, 0)]], [c(1, 0), c(0, 0)]], params: ["A", "b"] },
  { name: "complexLuFactor", call: into(complexLuFactor, 0), valid: [Float64Array.of(1, 0, 0, 1), Float64Array.of(0, 1, 1, 0), 2, new Int32Array(2)], params: ["re", "im", "n", "piv"] },
  { name: "complexLuSolve", call: into(complexLuSolve, 4), valid: [cfactored.re, cfactored.im, 2, cfactored.p, Float64Array.of(1, 0), Float64Array.of(0, 0)], params: ["re", "im", "n", "piv", "br", "bi"] },
  { name: "luFactor", call: into(luFactor, 0), valid: [A2, 2, new Int32Array(2)], params: ["a", "n", "pivots"], bad: [[Float64Array.of(1, 2, 2, 4), 2, new Int32Array(2)]] },
  { name: "luSolve", call: into(luSolve, 3), valid: [factored.a, 2, factored.p, Float64Array.of(3, 5)], params: ["a", "n", "pivots", "b"] },
  { name: "solveLinear", call: solveLinear, valid: [A2, Float64Array.of(3, 5)], params: ["a", "b"] },
  // seeded random stream
  { name: "createRandom", call: (seed: number) => createRandom(seed).uniform(), valid: [42], params: ["seed"] },
  { name: "createRandomFromState", call: (s: [number, number, number, number]) => createRandomFromState(s).uniform(), valid: [[1, 2, 3, 4]], params: ["state"] },
  { name: "createRandom().uniformIn", where: "uniformIn", call: (lo: number, hi: number) => createRandom(1).uniformIn(lo, hi), valid: [-2, 5], params: ["low", "high"] },
  { name: "createRandom().normal", where: "normal", call: (mean: number, sd: number) => createRandom(1).normal(mean, sd), valid: [1, 0.5], params: ["mean", "sd"] },
  // Kelvin functions
  { name: "kelvin", call: kelvin, valid: [2], params: ["x"] },
  { name: "kelvinScaled", call: kelvinScaled, valid: [2], params: ["x"] },
  { name: "ber", call: ber, valid: [2], params: ["x"] },
  { name: "bei", call: bei, valid: [2], params: ["x"] },
  { name: "berPrime", call: berPrime, valid: [2], params: ["x"] },
  { name: "beiPrime", call: beiPrime, valid: [2], params: ["x"] },
]);
