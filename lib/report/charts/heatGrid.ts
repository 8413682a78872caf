/**
 * What the heat-map charts (coverage, exposure) share: the check of a grid of values over two
 * ascending axes, the display scales, each cell as a rectangle and the level line
 * (marching squares), all in display units.
 */
import { levelSegments } from "../contour.ts";
import { displayScale, maxAbs, tidy, type DisplayScale } from "../scale.ts";
import { finiteArray, gridShape, positive } from "./check.ts";
import { cellEdges } from "./spec.ts";

/** One input of a chart with the user's name for it (for error messages). */
type Named<T> = readonly [name: string, data: T];

/** A heat map's input: axes in m, values[row][column] in `unit`, the level (> 0) in `unit`. */
export interface HeatGridInput {
  readonly x: Named<readonly number[]>;
  readonly y: Named<readonly number[]>;
  readonly values: Named<readonly (readonly number[])[]>;
  readonly level: Named<number>;
  /** SI unit of the values and the level, e.g. "A", "T" */
  readonly unit: string;
}

/** A rectangle or a segment in display units. */
export interface DisplayBox {
  readonly x: number;
  readonly x2: number;
  readonly y: number;
  readonly y2: number;
}

/** A checked heat map laid out for display. */
export interface HeatGrid {
  /** display scale of both axes (from m) */
  readonly length: DisplayScale;
  /** display scale of the values and the level */
  readonly value: DisplayScale;
  /** cell edges of the columns and the rows, m */
  readonly xEdges: readonly number[];
  readonly yEdges: readonly number[];
  /** cell (row r, column c) as a rectangle in display units */
  readonly cell: (r: number, c: number) => DisplayBox;
  /** the level line as segments in display units (empty when the level is not crossed) */
  readonly levelLine: readonly DisplayBox[];
}

/**
 * Checks a heat map's grid (finite axes, one value per cell, a level > 0; errors name the
 * input's fields) and lays it out: display scales, cell rectangles, level line.
 * @example heatGrid("chart.coverage", { x: ["x", [0, 0.01]], y: ["y", [0]], values: ["current", [[1e-3, 1e-4]]], level: ["threshold", 5e-4], unit: "A" }).length.unit // → "mm"
 */
export function heatGrid(where: string, g: HeatGridInput): HeatGrid {
  const [xName, x] = g.x;
  const [yName, y] = g.y;
  const [valuesName, values] = g.values;
  const [levelName, level] = g.level;
  finiteArray(x, xName, where, "m");
  finiteArray(y, yName, where, "m");
  gridShape(values, y.length, x.length, valuesName, where);
  positive(level, levelName, where, g.unit);
  const length = displayScale(Math.max(maxAbs(x), maxAbs(y)), "m");
  const value = displayScale(Math.max(maxAbs(values.flat()), level), g.unit);
  const xEdges = cellEdges(x);
  const yEdges = cellEdges(y);
  const f = length.factor;
  const cell = (r: number, c: number): DisplayBox => ({
    x: tidy(xEdges[c]! * f), x2: tidy(xEdges[c + 1]! * f), y: tidy(yEdges[r]! * f), y2: tidy(yEdges[r + 1]! * f),
  });
  const levelLine = levelSegments(x, y, values, level).map((s) => ({
    x: tidy(s.x1 * f), y: tidy(s.y1 * f), x2: tidy(s.x2 * f), y2: tidy(s.y2 * f),
  }));
  return { length, value, xEdges, yEdges, cell, levelLine };
}
