/**
 * Core geometric types (docs/design.md §4). A coil is a set of weighted current filaments in its
 * own frame (axis +z, origin at the centre of the winding) plus the conductor that carries
 * the current. All lengths in metres.
 */

/** A point or direction in 3-D, m (or unitless for directions). */
export type Vec3 = readonly [number, number, number];

/** Where a coil sits in the world: its centre, its axis (unit normal, default +z) and spin about the axis, rad. */
export interface Pose {
  readonly position: Vec3;
  readonly axis?: Vec3;
  readonly spin?: number;
}

/** One current filament: a circle or a closed polygon, weighted by the turns it stands for. */
export type Filament =
  | {
      readonly kind: "circle";
      readonly center: Vec3;
      readonly axis: Vec3;
      readonly radius: number;
      readonly turns: number;
    }
  | { readonly kind: "path"; readonly points: readonly Vec3[]; readonly turns: number };

/** The conductor a coil is wound from (plain data; losses are computed in lib/em/losses). */
export type Conductor =
  | {
      readonly kind: "round";
      /** bare copper diameter, m */
      readonly diameter: number;
      /** outer diameter including insulation, m */
      readonly outerDiameter: number;
      /** material name, resolved in lib/em/materials.ts (default "copper") */
      readonly material?: string;
    }
  | {
      readonly kind: "litz";
      readonly strands: number;
      /** bare diameter of one strand, m */
      readonly strandDiameter: number;
      /** outer diameter of the bundle including serving, m */
      readonly outerDiameter: number;
      readonly material?: string;
    }
  | {
      readonly kind: "trace";
      /** trace width, m */
      readonly width: number;
      /** copper thickness, m */
      readonly thickness: number;
      readonly material?: string;
    };

/** A coil in its own frame. */
export interface Coil {
  readonly filaments: readonly Filament[];
  readonly conductor: Conductor;
  /** total turns */
  readonly turns: number;
  /** total conductor length, m */
  readonly wireLength: number;
  /** which builder made it and with which (SI) parameters, for reports and loss models */
  readonly shape?: CoilShape;
}

/**
 * The builder's own description of a coil, in SI units (m), for reports and loss models
 * (written by lib/em/builders/*; conventions in docs/methods/coils.md). Radii of a winding
 * window are measured to its boundary (the insulation surface of round wire, the copper edge of
 * a trace); `meanRadius` is the mean of inner and outer radius. Hand-built coils may omit it or
 * use `{ kind: "custom" }`.
 */
export type CoilShape =
  | {
      /** wound multi-layer circular coil: turns fill layer by layer, layers stacked radially outward */
      readonly kind: "roundCoil";
      readonly innerRadius: number;
      readonly meanRadius: number;
      readonly outerRadius: number;
      /** axial extent of the winding window, m */
      readonly windingHeight: number;
      readonly turns: number;
      readonly layers: number;
      /** turns in a full layer (the last layer may hold fewer) */
      readonly turnsPerLayer: number;
      /** centre-to-centre distance of neighbouring turns along the axis, m */
      readonly axialPitch: number;
      /** centre-to-centre distance of neighbouring layers, m */
      readonly radialPitch: number;
    }
  | {
      /** single-layer circular coil with a pitch */
      readonly kind: "solenoid";
      /** radius of the wire centres, m */
      readonly radius: number;
      /** winding length turns·pitch (the current-sheet length of Nagaoka's formula), m */
      readonly length: number;
      readonly pitch: number;
      readonly turns: number;
    }
  | {
      /** planar circular (Archimedean) spiral */
      readonly kind: "flatSpiral";
      /** innermost conductor edge, m */
      readonly innerRadius: number;
      /** outermost conductor edge, m */
      readonly outerRadius: number;
      readonly meanRadius: number;
      readonly pitch: number;
      readonly turns: number;
      /** conductor width in the plane (trace width or wire outer diameter), m */
      readonly conductorWidth: number;
      /** how the filaments represent the spiral */
      readonly model: "rings" | "spiral";
    }
  | {
      /** rectangular spiral: planar (turns nest inward) or wound (turns stacked along the axis) */
      readonly kind: "rectSpiral";
      readonly stacking: "planar" | "axial";
      /** outer edge dimensions of the outermost turn, m */
      readonly outerWidth: number;
      readonly outerHeight: number;
      /** inner edge dimensions of the innermost turn, m */
      readonly innerWidth: number;
      readonly innerHeight: number;
      readonly pitch: number;
      readonly turns: number;
      /** corner radius of the outer edge of the outermost turn, m (0: sharp corners) */
      readonly cornerRadius: number;
      readonly conductorWidth: number;
    }
  | {
      /** one rectangular turn; width and height measured between conductor centrelines */
      readonly kind: "rectLoop";
      readonly width: number;
      readonly height: number;
    }
  | { readonly kind: "custom"; readonly [key: string]: unknown };
