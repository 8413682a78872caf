import type { Workload } from "./harness.ts";
import { coilResistance } from "../lib/em/losses/coilResistance.ts";
import { roundWireAcFactor } from "../lib/em/losses/roundWireAcFactor.ts";
import { kelvin } from "../lib/math/kelvin.ts";
import { roundCoil } from "../lib/em/builders/roundCoil.ts";
import { roundWire } from "../lib/em/builders/conductor.ts";
import type { Coil } from "../lib/em/types.ts";

// the 20-turn transmitter: radius 40 mm, 20 turns, 0.5 mm copper
const tx = roundCoil({ meanRadius: 0.04, turns: 20, wire: roundWire(0.5e-3, { insulation: 25e-6 }) });
let k = 0;
const xs = Array.from({ length: 256 }, (_, i) => (i + 0.5) * 0.2);

export const workloads: Workload[] = [
  {
    // a fresh coil object every call, so the per-coil field cache never hits: the full
    // turn-field computation (20 × 19 loopField calls) plus the Kelvin functions
    name: "coilResistance, 20-turn transmitter, incl. proximity (cold)",
    size: "20 turns, 1 frequency",
    target: 5e-3,
    fn: () => coilResistance({ ...tx } as Coil, 200e3),
  },
  {
    name: "coilResistance, same coil object (field cache warm)",
    size: "20 turns, 1 frequency",
    fn: () => coilResistance(tx, 100e3 + (k++ & 255) * 1e3),
  },
  { name: "roundWireAcFactor", size: "1 evaluation", fn: () => roundWireAcFactor(0.25e-3, 1e4 + (k++ & 1023) * 1e3, 1.7241e-8) },
  { name: "kelvin (ber, bei, ber′, bei′, orders 1, 2)", size: "1 evaluation, 0 < x < 51", fn: () => kelvin(xs[k++ & 255]!) },
];
