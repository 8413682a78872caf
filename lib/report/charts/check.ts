/** Input checks shared by the chart builders: they throw TanklightInputError naming the field. */
import { TanklightInputError } from "../../errors.ts";

/** A non-empty array of finite numbers, or throws. */
export function finiteArray(values: ArrayLike<number>, path: string, where: string, unit = ""): ArrayLike<number> {
  if (values.length === 0) throw new TanklightInputError([{ path, message: "must not be empty", value: values }], where);
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (!Number.isFinite(v)) throw new TanklightInputError([{ path: `${path}[${i}]`, message: `must be a finite number${unit ? ` in ${unit}` : ""}`, value: v }], where);
  }
  return values;
}

/** A grid values[row][column] matching the axes, or throws. */
export function gridShape(values: readonly (readonly number[])[], rows: number, columns: number, path: string, where: string): void {
  if (values.length !== rows) throw new TanklightInputError([{ path, message: `must have one row per y value (${rows})`, value: values.length }], where);
  values.forEach((row, r) => {
    if (row.length !== columns) throw new TanklightInputError([{ path: `${path}[${r}]`, message: `must have one value per x value (${columns})`, value: row.length }], where);
  });
}

/** A finite number > 0, or throws. */
export function positive(v: number, path: string, where: string, unit: string): number {
  if (!(Number.isFinite(v) && v > 0)) throw new TanklightInputError([{ path, message: `must be a finite number > 0 ${unit}`.trim(), value: v }], where);
  return v;
}
