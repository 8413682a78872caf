/**
 * Adapter from a token load (lib/circuit/loads/types.ts `TokenLoad`) to the link solver's
 * {@link LinkLoadModel}: the describing function is `fundamentalConductance(load, amplitude)` and
 * the LED currents `averageLoadCurrent(load, amplitude)` (lib/circuit/loads/describingFunction.ts).
 */
import { averageLoadCurrent, fundamentalConductance } from "../loads/describingFunction.ts";
import type { TokenLoad } from "../loads/types.ts";
import type { LinkLoadModel } from "./network.ts";

/**
 * The link solver's view of a token load.
 * @param load a {@link TokenLoad} (LED, anti-parallel pair, bridge, reservoir, resistor).
 * @returns a {@link LinkLoadModel}; a resistor is marked linear (no Newton unknown).
 * @example tokenLoadModel({ kind: "resistor", resistance: 1000 }).conductance(3) // → 0.001
 */
export function tokenLoadModel(load: TokenLoad): LinkLoadModel {
  const label = loadLabel(load);
  return {
    label,
    linear: load.kind === "resistor",
    conductance: (amplitude: number) => fundamentalConductance(load, amplitude),
    ledCurrents: (amplitude: number) =>
      averageLoadCurrent(load, amplitude).map((d) => ({
        label: d.label,
        current: d.current,
        relativeBrightness: d.relativeBrightness,
      })),
  };
}

function loadLabel(load: TokenLoad): string {
  switch (load.kind) {
    case "resistor":
      return `resistor ${load.resistance} Ω`;
    case "led":
      return load.led.label ?? "LED";
    case "antiParallel":
      return `anti-parallel ${load.a.label ?? "LED"} + ${load.b.label ?? "LED"}`;
    case "parallelSameDirection":
      return `parallel ${load.a.label ?? "LED"} + ${load.b.label ?? "LED"}`;
    case "bridge":
      return `bridge + ${load.led.label ?? "LED"}`;
    case "halfWaveReservoir":
      return `half-wave reservoir + ${load.led.label ?? "LED"}`;
    default:
      return "load";
  }
}
