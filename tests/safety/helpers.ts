import type { Coil } from "../../lib/em/types.ts";

/** A coil of N turns lumped on one circle of radius a (filament model), for closed-form checks. */
export function ringCoil(a: number, turns = 1, z = 0): Coil {
  return {
    filaments: [{ kind: "circle", center: [0, 0, z], axis: [0, 0, 1], radius: a, turns }],
    conductor: { kind: "round", diameter: 5e-4, outerDiameter: 5.5e-4 },
    turns,
    wireLength: 2 * Math.PI * a * turns,
  };
}
