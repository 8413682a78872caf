/**
 * Classic closed-form inductance formulas, kept as public reference functions for cross-checks
 * of the filament method (lib/em/selfInductance.ts) and for quick estimates. Every function takes
 * and returns SI (m, H); where the paper works in inches and µH the conversion is written out
 * once here (INCH, MICROHENRY) and tested. Sources and validity are in each doc comment and in
 * docs/methods/coils.md.
 */
import { TanklightInputError, unknownKeyMessage } from "../errors.ts";
import { MU0 } from "../constants.ts";

/** One inch, m (exact since the 1959 international yard and pound agreement). */
export const INCH = 0.0254;
/** One microhenry, H. */
export const MICROHENRY = 1e-6;

function check(where: string, path: string, x: number, rule: "positive" | "nonNegative" = "positive"): void {
  const ok = typeof x === "number" && Number.isFinite(x) && (rule === "positive" ? x > 0 : x >= 0);
  if (!ok) {
    const expected = rule === "positive" ? "a finite number > 0" : "a finite number ≥ 0";
    throw new TanklightInputError([{ path, message: `must be ${expected}`, value: x, expected }], where);
  }
  // lengths in m and turn counts: beyond these the formulas' products (n²·a, a²/ℓ) leave double precision
  if (x > FORMULA_MAX || (x > 0 && x < FORMULA_MIN)) {
    throw new TanklightInputError([{ path, message: `must lie in [${FORMULA_MIN}, ${FORMULA_MAX}] (lengths in m, turn counts): beyond, the formula's products leave double precision`, value: x }], where);
  }
}

/** Sane magnitudes of a formula's lengths (m) and turn counts. */
const FORMULA_MIN = 1e-9;
const FORMULA_MAX = 1e6;

/** {@link check} of every argument in `args` (its key is the field name), in order: each a finite number > 0. */
function checkPositive(where: string, args: Readonly<Record<string, number>>): void {
  for (const [path, x] of Object.entries(args)) check(where, path, x);
}

// ── wire gauges ──────────────────────────────────────────────────────────────

const AWG_NAMED: Readonly<Record<string, number>> = {
  "0000": -3,
  "4/0": -3,
  "000": -2,
  "3/0": -2,
  "00": -1,
  "2/0": -1,
  "0": 0,
  "1/0": 0,
};

/**
 * Bare diameter of American Wire Gauge n: d = 0.127 mm × 92^((36 − n)/39)
 * (ASTM B258, the defining rule: 36 AWG = 0.005 in, 0000 AWG = 0.46 in, 39 steps between).
 * @param gauge integer −3…56 (−3 = 0000 = 4/0), or the strings "0000", "000", "00", "4/0", "3/0", "2/0", "1/0".
 * @returns diameter, m.
 * @example awgDiameter(36) // → 1.27e-4 (0.005 in exactly)
 * @example awgDiameter("4/0") // → 0.011684 (0.46 in)
 */
export function awgDiameter(gauge: number | string): number {
  let n: number | undefined;
  if (typeof gauge === "number") n = gauge;
  else if (typeof gauge === "string") {
    const s = gauge.trim().toUpperCase().replace(/^AWG\s*/, "").replace(/\s*AWG$/, "");
    n = Object.hasOwn(AWG_NAMED, s) ? AWG_NAMED[s] : /^-?\d+$/.test(s) ? Number(s) : undefined;
  }
  if (n === undefined || !Number.isInteger(n) || n < -3 || n > 56) {
    throw new TanklightInputError(
      [{ path: "gauge", message: "must be an AWG number −3…56 or '4/0'…'1/0'", value: gauge, expected: "integer −3…56" }],
      "awgDiameter",
    );
  }
  return 0.127e-3 * Math.pow(92, (36 - n) / 39);
}

// ── single-layer coils: current sheet (Nagaoka) ──────────────────────────────

/**
 * Nagaoka's coefficient K_N of a cylindrical current sheet (radius a, length ℓ), exact form of
 * Lorenz (1879) as given by Nagaoka (1909): with k² = 4a²/(4a² + ℓ²), k′² = ℓ²/(4a² + ℓ²),
 *   K_N = (4/(3πk′))·[(k′²/k²)(K(k²) − E(k²)) + E(k²) − k].
 * L = K_N·µ₀πa²N²/ℓ is the inductance of the sheet carrying N·I uniformly. k′² is formed from the
 * geometry (never 1 − k²) so short coils keep their digits.
 * @param radius sheet radius a, m, > 0.
 * @param length sheet length ℓ, m, > 0.
 * @returns K_N, dimensionless, in (0, 1).
 * @example nagaokaCoefficient(0.01, 0.02) // → 0.68842… (D/ℓ = 1)
 */
export function nagaokaCoefficient(radius: number, length: number): number {
  checkPositive("nagaokaCoefficient", { radius, length });
  const fourA2 = 4 * radius * radius;
  const l2 = length * length;
  const k2 = fourA2 / (fourA2 + l2);
  const kp2 = l2 / (fourA2 + l2);
  const k = Math.sqrt(k2);
  const kp = Math.sqrt(kp2);
  const { K, KminusE } = ellipticKAndKMinusE(k2, kp2);
  const E = K - KminusE;
  // E − k = (E − 1) + (1 − k), with 1 − k = k′²/(1 + k) formed without cancellation.
  const eMinusK = E - 1 + kp2 / (1 + k);
  return (4 / (3 * Math.PI * kp)) * ((kp2 / k2) * KminusE + eMinusK);
}

/**
 * K(m) and K(m) − E(m) by the arithmetic–geometric mean (Abramowitz & Stegun 1964, §17.6):
 * K = π/(2a_N), K − E = K·Σ_{n≥0} 2^{n−1}c_n², c₀² = m, with c_{n+1} = c_n²/(4a_{n+1}) (A&S 17.6.3
 * rearranged) so that no step subtracts nearly equal numbers. Both m and m₁ = 1 − m are passed,
 * each formed from the geometry: K − E keeps full relative precision as m → 0 (long coils) and
 * K as m → 1 (short coils).
 */
function ellipticKAndKMinusE(m: number, m1: number): { K: number; KminusE: number } {
  let a = 1;
  let b = Math.sqrt(m1);
  let c = Math.sqrt(m);
  let sum = 0.5 * m;
  let weight = 0.5;
  for (let i = 0; i < 40; i++) {
    const an = 0.5 * (a + b);
    const cn = (c * c) / (4 * an);
    b = Math.sqrt(a * b);
    a = an;
    c = cn;
    weight *= 2;
    sum += weight * c * c;
    if (c <= 1e-17 * a) break;
  }
  const K = Math.PI / (2 * a);
  return { K, KminusE: K * sum };
}

/**
 * Nagaoka's coefficient by Lundin's rational approximation (Lundin, Proc. IEEE 73(9):1428–1429,
 * 1985), x = D/ℓ = 2a/ℓ:
 *   f₁(z) = (1 + 0.383901z + 0.017108z²)/(1 + 0.258952z), f₂(z) = 0.093842z + 0.002029z² − 0.000801z³;
 *   x ≤ 1: K_N = f₁(x²) − 4x/(3π);  x ≥ 1: K_N = (2/(πx))·[(ln(4x) − ½)·f₁(1/x²) + f₂(1/x²)].
 * Stated accuracy ±3 ppm (memory; our tests measure it against the exact form).
 * @param radius a, m, > 0. @param length ℓ, m, > 0.
 * @example lundinNagaokaCoefficient(0.01, 0.02) // → 0.68842… (x = 1)
 */
export function lundinNagaokaCoefficient(radius: number, length: number): number {
  checkPositive("lundinNagaokaCoefficient", { radius, length });
  const x = (2 * radius) / length;
  const f1 = (z: number): number => (1 + z * (0.383901 + 0.017108 * z)) / (1 + 0.258952 * z);
  const f2 = (z: number): number => z * (0.093842 + z * (0.002029 - 0.000801 * z));
  if (x <= 1) return f1(x * x) - (4 * x) / (3 * Math.PI);
  const z = 1 / (x * x);
  return (2 / (Math.PI * x)) * ((Math.log(4 * x) - 0.5) * f1(z) + f2(z));
}

/**
 * Inductance of a uniform cylindrical current sheet (the classic model of a single-layer coil):
 * L = K_N·µ₀πa²N²/ℓ with the exact Nagaoka coefficient.
 * A coil of round wire differs from its sheet by Rosa's correction ({@link rosaRoundWireCorrection}).
 * @param radius a, m, > 0 (to the wire centres). @param length ℓ = N·pitch, m, > 0. @param turns N, > 0.
 * @returns H.
 * @example currentSheetInductance(0.01, 0.02, 20) // → 5.4356e-6 (5.44 µH)
 */
export function currentSheetInductance(radius: number, length: number, turns: number): number {
  checkPositive("currentSheetInductance", { radius, length, turns });
  return (nagaokaCoefficient(radius, length) * MU0 * Math.PI * radius * radius * turns * turns) / length;
}

/**
 * Wheeler's 1982 single formula for short and long current sheets (Wheeler, "Inductance formulas
 * for circular and square coils", Proc. IEEE 70(12):1449–1450, 1982), d = 2a, u = ℓ/d:
 *   L = (µ₀dN²/2)·[ln(1 + π/(2u)) + 1/(2.3004 + 3.437u + 1.7636u² − 0.47/(0.755 + 1/u)^1.44)].
 * Claimed ≤ 0.1 % (claim checked; coefficients from memory — they reproduce both asymptotes
 * exactly: the thin ring ln(4/u) − ½ as u → 0 and K_N ≈ 1 − 4/(3πu) as u → ∞; tests measure the error
 * against the exact Nagaoka form).
 * @param radius a, m, > 0. @param length ℓ, m, > 0. @param turns N, > 0.
 * @returns H.
 * @example wheeler1982Inductance(0.01, 0.02, 20) // → 5.4355e-6 (H; 20 turns, radius 10 mm, 20 mm long)
 */
export function wheeler1982Inductance(radius: number, length: number, turns: number): number {
  checkPositive("wheeler1982Inductance", { radius, length, turns });
  const d = 2 * radius;
  const u = length / d;
  const tail = 1 / (2.3004 + 3.437 * u + 1.7636 * u * u - 0.47 / Math.pow(0.755 + 1 / u, 1.44));
  return ((MU0 * d * turns * turns) / 2) * (Math.log1p(Math.PI / (2 * u)) + tail);
}

// ── Wheeler 1928 (inches, µH) ────────────────────────────────────────────────

/**
 * Wheeler's single-layer formula (Wheeler, "Simple inductance formulas for radio coils",
 * Proc. IRE 16(10):1398–1400, 1928): L[µH] = a²n²/(9a + 10b), a mean radius and b length in
 * inches; about 1 % for b > 0.8a. Converted here: a_in = a/INCH, L = L_µH·MICROHENRY.
 * @param meanRadius a, m, > 0. @param length b, m, > 0. @param turns n, > 0.
 * @returns H.
 * @example wheelerSingleLayerInductance(0.0254, 0.0508, 10) // → 3.448e-6 (100/29 µH)
 */
export function wheelerSingleLayerInductance(meanRadius: number, length: number, turns: number): number {
  checkPositive("wheelerSingleLayerInductance", { meanRadius, length, turns });
  const a = meanRadius / INCH;
  const b = length / INCH;
  return ((a * a * turns * turns) / (9 * a + 10 * b)) * MICROHENRY;
}

/**
 * Wheeler's multilayer formula (Proc. IRE 16(10), 1928): L[µH] = 0.8a²n²/(6a + 9b + 10c), a mean
 * radius, b winding length, c radial depth, inches; about 1 % when the three terms of the
 * denominator are about equal. Assumes the current spread uniformly over the rectangular
 * winding cross-section.
 * @param meanRadius a, m, > 0. @param length b, m, > 0. @param depth c, m, ≥ 0. @param turns n, > 0.
 * @returns H.
 * @example wheelerMultilayerInductance(0.0254, 0.0254, 0.0254, 10) // → 3.2e-6 (80/25 µH)
 */
export function wheelerMultilayerInductance(meanRadius: number, length: number, depth: number, turns: number): number {
  checkPositive("wheelerMultilayerInductance", { meanRadius, length });
  check("wheelerMultilayerInductance", "depth", depth, "nonNegative");
  check("wheelerMultilayerInductance", "turns", turns);
  const a = meanRadius / INCH;
  const b = length / INCH;
  const c = depth / INCH;
  return ((0.8 * a * a * turns * turns) / (6 * a + 9 * b + 10 * c)) * MICROHENRY;
}

/**
 * Wheeler's flat-spiral formula (Proc. IRE 16(10), 1928): L[µH] = a²n²/(8a + 11c), a mean radius,
 * c radial depth (outer minus inner radius), inches; within about 5 % for c > 0.2a.
 * @param meanRadius a, m, > 0. @param depth c, m, > 0. @param turns n, > 0.
 * @returns H.
 * @example wheelerFlatSpiralInductance(0.0254, 0.0254, 10) // → 5.263e-6 (100/19 µH)
 */
export function wheelerFlatSpiralInductance(meanRadius: number, depth: number, turns: number): number {
  checkPositive("wheelerFlatSpiralInductance", { meanRadius, depth, turns });
  const a = meanRadius / INCH;
  const c = depth / INCH;
  return ((a * a * turns * turns) / (8 * a + 11 * c)) * MICROHENRY;
}

// ── planar spirals (Mohan et al. 1999) ───────────────────────────────────────

/** Outline of a planar spiral in Mohan et al.'s tables. */
export type SpiralOutline = "square" | "hexagonal" | "octagonal" | "circle";

/** Modified-Wheeler coefficients K1, K2 (Mohan et al. 1999, Table I; square row checked, others memory). */
const MOHAN_WHEELER: Readonly<Record<Exclude<SpiralOutline, "circle">, readonly [number, number]>> = {
  square: [2.34, 2.75],
  hexagonal: [2.33, 3.82],
  octagonal: [2.25, 3.55],
};

/** Current-sheet coefficients c1…c4 (Mohan et al. 1999, Table II; square row checked, others memory). */
const MOHAN_SHEET: Readonly<Record<SpiralOutline, readonly [number, number, number, number]>> = {
  square: [1.27, 2.07, 0.18, 0.13],
  hexagonal: [1.09, 2.23, 0.0, 0.17],
  octagonal: [1.07, 2.29, 0.0, 0.19],
  circle: [1.0, 2.46, 0.0, 0.2],
};

function spiralMeans(where: string, turns: number, dOut: number, dIn: number): { dAvg: number; rho: number } {
  checkPositive(where, { turns, outerDiameter: dOut });
  check(where, "innerDiameter", dIn, "nonNegative");
  if (!(dIn < dOut)) {
    throw new TanklightInputError(
      [{ path: "innerDiameter", message: "must be smaller than outerDiameter", value: dIn, expected: `< ${dOut} m` }],
      where,
    );
  }
  return { dAvg: (dOut + dIn) / 2, rho: (dOut - dIn) / (dOut + dIn) };
}

/**
 * Modified Wheeler expression for planar spirals (Mohan, Hershenson, Boyd, Lee, IEEE JSSC
 * 34(10):1419–1424, 1999, eq. (1)): L = K1·µ₀n²d_avg/(1 + K2ρ), d_avg = (d_out + d_in)/2,
 * fill ratio ρ = (d_out − d_in)/(d_out + d_in). Typical error 2–3 % for the spirals it was fitted to
 * (fine-pitch integrated spirals, s ≤ w). Diameters are measured to the outer and inner conductor
 * edges. No circular row in the paper.
 * @param turns n, > 0. @param outerDiameter d_out, m. @param innerDiameter d_in, m, < d_out.
 * @param outline "square" | "hexagonal" | "octagonal".
 * @returns H.
 * @example mohanModifiedWheelerInductance(10, 0.02, 0.01, "square") // → 2.3013e-6 (H)
 */
export function mohanModifiedWheelerInductance(
  turns: number,
  outerDiameter: number,
  innerDiameter: number,
  outline: Exclude<SpiralOutline, "circle">,
): number {
  const { dAvg, rho } = spiralMeans("mohanModifiedWheelerInductance", turns, outerDiameter, innerDiameter);
  const coef = typeof outline === "string" && Object.hasOwn(MOHAN_WHEELER, outline) ? MOHAN_WHEELER[outline] : undefined;
  if (coef === undefined) {
    throw new TanklightInputError(
      [{ path: "outline", message: "must be 'square', 'hexagonal' or 'octagonal'", value: outline }],
      "mohanModifiedWheelerInductance",
    );
  }
  return (coef[0] * MU0 * turns * turns * dAvg) / (1 + coef[1] * rho);
}

/**
 * Current-sheet expression for planar spirals (Mohan et al., IEEE JSSC 34(10), 1999, eq. (2)):
 * L = (µ₀n²d_avg·c1/2)·[ln(c2/ρ) + c3ρ + c4ρ²], symbols as {@link mohanModifiedWheelerInductance}.
 * Typical error 2–3 % (fine-pitch spirals); grows as the spacing grows against the width.
 * @param outline "square" | "hexagonal" | "octagonal" | "circle".
 * @returns H.
 * @example mohanCurrentSheetInductance(10, 0.02, 0.01, "square") // → 2.2749e-6 (H)
 */
export function mohanCurrentSheetInductance(
  turns: number,
  outerDiameter: number,
  innerDiameter: number,
  outline: SpiralOutline,
): number {
  const { dAvg, rho } = spiralMeans("mohanCurrentSheetInductance", turns, outerDiameter, innerDiameter);
  const c = typeof outline === "string" && Object.hasOwn(MOHAN_SHEET, outline) ? MOHAN_SHEET[outline] : undefined;
  if (c === undefined) {
    throw new TanklightInputError(
      [{ path: "outline", message: "must be 'square', 'hexagonal', 'octagonal' or 'circle'", value: outline }],
      "mohanCurrentSheetInductance",
    );
  }
  return ((MU0 * turns * turns * dAvg * c[0]) / 2) * (Math.log(c[1] / rho) + c[2] * rho + c[3] * rho * rho);
}

// ── rectangles (Grover) ──────────────────────────────────────────────────────

/**
 * Inductance of one rectangular turn of round wire (Grover, Inductance Calculations, 1946, the
 * rectangle formula; also Rosa 1908), sides a and b between wire axes, wire radius ρ ≪ a, b,
 * diagonal g = √(a² + b²):
 *   L = (µ₀/π)·[a ln(2ab/(ρ(a + g))) + b ln(2ab/(ρ(b + g))) − 2(a + b) + 2g + Y(a + b)],
 * Y = 1/4 for uniform current (low frequency), 0 for surface current (high frequency).
 * In Grover's units the prefactor µ₀/π is 0.004 µH/cm. Terms of order ρ/a are neglected.
 * @param width a, m, > 0. @param height b, m, > 0. @param wireRadius ρ, m, > 0.
 * @param opts.internal Y, default 1/4.
 * @returns H.
 * @example groverRectangleInductance(0.1, 0.1, 0.0005) // → 3.8194e-7 (a 10 cm square of 1 mm wire)
 */
export function groverRectangleInductance(
  width: number,
  height: number,
  wireRadius: number,
  opts: { readonly internal?: number } = {},
): number {
  const where = "groverRectangleInductance";
  checkPositive(where, { width, height, wireRadius });
  if (typeof opts !== "object" || opts === null || Array.isArray(opts)) {
    throw new TanklightInputError([{ path: "opts", message: "must be an object { internal? }", value: opts }], where);
  }
  for (const key of Reflect.ownKeys(opts)) {
    if (key !== "internal") throw new TanklightInputError([{ path: `opts.${String(key)}`, message: unknownKeyMessage(String(key), ["internal"]), value: (opts as Record<PropertyKey, unknown>)[key] }], where);
  }
  const y = opts.internal === undefined ? 0.25 : opts.internal;
  check(where, "internal", y, "nonNegative");
  const a = width;
  const b = height;
  const g = Math.hypot(a, b);
  const bracket =
    a * Math.log((2 * a * b) / (wireRadius * (a + g))) +
    b * Math.log((2 * a * b) / (wireRadius * (b + g))) -
    2 * (a + b) +
    2 * g +
    y * (a + b);
  return (MU0 / Math.PI) * bracket;
}

// ── round wire against current sheet (Rosa) ──────────────────────────────────

/**
 * Rosa's B term for N turns: −(2/N)·Σ_{k=1}^{N−1} (N − k)·ln(g_k/(k·p)), where g_k is the geometric
 * mean distance of two collinear strips of width p whose centres are k·p apart (Maxwell):
 *   ln g = [(D + p)² ln(D + p) + (D − p)² ln(D − p) − 2D² ln D]/(2p²) − 3/2,  D = k·p.
 * It is the difference between the mutual inductances of neighbouring filaments and of the
 * sheet's strips, in units of µ₀aN. Values: B(1) = 0, B(2) = 3/2 − 2 ln 2 = 0.11371 (Rosa's table
 * gives 0.1137 — from memory), rising towards about 0.3 for many turns.
 * @param turns N, integer ≥ 1.
 * @example rosaB(10) // → 0.2664
 */
export function rosaB(turns: number): number {
  return rosaBOf(turns, "rosaB");
}

/** The largest turn count of Rosa's B: the sum has one term per turn (1e9 turns ran for minutes; 1e300 never ended). */
const ROSA_MAX_TURNS = 100000;

function rosaBOf(turns: number, where: string): number {
  if (!(Number.isInteger(turns) && turns >= 1 && turns <= ROSA_MAX_TURNS)) {
    throw new TanklightInputError([{ path: "turns", message: `must be a whole number from 1 to ${ROSA_MAX_TURNS} (Rosa's sum has one term per turn)`, value: turns }], where);
  }
  let sum = 0;
  for (let k = 1; k < turns; k++) {
    // In units of p: D = k, strip width 1; (D − 1)² ln(D − 1) → 0 at k = 1.
    const lnG =
      ((k + 1) ** 2 * Math.log(k + 1) + (k > 1 ? (k - 1) ** 2 * Math.log(k - 1) : 0) - 2 * k * k * Math.log(k)) / 2 -
      1.5;
    sum += (turns - k) * (lnG - Math.log(k));
  }
  return sum === 0 ? 0 : (-2 / turns) * sum;
}

/**
 * Rosa's correction from a current sheet to a single-layer coil of round wire (Rosa, Bull. Bureau
 * of Standards 2:161, 1906; form from memory, terms re-derived from geometric mean distances):
 *   L_wire = L_sheet − µ₀aN(A + B),  A = 5/4 − ln(2p/d),
 * with p the pitch, d the bare wire diameter (uniform current in the wire, Y = 1/4) and B from
 * {@link rosaB}. A compares a round wire (GMD d/2·e^{−1/4}) with a strip of width p (GMD p·e^{−3/2});
 * valid while p ≪ a.
 * @param radius a, m. @param turns N, integer ≥ 1. @param pitch p, m. @param wireDiameter d, m, ≤ p.
 * @returns ΔL = µ₀aN(A + B), H (subtract it from the sheet's inductance).
 * @example rosaRoundWireCorrection(0.01, 20, 1e-3, 0.5e-3) // → 4.0231e-8 (H)
 */
export function rosaRoundWireCorrection(radius: number, turns: number, pitch: number, wireDiameter: number): number {
  const where = "rosaRoundWireCorrection";
  checkPositive(where, { radius, pitch, wireDiameter });
  const B = rosaBOf(turns, where);
  const A = 1.25 - Math.log((2 * pitch) / wireDiameter);
  return MU0 * radius * turns * (A + B);
}
