/**
 * Level lines of a grid by marching squares (Lorensen & Cline's marching cubes in two
 * dimensions: W. E. Lorensen, H. E. Cline, SIGGRAPH 1987), with linear interpolation along
 * each cell edge. Used for the lit boundary of a coverage map and the reference-level line of
 * an exposure map. Saddle cells are split by the cell-centre mean.
 */

/** One straight piece of a level line, in the grid's own coordinates. */
export interface Segment {
  readonly x1: number;
  readonly y1: number;
  readonly x2: number;
  readonly y2: number;
}

/**
 * Segments of the line value = level over a grid.
 * @param xs column coordinates (ascending), ys row coordinates (ascending);
 * @param values values[row][column]; non-finite values are treated as below the level.
 * @param level the level.
 * @returns the segments (empty when the level is not crossed).
 * @example levelSegments([0, 1], [0, 1], [[0, 1], [0, 1]], 0.5) // → [{ x1: 0.5, y1: 0, x2: 0.5, y2: 1 }]
 */
export function levelSegments(xs: readonly number[], ys: readonly number[], values: readonly (readonly number[])[], level: number): Segment[] {
  const out: Segment[] = [];
  const v = (r: number, c: number): number => {
    const x = values[r]?.[c];
    return x !== undefined && Number.isFinite(x) ? x : -Infinity;
  };
  // point where the level crosses the edge from (xa, ya, va) to (xb, yb, vb)
  const cross = (xa: number, ya: number, va: number, xb: number, yb: number, vb: number): [number, number] => {
    const t = Number.isFinite(va) && Number.isFinite(vb) && vb !== va ? (level - va) / (vb - va) : 0.5;
    return [xa + t * (xb - xa), ya + t * (yb - ya)];
  };
  for (let r = 0; r + 1 < ys.length; r++) {
    for (let c = 0; c + 1 < xs.length; c++) {
      const x0 = xs[c]!, x1 = xs[c + 1]!, y0 = ys[r]!, y1 = ys[r + 1]!;
      const a = v(r, c), b = v(r, c + 1), d = v(r + 1, c + 1), e = v(r + 1, c); // corners anticlockwise from (x0, y0)
      const code = (a >= level ? 1 : 0) | (b >= level ? 2 : 0) | (d >= level ? 4 : 0) | (e >= level ? 8 : 0);
      if (code === 0 || code === 15) continue;
      const bottom = (): [number, number] => cross(x0, y0, a, x1, y0, b);
      const right = (): [number, number] => cross(x1, y0, b, x1, y1, d);
      const top = (): [number, number] => cross(x0, y1, e, x1, y1, d);
      const left = (): [number, number] => cross(x0, y0, a, x0, y1, e);
      const push = (p: [number, number], q: [number, number]): void => {
        out.push({ x1: p[0], y1: p[1], x2: q[0], y2: q[1] });
      };
      switch (code) {
        case 1: case 14: push(left(), bottom()); break;
        case 2: case 13: push(bottom(), right()); break;
        case 3: case 12: push(left(), right()); break;
        case 4: case 11: push(right(), top()); break;
        case 6: case 9: push(bottom(), top()); break;
        case 7: case 8: push(left(), top()); break;
        case 5: case 10: {
          const centre = (a + b + d + e) / 4;
          const joined = Number.isFinite(centre) && centre >= level;
          if ((code === 5) === joined) { push(left(), top()); push(bottom(), right()); }
          else { push(left(), bottom()); push(right(), top()); }
          break;
        }
      }
    }
  }
  return out;
}
