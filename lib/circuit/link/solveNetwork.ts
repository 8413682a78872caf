/**
 * Steady state of a driven transmitter and any number of coupled receivers with nonlinear
 * loads, at the drive frequency, from plain numbers (the link solver's numeric core).
 *
 * Linear part — the coupled-circuit (loop) impedance matrix, one loop per coil:
 *   Z₀₀ = Z_src + R₀ + jωL₀ (+ Z_C₀ if series-compensated),  Zₖₖ = Rₖ + jωLₖ + Z_ext,k(Yₖ),
 *   Zᵢⱼ = jωMᵢⱼ (i ≠ j),  Z·I = [V_th, 0, …, 0]ᵀ,
 * with Z_ext = Z_C + 1/Y for a series tank and 1/(Y_C + Y) for a parallel tank (load admittance
 * Y across the capacitor), Z_C = ESR + 1/(jωC). A parallel-compensated transmitter driven through
 * Z_src is replaced by its Thevenin equivalent seen from the coil: V_th = V·Z_C/(Z_src + Z_C),
 * Z_th = Z_src ∥ Z_C. A current-regulated transmitter replaces row 0 by I₀ = I_set. This is the
 * textbook coupled-circuit (mesh) analysis; for one receiver it gives the reflected impedance
 * (ωM)²/Z₂ (checked in tests/circuit/link.test.ts).
 *
 * Nonlinear part — each load's describing function Y(V) (fundamental-harmonic balance): the
 * unknowns are the receivers' load amplitudes xₖ, and xₖ = |Vₖ(x)|. Solved by
 * 1. a local solve per receiver: with the rest of the network fixed, receiver k sees a Thevenin
 *    source found from one LU by the Sherman–Morrison update of its diagonal,
 *    Iₖ = E/(Z_s + Zₖₖ(Y)) with E = Iₖ⁰/Wₖₖ, Z_s = 1/Wₖₖ − Zₖₖ⁰, W = Z⁻¹; the scalar equation
 *    ln x + ln|1 + A + B·Y(x)| = ln|E| is increasing in x and is solved by Newton safeguarded by
 *    bisection (the logarithm keeps an LED's exponential knee nearly linear);
 * 2. damped Newton on s = ln x over all receivers together, with the exact Jacobian from the
 *    same LU (∂I/∂xⱼ = −W·eⱼ·∂Zⱼⱼ/∂xⱼ·Iⱼ), step limited to a factor e³ and halved by
 *    backtracking while the residual max|ln|Vₖ| − sₖ| does not fall; a failed line search falls
 *    back to step 1 for all receivers at once.
 * With one nonlinear receiver step 1 is already the exact answer.
 *
 * The pieces: ./validateNetwork.ts (input checks), ./tankImpedance.ts (the linear matrix and
 * tank impedances), ./localSolve.ts (step 1's scalar solve), ./operatingPoint.ts (the
 * iteration on an explicit workspace), ./assembleResult.ts (the result from the solved state).
 */
import { TanklightInputError, requireObject, requirePositive, unknownKeyMessage } from "../../errors.ts";
import { assembleResult, type SolvedLink } from "./assembleResult.ts";
import { LinkConvergenceError } from "./localSolve.ts";
import type { LinkNetwork, LinkOptions } from "./network.ts";
import { createWorkspace, receiverLabel, solveOperatingPoint, type LinkWorkspace } from "./operatingPoint.ts";
import type { LinkResult } from "./result.ts";
import { baseMatrix, receiverTanks } from "./tankImpedance.ts";
import { validateNetwork } from "./validateNetwork.ts";

export { LinkConvergenceError } from "./localSolve.ts";

/**
 * Solves the link from plain numbers: the linear coupled-circuit matrix at the drive frequency
 * and the nonlinear loads by their describing functions (see the module comment for the method).
 *
 * @param network transmitter, receivers and the full inductance matrix, SI (./network.ts).
 * @param options lit threshold (A, default 0.5 mA, trade practice), brightness reference,
 *   caution voltage, iteration cap, tolerance, what to do on non-convergence.
 * @returns {@link LinkResult}: every element's peak and RMS current and voltage, powers,
 *   efficiency, reflected impedance, LED currents and verdicts, warnings and cautions.
 * @throws TanklightInputError on bad numbers; LinkConvergenceError if the operating point is
 *   not found (unless options.onNonConvergence is "warn").
 * @example one series-tuned 10 µH pair, k = 0.1, 1 V sine, 10 Ω load → power.efficiency ≈ 0.97
 */
export function solveLinkNetwork(network: LinkNetwork, options: LinkOptions = {}): LinkResult {
  requireObject(network, "network", "solveLinkNetwork");
  requireObject(options, "options", "solveLinkNetwork", true);
  if (options !== undefined) checkLinkOptions(options, "solveLinkNetwork");
  requirePositive(network.frequency, "frequency", "Hz", "solveLinkNetwork");
  validateNetwork(network, "solveLinkNetwork");
  return assembleResult(solveLinkOperatingPoint(network, options), options);
}

/**
 * The operating point of {@link solveLinkNetwork} without its result record, for batch runs
 * (toleranceYield) that read a few numbers from many networks of one layout: the same
 * iteration and the same numbers, without the input check — the caller checks one network of
 * the layout with `validateNetwork` and varies only part values. Read each LED's current from
 * the load's `ledCurrents(|V_k|)` (|V_k| = hypot(ws.vRe[k], ws.vIm[k])) and the drives' power
 * from `inputPower(ws)` (./assembleResult.ts).
 * @param reuse the workspace of an earlier call on a network of the same layout: its arrays are
 *   taken over (no allocation per solve); that earlier result's workspace is then overwritten.
 * @returns the solved workspace, whether it converged, the iterations, and the non-convergence
 *   warning if any (options.onNonConvergence "warn"; "throw" throws LinkConvergenceError).
 * @example inputPower(solveLinkOperatingPoint(net).ws) // → solveLinkNetwork(net).power.input
 */
export function solveLinkOperatingPoint(network: LinkNetwork, options: LinkOptions = {}, reuse?: LinkWorkspace): SolvedLink {
  const where = "solveLinkNetwork";
  const f = requirePositive(network.frequency, "frequency", "Hz", where);
  const w = 2 * Math.PI * f;
  const ws = createWorkspace(network, w, baseMatrix(network, w), receiverTanks(network.receivers, w), where, reuse);
  const { converged, iterations } = solveOperatingPoint(ws, options.tolerance ?? 1e-10, options.maxIterations ?? 80);
  const warnings: string[] = [];
  if (!converged) {
    const parts = ws.nl.map((k, c) => `${receiverLabel(network.receivers[k]!, k)}: |V| − x = ${ws.resid[c]!.toExponential(2)} V`);
    const msg = `solveLinkNetwork: the nonlinear operating point did not converge in ${iterations} iterations (${parts.join("; ")}); try a smaller step in the sweep, check the load models, or raise maxIterations`;
    if ((options.onNonConvergence ?? "throw") === "throw") throw new LinkConvergenceError(msg, iterations, Array.from(ws.resid));
    warnings.push(msg);
  }
  return { ws, converged, iterations, warnings };
}

/** The keys of LinkOptions, and of solveLink's options that the engines pass along with them (model, order, samples, tabulateLoads). */
const LINK_OPTION_KEYS: readonly string[] = Object.freeze(["litThreshold", "brightnessReference", "cautionVoltage", "maxIterations", "tolerance", "onNonConvergence", "tabulateLoads", "model", "order", "samples"]);

/**
 * LinkOptions checked by hand (solveLinkNetwork runs in the analysis loops: a few typeof tests,
 * no schema): known keys only (a typo names the nearest), SI numbers in range — solveLink takes
 * the same options with units ("0.5 mA").
 */
export function checkLinkOptions(options: LinkOptions, where: string): void {
  const o = options as Record<string, unknown>;
  const fail = (key: string, message: string): never => {
    throw new TanklightInputError([{ path: `options.${key}`, message, value: o[key] }], where);
  };
  for (const key of Object.keys(o)) if (!LINK_OPTION_KEYS.includes(key)) fail(key, unknownKeyMessage(key, LINK_OPTION_KEYS));
  const positive = (key: string, unit: string): void => {
    const v = o[key];
    if (v !== undefined && !(typeof v === "number" && v > 0 && v < Infinity)) fail(key, `must be a finite number > 0 ${unit} (SI; solveLink reads units)`);
  };
  positive("litThreshold", "A");
  positive("brightnessReference", "A");
  positive("cautionVoltage", "V");
  const it = o["maxIterations"];
  if (it !== undefined && !(Number.isInteger(it) && (it as number) >= 1 && (it as number) <= 10_000)) fail("maxIterations", "must be a whole number from 1 to 10000");
  const tol = o["tolerance"];
  if (tol !== undefined && !(typeof tol === "number" && tol > 0 && tol <= 0.01)) fail("tolerance", "must be a number > 0 and ≤ 0.01");
  const nc = o["onNonConvergence"];
  if (nc !== undefined && nc !== "throw" && nc !== "warn") fail("onNonConvergence", "must be 'throw' or 'warn'");
}
