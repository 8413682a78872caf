/**
 * The element stamps of modified nodal analysis (Ho, Ruehli & Brennan 1975) with the
 * companion models of the trapezoidal rule and backward Euler: the linear matrix (conductances,
 * capacitors as αC, voltage-source and inductor branch rows with −R − αL), the right-hand side
 * (sources at the new time and the integration history) and the linearised diodes.
 * α = 2/h, θ = 1 for the trapezoidal rule; α = 1/h, θ = 0 for backward Euler.
 * Matrices are row-major n×n Float64Arrays; node index −1 is ground (not stamped).
 */
import type { CompiledCircuit } from "./compile.ts";

/** The integration history of the reactive elements (the state the next step starts from). */
export interface ReactiveHistory {
  /** capacitor voltages, V, and currents, A */
  readonly capV: Float64Array;
  readonly capI: Float64Array;
  /** inductor currents, A, and inductor voltages less their resistive drop, V */
  readonly indI: Float64Array;
  readonly indW: Float64Array;
}

/** Adds a conductance g (S) between nodes a and b. */
function stampConductance(A: Float64Array, n: number, a: number, b: number, g: number): void {
  if (a >= 0) A[a * n + a] = A[a * n + a]! + g;
  if (b >= 0) A[b * n + b] = A[b * n + b]! + g;
  if (a >= 0 && b >= 0) {
    A[a * n + b] = A[a * n + b]! - g;
    A[b * n + a] = A[b * n + a]! - g;
  }
}

/** Adds ±1 incidence of a branch current `row` between nodes a (+) and b (−), in its row and column. */
function stampBranch(A: Float64Array, n: number, a: number, b: number, row: number): void {
  if (a >= 0) {
    A[a * n + row] = A[a * n + row]! + 1;
    A[row * n + a] = A[row * n + a]! + 1;
  }
  if (b >= 0) {
    A[b * n + row] = A[b * n + row]! - 1;
    A[row * n + b] = A[row * n + b]! - 1;
  }
}

/**
 * Writes the linear part of the MNA matrix into A (zeroed first) for integration coefficient
 * alpha (1/s) and the switch states (1 closed, 0 open).
 */
export function stampLinear(cc: CompiledCircuit, A: Float64Array, n: number, alpha: number, switchState: Uint8Array): void {
  A.fill(0);
  for (const r of cc.resistors) stampConductance(A, n, r.a, r.b, r.g);
  cc.switches.forEach((s, i) => stampConductance(A, n, s.a, s.b, switchState[i] ? s.gOn : s.gOff));
  for (const c of cc.capacitors) stampConductance(A, n, c.a, c.b, alpha * c.c);
  for (const v of cc.voltageSources) stampBranch(A, n, v.a, v.b, v.row);
  for (const l of cc.inductors) {
    const k = l.row;
    stampBranch(A, n, l.a, l.b, k);
    A[k * n + k] = A[k * n + k]! - l.r;
    cc.inductors.forEach((m, j) => {
      A[k * n + m.row] = A[k * n + m.row]! - alpha * l.l[j]!;
    });
  }
}

/**
 * Writes the right-hand side into b (zeroed first): the sources at time tNew (s) and the
 * companion currents and voltages of the capacitors and inductors from their history.
 */
export function stampRhs(cc: CompiledCircuit, b: Float64Array, tNew: number, alpha: number, theta: number, hist: ReactiveHistory): void {
  b.fill(0);
  for (const v of cc.voltageSources) b[v.row] = v.waveform(tNew);
  for (const s of cc.currentSources) {
    const j = s.waveform(tNew);
    if (s.to >= 0) b[s.to] = b[s.to]! + j;
    if (s.from >= 0) b[s.from] = b[s.from]! - j;
  }
  stampHistory(cc, b, alpha, theta, hist);
}

/**
 * Adds the companion currents and voltages of the capacitors and inductors from their history
 * to b (the part of the right-hand side that is linear in the history; the sensitivities of
 * the shooting method propagate through it alone).
 */
export function stampHistory(cc: CompiledCircuit, b: Float64Array, alpha: number, theta: number, hist: ReactiveHistory): void {
  const capList = cc.capacitors;
  for (let i = 0; i < capList.length; i++) {
    const c = capList[i]!;
    const jeq = alpha * c.c * hist.capV[i]! + theta * hist.capI[i]!;
    if (c.a >= 0) b[c.a] = b[c.a]! + jeq;
    if (c.b >= 0) b[c.b] = b[c.b]! - jeq;
  }
  const indList = cc.inductors;
  const nL = indList.length;
  for (let k = 0; k < nL; k++) {
    const l = indList[k]!;
    let s = 0;
    for (let j = 0; j < nL; j++) s += l.l[j]! * hist.indI[j]!;
    b[l.row] = -alpha * s - theta * hist.indW[k]!;
  }
}

/**
 * Stamps every diode linearised at its voltage diodeV[d] (V): conductance g = i'(v₀) into W and
 * the companion current i(v₀) − g·v₀ into the right-hand side x; records g and i(v₀).
 */
export function stampDiodes(
  cc: CompiledCircuit,
  W: Float64Array,
  x: Float64Array,
  n: number,
  diodeV: Float64Array,
  diodeG: Float64Array,
  diodeI0: Float64Array,
): void {
  const diodes = cc.diodes;
  for (let d = 0; d < diodes.length; d++) {
    const e = diodes[d]!;
    const v0 = diodeV[d]!;
    const g = e.model.conductance(v0);
    const i0 = e.model.current(v0);
    diodeG[d] = g;
    diodeI0[d] = i0;
    const ieq = i0 - g * v0;
    const a = e.a;
    const c = e.b;
    if (a >= 0) {
      W[a * n + a] = W[a * n + a]! + g;
      x[a] = x[a]! - ieq;
    }
    if (c >= 0) {
      W[c * n + c] = W[c * n + c]! + g;
      x[c] = x[c]! + ieq;
    }
    if (a >= 0 && c >= 0) {
      W[a * n + c] = W[a * n + c]! - g;
      W[c * n + a] = W[c * n + a]! - g;
    }
  }
}

/**
 * Advances the history to the accepted solution x: capacitor current by the companion relation
 * i = αC(v − v_old) − θ·i_old, inductor current from its branch row, w = v − R·i.
 */
export function updateHistory(cc: CompiledCircuit, x: Float64Array, alpha: number, theta: number, hist: ReactiveHistory): void {
  const capList = cc.capacitors;
  for (let i = 0; i < capList.length; i++) {
    const c = capList[i]!;
    const v = (c.a >= 0 ? x[c.a]! : 0) - (c.b >= 0 ? x[c.b]! : 0);
    hist.capI[i] = alpha * c.c * (v - hist.capV[i]!) - theta * hist.capI[i]!;
    hist.capV[i] = v;
  }
  const indList = cc.inductors;
  for (let k = 0; k < indList.length; k++) {
    const l = indList[k]!;
    const i = x[l.row]!;
    const v = (l.a >= 0 ? x[l.a]! : 0) - (l.b >= 0 ? x[l.b]! : 0);
    hist.indI[k] = i;
    hist.indW[k] = v - l.r * i;
  }
}
