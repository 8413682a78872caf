/** Hand-built coils for the EM core tests (independent of the builders). */
import type { Coil, Filament, Vec3 } from "../../lib/em/types.ts";

/** A wound coil: `layers` radial layers of `perLayer` turns, axial pitch and radial pitch = wire outer diameter. */
export function handRoundCoil(innerRadius: number, perLayer: number, layers: number, wireDiameter: number, total = perLayer * layers): Coil {
  const filaments: Filament[] = [];
  let n = 0;
  for (let j = 0; j < layers && n < total; j++) {
    for (let i = 0; i < perLayer && n < total; i++, n++) {
      const z = (i - (perLayer - 1) / 2) * wireDiameter;
      filaments.push({ kind: "circle", center: [0, 0, z], axis: [0, 0, 1], radius: innerRadius + wireDiameter / 2 + j * wireDiameter, turns: 1 });
    }
  }
  const wireLength = filaments.reduce((s, f) => s + (f.kind === "circle" ? 2 * Math.PI * f.radius : 0), 0);
  return { filaments, conductor: { kind: "round", diameter: wireDiameter, outerDiameter: wireDiameter }, turns: total, wireLength };
}

/** One circular turn of round wire. */
export function singleTurn(radius: number, wireDiameter: number, center: Vec3 = [0, 0, 0]): Coil {
  return {
    filaments: [{ kind: "circle", center, axis: [0, 0, 1], radius, turns: 1 }],
    conductor: { kind: "round", diameter: wireDiameter, outerDiameter: wireDiameter },
    turns: 1,
    wireLength: 2 * Math.PI * radius,
  };
}

/** A regular n-gon turn inscribed in a circle of radius r (counter-clockwise about +z) at height z. */
export function polygonTurn(r: number, n: number, wireDiameter: number, z = 0, phase = 0): Coil {
  const points: Vec3[] = [];
  for (let i = 0; i < n; i++) points.push([r * Math.cos(phase + (2 * Math.PI * i) / n), r * Math.sin(phase + (2 * Math.PI * i) / n), z]);
  return { filaments: [{ kind: "path", points, turns: 1 }], conductor: { kind: "round", diameter: wireDiameter, outerDiameter: wireDiameter }, turns: 1, wireLength: 2 * n * r * Math.sin(Math.PI / n) };
}

/** A rectangle w × h centred on the axis (counter-clockwise about +z). */
export function rectTurn(w: number, h: number, wireDiameter: number): Coil {
  const points: Vec3[] = [[-w / 2, -h / 2, 0], [w / 2, -h / 2, 0], [w / 2, h / 2, 0], [-w / 2, h / 2, 0]];
  return { filaments: [{ kind: "path", points, turns: 1 }], conductor: { kind: "round", diameter: wireDiameter, outerDiameter: wireDiameter }, turns: 1, wireLength: 2 * (w + h) };
}
