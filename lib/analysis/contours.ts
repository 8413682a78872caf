/**
 * Dead zones as polygons: marching squares (Lorensen & Cline's marching cubes in two
 * dimensions; Maple 2003, "Geometric design and space planning using the marching squares and
 * marching cube algorithms") over axis-aligned quads of grid nodes of mixed size, with the
 * crossing on each edge placed by linear interpolation of the node values, saddles decided by
 * the mean of the four corners, and the segments stitched into closed loops through the edges
 * they share.
 *
 * Convention: a node is dead where its value is < 0. Every segment has the dead side on its
 * left, so outer boundaries run counter-clockwise (positive area) and lit holes clockwise
 * (negative area): the signed areas of all loops add up to the dead area.
 */

/** A closed loop in the (u, v) plane, m; area signed (dead on the left). */
export interface Loop {
  readonly points: readonly (readonly [number, number])[];
  readonly area: number;
}

/** The node field the quads refer to: integer node coordinates (I, J). */
export interface NodeField {
  /** value at node (I, J): < 0 dead, ≥ 0 lit */
  value(I: number, J: number): number;
  /** position of node (I, J) in the plane, m */
  u(I: number): number;
  v(J: number): number;
  /** a unique non-negative integer per node (I, J) */
  key(I: number, J: number): number;
}

/**
 * Marching squares over the quads the caller visits.
 * @param visitQuads calls `quad(Ia, Ja, Ib, Jb)` for each axis-aligned quad with corners
 *   (Ia, Ja), (Ib, Ja), (Ib, Jb), (Ia, Jb), Ia < Ib, Ja < Jb; neighbouring quads must share
 *   the edges that carry crossings (a crossing edge must be the same pair of nodes on both sides).
 * @param field node values, positions and keys.
 * @returns the closed loops with signed areas.
 */
export function marchingSquares(visitQuads: (quad: (Ia: number, Ja: number, Ib: number, Jb: number) => void) => void, field: NodeField): Loop[] {
  // segment store: start crossing key → [end crossing key]; crossing key → point
  const next = new Map<string, string>();
  const point = new Map<string, readonly [number, number]>();
  const cx = [0, 0, 0, 0];
  const cy = [0, 0, 0, 0];
  const cv = [0, 0, 0, 0];
  const crossingKey = (k: number): string => {
    const ka = field.key(cx[k]!, cy[k]!);
    const kb = field.key(cx[(k + 1) & 3]!, cy[(k + 1) & 3]!);
    return ka < kb ? `${ka}:${kb}` : `${kb}:${ka}`;
  };
  const crossing = (k: number): string => {
    const key = crossingKey(k);
    if (!point.has(key)) {
      const a = k;
      const b = (k + 1) & 3;
      const fa = cv[a]!;
      const fb = cv[b]!;
      const t = fa === fb ? 0.5 : fa / (fa - fb);
      const ua = field.u(cx[a]!);
      const va = field.v(cy[a]!);
      point.set(key, [ua + t * (field.u(cx[b]!) - ua), va + t * (field.v(cy[b]!) - va)]);
    }
    return key;
  };
  visitQuads((Ia, Ja, Ib, Jb) => {
    cx[0] = Ia; cy[0] = Ja;
    cx[1] = Ib; cy[1] = Ja;
    cx[2] = Ib; cy[2] = Jb;
    cx[3] = Ia; cy[3] = Jb;
    let mask = 0;
    for (let k = 0; k < 4; k++) {
      cv[k] = field.value(cx[k]!, cy[k]!);
      if (cv[k]! < 0) mask |= 1 << k;
    }
    if (mask === 0 || mask === 15) return;
    // crossings in counter-clockwise order: exit (dead → lit) or entry (lit → dead)
    const exits: number[] = [];
    const entries: number[] = [];
    for (let k = 0; k < 4; k++) {
      const da = (mask >> k) & 1;
      const db = (mask >> ((k + 1) & 3)) & 1;
      if (da && !db) exits.push(k);
      else if (!da && db) entries.push(k);
    }
    if (exits.length === 1) {
      next.set(crossing(exits[0]!), crossing(entries[0]!));
      return;
    }
    // saddle: the centre (mean of the corners) decides which corners connect
    const centreDead = (cv[0]! + cv[1]! + cv[2]! + cv[3]!) / 4 < 0;
    for (const k of exits) {
      const partner = centreDead ? (k + 1) & 3 : (k + 3) & 3;
      next.set(crossing(k), crossing(partner));
    }
  });
  const loops: Loop[] = [];
  const seen = new Set<string>();
  for (const start of next.keys()) {
    if (seen.has(start)) continue;
    const pts: (readonly [number, number])[] = [];
    let k: string | undefined = start;
    while (k !== undefined && !seen.has(k)) {
      seen.add(k);
      pts.push(point.get(k)!);
      k = next.get(k);
    }
    let area = 0;
    for (let i = 0; i < pts.length; i++) {
      const a = pts[i]!;
      const b = pts[(i + 1) % pts.length]!;
      area += a[0] * b[1] - b[0] * a[1];
    }
    loops.push({ points: pts, area: area / 2 });
  }
  return loops;
}
