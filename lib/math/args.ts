/**
 * Argument checks of the public numerics (tanklight/advanced): finite numbers, caller-owned
 * output arrays with room at an offset, typed arrays of the right kind, and finite results.
 * Each throws a TanklightInputError naming the public function and the argument; the unchecked
 * cores beside the public forms skip them on hot paths.
 */
import { TanklightInputError } from "../errors.ts";

/**
 * x itself when it is a finite number; otherwise an error naming `field` and `where`.
 * @example finiteArg(2.5, "ar", "complexMul") // → 2.5
 */
export function finiteArg(x: unknown, field: string, where: string): number {
  if (typeof x === "number" && Number.isFinite(x)) return x;
  throw new TanklightInputError([{ path: field, message: "must be a finite number", value: x, expected: "finite number" }], where);
}

/** Checks that `a` is a typed array of the given kind (by name: "Float64Array", "Int32Array"). */
export function typedArg<T>(a: unknown, kind: abstract new (...args: never[]) => T, field: string, where: string): T {
  if (a instanceof kind) return a;
  throw new TanklightInputError([{ path: field, message: `must be a ${kind.name}`, value: a }], where);
}

/**
 * Checks a caller's output array: a Float64Array with `count` places from `offset` (a whole
 * number ≥ 0; undefined means 0). Returns the offset.
 * @example outArg(new Float64Array(4), 2, 2, "complexMul") // → 2
 */
export function outArg(out: unknown, offset: unknown, count: number, where: string): number {
  typedArg(out, Float64Array, "out", where);
  const at = offset === undefined ? 0 : offset;
  if (!(typeof at === "number" && Number.isInteger(at) && at >= 0 && at + count <= (out as Float64Array).length)) {
    throw new TanklightInputError(
      [{ path: "offset", message: `must be a whole number from 0 to out.length − ${count} (${(out as Float64Array).length - count})`, value: at }],
      where,
    );
  }
  return at;
}

/** An error for a result that left the double range although the arguments were finite. */
export function overflowError(what: string, where: string, value: unknown): TanklightInputError {
  return new TanklightInputError(
    [{ path: "result", message: `${what} is not a finite double (the arguments are too large or too small for double precision)`, value }],
    where,
  );
}
