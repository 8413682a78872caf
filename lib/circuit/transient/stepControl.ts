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
 * First step after a switching instant, as a fraction of the output step: 2⁻¹⁰. Breakpoint
 * restart as circuit simulators do it (Nagel, SPICE2, UC Berkeley ERL-M520, 1975, from memory
 * (unverified): at a breakpoint the step is cut and integration restarts with a first-order
 * step): one backward-Euler step of h/1024, then trapezoidal steps doubling back to h. The
 * backward-Euler step's numerical damping, which a full-length step makes ≈ 4πQ/N² of a
 * switched tank's current (N steps a cycle), becomes negligible, and a switch closing on a
 * charged capacitor with R_on·C ≪ h decays while the steps are still short instead of ringing
 * under the trapezoidal rule (its amplification → −1 for h ≫ R_on·C).
 */
export const RESTART_FRACTION = 1 / 1024;

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
    if (engine.tryStep(tNew, len, engine.afterDiscontinuity)) {
      engine.t = tNew;
      remaining -= len;
      engine.steps++;
      engine.afterDiscontinuity = false;
      engine.subStep = Math.min(h, engine.subStep * 2);
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
