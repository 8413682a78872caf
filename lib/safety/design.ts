/**
 * The input of every safety check: a small zod-validated record of what the checks need — the
 * operating frequency, each transmitter coil with its pose and operating current (peak, with
 * its phase), the surface people can touch, and the parts whose ratings matter. Build it by hand
 * (quantities with units accepted) or from a solveLink system and its solution with
 * {@link designFromLink}.
 */
import * as z from "../zod.ts";
import { parseInput, angle, capacitance, current, frequency, length, power, voltage, lazySchema } from "../schema.ts";
import { TanklightInputError, describeValue, requireObject } from "../errors.ts";
import { PoseInput, TransmitterInput, LinkSystemInput, systemTransmitters, type DriveParsed, type LinkSystem } from "../circuit/link/schema.ts";
import type { LinkSolution } from "../circuit/link.ts";
import type { TransmitterState, ReceiverState } from "../circuit/link/result.ts";
import { CLASS_E } from "../circuit/drive.ts";
import type { Coil, Pose } from "../em/types.ts";

/** A tank capacitor and its operating stress (peak values) and ratings. */
export const SafetyCapacitorInput = lazySchema(() => z.strictObject({
  capacitance: capacitance(),
  /** operating voltage across it, V peak */
  voltage: voltage({ nonNegative: true }),
  /** DC (or AC peak) voltage rating of the part, V */
  rating: voltage({ positive: true }).optional(),
  /** RMS current rating of the part, A RMS */
  currentRating: current({ positive: true }).optional(),
}));

/** One transmitter coil at its operating point. */
export const SafetyTransmitterInput = lazySchema(() => z.strictObject({
  label: z.string().optional(),
  coil: TransmitterInput.shape.coil,
  /** pose of the coil (default: at the origin, axis +z) */
  pose: PoseInput.optional(),
  /** coil current, A peak (≥ 0) */
  current: current({ nonNegative: true }),
  /** phase of the coil current, rad (default 0) — arrays driven in different phases */
  phase: angle().optional(),
  capacitor: SafetyCapacitorInput.optional(),
  /** peak voltage across the drive's switch, V (bridge: the supply; class E ≈ 3.56×; single switch under a parallel tank ≈ π×) */
  switchPeakVoltage: voltage({ nonNegative: true }).optional(),
  /** the switch's voltage rating, V */
  switchRating: voltage({ positive: true }).optional(),
  /** loss in the winding, W (default: not given; the winding-temperature estimate then uses the coil's AC resistance) */
  coilLoss: power().optional(),
}));

/** |surfaceHeight| ≤ 100 km: the exposure grid and metal objects above it stay within the field sums' ±1000 km (GEOMETRY_LIMITS). */
const SURFACE_LIMIT = 1e5;

/** One LED on a token, with its operating current and ratings. */
export const SafetyLedInput = lazySchema(() => z.strictObject({
  label: z.string().optional(),
  /** average forward current, A */
  averageCurrent: current({ nonNegative: true }),
  /** rated (continuous) forward current, A; default: a typical indicator LED (see partRatings.ts) */
  ratedCurrent: current({ positive: true }).optional(),
  /** absolute-maximum continuous forward current, A; default: a typical indicator LED */
  maximumCurrent: current({ positive: true }).optional(),
}));

/** One token (receiver). */
export const SafetyReceiverInput = lazySchema(() => z.strictObject({
  label: z.string().optional(),
  capacitor: SafetyCapacitorInput.optional(),
  leds: z.array(SafetyLedInput).default([]),
  /** largest outer dimension of the token, m (small-parts caution); default unknown */
  size: length().optional(),
}));

/** The whole design as the safety checks see it. */
export const SafetyDesignInput = lazySchema(() => z.strictObject({
  /** operating (drive) frequency, Hz */
  frequency: frequency(),
  transmitters: z.array(SafetyTransmitterInput).min(1),
  /** the surface people touch: its height z in the world frame, m (points with z ≥ it are accessible) */
  surfaceHeight: length({ positive: false, min: -SURFACE_LIMIT, max: SURFACE_LIMIT }),
  receivers: z.array(SafetyReceiverInput).default([]),
}));

/** What the safety checks accept (quantities as numbers or strings with units). */
export type SafetyDesign = z.input<typeof SafetyDesignInput>;
/** The validated design (SI numbers). */
export type SafetyDesignParsed = z.output<typeof SafetyDesignInput>;

/** Validates a design once; every check calls it (a parsed design passes through unchanged). */
export function parseSafetyDesign(design: SafetyDesign, where: string): SafetyDesignParsed {
  requireObject(design, "design", where);
  return parseInput(SafetyDesignInput, design, where);
}

/** Extra facts for {@link designFromLink} that a link system does not hold. */
export interface DesignFromLinkOptions {
  /** height of the touchable surface above the transmitter's pose, m, e.g. a 3 mm lid over the winding */
  readonly surfaceHeight: number;
  /** largest outer dimension of each token, m (small-parts caution) — one value for all, or per receiver */
  readonly tokenSize?: number | readonly number[];
  /** voltage rating of each transmitter's switch, V */
  readonly switchRating?: number;
  /** RMS current rating of the tank capacitors, A RMS */
  readonly capacitorCurrentRating?: number;
}

/** designFromLink's opts (strict: a typo names the nearest key). */
const DesignFromLinkInput = lazySchema(() => z.strictObject({
  opts: z.strictObject({
    surfaceHeight: length({ positive: false }),
    tokenSize: z.union([length(), z.array(length())]).optional(),
    switchRating: voltage({ positive: true }).optional(),
    capacitorCurrentRating: current({ positive: true }).optional(),
  }),
}));

type SystemTransmitter = z.output<typeof TransmitterInput>;

/** Peak switch voltage of a drive spec, V, or undefined where the drive has no switch we know of. */
function switchPeak(drive: DriveParsed): number | undefined {
  if (!("kind" in drive)) return undefined;
  switch (drive.kind) {
    case "halfBridge":
    case "fullBridge":
      return drive.supply; // each switch blocks the supply
    case "classE":
      return CLASS_E.peakSwitchVoltageFactor * drive.supply; // Sokal & Sokal 1975: 3.562·V_DD
    case "parallelTank":
      return Math.PI * drive.supply; // half-sine swing of peak π·V_DD (see parallelTankDrive)
    default:
      return undefined;
  }
}

function transmitterOf(tx: SystemTransmitter, drive: DriveParsed | undefined, state: TransmitterState, opts: DesignFromLinkOptions): z.input<typeof SafetyTransmitterInput> {
  const sw = drive !== undefined ? switchPeak(drive) : undefined;
  return {
    label: state.label,
    coil: tx.coil as Coil,
    ...(tx.pose ? { pose: tx.pose as Pose } : {}),
    current: state.coilCurrent,
    phase: Math.atan2(state.coilCurrentPhasor.im, state.coilCurrentPhasor.re),
    ...(tx.capacitor
      ? {
          capacitor: {
            capacitance: tx.capacitor.capacitance,
            voltage: state.capacitorVoltage,
            ...(tx.capacitor.rating !== undefined ? { rating: tx.capacitor.rating } : {}),
            ...(opts.capacitorCurrentRating !== undefined ? { currentRating: opts.capacitorCurrentRating } : {}),
          },
        }
      : {}),
    ...(sw !== undefined ? { switchPeakVoltage: sw } : {}),
    ...(opts.switchRating !== undefined ? { switchRating: opts.switchRating } : {}),
    coilLoss: state.coilLoss,
  };
}

/**
 * Builds a {@link SafetyDesign} from a solveLink system and its solution: each transmitter's
 * coil, pose and solved coil current (peak, with its phase), its tank capacitor's solved
 * voltage and rating, the switch's peak voltage from the drive spec (bridge: the supply; class
 * E: 3.562·V_DD, Sokal & Sokal 1975; single switch under a parallel tank: π·V_DD), and each
 * token's capacitor voltage and LED currents. Accepts a one-transmitter system
 * (`transmitter:`) and, where the link solver offers it, a list (`transmitters:`).
 * @param system the solveLink input.
 * @param solution what solveLink returned for it.
 * @param opts.surfaceHeight height of the touchable surface above the transmitter, m (required:
 *   the link does not know the lid).
 * @example designFromLink(system, solveLink(system), { surfaceHeight: 0.003 }) .surfaceHeight // → 0.003 (the lid over a transmitter at the origin)
 */
export function designFromLink(system: LinkSystem, solution: LinkSolution, opts: DesignFromLinkOptions): SafetyDesign {
  const where = "designFromLink";
  requireObject(system, "system", where);
  const s = parseInput(LinkSystemInput, system, where);
  opts = parseInput(DesignFromLinkInput, { opts }, where).opts;
  const txs = systemTransmitters(s);
  checkSolution(solution, txs.length, s.receivers.length, where);
  const states = solution.transmitters;
  // a coil on a shared drive sees that drive's switch
  const driveOf = (tx: SystemTransmitter, i: number): DriveParsed | undefined => {
    if (typeof tx.drive !== "string") return tx.drive;
    const shared = s.sharedDrives?.find((d) => d.name === tx.drive);
    if (shared === undefined) {
      const path = s.transmitters === undefined ? "system.transmitter.drive" : `system.transmitters[${i}].drive`;
      throw new TanklightInputError([{ path, message: `names no shared drive (known: ${(s.sharedDrives ?? []).map((d) => `'${d.name}'`).join(", ") || "none"})`, value: tx.drive }], where);
    }
    return shared.drive;
  };
  if (Array.isArray(opts.tokenSize) && opts.tokenSize.length !== s.receivers.length) {
    throw new TanklightInputError([{ path: "opts.tokenSize", message: `gives ${opts.tokenSize.length} sizes for ${s.receivers.length} receivers (one number for all, or one per receiver)`, value: opts.tokenSize }], where);
  }
  const base = (txs[0]!.pose?.position[2] as number | undefined) ?? 0;
  const sizes = opts.tokenSize;
  return {
    frequency: solution.frequency,
    surfaceHeight: base + opts.surfaceHeight,
    transmitters: txs.map((tx, i) => transmitterOf(tx, driveOf(tx, i), states[i]!, opts)),
    receivers: solution.receivers.map((r: ReceiverState, k) => {
      const cap = s.receivers[k]?.capacitor;
      const size = typeof sizes === "number" ? sizes : sizes?.[k];
      return {
        label: r.label,
        ...(cap
          ? {
              capacitor: {
                capacitance: cap.capacitance,
                voltage: r.capacitorVoltage,
                ...(cap.rating !== undefined ? { rating: cap.rating } : {}),
                ...(opts.capacitorCurrentRating !== undefined ? { currentRating: opts.capacitorCurrentRating } : {}),
              },
            }
          : {}),
        leds: r.leds.map((l) => ({ label: l.label, averageCurrent: l.averageCurrent })),
        ...(size !== undefined ? { size } : {}),
      };
    }),
  };
}

/** The solution must be solveLink's result for this system: its transmitter and receiver lists match the system's. */
function checkSolution(solution: unknown, transmitters: number, receivers: number, where: string): void {
  requireObject(solution, "solution", where);
  const sol = solution as { transmitters?: unknown; receivers?: unknown; frequency?: unknown };
  const count = (x: unknown): number => (Array.isArray(x) ? x.length : -1);
  if (count(sol.transmitters) !== transmitters || count(sol.receivers) !== receivers || !(typeof sol.frequency === "number" && sol.frequency > 0 && Number.isFinite(sol.frequency))) {
    throw new TanklightInputError(
      [{ path: "solution", message: `must be what solveLink returned for this system (${transmitters} transmitter(s), ${receivers} receiver(s), a frequency)`, value: `${count(sol.transmitters)} transmitter(s), ${count(sol.receivers)} receiver(s), frequency ${describeValue(sol.frequency)}` }],
      where,
    );
  }
}
