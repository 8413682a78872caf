/**
 * Input schemas of the EM layer's public functions (docs/design.md §3): coils and filaments
 * as hand-made plain data, poses, circle filaments, and the quantity arguments a person types
 * ("200 kHz"). Strict objects: an unknown key is an error that names the nearest valid key.
 *
 * Each check has a fast path for valid SI input (a tight loop, no allocation) and falls back to
 * the zod schema only to convert quantity strings or to word the error, so the hot paths
 * (field maps, coupling sweeps) do not pay for validation. A coil that passed is remembered by
 * identity (coils are immutable plain data), so repeated calls check it once.
 */
import * as z from "../zod.ts";
import { TanklightInputError, type InputIssue } from "../errors.ts";
import { angle, parseInput, unitVector, vec3, type QuantitySchema, lazySchema } from "../schema.ts";
import { MATERIALS } from "./materials.ts";
import { SIZE_LIMITS } from "./builders/common.ts";
import type { Coil, Conductor, Filament, Pose, Vec3 } from "./types.ts";

// ── building blocks (SI numbers: coils and filaments are plain data in metres) ─────────────

/**
 * Sane magnitudes of geometry (m) and turn weights: beyond them products of lengths overflow or
 * underflow double precision (the field and inductance kernels form a⁴ and 1/β³), and no coil
 * is that big or that fine.
 */
export const GEOMETRY_LIMITS = { maxLength: 1e6, minLength: 1e-12, maxTurns: 1e9 } as const;
const WHY = "beyond it products of lengths leave double precision";

const finiteNumber = (rule: string) => z.number({ error: `must be a finite number${rule}` });
const positive = (unit: string) => finiteNumber(` > 0 ${unit}`.trimEnd()).positive({ error: `must be a finite number > 0 ${unit}`.trimEnd() });
const size = lazySchema(() => positive("m")
  .min(GEOMETRY_LIMITS.minLength, { error: `must be ≥ ${GEOMETRY_LIMITS.minLength} m (${WHY})` })
  .max(GEOMETRY_LIMITS.maxLength, { error: `must be ≤ ${GEOMETRY_LIMITS.maxLength} m (${WHY})` }));
const coordinate = lazySchema(() => finiteNumber(" in m").min(-GEOMETRY_LIMITS.maxLength, { error: `must be within ±${GEOMETRY_LIMITS.maxLength} m (${WHY})` }).max(GEOMETRY_LIMITS.maxLength, { error: `must be within ±${GEOMETRY_LIMITS.maxLength} m (${WHY})` }));
const point = lazySchema(() => z.tuple([coordinate, coordinate, coordinate], { error: "must be three finite coordinates [x, y, z] in m" }));
const direction = lazySchema(() => z
  .tuple([finiteNumber(""), finiteNumber(""), finiteNumber("")], { error: "must be a direction [x, y, z]" })
  .refine((v) => Math.hypot(v[0], v[1], v[2]) > 0, { error: "must be a non-zero direction" }));
const turns = lazySchema(() => positive("").max(GEOMETRY_LIMITS.maxTurns, { error: `must be ≤ ${GEOMETRY_LIMITS.maxTurns} (${WHY})` }));

/** A circle filament of a Coil: `{ kind: "circle", center (m), axis (non-zero), radius (m, > 0), turns (> 0) }`. */
export const CircleFilamentSpec = lazySchema(() => z.strictObject({ kind: z.literal("circle"), center: point, axis: direction, radius: size, turns }));
/** A closed polygon filament of a Coil: `{ kind: "path", points (≥ 3 points in m), turns (> 0) }`. */
export const PathFilamentSpec = lazySchema(() => z.strictObject({
  kind: z.literal("path"),
  points: z.array(point).min(3, { error: "must list at least 3 points (a closed polygon)" }),
  turns,
}));
/** One filament of a Coil. */
export const FilamentSpec = lazySchema(() => z.discriminatedUnion("kind", [CircleFilamentSpec, PathFilamentSpec]));

const materialName = lazySchema(() => z.string({ error: "must be a material name" }).refine((m) => Object.hasOwn(MATERIALS, m.toLowerCase()), {
  error: `is not a known material (known: ${Object.keys(MATERIALS).join(", ")})`,
}));
/** The conductor of a Coil (SI numbers), as the builders' conductor helpers make it. */
export const ConductorSpec = lazySchema(() => z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("round"), diameter: size, outerDiameter: size, material: materialName.optional() }),
  z.strictObject({
    kind: z.literal("litz"),
    strands: z.number({ error: "must be a whole number ≥ 1" }).int({ error: "must be a whole number ≥ 1" }).min(1, { error: "must be a whole number ≥ 1" }).max(SIZE_LIMITS.strands.max, { error: `must be ≤ ${SIZE_LIMITS.strands.max} (${SIZE_LIMITS.strands.why})` }),
    strandDiameter: size,
    outerDiameter: size,
    material: materialName.optional(),
  }),
  z.strictObject({ kind: z.literal("trace"), width: size, thickness: size, material: materialName.optional() }),
]));

/** A Coil as plain data (any builder's output, or hand-made filaments): SI numbers, strict keys. */
export const CoilSpec = lazySchema(() => z.strictObject({
  filaments: z.array(FilamentSpec).min(1, { error: "must hold at least one filament" }),
  conductor: ConductorSpec,
  turns,
  wireLength: size,
  shape: z.custom<NonNullable<Coil["shape"]>>((s) => typeof s === "object" && s !== null && typeof (s as { kind?: unknown }).kind === "string", {
    error: "must be a shape record { kind, … } (as the builders write it) or absent",
  }).optional(),
}));

/** A pose: position (lengths, "12 mm" accepted), axis (non-zero direction, default +z), spin (angle, default 0). */
export const PoseSpec = lazySchema(() => z.strictObject({ position: vec3({ min: -GEOMETRY_LIMITS.maxLength, max: GEOMETRY_LIMITS.maxLength }), axis: unitVector().optional(), spin: angle().optional() }));

/** A circle filament for loopMutualInductance: `{ center, axis, radius }`, or a Coil's circle filament (kind, turns ignored). */
export const LoopSpec = lazySchema(() => z.strictObject({
  kind: z.literal("circle").optional(),
  center: point,
  axis: direction,
  radius: size,
  turns: turns.optional(),
}));

// ── running the checks ───────────────────────────────────────────────────────

/** Issues of a schema run under a field prefix: "a" + "filaments[0].radius" → "a.filaments[0].radius". */
function prefixed(e: TanklightInputError, field: string): InputIssue[] {
  return e.issues.map((i) => ({ ...i, path: i.path === "" ? field : i.path.startsWith("[") ? `${field}${i.path}` : `${field}.${i.path}` }));
}

/**
 * Parse one argument with a schema; errors name `field` (the user's name for the argument) and
 * `where` (the public function).
 * @example parseArg(PoseSpec, { position: ["1 mm", 0, 0] }, "pose", "magneticField").position // → [0.001, 0, 0]
 */
export function parseArg<T>(schema: z.ZodType<T>, value: unknown, field: string, where: string): T {
  try {
    return parseInput(schema, value, where);
  } catch (e) {
    if (!(e instanceof TanklightInputError)) throw e;
    throw new TanklightInputError(prefixed(e, field), where);
  }
}

const L = GEOMETRY_LIMITS.maxLength;
const inRange = (x: unknown): boolean => typeof x === "number" && x >= -L && x <= L;
const isFinite3 = (v: unknown): boolean => Array.isArray(v) && v.length === 3 && inRange(v[0]) && inRange(v[1]) && inRange(v[2]);
const plain = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v) && Object.getPrototypeOf(v) === Object.prototype;
/** every own key of v is one of `keys` */
function onlyKeys(v: Record<string, unknown>, keys: readonly string[]): boolean {
  for (const k in v) if (!keys.includes(k)) return false;
  return Object.getOwnPropertySymbols(v).length === 0;
}
const pos = (x: unknown): boolean => typeof x === "number" && x >= GEOMETRY_LIMITS.minLength && x <= L;
const posTurns = (x: unknown): boolean => typeof x === "number" && x > 0 && x <= GEOMETRY_LIMITS.maxTurns;

const CIRCLE_KEYS = ["kind", "center", "axis", "radius", "turns"] as const;
const PATH_KEYS = ["kind", "points", "turns"] as const;
const COIL_KEYS = ["filaments", "conductor", "turns", "wireLength", "shape"] as const;
const CONDUCTOR_KEYS = { round: ["kind", "diameter", "outerDiameter", "material"], litz: ["kind", "strands", "strandDiameter", "outerDiameter", "material"], trace: ["kind", "width", "thickness", "material"] } as const;

/** The fast check of one filament (true: valid). */
function filamentOk(f: unknown): boolean {
  if (!plain(f) || !posTurns(f["turns"])) return false;
  if (f["kind"] === "circle") {
    if (!onlyKeys(f, CIRCLE_KEYS) || !isFinite3(f["center"]) || !isFinite3(f["axis"]) || !pos(f["radius"])) return false;
    const a = f["axis"] as Vec3;
    return Math.hypot(a[0], a[1], a[2]) > 0;
  }
  if (f["kind"] === "path") {
    const pts = f["points"];
    if (!onlyKeys(f, PATH_KEYS) || !Array.isArray(pts) || pts.length < 3) return false;
    for (let i = 0; i < pts.length; i++) if (!isFinite3(pts[i])) return false;
    return true;
  }
  return false;
}

function conductorOk(c: unknown): boolean {
  if (!plain(c)) return false;
  const m = c["material"];
  if (m !== undefined && !(typeof m === "string" && Object.hasOwn(MATERIALS, m.toLowerCase()))) return false;
  switch (c["kind"]) {
    case "round":
      return onlyKeys(c, CONDUCTOR_KEYS.round) && pos(c["diameter"]) && pos(c["outerDiameter"]);
    case "litz":
      return onlyKeys(c, CONDUCTOR_KEYS.litz) && Number.isInteger(c["strands"]) && (c["strands"] as number) >= 1 && (c["strands"] as number) <= SIZE_LIMITS.strands.max && pos(c["strandDiameter"]) && pos(c["outerDiameter"]);
    case "trace":
      return onlyKeys(c, CONDUCTOR_KEYS.trace) && pos(c["width"]) && pos(c["thickness"]);
    default:
      return false;
  }
}

/** Coils that passed, by identity (a cache keyed by the objects it describes: coils are immutable plain data). */
const checkedCoils = new WeakSet<object>();

/**
 * A coil argument checked like a builder's output: strict keys, finite SI numbers, positive
 * radii, turns and lengths, non-zero axes, ≥ 3 points a polygon, a known material, and at most
 * SIZE_LIMITS.points polygon vertices. Returns the coil itself.
 * @param field the user's name for the argument ("coil", "a", "tx").  @param where the public function.
 * @example checkCoil(roundCoil({ meanRadius: 0.04, turns: 1, wire: { diameter: 1e-3 } }), "coil", "selfInductance").turns // → 1
 */
export function checkCoil(coil: unknown, field: string, where: string): Coil {
  if (typeof coil === "object" && coil !== null && checkedCoils.has(coil)) return coil as Coil;
  let ok = plain(coil) && onlyKeys(coil, COIL_KEYS) && posTurns(coil["turns"]) && pos(coil["wireLength"]) && Array.isArray(coil["filaments"]) && coil["filaments"].length > 0 && conductorOk(coil["conductor"]);
  let vertices = 0;
  if (ok) {
    const s = (coil as Record<string, unknown>)["shape"];
    if (s !== undefined && !(typeof s === "object" && s !== null && typeof (s as { kind?: unknown }).kind === "string")) ok = false;
    for (const f of (coil as { filaments: unknown[] }).filaments) {
      if (!filamentOk(f)) { ok = false; break; }
      if ((f as Filament).kind === "path") vertices += (f as { points: unknown[] }).points.length;
    }
  }
  if (!ok) {
    parseArg(CoilSpec, coil, field, where);
    // the schema accepted what the fast check refused: a form the fast check does not know (an own
    // key of a class instance, a symbol key); refuse it in words rather than compute with it
    throw new TanklightInputError([{ path: field, message: "must be a plain Coil object (as the builders return)", value: coil }], where);
  }
  if (vertices > SIZE_LIMITS.points.max) {
    throw new TanklightInputError(
      [{ path: `${field}.filaments`, message: `hold ${vertices} polygon vertices, more than ${SIZE_LIMITS.points.max}: ${SIZE_LIMITS.points.why}`, value: `${vertices} vertices` }],
      where,
    );
  }
  checkedCoils.add(coil as object);
  return coil as Coil;
}

const POSE_KEYS = ["position", "axis", "spin"] as const;

/**
 * A pose argument: `{ position, axis?, spin? }` with strict keys (`axsi` → "did you mean 'axis'?");
 * lengths and angles may be quantity strings. Returns a pose in SI numbers (the same object when
 * it already was one).
 * @example checkPose({ position: [0, 0, "2 cm"] }, "poseB", "couplingFactor").position // → [0, 0, 0.02]
 */
export function checkPose(pose: unknown, field: string, where: string): Pose {
  if (plain(pose) && onlyKeys(pose, POSE_KEYS) && isFinite3(pose["position"])) {
    const a = pose["axis"];
    const s = pose["spin"];
    const axisOk = a === undefined || (isFinite3(a) && Math.hypot((a as Vec3)[0], (a as Vec3)[1], (a as Vec3)[2]) > 0);
    const spinOk = s === undefined || (typeof s === "number" && Number.isFinite(s));
    if (axisOk && spinOk) return pose as unknown as Pose;
  }
  return parseArg(PoseSpec, pose, field, where) as Pose;
}

/**
 * A circle-filament argument of loopMutualInductance: `{ center, axis, radius }` (or a Coil's
 * circle filament), strict keys, returned with its axis as given (callers normalise).
 */
export function checkLoop(loop: unknown, field: string, where: string): { center: Vec3; axis: Vec3; radius: number } {
  if (plain(loop) && onlyKeys(loop, CIRCLE_KEYS) && (loop["kind"] === undefined || loop["kind"] === "circle") && isFinite3(loop["center"]) && isFinite3(loop["axis"]) && pos(loop["radius"]) && (loop["turns"] === undefined || posTurns(loop["turns"]))) {
    const a = loop["axis"] as Vec3;
    if (Math.hypot(a[0], a[1], a[2]) > 0) return loop as unknown as { center: Vec3; axis: Vec3; radius: number };
  }
  return parseArg(LoopSpec, loop, field, where);
}

/**
 * A quantity argument ("200 kHz" or 2e5): a finite number that meets `ok` passes untouched; anything
 * else goes through the quantity schema, which converts strings and words the error under `field`.
 * @example quantityArg(frequency(), (x) => x > 0, "200 kHz", "f", "skinDepth") // → 200000
 */
export function quantityArg(schema: QuantitySchema, ok: (x: number) => boolean, value: unknown, field: string, where: string): number {
  if (typeof value === "number" && Number.isFinite(value) && ok(value)) return value;
  return parseArg(schema, value, field, where);
}

/**
 * An options argument: undefined → {}; an object that passes `fast` (a check of valid SI input:
 * known keys, numbers in range) as it is; otherwise parsed by a strict object schema (which
 * converts quantity strings, and names the nearest valid key for an unknown one).
 */
export function optionsArg<T extends object>(schema: z.ZodType<T>, value: unknown, field: string, where: string, fast?: (o: Record<string, unknown>) => boolean): T {
  if (value === undefined) return {} as T;
  if (fast !== undefined && plain(value) && Object.getOwnPropertySymbols(value).length === 0 && fast(value)) return value as T;
  return parseArg(schema, value, field, where);
}

/**
 * Scalar arguments of the loss and formula internals: each a finite number, > 0 (or ≥ 0 for
 * "nonNegative"), at most 1e15 in magnitude and, when not zero, at least 1e-15 (SI: lengths in m,
 * frequencies in Hz, resistivities in Ω·m all lie well inside); an error names the argument and
 * `where`.
 * @example checkNumbers("slabSkinFactor", [["Delta", 1.5, "nonNegative"]]) // → undefined (no error)
 */
export function checkNumbers(where: string, args: readonly (readonly [string, unknown, "positive" | "nonNegative"])[]): void {
  for (const [name, x, rule] of args) {
    const ok = typeof x === "number" && Number.isFinite(x) && (rule === "positive" ? x > 0 : x >= 0) && x <= 1e15 && (x === 0 || x >= 1e-15);
    if (!ok) {
      throw new TanklightInputError([{ path: name, message: `must be a finite number ${rule === "positive" ? "> 0" : "≥ 0"} in [1e-15, 1e15] (SI units)`, value: x }], where);
    }
  }
}

/** A conductor argument (as roundWire, litzWire, pcbTrace return it): strict keys, finite SI sizes. */
export function checkConductor(c: unknown, field: string, where: string): Conductor {
  if (conductorOk(c)) return c as Conductor;
  return parseArg(ConductorSpec, c, field, where) as Conductor;
}

/** A result that must be finite (the arguments were checked, but their combination left the double range). */
export function finiteResult<T extends number>(x: T, what: string, where: string): T {
  if (!Number.isFinite(x)) throw new TanklightInputError([{ path: "result", message: `${what} is not a finite double for these arguments`, value: x }], where);
  return x;
}
