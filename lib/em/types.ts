/**
 * Core geometric types (design.md §4). A coil is a set of weighted current filaments in its
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
  readonly shape?: { readonly kind: string; readonly [key: string]: unknown };
}
