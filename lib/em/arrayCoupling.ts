/**
 * Mutual inductance of every transmitter of an array to one token at many token poses — what a
 * coverage map of a transmitter array needs — through one cached couplingEvaluator per distinct
 * transmitter coil.
 */
import { TanklightInputError, underName } from "../errors.ts";
import { unknownKeyMessage } from "../schema.ts";
import { checkCoil, checkPose } from "./inputs.ts";
import { couplingEvaluator, type CouplingEvaluator, type CouplingEvaluatorOptions } from "./couplingEvaluator.ts";
import { poseFrame } from "./frames.ts";
import type { Coil, Pose } from "./types.ts";

/** One transmitter of an array: its coil (own frame) and where it sits. */
export interface ArrayTransmitter {
  readonly coil: Coil;
  readonly pose: Pose;
}

/** Configured once for an array and a token design; evaluated at many token poses. */
export interface ArrayCoupling {
  /**
   * M of each transmitter to the token at `tokenPose`, H, in transmitter order, written to `out`
   * (allocated when omitted; length = number of transmitters).
   */
  mutual(tokenPose: Pose, out?: Float64Array): Float64Array;
  /** the evaluator of each transmitter (transmitters sharing a coil object share one) */
  readonly evaluators: readonly CouplingEvaluator[];
}

/** The most transmitters of one array (each costs one coupling evaluation per token pose). */
const MAX_TRANSMITTERS = 10000;

/**
 * Fast M of each transmitter of an array to a token at any pose — the building block of an
 * array's coverage map (docs/methods/em.md, "Arrays"). Transmitters that share a coil object
 * share one couplingEvaluator (lumps, segment tables and self-inductances built once); each
 * value has the evaluator's accuracy (relTol, default 1e-3, with its exact fall-back), and the
 * straight-conductor fast path serves rectangular coils.
 *
 * @param transmitters `[{ coil, pose }]`, at least one; poses in m (world frame).
 * @param token the token's coil (own frame).
 * @param options passed to each couplingEvaluator (`relTol`, `absTol`, `frequency`).
 * @returns `{ mutual(tokenPose, out?) → Float64Array of M (H) per transmitter, evaluators }`.
 * @example arrayCoupling([{ coil: tx, pose: { position: [-0.05, 0, 0] } }, { coil: tx, pose: { position: [0.05, 0, 0] } }], token).mutual({ position: [0, 0, 0.02] }).length // → 2
 * @see couplingEvaluator, solveLink (transmitters: [...])
 */
export function arrayCoupling(transmitters: readonly ArrayTransmitter[], token: Coil, options: CouplingEvaluatorOptions = {}): ArrayCoupling {
  const where = "arrayCoupling";
  if (!Array.isArray(transmitters) || transmitters.length === 0) {
    throw new TanklightInputError([{ path: "transmitters", message: "must be a list of at least one { coil, pose }", value: transmitters }], where);
  }
  if (transmitters.length > MAX_TRANSMITTERS) {
    throw new TanklightInputError([{ path: "transmitters", message: `lists more than ${MAX_TRANSMITTERS} transmitters (each is one evaluation per token pose)`, value: `${transmitters.length} transmitters` }], where);
  }
  const poses = transmitters.map((t, i) => {
    const at = `transmitters[${i}]`;
    if (typeof t !== "object" || t === null || Array.isArray(t)) throw new TanklightInputError([{ path: at, message: "must be { coil, pose }", value: t }], where);
    for (const key of Reflect.ownKeys(t)) {
      if (key !== "coil" && key !== "pose") throw new TanklightInputError([{ path: `${at}.${String(key)}`, message: unknownKeyMessage(String(key), ["coil", "pose"]), value: (t as unknown as Record<PropertyKey, unknown>)[key] }], where);
    }
    checkCoil(t.coil, `${at}.coil`, where);
    poseFrame(t.pose, where, `${at}.pose`);
    return checkPose(t.pose, `${at}.pose`, where);
  });
  checkCoil(token, "token", where);
  const byCoil = new Map<Coil, CouplingEvaluator>();
  const evaluators = transmitters.map((t) => {
    let ev = byCoil.get(t.coil);
    if (ev === undefined) {
      ev = underName(where, () => couplingEvaluator(t.coil, token, options));
      byCoil.set(t.coil, ev);
    }
    return ev;
  });
  return {
    mutual(tokenPose, out = new Float64Array(poses.length)) {
      for (let i = 0; i < poses.length; i++) out[i] = evaluators[i]!.mutual(poses[i]!, tokenPose);
      return out;
    },
    evaluators,
  };
}
