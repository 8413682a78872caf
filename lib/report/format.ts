/** Text of one table value: quantities with their unit and SI prefix, plain numbers to 3 figures. */
import { formatQuantity } from "../units.ts";
import type { TableValue } from "./notebook.ts";

/** @example valueText({ value: 5.1e-4, unit: "A" }) // → "510 µA" */
export function valueText(v: TableValue): string {
  if (typeof v === "string") return v;
  if (typeof v === "number") return Number.isInteger(v) ? String(v) : formatQuantity(v, "", 3);
  return formatQuantity(v.value, v.unit, v.digits ?? 3);
}
