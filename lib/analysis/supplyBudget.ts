/**
 * Supply budget: a design's DC supply current and power against the supply it names.
 *
 * With ideal switches a switched drive takes from its DC supply the power its equivalent
 * source delivers: I_DC = P_in / V_DD (P_in = `power.input` of the link result, which includes
 * the switch loss modelled as source resistance). Sine and current-regulated drives name no DC
 * supply, so they have no budget here.
 *
 * Current ratings at 5 V — source: the USB specifications: USB 2.0 500 mA per port (USB 2.0
 * Specification §7.2.1), USB 3.x 900 mA (USB 3.2 Specification), USB Type-C current 1.5 A and
 * 3.0 A (USB Type-C Cable and Connector Specification). A bench supply is taken at its rating.
 */
import * as z from "../zod.ts";
import { TanklightInputError, requireObject, underName } from "../errors.ts";
import { current as currentQ, parseArgs, parseInput, voltage as voltageQ, lazySchema } from "../schema.ts";
import { LinkSystemInput, systemTransmitters, type DriveParsed } from "../circuit/link/schema.ts";
import { solveLink, type LinkSystem, type LinkSolution } from "../circuit/link.ts";
import type { LinkOptions } from "../circuit/link/network.ts";

/** The named supplies (5 V USB ports) with their current ratings and sources. */
export const USB_SUPPLIES = {
  "usb2": { label: "USB 2.0 port", voltage: 5, current: 0.5, source: "source: USB 2.0 Specification §7.2.1 (500 mA)" },
  "usb3": { label: "USB 3.x port", voltage: 5, current: 0.9, source: "source: USB 3.2 Specification (900 mA)" },
  "usb-c-1.5a": { label: "USB Type-C port, 1.5 A current", voltage: 5, current: 1.5, source: "source: USB Type-C Specification (Type-C current 1.5 A)" },
  "usb-c-3a": { label: "USB Type-C port, 3.0 A current", voltage: 5, current: 3.0, source: "source: USB Type-C Specification (Type-C current 3.0 A)" },
} as const;

/** A named USB supply. */
export type UsbSupply = keyof typeof USB_SUPPLIES;

/** A supply: a named USB port, or a bench/mains adapter by its rating. */
export const SupplyInput = lazySchema(() => z.union([
  z.enum(Object.keys(USB_SUPPLIES) as [UsbSupply, ...UsbSupply[]]),
  z.strictObject({
    kind: z.literal("bench"),
    /** output voltage, V */
    voltage: voltageQ({ positive: true }),
    /** rated output current, A */
    current: currentQ({ positive: true }),
    label: z.string().optional(),
  }),
]));
/** supplyVerdict's arguments: the DC draw (V > 0, A ≥ 0, quantity strings accepted) and the supply. */
const SupplyVerdictArgs = lazySchema(() => z.strictObject({ draw: z.strictObject({ voltage: voltageQ({ positive: true }), current: currentQ({ nonNegative: true }) }), supply: SupplyInput }));
/** supplyBudget's supply, checked before the link is solved. */
const SupplyBudgetArgs = lazySchema(() => z.strictObject({ supply: SupplyInput }));
/** What {@link supplyBudget} accepts as a supply. */
export type SupplyInput = z.input<typeof SupplyInput>;

/** Share of the rating above which the budget is called tight: 80 % (a common derating, trade practice, no source). */
export const SUPPLY_DERATING = 0.8;
/** Relative mismatch of the drive's supply voltage and the named supply's allowed before a verdict says so: 5 %. */
export const SUPPLY_VOLTAGE_TOLERANCE = 0.05;

/** The verdict of a supply budget. */
export interface SupplyVerdict {
  /** the supply, e.g. "USB 2.0 port" */
  readonly supply: string;
  /** its voltage and rated current, V and A */
  readonly voltage: number;
  readonly rating: number;
  readonly ratingSource: string;
  /** the design's DC supply current, A, and power, W */
  readonly current: number;
  readonly power: number;
  /** current / rating */
  readonly utilisation: number;
  /** "within" ≤ 80 % of the rating; "tight" 80–100 %; "over" above it; "voltage mismatch" if the drive runs from another voltage */
  readonly verdict: "within" | "tight" | "over" | "voltage mismatch";
  /** one sentence with numbers and units */
  readonly message: string;
}

function resolveSupply(s: z.output<typeof SupplyInput>): { label: string; voltage: number; current: number; source: string } {
  if (typeof s === "string") return USB_SUPPLIES[s];
  return { label: s.label ?? `bench supply ${s.voltage} V / ${s.current} A`, voltage: s.voltage, current: s.current, source: "the supply's own rating" };
}

/**
 * Verdict of a DC draw against a supply.
 * @param draw `{ voltage: V, current: A }` — the drive's supply voltage and DC current.
 * @param supply "usb2" | "usb3" | "usb-c-1.5a" | "usb-c-3a" | { kind: "bench", voltage, current }.
 * @returns {@link SupplyVerdict}.
 * @example supplyVerdict({ voltage: 5, current: 10.52 }, "usb2").verdict // → "over"
 */
export function supplyVerdict(draw: { readonly voltage: number; readonly current: number }, supply: SupplyInput): SupplyVerdict {
  const args = parseArgs(SupplyVerdictArgs, [draw, supply], "supplyVerdict");
  draw = args.draw;
  const s = resolveSupply(args.supply);
  const power = draw.voltage * draw.current;
  const utilisation = draw.current / s.current;
  const fmtA = (a: number): string => (a >= 1 ? `${a.toPrecision(3)} A` : `${(a * 1e3).toPrecision(3)} mA`);
  const base = `draws ${fmtA(draw.current)} (${power.toPrecision(3)} W) at ${draw.voltage} V from a ${s.label} rated ${fmtA(s.current)} at ${s.voltage} V`;
  let verdict: SupplyVerdict["verdict"];
  let message: string;
  if (Math.abs(draw.voltage - s.voltage) > SUPPLY_VOLTAGE_TOLERANCE * s.voltage) {
    verdict = "voltage mismatch";
    message = `the drive runs from ${draw.voltage} V but the ${s.label} gives ${s.voltage} V: recompute the design at the supply's voltage`;
  } else if (utilisation > 1) {
    verdict = "over";
    message = `${base}: ${utilisation.toPrecision(3)}× its rating — the supply will limit, shut down or overheat; raise the coil's turns or series resistance, lower the drive, or use a bigger supply`;
  } else if (utilisation > SUPPLY_DERATING) {
    verdict = "tight";
    message = `${base}: ${(100 * utilisation).toFixed(0)} % of its rating, above the usual ${(100 * SUPPLY_DERATING).toFixed(0)} % derating`;
  } else {
    verdict = "within";
    message = `${base}: ${(100 * utilisation).toFixed(0)} % of its rating`;
  }
  return { supply: s.label, voltage: s.voltage, rating: s.current, ratingSource: s.source, current: draw.current, power, utilisation, verdict, message };
}

/** The DC supply voltage of a parsed drive spec, V (undefined for sine, current-regulated and ready equivalents, and for a shared drive's name). */
export function supplyVoltageOf(drive: DriveParsed | string): number | undefined {
  if (typeof drive === "object" && "supply" in drive && typeof drive.supply === "number") return drive.supply;
  return undefined;
}

/** A design's DC draw with the link solution it came from. */
export interface SupplyBudget extends SupplyVerdict {
  readonly solution: LinkSolution;
}

/**
 * Solves the link as given and compares its DC supply draw (I = P_in/V_DD) with a supply.
 * @param system a link system whose transmitter drive names a supply voltage (half/full bridge,
 *   parallel tank, class E).
 * @param supply see {@link supplyVerdict}.
 * @param options link options (lit threshold, …).
 * @throws TanklightInputError if the drive names no DC supply.
 * @example a 1-turn, 50 mm coil series-tuned on a 5 V half bridge: supplyBudget(system, "usb2").verdict is "over" (15.0 A, 75.2 W)
 */
export function supplyBudget(system: LinkSystem, supply: SupplyInput, options: LinkOptions = {}): SupplyBudget {
  requireObject(system, "system", "supplyBudget");
  const parsed = parseInput(LinkSystemInput, system, "supplyBudget");
  parseInput(SupplyBudgetArgs, { supply }, "supplyBudget");
  const txs = systemTransmitters(parsed);
  const at = (i: number): string => (parsed.transmitters === undefined ? "transmitter" : `transmitters[${i}]`);
  // every drive in the solution's order (own drives, then the shared drives that feed a coil), with its field
  const drives = [
    ...txs.flatMap((t, i) => (typeof t.drive === "string" ? [] : [{ drive: t.drive, path: `${at(i)}.drive` }])),
    ...(parsed.sharedDrives ?? []).flatMap((d, g) => (txs.some((t) => t.drive === d.name) ? [{ drive: d.drive, path: `sharedDrives[${g}].drive` }] : [])),
  ];
  let v: number | undefined;
  for (const d of drives) {
    const dv = supplyVoltageOf(d.drive);
    if (dv === undefined) {
      throw new TanklightInputError(
        [{ path: d.path, message: "names no DC supply voltage (sine and current-regulated drives have no supply budget here)", value: d.drive, expected: "a halfBridge, fullBridge, parallelTank or classE drive with its supply" }],
        "supplyBudget",
      );
    }
    if (v !== undefined && dv !== v) {
      throw new TanklightInputError([{ path: d.path, message: `runs from ${dv} V while another drive runs from ${v} V: one supply budget needs one supply voltage`, value: dv }], "supplyBudget");
    }
    v = dv;
  }
  if (v === undefined) throw new TanklightInputError([{ path: "transmitters", message: "no drive", value: undefined }], "supplyBudget");
  const solution = underName("supplyBudget", () => solveLink(system, options));
  // I = Σ P_in/V_DD over the drives (a drive that returns power draws nothing)
  let current = 0;
  for (const d of solution.drives) current += Math.max(0, d.inputPower) / v;
  const voltage = v;
  return { ...underName("supplyBudget", () => supplyVerdict({ voltage, current }, supply)), solution };
}
