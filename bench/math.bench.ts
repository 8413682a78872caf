/**
 * lib/math benchmarks (`npm run bench -- math`). K+E kernels: within 1.3× of a minimal AGM loop
 * measured beside them (issue 12; ≤ 26 ns when that loop takes 20 ns).
 * The others are reported without a target, for the engines that call them.
 */
import type { Workload } from "./harness.ts";
import { ellipticKE, ellipticKEInto } from "../lib/math/elliptic.ts";
import { integrateAdaptive, integrateGaussLegendre } from "../lib/math/quadrature.ts";
import { lambertW } from "../lib/math/lambertW.ts";
import { luFactor, luSolve } from "../lib/math/lu.ts";
import { solveComplex } from "../lib/math/solveComplex.ts";
import { complexLuFactorCore, complexLuSolveCore } from "../lib/math/complexLu.ts";
import { createRandom } from "../lib/math/random.ts";

let i = 0;
const ms = Array.from({ length: 1024 }, (_, j) => (j + 0.5) / 1024);
// Lambert W arguments spread over the diode range: 1e-6 … 1e12, log-uniform
const ws = Array.from({ length: 1024 }, (_, j) => 10 ** (-6 + (18 * j) / 1023));

const rng = createRandom(2);
const N = 12;
const a12 = Float64Array.from({ length: N * N }, () => rng.uniformIn(-1, 1));
for (let k = 0; k < N; k++) a12[k * N + k]! += 4;
const b12 = Float64Array.from({ length: N }, () => rng.uniformIn(-1, 1));
const lu = new Float64Array(N * N);
const piv = new Int32Array(N);
const x12 = new Float64Array(N);

const c12 = Array.from({ length: N }, () => Array.from({ length: N }, () => ({ re: rng.normal(), im: rng.normal() })));
const cb12 = Array.from({ length: N }, () => ({ re: rng.normal(), im: rng.normal() }));
// the link solver's size: 13×13 complex (1 transmitter + 12 tokens), factored and solved in place
const M = 13;
const cRe = Float64Array.from({ length: M * M }, () => rng.normal());
const cIm = Float64Array.from({ length: M * M }, () => rng.normal());
const wRe = new Float64Array(M * M);
const wIm = new Float64Array(M * M);
const cPiv = new Int32Array(M);
const xRe = new Float64Array(M);
const xIm = new Float64Array(M);

const keOut = new Float64Array(2);
/**
 * The reference for the K+E kernels: the AGM (A&S 17.6) in its barest form — a fixed six
 * steps (enough for |c|/a < 1e-8 at every m of this bench, m ≤ 1 − 0.5/1024), no checks, no
 * branches, no near-1 treatment — writing K and E = K(1 − S) into a Float64Array.
 */
const minimalOut = new Float64Array(2);
const minimalKE = (m: number): number => {
  let a = 1;
  let b = Math.sqrt(1 - m);
  let s = 0.5 * m;
  let w = 0.5;
  for (let n = 0; n < 6; n++) {
    const c = 0.5 * (a - b);
    const an = 0.5 * (a + b);
    b = Math.sqrt(a * b);
    a = an;
    w *= 2;
    s += w * c * c;
  }
  const K = Math.PI / 2 / a;
  minimalOut[0] = K;
  minimalOut[1] = K * (1 - s);
  return minimalOut[1];
};
const smooth = (x: number): number => Math.exp(-x) * Math.cos(3 * x);

export const workloads: Workload[] = [
  {
    name: "minimal AGM loop, K+E (6 fixed steps, reference)",
    size: "1 evaluation",
    fn: () => minimalKE(ms[i++ & 1023]!),
  },
  {
    name: "ellipticK+E pair (AGM)",
    size: "1 evaluation",
    against: "minimal AGM loop, K+E (6 fixed steps, reference)",
    maxSlowdown: 1.3,
    fn: () => ellipticKE(ms[i++ & 1023]!).E,
  },
  {
    name: "ellipticKEInto (m and m1 given, writes into out)",
    size: "1 evaluation",
    against: "minimal AGM loop, K+E (6 fixed steps, reference)",
    maxSlowdown: 1.3,
    fn: () => {
      const m = ms[i++ & 1023]!;
      ellipticKEInto(m, 1 - m, keOut);
      return keOut[0];
    },
  },
  {
    name: "Gauss–Legendre 32-point integral (cached rule)",
    size: "32 integrand calls",
    fn: () => integrateGaussLegendre(smooth, 0, 2, 32),
  },
  {
    name: "adaptive Gauss–Kronrod ∫₀¹ ln x dx, tol 1e-10",
    size: "1 integral",
    fn: () => integrateAdaptive(Math.log, 0, 1, { absTol: 1e-10, relTol: 1e-10 }),
  },
  {
    name: "lambertW (x log-uniform 1e-6 … 1e12)",
    size: "1 evaluation",
    fn: () => lambertW(ws[i++ & 1023]!),
  },
  {
    name: "12×12 real LU factor + solve (in place, reused workspace)",
    size: "1 system",
    fn: () => {
      lu.set(a12);
      x12.set(b12);
      luFactor(lu, N, piv);
      luSolve(lu, N, piv, x12);
      return x12[0];
    },
  },
  {
    name: "13×13 complex LU factor + solve (complexLuFactorCore/SolveCore)",
    size: "1 system",
    fn: () => {
      wRe.set(cRe);
      wIm.set(cIm);
      complexLuFactorCore(wRe, wIm, M, cPiv);
      xRe.fill(1);
      xIm.fill(0);
      complexLuSolveCore(wRe, wIm, M, cPiv, xRe, xIm);
      return xRe[0];
    },
  },
  {
    name: "12×12 complex solve, allocating (solveComplex)",
    size: "1 system",
    fn: () => solveComplex(c12, cb12),
  },
  {
    name: "normal draw (xoshiro128**, polar method)",
    size: "1 draw",
    fn: () => rng.normal(),
  },
];
