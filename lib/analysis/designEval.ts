/**
 * One candidate of searchDesign, evaluated: coils built from the candidate's numbers, tanks
 * tuned with E-series parts, a half bridge from the named supply, then the LED current along a
 * radius of the region at the token's height (bracketing and bisection, ./findRange.ts, so a dark
 * ring is found) and the DC supply current. Margins are natural logarithms, ≥ 0 when met:
 *   coverage = ln(I_q / I_lit), I_q the LED current met on the required share of the region's area
 *              (the weakest point for a share of 1), worst over the LED colours;
 *   supply   = ln(0.8·I_rated / I_DC) (80 % derating, trade practice, no source).
 * Plain-data in and out, so worker threads can evaluate candidates.
 */
import { roundCoil } from "../em/builders/roundCoil.ts";
import { selfInductance } from "../em/selfInductance.ts";
import type { Vec3 } from "../em/types.ts";
import { nearestStandardValue, type ESeries } from "../circuit/eseries.ts";
import { ledPreset, type LedColour } from "../circuit/loads/ledPresets.ts";
import type { LinkSystem } from "../circuit/link.ts";
import { makeProbe } from "./probe.ts";
import { probeSpec } from "./probeSpec.ts";
import { rangeWith } from "./findRange.ts";
import { SUPPLY_DERATING } from "./supplyBudget.ts";

/** The numbers that make one design. */
export interface Candidate {
  /** transmitter mean radius, m */
  readonly radius: number;
  /** transmitter turns (a flat winding: one turn per layer, layers outward) */
  readonly turns: number;
  /** transmitter wire diameter, m */
  readonly wire: number;
  /** drive frequency, Hz */
  readonly frequency: number;
  readonly tokenTurns: number;
}

/** The fixed part of the problem, as plain SI numbers. */
export interface DesignProblem {
  /** region: points of the covered area, radii from the transmitter's axis, sorted, m */
  readonly radii: readonly number[];
  readonly reach: number;
  readonly share: number;
  readonly barrier: number;
  readonly token: { readonly innerRadius: number; readonly layers: number; readonly wire: number };
  readonly colours: readonly LedColour[];
  readonly supplyVoltage: number;
  readonly supplyRating: number;
  readonly tilt: number;
  readonly litThreshold: number;
  readonly series: ESeries;
  readonly onResistance: number;
}

/** An evaluated design (SI). */
export interface DesignEvaluation {
  readonly candidate: Candidate;
  readonly transmitterCapacitance: number;
  readonly tokenCapacitance: number;
  readonly tokenHeight: number;
  readonly transmitterInductance: number;
  readonly tokenInductance: number;
  /** LED current met on the required share of the area (worst colour), A */
  readonly coveredCurrent: number;
  /** the weakest point's LED current and colour */
  readonly weakest: { readonly current: number; readonly radius: number; readonly colour: LedColour };
  readonly supplyCurrent: number;
  readonly margins: { readonly coverage: number; readonly supply: number };
  readonly score: number;
  readonly binding: "coverage" | "supply";
}

/**
 * Builds and evaluates one candidate design.
 * @param c the candidate's numbers; @param p the problem (see DesignProblem).
 */
export function evaluateDesign(c: Candidate, p: DesignProblem): DesignEvaluation {
  const w = 2 * Math.PI * c.frequency;
  const tx = roundCoil({ meanRadius: c.radius, turns: c.turns, layers: c.turns, wire: { diameter: c.wire, insulation: 0.03e-3 } });
  const token = roundCoil({ innerRadius: p.token.innerRadius, turns: c.tokenTurns, layers: p.token.layers, wire: { diameter: p.token.wire, insulation: 0.01e-3 } });
  const L1 = selfInductance(tx, { frequency: c.frequency });
  const L2 = selfInductance(token, { frequency: c.frequency });
  const C1 = nearestStandardValue(1 / (w * w * L1), p.series);
  const C2 = nearestStandardValue(1 / (w * w * L2), p.series);
  const height = p.barrier + (token.shape?.kind === "roundCoil" ? token.shape.windingHeight / 2 : 0);
  let coveredCurrent = Infinity;
  let weakest = { current: Infinity, radius: 0, colour: p.colours[0]! };
  let supplyCurrent = 0;
  const axes: Vec3[] = p.tilt > 0 ? [[0, 0, 1], [0, Math.sin(p.tilt), Math.cos(p.tilt)], [Math.sin(p.tilt), 0, Math.cos(p.tilt)], [-Math.sin(p.tilt), 0, Math.cos(p.tilt)]] : [[0, 0, 1]];
  for (const colour of p.colours) {
    const system: LinkSystem = {
      frequency: c.frequency,
      transmitter: { coil: tx, compensation: "series", capacitor: { capacitance: C1 }, drive: { kind: "halfBridge", supply: p.supplyVoltage, onResistance: p.onResistance } },
      receivers: [{ coil: token, pose: { position: [0, 0, height] }, topology: "parallel", capacitor: { capacitance: C2 }, load: { kind: "led", led: ledPreset(colour) } }],
    };
    const probe = makeProbe(probeSpec(system, { axes, litThreshold: p.litThreshold }, "searchDesign"));
    const r = rangeWith(probe, [0, 0, height], [1, 0, 0], p.reach, p.reach / 40, Math.max(2e-4, p.reach / 1000));
    const curve = r.curve;
    // LED current at each region point's radius: linear between solved points, zero inside a dark stretch
    const at = (radius: number): number => {
      for (let k = 0; k + 1 < r.boundaries.length; k += 1) {
        const a = r.boundaries[k]!;
        const b = r.boundaries[k + 1]!;
        if (radius > a && radius < b && interpolate(curve, (a + b) / 2) < p.litThreshold) return 0;
      }
      return interpolate(curve, radius);
    };
    const currents = p.radii.map(at).sort((a, b) => a - b);
    const q = currents[Math.min(currents.length - 1, Math.floor((1 - p.share) * currents.length))]!;
    coveredCurrent = Math.min(coveredCurrent, q);
    for (const pt of curve) if (pt.current < weakest.current) weakest = { current: pt.current, radius: pt.distance, colour };
    for (const radius of [0, p.reach]) supplyCurrent = Math.max(supplyCurrent, probe.at([radius, 0, height], [0, 0, 1]).supply);
  }
  const coverage = Math.log(Math.max(coveredCurrent, 1e-6 * p.litThreshold) / p.litThreshold);
  const supply = Math.log((SUPPLY_DERATING * p.supplyRating) / Math.max(supplyCurrent, 1e-12));
  return {
    candidate: c,
    transmitterCapacitance: C1,
    tokenCapacitance: C2,
    tokenHeight: height,
    transmitterInductance: L1,
    tokenInductance: L2,
    coveredCurrent,
    weakest,
    supplyCurrent,
    margins: { coverage, supply },
    score: Math.min(coverage, supply),
    binding: coverage <= supply ? "coverage" : "supply",
  };
}

function interpolate(curve: readonly { distance: number; current: number }[], x: number): number {
  let lo = 0;
  let hi = curve.length - 1;
  if (x <= curve[0]!.distance) return curve[0]!.current;
  if (x >= curve[hi]!.distance) return curve[hi]!.current;
  while (hi - lo > 1) {
    const m = (lo + hi) >> 1;
    if (curve[m]!.distance <= x) lo = m;
    else hi = m;
  }
  const a = curve[lo]!;
  const b = curve[hi]!;
  const t = b.distance > a.distance ? (x - a.distance) / (b.distance - a.distance) : 0;
  return a.current + t * (b.current - a.current);
}
