/**
 * The coils the EM fuzz suites (em.fuzz.test.ts, kernels.fuzz.test.ts) derive their calls from:
 * a small transmitter, a token, and a hand-made one-turn coil whose fields the suites mutate
 * one by one (builders' coils are frozen and checked by identity).
 */
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";

export const tx = roundCoil({ innerRadius: "20 mm", turns: 4, wire: { diameter: "0.5 mm" } });
export const tok = roundCoil({ innerRadius: "6 mm", turns: 3, wire: { diameter: "0.2 mm" } });
export const hand = () => ({
  filaments: [{ kind: "circle", center: [0, 0, 0], axis: [0, 0, 1], radius: 0.02, turns: 1 }],
  conductor: { kind: "round", diameter: 5e-4, outerDiameter: 5.5e-4 },
  turns: 1,
  wireLength: 0.126,
});
