/**
 * Where the transient's steps fall: from one output time to the next, cut at every switching
 * instant (located by bisection on the switch's closed(t)), each piece halved while Newton's
 * method fails and lengthened again after success. Every loop here is bounded: event location
 * stops at the floating-point resolution of t, so it cannot stall however long the run.
 */
import type { Engine } from "./engine.ts";
import { TransientConvergenceError } from "./errors.ts";

/** Halvings of one step before Newton's failure is reported. */
const MAX_HALVINGS = 24;
/** Sub-steps (after halving) allowed inside one output step. */
const MAX_PIECES_PER_STEP = 4096;
/** Switching instants are located to this fraction of a step. */
export const EDGE_RESOLUTION = 1e-10;
/** Pieces (switching instants and steps) allowed between two output times before the run is declared stuck. */
const MAX_PIECES_PER_OUTPUT = 1e6;
/** Bisection halvings of a switching-instant search: 2⁻²⁰⁰ of a step is far below any double's spacing. */
const MAX_BISECTIONS = 200;

/**
 * The first instant in (lo, hi] at which `closed` differs from `now`, to within `resolution`
 * (s) or the spacing of doubles at t, whichever is coarser: bisection that stops as soon as no
 * double lies strictly between its ends, so it ends at any t. Requires closed(hi) ≠ now.
 * @example switchingEdge((t) => t >= 0.3, false, 0, 1, 1e-12) // → 0.3 (within 1e-12)
 */
export function switchingEdge(closed: (t: number) => boolean, now: boolean, lo: number, hi: number, resolution: number): number {
  for (let i = 0; i < MAX_BISECTIONS && hi - lo > resolution; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break; // lo and hi are adjacent doubles
    if (closed(mid) === now) lo = mid;
    else hi = mid;
  }
  return hi;
}

/** The earliest switching instant in (t, t + hs], or Infinity when no switch changes state. */
function nextSwitchingEdge(engine: Engine, hs: number, h: number): number {
  const switches = engine.cc.switches;
  let tEdge = Infinity;
  for (let i = 0; i < switches.length; i++) {
    const s = switches[i]!;
    const now = engine.switchState[i] === 1;
    if (s.closed(engine.t + hs) !== now) {
      const edge = switchingEdge(s.closed, now, engine.t, engine.t + hs, EDGE_RESOLUTION * h);
      if (edge < tEdge) tEdge = edge;
    }
  }
  return tEdge;
}

/**
 * Breakpoint restart after a switching instant. The step is cut at the instant and integration
 * restarts with one backward-Euler step of h/1024 (first order, needs no derivative from before
 * the discontinuity — Nagel, SPICE2, UC Berkeley ERL-M520, 1975, from memory (unverified)),
 * then steps growing 1.5× a step back to h and two steps of h, all TR-BDF2 (Bank et al., IEEE
 * Trans. CAD 4(4):436–451, 1985: second order, L-stable), and from there the trapezoidal rule.
 * - The short first-order step keeps backward Euler's damping of a switched tank — ≈ 4πQ/N²
 *   of its current for a full-length step, N steps a cycle — negligible; TR-BDF2 damps a tank
 *   by 4e-9 a step at 200 steps a cycle.
 * - A switch closing on a charged capacitor starts a fast mode (τ = R_on·C, possibly ≪ h). The
 *   trapezoidal rule reflects such a mode (amplification → −1 for h ≫ τ: false ringing);
 *   TR-BDF2's amplification is small but also negative beyond h ≈ 2.4τ, so the ramp must be
 *   gentle enough that the mode has decayed before the steps grow past it. Growth 1.5 and two
 *   full TR-BDF2 steps leave at most 1.1e-4 of the jump as undershoot at the output samples,
 *   over τ/h = 1e-6…10 (growth 2 and none: 8.5e-3) — worked out on the scalar mode
 *   x′ = −x/τ with each method's amplification factor (docs/methods/transient.md).
 * Steps shortened after a Newton failure are TR-BDF2 too until they are back at h.
 */
export const RESTART_FRACTION = 1 / 1024;
/** Growth of the restart steps, per step. */
const RESTART_GROWTH = 1.5;
/** Full-length TR-BDF2 steps after the restart ramp, before the trapezoidal rule takes over. */
export const RESTART_FULL_STEPS = 2;

/** Takes every switch's state at tEdge (s), counting the changes; the next step is a short backward-Euler step. */
function applySwitching(engine: Engine, tEdge: number, h: number): void {
  const switches = engine.cc.switches;
  engine.t = tEdge;
  for (let i = 0; i < switches.length; i++) {
    const v = switches[i]!.closed(tEdge) ? 1 : 0;
    if (v !== engine.switchState[i]) {
      engine.switchState[i] = v;
      engine.switchingEvents++;
    }
  }
  engine.switchVersion++;
  engine.afterDiscontinuity = true;
  engine.subStep = Math.min(engine.subStep, RESTART_FRACTION * h);
  engine.stableSteps = RESTART_FULL_STEPS;
}

/**
 * Integrates from engine.t to tTarget (≤ one grid step h, s), cutting at switching instants.
 * @throws TransientConvergenceError if more than 1e6 pieces do not reach tTarget.
 */
export function advanceTo(engine: Engine, tTarget: number, h: number): void {
  let guard = 0;
  while (tTarget - engine.t > EDGE_RESOLUTION * h) {
    if (++guard > MAX_PIECES_PER_OUTPUT) throw new TransientConvergenceError(`simulate: no progress at t = ${engine.t} s`, engine.t, engine.subStep, []);
    const rem = tTarget - engine.t;
    const sub = engine.subStep;
    // a remainder within rounding of the sub-step is taken as exactly the sub-step, so the
    // integration coefficient (and the cached factorisation) stays the same from step to step
    let hs = Math.abs(rem - sub) <= 1e-9 * sub ? sub : Math.min(sub, rem);
    if (rem - hs < EDGE_RESOLUTION * h) hs = Math.abs(rem - sub) <= 1e-9 * sub ? sub : rem;
    const tEdge = engine.cc.switches.length > 0 ? nextSwitchingEdge(engine, hs, h) : Infinity;
    const flip = tEdge !== Infinity;
    if (flip) hs = tEdge - engine.t;
    const tEnd = engine.t + hs;
    if (hs > EDGE_RESOLUTION * h) stepWithHalving(engine, hs, h);
    // the step ended at (or within EDGE_RESOLUTION·h before) the instant: take the new states there
    if (flip) applySwitching(engine, tEnd, h);
  }
  engine.t = tTarget;
}

/** One step of length hs (s), halved until Newton converges. */
function stepWithHalving(engine: Engine, hs: number, h: number): void {
  const nonlinear = engine.cc.diodes.length > 0;
  let remaining = hs;
  let tries = 0;
  let pieces = 0;
  while (remaining > EDGE_RESOLUTION * h) {
    if (++pieces > MAX_PIECES_PER_STEP) {
      const names = engine.cc.diodes.map((d) => d.name);
      throw new TransientConvergenceError(
        `simulate: the step collapsed at t = ${engine.t} s (more than ${MAX_PIECES_PER_STEP} sub-steps in one step; nonlinear elements: ${names.join(", ") || "none"})`,
        engine.t, engine.subStep, names,
      );
    }
    const len = Math.min(remaining, engine.subStep);
    const tNew = engine.t + len;
    if (nonlinear) engine.saveHistory();
    const full = engine.subStep >= h;
    const method = engine.afterDiscontinuity ? "euler" : !full || engine.stableSteps > 0 ? "trbdf2" : "trapezoidal";
    if (engine.tryStep(tNew, len, method)) {
      engine.t = tNew;
      remaining -= len;
      engine.steps++;
      engine.afterDiscontinuity = false;
      if (full && method === "trbdf2") engine.stableSteps--;
      engine.subStep = Math.min(h, engine.subStep * RESTART_GROWTH);
      tries = 0;
      continue;
    }
    if (!nonlinear) {
      throw new TransientConvergenceError(`simulate: the solution became non-finite at t = ${engine.t} s`, engine.t, len, []);
    }
    engine.restoreHistory();
    engine.restoreSolution();
    engine.rejected++;
    engine.subStep = len / 2;
    if (++tries > MAX_HALVINGS) {
      const names = engine.cc.diodes.map((d) => d.name);
      throw new TransientConvergenceError(
        `simulate: Newton's method did not converge at t = ${engine.t} s even with the step reduced to ${engine.subStep} s (nonlinear elements: ${names.join(", ") || "none"})`,
        engine.t, engine.subStep, names,
      );
    }
  }
}
