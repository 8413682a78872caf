/**
 * A shared test system for the analysis tests: the pebble drawer's coils (a 5-turn, 50 mm
 * transmitter under a parallel tank, switched from a DC supply; a 120-turn token with one LED).
 * Demo data (casebook/pebbleDrawer.ts), not a published design.
 */
import { ledPreset, roundCoil, type LedColour, type LinkSystem } from "../../lib/mod.ts";

export const tx = roundCoil({ meanRadius: 0.05, turns: 5, wire: { diameter: 0.8e-3, insulation: 0.03e-3 } });
export const token = roundCoil({ innerRadius: 0.0065, turns: 120, layers: 6, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
export const FREQUENCY = 196.9e3;
export const LID = 0.005;

/** The drawer with one token (of a colour) at a position; `supply` in V, `tokenResistance` overrides the token coil's R (Ω). */
export function drawer(opts: { colour?: LedColour; position?: readonly [number, number, number]; supply?: number; tokenResistance?: number } = {}): LinkSystem {
  return {
    frequency: FREQUENCY,
    transmitter: {
      coil: tx,
      compensation: "parallel",
      capacitor: { capacitance: 106.8e-9, dissipationFactor: 1e-3 },
      drive: { kind: "parallelTank", supply: opts.supply ?? 5, onResistance: 0.05 },
    },
    receivers: [
      {
        coil: token,
        pose: { position: opts.position ?? [0, 0, LID] },
        topology: "parallel",
        capacitor: { capacitance: 2.2e-9, dissipationFactor: 1e-3 },
        load: { kind: "led", led: ledPreset(opts.colour ?? "red") },
        ...(opts.tokenResistance !== undefined ? { resistance: opts.tokenResistance } : {}),
      },
    ],
  };
}
