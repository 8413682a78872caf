import { expect } from "vitest";

/**
 * Relative-tolerance assertion (docs/style.md §5): |actual − expected| ≤ rtol·|expected|.
 * On failure it prints the context, actual, expected, Δ, the relative error and the tolerance.
 * Where expected is exactly 0 pass `atol` (absolute floor) and say why in the test.
 */
export function expectRelClose(
  actual: number,
  expected: number,
  rtol: number,
  context = "",
  atol = 0,
): void {
  const delta = actual - expected;
  const rel = expected === 0 ? Infinity : Math.abs(delta / expected);
  const ok =
    Number.isFinite(actual) &&
    (Math.abs(delta) <= rtol * Math.abs(expected) || Math.abs(delta) <= atol);
  if (!ok) {
    expect.fail(
      `${context ? context + ": " : ""}actual ${actual}, expected ${expected}, Δ ${delta}, ` +
        `relative ${rel.toExponential(3)} > rtol ${rtol}${atol ? ` (atol ${atol})` : ""}`,
    );
  }
  expect(ok).toBe(true);
}
