import {
  ALUMINIUM,
  BOLTZMANN,
  COPPER,
  DIMENSIONS,
  ELEMENTARY_CHARGE,
  EPS0,
  IssueList,
  K_B_RHO,
  K_B_Z,
  MATERIALS,
  MU0,
  PLANCK,
  REFERENCE_TEMPERATURE,
  SPEED_OF_LIGHT,
  SingularMatrixError,
  TanklightInputError,
  VACUUM_PERMEABILITY,
  VACUUM_PERMITTIVITY,
  ZERO_CELSIUS,
  aOverRhoKernel,
  acFactorFromQ,
  angle,
  archimedeanArcLength,
  averageLoadCurrent,
  awgDiameter,
  capacitance,
  circleTurn,
  coaxialKernel,
  count,
  createRandom,
  current,
  currentFedBridge,
  currentSheetInductance,
  diode,
  external_exports,
  filamentMutual,
  filamentToWorld,
  fitShockley,
  formatQuantity,
  frequency,
  fundamentalConductance,
  groverRectangleInductance,
  isPositiveInteger,
  isQuantity,
  lastFilamentDistance2,
  led,
  length,
  litzResistancePerLength,
  loadResponse,
  loopField,
  loopKernel,
  loopMutualInductance,
  luFactor,
  luSolve,
  material,
  metres,
  mohanCurrentSheetInductance,
  mohanModifiedWheelerInductance,
  parseInput,
  parseQuantity,
  poseFrame,
  power,
  proximityG,
  quantity,
  requireFinite,
  requirePositive,
  reservoirSteadyState,
  resistance,
  resistivityAt,
  rotate,
  roundWireAcFactor,
  roundedRectangle,
  roundedRectanglePerimeter,
  selfCapacitance,
  selfCapacitanceDetail,
  selfInductance,
  selfInductanceDetail,
  selfResonance,
  selfResonanceWarning,
  siUnit,
  steigerwaldEquivalentResistance,
  temperature,
  thermalVoltage,
  toCoil,
  tokenLoadModel,
  traceResistancePerLength,
  turnFieldsPerAmpere,
  unitVector,
  vec3,
  voltage,
  wheeler1982Inductance,
  wheelerFlatSpiralInductance,
  wheelerMultilayerInductance,
  wheelerSingleLayerInductance
} from "./chunk-FFN5TAEO.js";

// lib/em/builders/conductor.ts
var COPPER_DENSITY = 8890;
var OUNCE = 0.028349523125;
var SQUARE_FOOT = 0.09290304;
function copperWeightThickness(ounces) {
  if (!(Number.isFinite(ounces) && ounces > 0)) {
    throw new TanklightInputError(
      [{ path: "ounces", message: "must be a copper weight > 0 oz/ft\xB2", value: ounces, expected: "> 0" }],
      "copperWeightThickness"
    );
  }
  return ounces * OUNCE / (SQUARE_FOOT * COPPER_DENSITY);
}
function checkMaterial(issues, name, path) {
  if (name === void 0) return "copper";
  if (typeof name !== "string" || !Object.hasOwn(MATERIALS, name.toLowerCase())) {
    issues.add(path, `is not a known material (known: ${Object.keys(MATERIALS).join(", ")})`, name);
  }
  return name;
}
function readLength(issues, value, path, rule) {
  if (typeof value !== "number" && typeof value !== "string") {
    issues.add(path, "expected a length like '0.5 mm' or a number in m", value, rule === "positive" ? "> 0 m" : "\u2265 0 m");
    return void 0;
  }
  let x;
  try {
    x = parseQuantity(value, "length", path);
  } catch (e) {
    if (e instanceof TanklightInputError) {
      issues.issues.push(...e.issues);
      return void 0;
    }
    throw e;
  }
  if (rule === "positive" ? !(x > 0) : !(x >= 0)) {
    issues.add(path, `must be ${rule === "positive" ? "> 0" : "\u2265 0"} m`, value, rule === "positive" ? "> 0 m" : "\u2265 0 m");
    return void 0;
  }
  return x;
}
function outerOf(issues, bare, opts, prefix) {
  if (opts.insulation !== void 0 && opts.outerDiameter !== void 0) {
    issues.add(`${prefix}insulation`, "give insulation or outerDiameter, not both", opts.insulation);
    return void 0;
  }
  if (opts.outerDiameter !== void 0) {
    const od = readLength(issues, opts.outerDiameter, `${prefix}outerDiameter`, "positive");
    if (od !== void 0 && bare !== void 0 && od < bare) {
      issues.add(`${prefix}outerDiameter`, `must be \u2265 the bare diameter ${metres(bare)}`, opts.outerDiameter, `\u2265 ${metres(bare)}`);
      return void 0;
    }
    return od;
  }
  if (opts.insulation !== void 0) {
    const t = readLength(issues, opts.insulation, `${prefix}insulation`, "nonNegative");
    return t === void 0 || bare === void 0 ? void 0 : bare + 2 * t;
  }
  return bare;
}
function roundWire(diameter, opts = {}) {
  const issues = new IssueList("roundWire");
  const d = readLength(issues, diameter, "diameter", "positive");
  const od = outerOf(issues, d, opts, "");
  const mat = checkMaterial(issues, opts.material, "material");
  issues.throwIfAny();
  return { kind: "round", diameter: d, outerDiameter: od, material: mat };
}
function awgWire(gauge, opts = {}) {
  const d = awgDiameter(gauge);
  const issues = new IssueList("awgWire");
  const od = outerOf(issues, d, opts, "");
  const mat = checkMaterial(issues, opts.material, "material");
  issues.throwIfAny();
  return { kind: "round", diameter: d, outerDiameter: od, material: mat };
}
function litzWire(strands, strandDiameter, opts = {}) {
  const issues = new IssueList("litzWire");
  if (!(typeof strands === "number" && isPositiveInteger(strands))) {
    issues.add("strands", "must be a whole number \u2265 1", strands, "integer \u2265 1");
  }
  const ds = readLength(issues, strandDiameter, "strandDiameter", "positive");
  const fill = opts.fillFactor ?? 0.7;
  if (!(typeof fill === "number" && fill > 0 && fill <= Math.PI / (2 * Math.sqrt(3)))) {
    issues.add("fillFactor", "must be in (0, 0.9069] (hexagonal packing limit \u03C0/(2\u221A3))", fill, "0 < fill \u2264 0.9069");
  }
  let od;
  if (opts.outerDiameter !== void 0) {
    od = readLength(issues, opts.outerDiameter, "outerDiameter", "positive");
  } else {
    const ins = opts.strandInsulation === void 0 ? 0 : readLength(issues, opts.strandInsulation, "strandInsulation", "nonNegative");
    if (ds !== void 0 && ins !== void 0) od = (ds + 2 * ins) * Math.sqrt(strands / fill);
  }
  if (od !== void 0 && ds !== void 0 && isPositiveInteger(strands) && od < ds * Math.sqrt(strands)) {
    issues.add("outerDiameter", `is too small to hold ${strands} strands of ${metres(ds)}`, opts.outerDiameter, `\u2265 ${metres(ds * Math.sqrt(strands))}`);
  }
  const mat = checkMaterial(issues, opts.material, "material");
  issues.throwIfAny();
  return { kind: "litz", strands, strandDiameter: ds, outerDiameter: od, material: mat };
}
function pcbTrace(width, thickness, opts = {}) {
  const issues = new IssueList("pcbTrace");
  const w = readLength(issues, width, "width", "positive");
  let t;
  const oz = typeof thickness === "string" ? /^\s*([0-9]*\.?[0-9]+)\s*oz\s*$/i.exec(thickness) : null;
  if (oz !== null) {
    const ounces = Number(oz[1]);
    if (ounces > 0) t = copperWeightThickness(ounces);
    else issues.add("thickness", "copper weight must be > 0 oz", thickness, "> 0 oz");
  } else {
    t = readLength(issues, thickness, "thickness", "positive");
  }
  const mat = checkMaterial(issues, opts.material, "material");
  issues.throwIfAny();
  return { kind: "trace", width: w, thickness: t, material: mat };
}
function conductorFootprint(c) {
  return c.kind === "trace" ? c.width : c.outerDiameter;
}
var OUNCES = /^\s*([0-9]*\.?[0-9]+)\s*oz\s*$/i;
function copperThickness() {
  return external_exports.preprocess((v) => {
    if (typeof v === "string") {
      const m = OUNCES.exec(v);
      if (m !== null && Number(m[1]) > 0) return copperWeightThickness(Number(m[1]));
    }
    return v;
  }, length());
}
var WireInput = external_exports.strictObject({
  kind: external_exports.enum(["round", "litz"]).optional(),
  diameter: length().optional(),
  insulation: length({ nonNegative: true }).optional(),
  outerDiameter: length().optional(),
  strands: external_exports.number().int().positive().optional(),
  strandDiameter: length().optional(),
  material: external_exports.string().optional()
});
var TraceInput = external_exports.strictObject({
  kind: external_exports.literal("trace").optional(),
  width: length(),
  thickness: copperThickness(),
  material: external_exports.string().optional()
});
var conductorFields = {
  wire: WireInput.optional(),
  awg: external_exports.union([external_exports.number(), external_exports.string()]).optional(),
  trace: TraceInput.optional()
};
function resolveConductor(f, issues, allowTrace) {
  const given = ["wire", "awg", "trace"].filter((k) => f[k] !== void 0);
  if (given.length !== 1) {
    const options = allowTrace ? "wire, awg or trace" : "wire or awg";
    issues.add(given.length === 0 ? "wire" : given.join("/"), `give exactly one of ${options}`, given.length === 0 ? void 0 : given.join(", "));
    return void 0;
  }
  const field = given[0];
  const material2 = (m) => checkMaterial(issues, m, `${field}.material`);
  if (f.trace !== void 0) {
    if (!allowTrace) {
      issues.add("trace", "a wound coil takes wire or awg, not a PCB trace", f.trace);
      return void 0;
    }
    return { kind: "trace", width: f.trace.width, thickness: f.trace.thickness, material: material2(f.trace.material) };
  }
  if (f.awg !== void 0) {
    try {
      const d = awgDiameter(f.awg);
      return { kind: "round", diameter: d, outerDiameter: d, material: "copper" };
    } catch {
      issues.add("awg", "must be an AWG number \u22123\u202656 or '4/0'\u2026'1/0'", f.awg, "integer \u22123\u202656");
      return void 0;
    }
  }
  const w = f.wire;
  if (w.kind === "litz" || w.strands !== void 0) {
    let ok = true;
    for (const k of ["strands", "strandDiameter", "outerDiameter"]) {
      if (w[k] === void 0) {
        issues.add(`wire.${k}`, "litz wire needs strands, strandDiameter and outerDiameter (or use litzWire())", void 0);
        ok = false;
      }
    }
    if (!ok) return void 0;
    return { kind: "litz", strands: w.strands, strandDiameter: w.strandDiameter, outerDiameter: w.outerDiameter, material: material2(w.material) };
  }
  if (w.diameter === void 0) {
    issues.add("wire.diameter", "round wire needs its bare diameter", void 0, "length > 0 m");
    return void 0;
  }
  if (w.insulation !== void 0 && w.outerDiameter !== void 0 && Math.abs(w.diameter + 2 * w.insulation - w.outerDiameter) > 1e-12) {
    issues.add("wire.insulation", "give insulation or outerDiameter, not both", w.insulation);
    return void 0;
  }
  const od = w.outerDiameter ?? w.diameter + 2 * (w.insulation ?? 0);
  if (od < w.diameter) {
    issues.add("wire.outerDiameter", `must be \u2265 the bare diameter ${metres(w.diameter)}`, od, `\u2265 ${metres(w.diameter)}`);
    return void 0;
  }
  return { kind: "round", diameter: w.diameter, outerDiameter: od, material: material2(w.material) };
}

// lib/em/builders/roundCoil.ts
var RoundCoilSpec = external_exports.strictObject({
  /** radius of the former: inner boundary of the winding window, m (give this or meanRadius) */
  innerRadius: length().optional(),
  /** mean radius (inner + outer)/2 of the winding window, m */
  meanRadius: length().optional(),
  /** total turns, integer ≥ 1 */
  turns: count(),
  /** layers, integer ≥ 1 (default 1); turns per full layer = ⌈turns/layers⌉ */
  layers: count().optional(),
  /** axial centre-to-centre distance of turns, m (default: wire outer diameter) */
  pitch: length().optional(),
  /** radial centre-to-centre distance of layers, m (default: wire outer diameter) */
  radialPitch: length().optional(),
  ...conductorFields
});
function layeredTurns(firstRadius, turns, turnsPerLayer, axialPitch, radialPitch) {
  const filaments = [];
  let wireLength = 0;
  const z0 = -((turnsPerLayer - 1) * axialPitch) / 2;
  for (let t = 0; t < turns; t++) {
    const layer = Math.floor(t / turnsPerLayer);
    const i = t % turnsPerLayer;
    const slot = layer % 2 === 0 ? i : turnsPerLayer - 1 - i;
    const r = firstRadius + layer * radialPitch;
    filaments.push(circleTurn(r, z0 + slot * axialPitch));
    const lastInLayer = i === turnsPerLayer - 1;
    const step = lastInLayer && t < turns - 1 ? radialPitch : axialPitch;
    wireLength += Math.hypot(2 * Math.PI * r, step);
  }
  return { filaments, wireLength };
}
function roundCoil(spec) {
  const where = "roundCoil";
  const p = parseInput(RoundCoilSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(p, issues, false);
  const layers = p.layers ?? 1;
  if (layers > p.turns) issues.add("layers", `must be \u2264 turns (${p.turns})`, p.layers, `\u2264 ${p.turns}`);
  const turnsPerLayer = Math.ceil(p.turns / layers);
  if (layers <= p.turns && (layers - 1) * turnsPerLayer >= p.turns) {
    issues.add("layers", `${p.turns} turns in ${layers} layers of ${turnsPerLayer} would leave a layer empty`, p.layers);
  }
  if (p.innerRadius === void 0 === (p.meanRadius === void 0)) {
    issues.add("innerRadius", "give exactly one of innerRadius or meanRadius", p.innerRadius ?? p.meanRadius);
  }
  if (conductor === void 0) issues.throwIfAny();
  const od = conductorFootprint(conductor);
  const axialPitch = p.pitch ?? od;
  const radialPitch = p.radialPitch ?? od;
  if (axialPitch < od) issues.add("pitch", `is narrower than the wire's outer diameter ${metres(od)}`, spec.pitch, `\u2265 ${metres(od)}`);
  if (radialPitch < od) issues.add("radialPitch", `is narrower than the wire's outer diameter ${metres(od)}`, spec.radialPitch, `\u2265 ${metres(od)}`);
  const depth = (layers - 1) * radialPitch + od;
  const innerRadius = p.innerRadius ?? (p.meanRadius ?? Infinity) - depth / 2;
  if (innerRadius < od / 2) {
    const field = p.innerRadius !== void 0 ? "innerRadius" : "meanRadius";
    issues.add(
      field,
      `leaves an inner radius of ${metres(innerRadius)}, smaller than half the wire's outer diameter (${metres(od / 2)}): a turn cannot be wound tighter than its own wire`,
      field === "innerRadius" ? spec.innerRadius : spec.meanRadius,
      field === "innerRadius" ? `\u2265 ${metres(od / 2)}` : `\u2265 ${metres(od / 2 + depth / 2)}`
    );
  }
  issues.throwIfAny();
  const outerRadius = innerRadius + depth;
  const { filaments, wireLength } = layeredTurns(innerRadius + od / 2, p.turns, turnsPerLayer, axialPitch, radialPitch);
  const shape = {
    kind: "roundCoil",
    innerRadius,
    meanRadius: (innerRadius + outerRadius) / 2,
    outerRadius,
    windingHeight: (turnsPerLayer - 1) * axialPitch + od,
    turns: p.turns,
    layers,
    turnsPerLayer,
    axialPitch,
    radialPitch
  };
  return Object.freeze({ filaments: Object.freeze(filaments), conductor, turns: p.turns, wireLength, shape });
}

// lib/em/builders/solenoid.ts
var SolenoidSpec = external_exports.strictObject({
  /** radius of the wire centres, m */
  radius: length(),
  turns: count(),
  /** centre-to-centre distance of neighbouring turns, m (give pitch or length; default: outer diameter) */
  pitch: length().optional(),
  /** winding length = turns·pitch, m */
  length: length().optional(),
  ...conductorFields
});
function solenoid(spec) {
  const where = "solenoid";
  const s = parseInput(SolenoidSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(s, issues, false);
  if (s.pitch !== void 0 && s.length !== void 0) issues.add("pitch", "give pitch or length, not both", spec.pitch);
  issues.throwIfAny();
  const od = conductorFootprint(conductor);
  const pitch = s.pitch ?? (s.length !== void 0 ? s.length / s.turns : od);
  if (pitch < od) {
    const field = s.length !== void 0 ? "length" : "pitch";
    issues.add(
      field,
      `gives a pitch of ${metres(pitch)}, narrower than the wire's outer diameter ${metres(od)}`,
      field === "length" ? spec.length : spec.pitch,
      field === "length" ? `\u2265 ${metres(od * s.turns)}` : `\u2265 ${metres(od)}`
    );
  }
  if (s.radius < od) {
    issues.add("radius", `is smaller than the wire's outer diameter ${metres(od)}: a turn cannot be wound tighter than its own wire`, spec.radius, `\u2265 ${metres(od)}`);
  }
  issues.throwIfAny();
  const { filaments, wireLength } = layeredTurns(s.radius, s.turns, s.turns, pitch, pitch);
  const shape = { kind: "solenoid", radius: s.radius, length: s.turns * pitch, pitch, turns: s.turns };
  return Object.freeze({ filaments: Object.freeze(filaments), conductor, turns: s.turns, wireLength, shape });
}

// lib/em/builders/flatSpiral.ts
var FlatSpiralSpec = external_exports.strictObject({
  /** innermost conductor edge, m (give this or outerRadius) */
  innerRadius: length().optional(),
  /** outermost conductor edge, m */
  outerRadius: length().optional(),
  turns: count(),
  /** radial advance per turn, m, ≥ conductor width */
  pitch: length(),
  model: external_exports.enum(["rings", "spiral"]).optional(),
  /** chords per turn of the "spiral" model, integer ≥ 8 (default 64) */
  segmentsPerTurn: count(8).optional(),
  ...conductorFields
});
function flatSpiral(spec) {
  const where = "flatSpiral";
  const s = parseInput(FlatSpiralSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(s, issues, true);
  if (s.innerRadius === void 0 === (s.outerRadius === void 0)) {
    issues.add("innerRadius", "give exactly one of innerRadius or outerRadius", s.innerRadius ?? s.outerRadius);
  }
  issues.throwIfAny();
  const w = conductorFootprint(conductor);
  const N = s.turns;
  const p = s.pitch;
  if (p < w) issues.add("pitch", `is narrower than the conductor width ${metres(w)}`, spec.pitch, `\u2265 ${metres(w)}`);
  const innerRadius = s.innerRadius ?? s.outerRadius - N * p - w;
  if (innerRadius < w / 2) {
    const field = s.innerRadius !== void 0 ? "innerRadius" : "outerRadius";
    issues.add(
      field,
      `leaves an inner radius of ${metres(innerRadius)}, smaller than half the conductor width (${metres(w / 2)})`,
      field === "innerRadius" ? spec.innerRadius : spec.outerRadius,
      field === "innerRadius" ? `\u2265 ${metres(w / 2)}` : `\u2265 ${metres(w / 2 + N * p + w)}`
    );
  }
  issues.throwIfAny();
  const model = s.model ?? "rings";
  const r0 = innerRadius + w / 2;
  const outerRadius = innerRadius + N * p + w;
  let filaments;
  if (model === "rings") {
    filaments = Array.from({ length: N }, (_, i) => circleTurn(r0 + (i + 0.5) * p, 0));
  } else {
    filaments = [{ kind: "path", points: spiralPolygon(r0, p, N, s.segmentsPerTurn ?? 64), turns: 1 }];
  }
  const shape = {
    kind: "flatSpiral",
    innerRadius,
    outerRadius,
    meanRadius: (innerRadius + outerRadius) / 2,
    pitch: p,
    turns: N,
    conductorWidth: w,
    model
  };
  return Object.freeze({
    filaments: Object.freeze(filaments),
    conductor,
    turns: N,
    wireLength: archimedeanArcLength(r0, r0 + N * p, p),
    shape
  });
}
function spiralPolygon(r0, p, N, segmentsPerTurn) {
  const points = [];
  const n = N * segmentsPerTurn;
  for (let k = 0; k <= n; k++) {
    const theta = 2 * Math.PI * k / segmentsPerTurn;
    const r = r0 + p * k / segmentsPerTurn;
    points.push([r * Math.cos(theta), r * Math.sin(theta), 0]);
  }
  points.push([r0 + N * p, 0, -p], [r0, 0, -p]);
  return points;
}

// lib/em/builders/rectSpiral.ts
var RectSpiralSpec = external_exports.strictObject({
  outerWidth: length(),
  outerHeight: length(),
  turns: count(),
  pitch: length(),
  /** corner radius of the outline's outer edge, m (default 0) */
  cornerRadius: length({ nonNegative: true }).optional(),
  /** "planar" (default) or "axial" */
  stacking: external_exports.enum(["planar", "axial"]).optional(),
  /** chords per rounded corner (default 8) */
  cornerSegments: count().optional(),
  ...conductorFields
});
function rectSpiral(spec) {
  const where = "rectSpiral";
  const s = parseInput(RectSpiralSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(s, issues, true);
  issues.throwIfAny();
  const w = conductorFootprint(conductor);
  const { outerWidth: W, outerHeight: H, turns: N, pitch: p } = s;
  const R = s.cornerRadius ?? 0;
  const stacking = s.stacking ?? "planar";
  const cornerSegments = s.cornerSegments ?? 8;
  if (p < w) issues.add("pitch", `is narrower than the conductor width ${metres(w)}`, spec.pitch, `\u2265 ${metres(w)}`);
  if (R > Math.min(W, H) / 2) issues.add("cornerRadius", `exceeds half the shorter side (${metres(Math.min(W, H) / 2)})`, spec.cornerRadius, `\u2264 ${metres(Math.min(W, H) / 2)}`);
  const inset = stacking === "planar" ? (N - 1) * p : 0;
  const innerWidth = W - 2 * inset - 2 * w;
  const innerHeight = H - 2 * inset - 2 * w;
  if (!(innerWidth > 0)) issues.add("outerWidth", `is too small for ${N} turns at ${metres(p)} pitch of a ${metres(w)} conductor`, spec.outerWidth, `> ${metres(2 * inset + 2 * w)}`);
  if (!(innerHeight > 0)) issues.add("outerHeight", `is too small for ${N} turns at ${metres(p)} pitch of a ${metres(w)} conductor`, spec.outerHeight, `> ${metres(2 * inset + 2 * w)}`);
  issues.throwIfAny();
  const filaments = [];
  let wireLength = 0;
  for (let i = 0; i < N; i++) {
    const d = stacking === "planar" ? w / 2 + i * p : w / 2;
    const z2 = stacking === "planar" ? 0 : (i - (N - 1) / 2) * p;
    const hx = W / 2 - d;
    const hy = H / 2 - d;
    const r = Math.max(R - d, 0);
    filaments.push({ kind: "path", points: roundedRectangle(hx, hy, r, z2, cornerSegments), turns: 1 });
    const perimeter = roundedRectanglePerimeter(hx, hy, r);
    wireLength += stacking === "planar" ? perimeter : Math.hypot(perimeter, p);
  }
  if (stacking === "planar") wireLength -= p;
  const shape = {
    kind: "rectSpiral",
    stacking,
    outerWidth: W,
    outerHeight: H,
    innerWidth,
    innerHeight,
    pitch: p,
    turns: N,
    cornerRadius: R,
    conductorWidth: w
  };
  return Object.freeze({ filaments: Object.freeze(filaments), conductor, turns: N, wireLength, shape });
}

// lib/em/builders/rectLoop.ts
var RectLoopSpec = external_exports.strictObject({
  /** centreline width along x, m */
  width: length(),
  /** centreline height along y, m */
  height: length(),
  ...conductorFields
});
function rectLoop(spec) {
  const where = "rectLoop";
  const s = parseInput(RectLoopSpec, spec, where);
  const issues = new IssueList(where);
  const conductor = resolveConductor(s, issues, true);
  issues.throwIfAny();
  const w = conductorFootprint(conductor);
  if (!(s.width > w)) issues.add("width", `must exceed the conductor width ${metres(w)} (opposite sides would touch)`, spec.width, `> ${metres(w)}`);
  if (!(s.height > w)) issues.add("height", `must exceed the conductor width ${metres(w)} (opposite sides would touch)`, spec.height, `> ${metres(w)}`);
  issues.throwIfAny();
  const shape = { kind: "rectLoop", width: s.width, height: s.height };
  return Object.freeze({
    filaments: Object.freeze([{ kind: "path", points: roundedRectangle(s.width / 2, s.height / 2, 0, 0, 1), turns: 1 }]),
    conductor,
    turns: 1,
    wireLength: 2 * (s.width + s.height),
    shape
  });
}

// lib/em/coaxialMutual.ts
function coaxialLoopMutualInductance(ra, rb, d) {
  requirePositive(ra, "ra", "m", "coaxialLoopMutualInductance");
  requirePositive(rb, "rb", "m", "coaxialLoopMutualInductance");
  requireFinite(d, "d", "m", "coaxialLoopMutualInductance");
  const M = coaxialKernel(ra, rb, d);
  if (!Number.isFinite(M)) {
    throw new TanklightInputError(
      [{ path: "ra, rb, d", message: "the filaments coincide (ra = rb and d = 0): their filament mutual inductance is infinite; use selfInductance with a wire radius", value: [ra, rb, d] }],
      "coaxialLoopMutualInductance"
    );
  }
  return M;
}

// lib/em/segmentField.ts
var MU0_OVER_4PI = MU0 / (4 * Math.PI);
function addSegmentField(px, py, pz, qx, qy, qz, current2, x, y, z2, out, offset = 0) {
  const r1x = x - px, r1y = y - py, r1z = z2 - pz;
  const r2x = x - qx, r2y = y - qy, r2z = z2 - qz;
  const R1 = Math.sqrt(r1x * r1x + r1y * r1y + r1z * r1z);
  const R2 = Math.sqrt(r2x * r2x + r2y * r2y + r2z * r2z);
  const den = R1 * R2 * (R1 * R2 + r1x * r2x + r1y * r2y + r1z * r2z);
  const cx = r1y * r2z - r1z * r2y;
  const cy = r1z * r2x - r1x * r2z;
  const cz = r1x * r2y - r1y * r2x;
  if (den === 0) {
    if (cx === 0 && cy === 0 && cz === 0 && (R1 === 0 || R2 === 0 || r1x * r2x + r1y * r2y + r1z * r2z <= 0)) return false;
    return true;
  }
  const f = MU0_OVER_4PI * current2 * (R1 + R2) / den;
  out[offset] = out[offset] + f * cx;
  out[offset + 1] = out[offset + 1] + f * cy;
  out[offset + 2] = out[offset + 2] + f * cz;
  return true;
}

// lib/em/magneticField.ts
var ks = new Float64Array(4);
var acc = new Float64Array(3);
function magneticField(coil, pose, current2, point) {
  requireFinite(current2, "current", "A", "magneticField");
  if (!Array.isArray(point) || point.length !== 3 || !point.every(Number.isFinite)) {
    throw new TanklightInputError([{ path: "point", message: "must be three finite coordinates in m", value: point }], "magneticField");
  }
  if (!coil || !Array.isArray(coil.filaments)) {
    throw new TanklightInputError([{ path: "coil.filaments", message: "must be a Coil with filaments", value: coil }], "magneticField");
  }
  const frame = poseFrame(pose, "magneticField", "pose");
  const p = toCoil(frame, point);
  acc[0] = 0;
  acc[1] = 0;
  acc[2] = 0;
  for (const f of coil.filaments) {
    if (f.kind === "circle") {
      const n = f.axis;
      const nl = Math.hypot(n[0], n[1], n[2]);
      const nx = n[0] / nl, ny = n[1] / nl, nz = n[2] / nl;
      const wx = p[0] - f.center[0], wy = p[1] - f.center[1], wz = p[2] - f.center[2];
      const z2 = wx * nx + wy * ny + wz * nz;
      const rx = wx - z2 * nx, ry = wy - z2 * ny, rz = wz - z2 * nz;
      const rho = Math.sqrt(rx * rx + ry * ry + rz * rz);
      if (!loopKernel(f.radius, rho, z2, ks, true)) onWire(point);
      const bz = ks[K_B_Z] * f.turns;
      const br = rho > 0 ? ks[K_B_RHO] * f.turns / rho : 0;
      acc[0] = acc[0] + bz * nx + br * rx;
      acc[1] = acc[1] + bz * ny + br * ry;
      acc[2] = acc[2] + bz * nz + br * rz;
    } else {
      const pts = f.points;
      for (let i = 0; i < pts.length; i++) {
        const a = pts[i];
        const b = pts[(i + 1) % pts.length];
        if (!addSegmentField(a[0], a[1], a[2], b[0], b[1], b[2], f.turns, p[0], p[1], p[2], acc)) onWire(point);
      }
    }
  }
  const B = rotate(frame.R, [acc[0] * current2, acc[1] * current2, acc[2] * current2]);
  return [B[0] + 0, B[1] + 0, B[2] + 0];
}
function onWire(point) {
  throw new TanklightInputError(
    [{ path: "point", message: "lies on a filament of the coil, where the filament field is infinite", value: point, expected: "a point off the winding" }],
    "magneticField"
  );
}

// lib/em/mutualInductance.ts
function conductorRadius(c) {
  switch (c.kind) {
    case "round":
      return c.diameter / 2;
    case "litz":
      return c.outerDiameter / 2;
    case "trace":
      return c.width / 2;
  }
}
function checkCoil(c, field, where) {
  if (!c || !Array.isArray(c.filaments) || c.filaments.length === 0 || !c.conductor) {
    throw new TanklightInputError([{ path: field, message: "must be a Coil with at least one filament and a conductor", value: c }], where);
  }
}
function mutualInductanceChecked(a, poseA, b, poseB) {
  const where = "mutualInductance";
  checkCoil(a, "a", where);
  checkCoil(b, "b", where);
  const fa = poseFrame(poseA, where, "poseA");
  const fb = poseFrame(poseB, where, "poseB");
  const wa = a.filaments.map((f) => filamentToWorld(f, fa));
  const wb = b.filaments.map((f) => filamentToWorld(f, fb));
  let sum2 = 0;
  let min2 = Infinity;
  for (const x of wa) {
    for (const y of wb) {
      sum2 += x.turns * y.turns * filamentMutual(x, y);
      const d2 = lastFilamentDistance2();
      if (d2 < min2) min2 = d2;
    }
  }
  const minDistance = Math.sqrt(min2);
  const clearance = conductorRadius(a.conductor) + conductorRadius(b.conductor);
  const warnings = [];
  if (minDistance < clearance) {
    warnings.push(
      `the coils' conductors overlap: filaments come within ${(minDistance * 1e3).toPrecision(3)} mm of each other, less than the sum of the wire radii (${(clearance * 1e3).toPrecision(3)} mm); the filament mutual inductance is not physical there`
    );
  }
  if (!Number.isFinite(sum2)) {
    throw new TanklightInputError([{ path: "poseA, poseB", message: "the coils' filaments touch; no finite mutual inductance", value: [poseA, poseB] }], where);
  }
  return { value: sum2, minFilamentDistance: minDistance, warnings };
}
function mutualInductance(a, poseA, b, poseB) {
  const r = mutualInductanceChecked(a, poseA, b, poseB);
  if (r.warnings.length > 0) {
    throw new TanklightInputError([{ path: "poseA, poseB", message: r.warnings[0], value: { poseA, poseB } }], "mutualInductance");
  }
  return r.value;
}
function couplingFactor(a, poseA, b, poseB) {
  const M = mutualInductance(a, poseA, b, poseB);
  return M / Math.sqrt(selfInductance(a) * selfInductance(b));
}

// lib/em/couplingEvaluator.ts
function coaxialTurns(filaments) {
  const out = [];
  for (const f of filaments) {
    if (f.kind !== "circle") return void 0;
    const [ax, ay, az] = f.axis;
    const al = Math.hypot(ax, ay, az);
    if (Math.abs(ax) > 1e-12 * al || Math.abs(ay) > 1e-12 * al || f.center[0] !== 0 || f.center[1] !== 0) return void 0;
    out.push({ r: f.radius, z: f.center[2], w: Math.sign(az) * f.turns });
  }
  const W = out.reduce((a, t) => a + t.w, 0);
  if (W === 0 || out.some((t) => t.w * W < 0)) return void 0;
  return out;
}
function lumpOf(group) {
  let W = 0, U = 0, Z = 0;
  for (const t of group) {
    W += t.w;
    U += t.w * t.r * t.r;
    Z += t.w * t.z;
  }
  const r = Math.sqrt(U / W), z2 = Z / W;
  let extent = 0;
  for (const t of group) extent = Math.max(extent, Math.hypot(t.r - r, t.z - z2));
  return { r, z: z2, w: W, extent };
}
function toLumps(list) {
  return {
    r: Float64Array.from(list, (t) => t.r),
    z: Float64Array.from(list, (t) => t.z),
    w: Float64Array.from(list, (t) => t.w),
    extent: list.reduce((a, t) => Math.max(a, t.extent), 0)
  };
}
function groupLevels(turns) {
  let groups = [turns.slice()];
  const levels = [toLumps(groups.map(lumpOf))];
  while (groups.some((g2) => g2.length > 1)) {
    const next = [];
    for (const g2 of groups) {
      if (g2.length === 1) {
        next.push(g2);
        continue;
      }
      const rs = g2.map((t) => t.r), zs = g2.map((t) => t.z);
      const byR = Math.max(...rs) - Math.min(...rs) > Math.max(...zs) - Math.min(...zs);
      const sorted = g2.slice().sort((a, b) => byR ? a.r - b.r : a.z - b.z);
      const h = Math.ceil(sorted.length / 2);
      next.push(sorted.slice(0, h), sorted.slice(h));
    }
    groups = next;
    levels.push(toLumps(groups.map(lumpOf)));
  }
  return levels;
}
function momentLumps(turns) {
  const c = lumpOf(turns);
  const uBar = c.r * c.r;
  let Vu = 0, Vz = 0;
  for (const t of turns) {
    Vu += t.w * (t.r * t.r - uBar) ** 2;
    Vz += t.w * (t.z - c.z) ** 2;
  }
  const su = Math.sqrt(Math.max(0, Vu / c.w)), sz = Math.sqrt(Math.max(0, Vz / c.w));
  const us = su > 1e-12 * uBar ? [uBar - su, uBar + su] : [uBar];
  const zs = sz > 0 ? [c.z - sz, c.z + sz] : [c.z];
  const list = [];
  for (const u of us) for (const z2 of zs) list.push({ r: Math.sqrt(u), z: z2, w: c.w / (us.length * zs.length), extent: c.extent });
  return toLumps(list);
}
var tables = /* @__PURE__ */ new Map();
function added(n) {
  let e = tables.get(n);
  if (!e) {
    const first = n === 8;
    const m = first ? 8 : n / 2;
    const c = new Float64Array(m), s = new Float64Array(m);
    for (let j = 0; j < m; j++) {
      const t = first ? 2 * Math.PI * j / 8 : (2 * j + 1) * Math.PI / m;
      c[j] = Math.cos(t);
      s[j] = Math.sin(t);
    }
    e = { c, s };
    tables.set(n, e);
  }
  return e;
}
var ring = { v1: 0, v0: 0, err: 0, minA2: Infinity };
var LUMP_SAFETY = 3;
var GUARD = 2;
function ringIntegral(cx, cy, cz, nx, ny, nz, r, t1, t0, qtol, floor) {
  let ux, uy, uz;
  if (Math.abs(nx) < 0.9) {
    ux = 1 - nx * nx;
    uy = -nx * ny;
    uz = -nx * nz;
  } else {
    ux = -ny * nx;
    uy = 1 - ny * ny;
    uz = -ny * nz;
  }
  const un = r / Math.sqrt(ux * ux + uy * uy + uz * uz);
  ux *= un;
  uy *= un;
  uz *= un;
  const vx = ny * uz - nz * uy, vy = nz * ux - nx * uz, vz = nx * uy - ny * ux;
  const n1 = t1.r.length;
  let minA2 = Infinity;
  let maxA2 = 0;
  let s1 = 0, s0 = 0, prev = 0, n = 8;
  const sq = Math.sqrt(qtol);
  for (; ; ) {
    const { c, s } = added(n);
    let abs = 0;
    for (let j = 0; j < c.length; j++) {
      const co = c[j], si = s[j];
      const wx = cx + co * ux + si * vx, wy = cy + co * uy + si * vy, wz = cz + co * uz + si * vz;
      const tx = -si * ux + co * vx, ty = -si * uy + co * vy;
      const rho = Math.sqrt(wx * wx + wy * wy);
      const geo = wx * ty - wy * tx;
      let a1 = 0;
      for (let k = 0; k < n1; k++) {
        const dz = wz - t1.z[k];
        const dm = t1.r[k] - rho;
        const z2 = dz * dz;
        const al2 = dm * dm + z2;
        if (al2 < minA2) minA2 = al2;
        if (al2 > maxA2) maxA2 = al2;
        if (al2 === 0) {
          ring.minA2 = 0;
          ring.v1 = ring.v0 = 0;
          ring.err = Infinity;
          return;
        }
        a1 += t1.w[k] * aOverRhoKernel(t1.r[k], rho, z2, al2);
      }
      const f1 = a1 * geo;
      s1 += f1;
      abs += Math.abs(f1);
      if (t0) {
        const dz = wz - t0.z[0];
        const dm = t0.r[0] - rho;
        const al2 = dm * dm + dz * dz;
        if (al2 > 0) s0 += t0.w[0] * aOverRhoKernel(t0.r[0], rho, dz * dz, al2) * geo;
      }
    }
    const v = 2 * Math.PI / n * s1;
    if (n > 8) {
      const diff = Math.abs(v - prev);
      const scale = Math.max(Math.abs(v), 1e-3 * (2 * Math.PI / (n / 2)) * abs, floor);
      const resolved = maxA2 <= 4 * minA2 || n * n * minA2 >= 4 * Math.PI * Math.PI * r * r;
      const converged = n >= 16 && diff <= 0.1 * sq * scale && resolved;
      if (converged || n >= 256) {
        ring.v1 = v;
        ring.v0 = 2 * Math.PI / n * s0;
        ring.err = converged ? diff * diff / scale : Infinity;
        ring.minA2 = minA2;
        return;
      }
    }
    prev = v;
    n *= 2;
  }
}
function checkCoil2(c, field) {
  if (!c || !Array.isArray(c.filaments) || c.filaments.length === 0 || !c.conductor) {
    throw new TanklightInputError([{ path: field, message: "must be a Coil with at least one filament and a conductor", value: c }], "couplingEvaluator");
  }
}
function couplingEvaluator(tx, rx, options = {}) {
  checkCoil2(tx, "tx");
  checkCoil2(rx, "rx");
  const relTol = options.relTol ?? 1e-3;
  if (!(relTol > 0 && relTol < 1)) {
    throw new TanklightInputError([{ path: "options.relTol", message: "must be in (0, 1)", value: relTol }], "couplingEvaluator");
  }
  if (options.absTol !== void 0 && !(Number.isFinite(options.absTol) && options.absTol >= 0)) {
    throw new TanklightInputError([{ path: "options.absTol", message: "must be a finite inductance \u2265 0 H", value: options.absTol }], "couplingEvaluator");
  }
  const selfTx = selfInductance(tx, options.frequency === void 0 ? {} : { frequency: options.frequency });
  const selfRx = selfInductance(rx, options.frequency === void 0 ? {} : { frequency: options.frequency });
  const norm = 1 / Math.sqrt(selfTx * selfRx);
  const txTurns = coaxialTurns(tx.filaments);
  const rxTurns = coaxialTurns(rx.filaments);
  const clearance = conductorRadius(tx.conductor) + conductorRadius(rx.conductor);
  const stats = { lumped: 0, exact: 0 };
  const fast = txTurns !== void 0 && rxTurns !== void 0;
  const txLevels = fast ? groupLevels(txTurns) : [];
  const rxLevels = fast ? groupLevels(rxTurns) : [];
  const t0 = txLevels[0];
  const t1 = fast ? momentLumps(txTurns) : t0;
  const rx0 = rxLevels[0];
  const rx1 = fast ? momentLumps(rxTurns) : rx0;
  const tExact = txLevels[txLevels.length - 1];
  const rxTotal = fast ? Math.abs(rxLevels[0].w[0]) : 1;
  let absTol = options.absTol ?? 0;
  if (options.absTol === void 0 && fast) {
    ringIntegral(0, 0, t0.z[0], 0, 0, 1, rxLevels[0].r[0], t0, void 0, 1e-8, 0);
    absTol = 0.01 * relTol * Math.abs(ring.v1 * rxLevels[0].w[0]);
  }
  const qtol = 0.1 * relTol;
  let lastError = 0;
  let lastMethod = "exact";
  let lastWarnings = [];
  let ox = 0, oy = 0, oz = 0, nx = 0, ny = 0, nz = 1;
  const sums = { m: 0, m0: 0, err: 0, minA2: Infinity };
  const sumRings = (rl, tl, tl0) => {
    let m = 0, m0 = 0, err = 0, minA2 = Infinity;
    const floor = absTol / rxTotal;
    for (let k = 0; k < rl.r.length; k++) {
      const h = rl.z[k];
      ringIntegral(ox + h * nx, oy + h * ny, oz + h * nz, nx, ny, nz, rl.r[k], tl, tl0, qtol, floor);
      m += rl.w[k] * ring.v1;
      m0 += rl.w[k] * ring.v0;
      err += Math.abs(rl.w[k]) * ring.err;
      if (ring.minA2 < minA2) minA2 = ring.minA2;
    }
    sums.m = m;
    sums.m0 = m0;
    sums.err = err;
    sums.minA2 = minA2;
  };
  const exact = (fTx, fRx) => {
    const Rt = fTx.R, Rr = fRx.R;
    const M = new Float64Array(9);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) M[3 * i + j] = Rt[i] * Rr[j] + Rt[3 + i] * Rr[3 + j] + Rt[6 + i] * Rr[6 + j];
    const d = [fRx.position[0] - fTx.position[0], fRx.position[1] - fTx.position[1], fRx.position[2] - fTx.position[2]];
    const t = [0, 1, 2].map((i) => Rt[i] * d[0] + Rt[3 + i] * d[1] + Rt[6 + i] * d[2]);
    const map = (p) => [
      M[0] * p[0] + M[1] * p[1] + M[2] * p[2] + t[0],
      M[3] * p[0] + M[4] * p[1] + M[5] * p[2] + t[1],
      M[6] * p[0] + M[7] * p[1] + M[8] * p[2] + t[2]
    ];
    const dir = (p) => {
      const q = [M[0] * p[0] + M[1] * p[1] + M[2] * p[2], M[3] * p[0] + M[4] * p[1] + M[5] * p[2], M[6] * p[0] + M[7] * p[1] + M[8] * p[2]];
      const l = Math.hypot(q[0], q[1], q[2]);
      return [q[0] / l, q[1] / l, q[2] / l];
    };
    let sum2 = 0;
    let min2 = Infinity;
    for (const g2 of rx.filaments) {
      const gw = g2.kind === "circle" ? { kind: "circle", center: map(g2.center), axis: dir(g2.axis), radius: g2.radius, turns: g2.turns } : { kind: "path", points: g2.points.map(map), turns: g2.turns };
      for (const f of tx.filaments) {
        const ft = f.kind === "circle" ? { ...f, axis: dir0(f.axis) } : f;
        sum2 += f.turns * g2.turns * filamentMutual(ft, gw, 0.1 * qtol);
        const d2 = lastFilamentDistance2();
        if (d2 < min2) min2 = d2;
      }
    }
    finish(sum2, Math.abs(sum2) * 0.1 * qtol, "exact", min2);
    return sum2;
  };
  const finish = (m, err, method, minA2) => {
    lastError = err;
    lastMethod = method;
    lastWarnings = [];
    if (method === "exact" && Math.sqrt(minA2) < clearance) {
      lastWarnings.push(
        `the coils' conductors overlap at this pose (filaments ${(Math.sqrt(minA2) * 1e3).toPrecision(3)} mm apart, wire radii sum ${(clearance * 1e3).toPrecision(3)} mm): the filament value is not physical`
      );
    }
    stats[method]++;
    void m;
  };
  const mutual = (poseTx, poseRx) => {
    const fTx = poseFrame(poseTx, "couplingEvaluator", "poseTx");
    const fRx = poseFrame(poseRx, "couplingEvaluator", "poseRx");
    if (!fast) return exact(fTx, fRx);
    const Rt = fTx.R, Rr = fRx.R;
    const nW0 = Rr[2], nW1 = Rr[5], nW2 = Rr[8];
    nx = Rt[0] * nW0 + Rt[3] * nW1 + Rt[6] * nW2;
    ny = Rt[1] * nW0 + Rt[4] * nW1 + Rt[7] * nW2;
    nz = Rt[2] * nW0 + Rt[5] * nW1 + Rt[8] * nW2;
    const dx = fRx.position[0] - fTx.position[0], dy = fRx.position[1] - fTx.position[1], dz = fRx.position[2] - fTx.position[2];
    ox = Rt[0] * dx + Rt[3] * dy + Rt[6] * dz;
    oy = Rt[1] * dx + Rt[4] * dy + Rt[7] * dz;
    oz = Rt[2] * dx + Rt[5] * dy + Rt[8] * dz;
    const accept = (e, m) => e <= Math.max(relTol * Math.abs(m), absTol);
    sumRings(rx1, t1, t0);
    const mA = sums.m, mA0 = sums.m0, errA = sums.err;
    let minA2 = sums.minA2;
    sumRings(rxLevels[0], t1, void 0);
    if (sums.minA2 < minA2) minA2 = sums.minA2;
    const D = Math.sqrt(minA2);
    const eRx = Math.abs(mA - sums.m) * Math.min(1, LUMP_SAFETY * rx0.extent * rx0.extent / (D * D));
    const eTx = Math.abs(mA - mA0) * Math.min(1, LUMP_SAFETY * t0.extent * t0.extent / (D * D));
    if (D > GUARD * Math.max(rx0.extent, t0.extent) && accept(eRx + eTx + errA, mA)) {
      finish(mA, eRx + eTx + errA, "lumped", minA2);
      return mA;
    }
    sumRings(rxLevels[0], tExact, void 0);
    let prev = sums.m;
    for (let l = 1; l < rxLevels.length; l++) {
      if (!Number.isFinite(sums.err)) break;
      const rl = rxLevels[l];
      sumRings(rl, tExact, void 0);
      const last = l === rxLevels.length - 1;
      const e = last ? sums.err : Math.abs(sums.m - prev) + sums.err;
      if (Math.sqrt(sums.minA2) > GUARD * rl.extent && accept(e, sums.m)) {
        finish(sums.m, e, last ? "exact" : "lumped", sums.minA2);
        return sums.m;
      }
      prev = sums.m;
    }
    return exact(fTx, fRx);
  };
  return {
    mutual,
    coupling: (a, b) => mutual(a, b) * norm,
    evaluate: (a, b) => {
      const m = mutual(a, b);
      return { mutual: m, coupling: m * norm, error: lastError, method: lastMethod, warnings: lastWarnings };
    },
    selfTx,
    selfRx,
    stats
  };
}
function dir0(a) {
  const l = Math.hypot(a[0], a[1], a[2]);
  return [a[0] / l, a[1] / l, a[2] / l];
}

// lib/em/losses/skinDepth.ts
function skinDepth(f, resistivity, muR = 1) {
  requirePositive(f, "f", "Hz", "skinDepth");
  requirePositive(resistivity, "resistivity", "\u03A9\xB7m", "skinDepth");
  if (!(Number.isFinite(muR) && muR >= 1)) {
    throw new TanklightInputError([{ path: "muR", message: "must be a finite number \u2265 1", value: muR, expected: "\u2265 1" }], "skinDepth");
  }
  return Math.sqrt(resistivity / (Math.PI * f * MU0 * muR));
}

// lib/em/losses/coilResistance.ts
var geometryCache = /* @__PURE__ */ new WeakMap();
function proximityGeometry(coil) {
  let g2 = geometryCache.get(coil);
  if (g2) return g2;
  const s = coil.shape;
  if (s?.kind === "flatSpiral" && coil.filaments.some((f) => f.kind === "path")) {
    const r0 = s.innerRadius + s.conductorWidth / 2;
    const N = Math.max(1, Math.round(s.turns));
    const rings = Array.from({ length: N }, (_, i) => ({ kind: "circle", center: [0, 0, 0], axis: [0, 0, 1], radius: r0 + (i + 0.5) * s.pitch, turns: 1 }));
    const ringCoil = { ...coil, filaments: rings };
    g2 = { fields: turnFieldsPerAmpere(ringCoil), lengths: filamentLengths(ringCoil) };
  } else {
    g2 = { fields: turnFieldsPerAmpere(equivalentCircleCoil(coil)), lengths: filamentLengths(coil) };
  }
  geometryCache.set(coil, g2);
  return g2;
}
function equivalentCircleCoil(coil) {
  if (coil.filaments.every((f) => f.kind === "circle")) return coil;
  const filaments = coil.filaments.map((f) => {
    if (f.kind === "circle") return f;
    const pts = f.points;
    const n = pts.length;
    let cx = 0, cy = 0, cz = 0;
    for (const p of pts) {
      cx += p[0];
      cy += p[1];
      cz += p[2];
    }
    cx /= n;
    cy /= n;
    cz /= n;
    let ax = 0, ay = 0, az = 0;
    for (let k = 0; k < n; k++) {
      const p = pts[k], q = pts[(k + 1) % n];
      const ux = p[0] - cx, uy = p[1] - cy, uz = p[2] - cz;
      const vx = q[0] - cx, vy = q[1] - cy, vz = q[2] - cz;
      ax += 0.5 * (uy * vz - uz * vy);
      ay += 0.5 * (uz * vx - ux * vz);
      az += 0.5 * (ux * vy - uy * vx);
    }
    const area = Math.hypot(ax, ay, az);
    return { kind: "circle", center: [cx, cy, cz], axis: [ax / area, ay / area, az / area], radius: Math.sqrt(area / Math.PI), turns: f.turns };
  });
  return { ...coil, filaments };
}
function filamentLengths(coil) {
  const out = new Float64Array(coil.filaments.length);
  coil.filaments.forEach((f, i) => {
    if (f.kind === "circle") out[i] = f.turns * 2 * Math.PI * f.radius;
    else {
      let L = 0;
      const n = f.points.length;
      for (let k = 0; k < n; k++) {
        const p = f.points[k], q = f.points[(k + 1) % n];
        L += Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]);
      }
      out[i] = f.turns * L;
    }
  });
  return out;
}
function coilResistanceDetail(coil, f, opts = {}) {
  if (!(typeof f === "number" && Number.isFinite(f) && f >= 0)) {
    throw new TanklightInputError([{ path: "f", message: "must be a finite frequency \u2265 0 Hz", value: f, expected: "\u2265 0 Hz" }], "coilResistance");
  }
  const temperature2 = opts.temperature ?? REFERENCE_TEMPERATURE;
  const c = coil.conductor;
  const rho = resistivityAt(material(c.material), temperature2);
  requirePositive(coil.wireLength, "coil.wireLength", "m", "coilResistance");
  const warnings = [];
  const len = coil.wireLength;
  let dc, skin, proximity = 0;
  const geo = f > 0 ? proximityGeometry(coil) : void 0;
  const fields = geo?.fields;
  const lengths = geo?.lengths ?? new Float64Array(0);
  if (fields) for (const w of fields.warnings) warnings.push(w);
  if (fields && coil.filaments.some((fl) => fl.kind === "path")) {
    warnings.push(
      coil.shape?.kind === "flatSpiral" ? "spiral polygon: the proximity field is computed for the spiral's rings (approximation)" : "polygon turns: the proximity field is computed for circles of equal area (approximation)"
    );
  }
  switch (c.kind) {
    case "round": {
      requirePositive(c.diameter, "coil.conductor.diameter", "m", "coilResistance");
      const r = c.diameter / 2;
      dc = rho * len / (Math.PI * r * r);
      if (!fields) {
        skin = 0;
        break;
      }
      const delta = Math.sqrt(rho / (Math.PI * f * MU0));
      skin = dc * (acFactorFromQ(Math.SQRT2 * r / delta) - 1);
      const G = rho * proximityG(c.diameter / (delta * Math.SQRT2));
      for (let i = 0; i < lengths.length; i++) proximity += lengths[i] * 2 * G * fields.h2[i];
      break;
    }
    case "litz": {
      requirePositive(c.strands, "coil.conductor.strands", "", "coilResistance");
      requirePositive(c.strandDiameter, "coil.conductor.strandDiameter", "m", "coilResistance");
      requirePositive(c.outerDiameter, "coil.conductor.outerDiameter", "m", "coilResistance");
      const p = litzResistancePerLength(c.strands, c.strandDiameter, c.outerDiameter, f, rho);
      dc = p.dc * len;
      skin = p.skin * len;
      if (!fields) break;
      proximity = p.internalProximity * len;
      for (let i = 0; i < lengths.length; i++) proximity += lengths[i] * p.externalFactor * fields.h2[i];
      break;
    }
    case "trace": {
      requirePositive(c.width, "coil.conductor.width", "m", "coilResistance");
      requirePositive(c.thickness, "coil.conductor.thickness", "m", "coilResistance");
      const p = traceResistancePerLength(c.width, c.thickness, f, rho);
      dc = p.dc * len;
      skin = p.skin * len;
      if (!fields) break;
      for (let i = 0; i < lengths.length; i++) proximity += lengths[i] * (p.normalFactor * fields.hz2[i] + p.tangentialFactor * fields.hr2[i]);
      if (p.beyondThinStrip) {
        warnings.push(
          `trace ${c.width} m \xD7 ${c.thickness} m at ${f} Hz: width\xB7thickness exceeds 2\u03B4\xB2, so the low-frequency strip proximity model overstates the loss`
        );
      }
      break;
    }
    default: {
      const never = c;
      throw new TanklightInputError([{ path: "coil.conductor.kind", message: "unknown conductor kind", value: never.kind }], "coilResistance");
    }
  }
  if (f > 0 && !opts.skipSelfResonance) {
    try {
      const w = selfResonanceWarning(coil, f);
      if (w) warnings.push(w);
    } catch (e) {
      if (!(e instanceof TanklightInputError)) throw e;
      warnings.push(`self-resonance could not be estimated for this coil (${e.message}); the f_sr/3 check was skipped`);
    }
  }
  return { dc, skin, proximity, total: dc + skin + proximity, frequency: f, temperature: temperature2, warnings };
}
function coilResistance(coil, f, opts = {}) {
  return coilResistanceDetail(coil, f, { ...opts, skipSelfResonance: true }).total;
}

// lib/em/losses/qualityFactor.ts
function qualityFactorDetail(coil, f, opts = {}) {
  if (!(typeof f === "number" && Number.isFinite(f) && f > 0)) {
    throw new TanklightInputError([{ path: "f", message: "must be a finite frequency > 0 Hz", value: f, expected: "> 0 Hz" }], "qualityFactor");
  }
  const r = coilResistanceDetail(coil, f, opts);
  const L = selfInductance(coil, { frequency: f });
  const fsr = selfResonance(coil);
  const warnings = [...r.warnings];
  if (f > fsr / 3) {
    warnings.push(`frequency ${f.toPrecision(4)} Hz is above a third of the coil's estimated self-resonance ${fsr.toPrecision(3)} Hz: lumped L, R and Q are no longer accurate`);
  }
  return { q: 2 * Math.PI * f * L / r.total, inductance: L, resistance: r.total, selfResonance: fsr, warnings };
}
function qualityFactor(coil, f, opts = {}) {
  return qualityFactorDetail(coil, f, opts).q;
}

// lib/circuit/eseries.ts
var E24 = [1, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2, 2.2, 2.4, 2.7, 3, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1];
var E12 = [1, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];
var E6 = [1, 1.5, 2.2, 3.3, 4.7, 6.8];
var E3 = [1, 2.2, 4.7];
var E48 = [
  100,
  105,
  110,
  115,
  121,
  127,
  133,
  140,
  147,
  154,
  162,
  169,
  178,
  187,
  196,
  205,
  215,
  226,
  237,
  249,
  261,
  274,
  287,
  301,
  316,
  332,
  348,
  365,
  383,
  402,
  422,
  442,
  464,
  487,
  511,
  536,
  562,
  590,
  619,
  649,
  681,
  715,
  750,
  787,
  825,
  866,
  909,
  953
];
var E96 = [
  100,
  102,
  105,
  107,
  110,
  113,
  115,
  118,
  121,
  124,
  127,
  130,
  133,
  137,
  140,
  143,
  147,
  150,
  154,
  158,
  162,
  165,
  169,
  174,
  178,
  182,
  187,
  191,
  196,
  200,
  205,
  210,
  215,
  221,
  226,
  232,
  237,
  243,
  249,
  255,
  261,
  267,
  274,
  280,
  287,
  294,
  301,
  309,
  316,
  324,
  332,
  340,
  348,
  357,
  365,
  374,
  383,
  392,
  402,
  412,
  422,
  432,
  442,
  453,
  464,
  475,
  487,
  499,
  511,
  523,
  536,
  549,
  562,
  576,
  590,
  604,
  619,
  634,
  649,
  665,
  681,
  698,
  715,
  732,
  750,
  768,
  787,
  806,
  825,
  845,
  866,
  887,
  909,
  931,
  953,
  976
];
var E192 = [
  100,
  101,
  102,
  104,
  105,
  106,
  107,
  109,
  110,
  111,
  113,
  114,
  115,
  117,
  118,
  120,
  121,
  123,
  124,
  126,
  127,
  129,
  130,
  132,
  133,
  135,
  137,
  138,
  140,
  142,
  143,
  145,
  147,
  149,
  150,
  152,
  154,
  156,
  158,
  160,
  162,
  164,
  165,
  167,
  169,
  172,
  174,
  176,
  178,
  180,
  182,
  184,
  187,
  189,
  191,
  193,
  196,
  198,
  200,
  203,
  205,
  208,
  210,
  213,
  215,
  218,
  221,
  223,
  226,
  229,
  232,
  234,
  237,
  240,
  243,
  246,
  249,
  252,
  255,
  258,
  261,
  264,
  267,
  271,
  274,
  277,
  280,
  284,
  287,
  291,
  294,
  298,
  301,
  305,
  309,
  312,
  316,
  320,
  324,
  328,
  332,
  336,
  340,
  344,
  348,
  352,
  357,
  361,
  365,
  370,
  374,
  379,
  383,
  388,
  392,
  397,
  402,
  407,
  412,
  417,
  422,
  427,
  432,
  437,
  442,
  448,
  453,
  459,
  464,
  470,
  475,
  481,
  487,
  493,
  499,
  505,
  511,
  517,
  523,
  530,
  536,
  542,
  549,
  556,
  562,
  569,
  576,
  583,
  590,
  597,
  604,
  612,
  619,
  626,
  634,
  642,
  649,
  657,
  665,
  673,
  681,
  690,
  698,
  706,
  715,
  723,
  732,
  741,
  750,
  759,
  768,
  777,
  787,
  796,
  806,
  816,
  825,
  835,
  845,
  856,
  866,
  876,
  887,
  898,
  909,
  920,
  931,
  942,
  953,
  965,
  976,
  988
];
var TABLES = {
  E3,
  E6,
  E12,
  E24,
  E48: E48.map((x) => x / 100),
  E96: E96.map((x) => x / 100),
  E192: E192.map((x) => x / 100)
};
var SERIES_TOLERANCE = {
  E3: 0.2,
  // historically > 20 %
  E6: 0.2,
  E12: 0.1,
  E24: 0.05,
  E48: 0.02,
  E96: 0.01,
  E192: 5e-3
};
function checkSeries(series, where) {
  if (typeof series !== "string" || !(series in TABLES)) {
    throw new TanklightInputError(
      [{ path: "series", message: `must be one of ${Object.keys(TABLES).join(", ")}`, value: series }],
      where
    );
  }
  return series;
}
function standardValues(series) {
  return TABLES[checkSeries(series, "standardValues")];
}
function standardValuesBetween(series, lo, hi) {
  const t = TABLES[checkSeries(series, "standardValuesBetween")];
  requirePositive(lo, "lo", "", "standardValuesBetween");
  requirePositive(hi, "hi", "", "standardValuesBetween");
  const out = [];
  const d0 = Math.floor(Math.log10(lo)) - 1;
  const d1 = Math.ceil(Math.log10(hi)) + 1;
  for (let d = d0; d <= d1; d++) {
    for (const m of t) {
      const v = decade(m, d);
      if (v >= lo * (1 - 1e-12) && v <= hi * (1 + 1e-12)) out.push(v);
    }
  }
  return out;
}
function decade(m, d) {
  const k = Math.round(m * 100);
  const e = d - 2;
  return e >= 0 ? k * 10 ** e : k / 10 ** -e;
}
function nearestStandardValue(x, series) {
  checkSeries(series, "nearestStandardValue");
  requirePositive(x, "x", "", "nearestStandardValue");
  let best = NaN;
  let bestErr = Infinity;
  for (const v of standardValuesBetween(series, x / 10, x * 10)) {
    const e = Math.abs(Math.log(v / x));
    if (e < bestErr) {
      bestErr = e;
      best = v;
    }
  }
  return best;
}

// lib/circuit/combination.ts
function bestCombination(x, series, options = {}) {
  const where = "bestCombination";
  requirePositive(x, "x", "", where);
  const maxParts = options.maxParts ?? 2;
  if (![1, 2, 3].includes(maxParts)) {
    throw new TanklightInputError([{ path: "options.maxParts", message: "must be 1, 2 or 3", value: maxParts }], where);
  }
  const topology = options.topology ?? "any";
  if (!["series", "parallel", "any"].includes(topology)) {
    throw new TanklightInputError([{ path: "options.topology", message: "must be 'series', 'parallel' or 'any'", value: topology }], where);
  }
  const kind = options.kind ?? "capacitor";
  if (!["capacitor", "resistor", "inductor"].includes(kind)) {
    throw new TanklightInputError([{ path: "options.kind", message: "must be 'capacitor', 'resistor' or 'inductor'", value: kind }], where);
  }
  const count2 = options.count ?? 5;
  if (!(Number.isInteger(count2) && count2 >= 1)) {
    throw new TanklightInputError([{ path: "options.count", message: "must be an integer \u2265 1", value: count2 }], where);
  }
  if (options.tolerance !== void 0) requirePositive(options.tolerance, "options.tolerance", "", where);
  const parallelOp = kind === "capacitor" ? "add" : "rec";
  const seriesOp = kind === "capacitor" ? "rec" : "add";
  const cand = standardValuesBetween(series, x * 0.01, x * 100);
  let out = [];
  const keep = Math.max(200, 20 * count2);
  let limit = Infinity;
  const prune = () => {
    out.sort((a, b) => Math.abs(a.error) - Math.abs(b.error) || a.parts.length - b.parts.length);
    out = out.slice(0, keep);
    limit = out.length >= keep ? Math.abs(out[out.length - 1].error) : Infinity;
  };
  const few = [];
  const push = (value, parts, topo) => {
    const error = (value - x) / x;
    if (parts.length < 3) {
      few.push({ value, error, parts: [...parts].sort((a, b) => a - b), topology: topo });
      return;
    }
    if (Math.abs(error) > limit) return;
    out.push({ value, error, parts: [...parts].sort((a, b) => a - b), topology: topo });
    if (out.length > 4 * keep) prune();
  };
  const n1 = nearestIndex(cand, x);
  for (const k of [n1 - 1, n1, n1 + 1]) if (k >= 0 && k < cand.length) push(cand[k], [cand[k]], "single");
  const allow = (t) => topology === "any" || topology === t;
  const opName = (op) => op === parallelOp ? "parallel" : "series";
  if (maxParts >= 2) {
    for (const op of ["add", "rec"]) {
      if (!allow(opName(op))) continue;
      for (const [a, b] of pairsFor(cand, x, op)) push(combine(op, a, b), [a, b], opName(op));
    }
  }
  if (maxParts >= 3) {
    for (const op of ["add", "rec"]) {
      if (!allow(opName(op))) continue;
      for (const c of cand) {
        const rest = remainder(op, x, c);
        if (!(rest > 0)) continue;
        for (const [a, b] of pairsFor(cand, rest, op, 1)) {
          if (a > c || b > c) continue;
          push(combine(op, combine(op, a, b), c), [a, b, c], opName(op));
        }
      }
    }
    if (topology === "any") {
      for (const [op1, op2] of [["add", "rec"], ["rec", "add"]]) {
        for (const c of cand) {
          const rest = remainder(op2, x, c);
          if (!(rest > 0)) continue;
          for (const [a, b] of pairsFor(cand, rest, op1, 1)) {
            push(combine(op2, combine(op1, a, b), c), [a, b, c], `${opName(op1)} pair in ${opName(op2)} with one`);
          }
        }
      }
    }
  }
  const tol = options.tolerance;
  out = few.concat(out);
  const kept = tol === void 0 ? out : out.filter((c) => Math.abs(c.error) <= tol * (1 + 1e-12));
  const unique = /* @__PURE__ */ new Map();
  for (const c of kept) {
    const key = `${c.topology}|${c.parts.map((p) => p.toPrecision(4)).join(",")}`;
    if (!unique.has(key)) unique.set(key, c);
  }
  const list = [...unique.values()];
  const byErr = (a, b) => Math.abs(a.error) - Math.abs(b.error);
  list.sort((a, b) => {
    const e = byErr(a, b);
    const p = a.parts.length - b.parts.length;
    if (options.prefer === "fewestParts") return p !== 0 ? p : e;
    return Math.abs(e) > 1e-12 * (Math.abs(a.error) + Math.abs(b.error)) ? e : p;
  });
  return list.slice(0, count2);
}
function combine(op, a, b) {
  return op === "add" ? a + b : a * b / (a + b);
}
function remainder(op, x, c) {
  if (op === "add") return x - c;
  return c > x ? 1 / (1 / x - 1 / c) : -1;
}
function pairsFor(cand, target, op, keepPerA = 2) {
  const pairs = [];
  for (const a of cand) {
    const r = remainder(op, target, a);
    if (!(r > 0)) continue;
    if (r < a * (1 - 1e-12)) continue;
    const k = nearestIndex(cand, r);
    const ks2 = keepPerA === 1 ? [k] : [k - 1, k, k + 1];
    for (const j of ks2) {
      if (j >= 0 && j < cand.length && cand[j] >= a * (1 - 1e-12)) pairs.push([a, cand[j]]);
    }
  }
  return pairs;
}
function nearestIndex(arr, v) {
  let lo = 0;
  let hi = arr.length - 1;
  while (hi - lo > 1) {
    const m = lo + hi >> 1;
    if (arr[m] <= v) lo = m;
    else hi = m;
  }
  return Math.abs(Math.log(arr[lo] / v)) <= Math.abs(Math.log(arr[hi] / v)) ? lo : hi;
}

// lib/circuit/tank.ts
function resonantCapacitance(L, f) {
  requirePositive(L, "L", "H", "resonantCapacitance");
  requirePositive(f, "f", "Hz", "resonantCapacitance");
  const w = 2 * Math.PI * f;
  return 1 / (w * w * L);
}
function resonantFrequency(L, C) {
  requirePositive(L, "L", "H", "resonantFrequency");
  requirePositive(C, "C", "F", "resonantFrequency");
  return 1 / (2 * Math.PI * Math.sqrt(L * C));
}
function tankQuality(t) {
  const where = "tankQuality";
  requirePositive(t.inductance, "inductance", "H", where);
  requirePositive(t.capacitance, "capacitance", "F", where);
  const f = 1 / (2 * Math.PI * Math.sqrt(t.inductance * t.capacitance));
  const w = 2 * Math.PI * f;
  const wl = w * t.inductance;
  const nonNeg2 = (x, name, unit) => {
    if (x === void 0) return 0;
    if (!(Number.isFinite(x) && x >= 0)) {
      throw new TanklightInputError([{ path: name, message: `must be a finite number \u2265 0 ${unit}`, value: x }], where);
    }
    return x;
  };
  const rl = nonNeg2(t.coilResistance, "coilResistance", "\u03A9");
  if (t.capacitorEsr !== void 0 && t.dissipationFactor !== void 0) {
    throw new TanklightInputError([{ path: "capacitorEsr", message: "give capacitorEsr or dissipationFactor, not both", value: t.capacitorEsr }], where);
  }
  const tanD = t.dissipationFactor !== void 0 ? nonNeg2(t.dissipationFactor, "dissipationFactor", "") : nonNeg2(t.capacitorEsr, "capacitorEsr", "\u03A9") * w * t.capacitance;
  let invQp = 0;
  if (t.parallelResistance !== void 0) {
    requirePositive(t.parallelResistance, "parallelResistance", "\u03A9", where);
    invQp = wl / t.parallelResistance;
  }
  const invQl = rl / wl;
  const invQ = invQl + tanD + invQp;
  if (!(invQ > 0)) {
    throw new TanklightInputError(
      [{ path: "coilResistance", message: "a tank needs at least one loss (coil resistance, capacitor ESR/tan \u03B4 or a parallel resistance)", value: t }],
      where
    );
  }
  const q = 1 / invQ;
  return {
    frequency: f,
    q,
    coilQ: invQl > 0 ? 1 / invQl : Infinity,
    capacitorQ: tanD > 0 ? 1 / tanD : Infinity,
    loadQ: invQp > 0 ? 1 / invQp : Infinity,
    bandwidth: f / q,
    dynamicResistance: q * wl,
    characteristicImpedance: Math.sqrt(t.inductance / t.capacitance)
  };
}
function tankBandwidth(f0, q) {
  requirePositive(f0, "f0", "Hz", "tankBandwidth");
  requirePositive(q, "q", "", "tankBandwidth");
  return f0 / q;
}
function detuningTolerance(q, fraction) {
  requirePositive(q, "q", "", "detuningTolerance");
  if (!(Number.isFinite(fraction) && fraction > 0 && fraction < 1)) {
    throw new TanklightInputError([{ path: "fraction", message: "must be between 0 and 1 (exclusive)", value: fraction }], "detuningTolerance");
  }
  const x = Math.sqrt(1 / ((1 - fraction) * (1 - fraction)) - 1);
  const a = x / q;
  const root = Math.sqrt(a * a + 4);
  const upper = (a + root) / 2;
  const lower = (-a + root) / 2;
  return {
    lowerRatio: lower,
    upperRatio: upper,
    relativeHalfWidth: (upper - lower) / 2,
    capacitanceChange: [1 / (upper * upper) - 1, 1 / (lower * lower) - 1]
  };
}
function tuneWithStandardParts(L, f, options = {}) {
  const c = resonantCapacitance(L, f);
  const combos = bestCombination(c, options.series ?? "E12", {
    maxParts: options.maxParts ?? 2,
    count: options.count ?? 5,
    kind: "capacitor",
    ...options.topology ? { topology: options.topology } : {}
  });
  const choices = combos.map((k) => {
    const fr = 1 / (2 * Math.PI * Math.sqrt(L * k.value));
    return { parts: k.parts, topology: k.topology, capacitance: k.value, frequency: fr, frequencyError: (fr - f) / f };
  });
  return { capacitance: c, choices };
}

// node_modules/simple-statistics/dist/simple-statistics.mjs
function sum(x) {
  if (x.length === 0) {
    return 0;
  }
  var sum2 = x[0];
  var correction = 0;
  var transition;
  if (typeof sum2 !== "number") {
    return Number.NaN;
  }
  for (var i = 1; i < x.length; i++) {
    if (typeof x[i] !== "number") {
      return Number.NaN;
    }
    transition = sum2 + x[i];
    if (Math.abs(sum2) >= Math.abs(x[i])) {
      correction += sum2 - transition + x[i];
    } else {
      correction += x[i] - transition + sum2;
    }
    sum2 = transition;
  }
  return sum2 + correction;
}
function mean(x) {
  if (x.length === 0) {
    throw new Error("mean requires at least one data point");
  }
  return sum(x) / x.length;
}
function sumNthPowerDeviations(x, n) {
  var meanValue = mean(x);
  var sum2 = 0;
  var tempValue;
  var i;
  if (n === 2) {
    for (i = 0; i < x.length; i++) {
      tempValue = x[i] - meanValue;
      sum2 += tempValue * tempValue;
    }
  } else {
    for (i = 0; i < x.length; i++) {
      sum2 += Math.pow(x[i] - meanValue, n);
    }
  }
  return sum2;
}
function sampleVariance(x) {
  if (x.length < 2) {
    throw new Error("sampleVariance requires at least two data points");
  }
  var sumSquaredDeviationsValue = sumNthPowerDeviations(x, 2);
  var besselsCorrection = x.length - 1;
  return sumSquaredDeviationsValue / besselsCorrection;
}
function sampleStandardDeviation(x) {
  var sampleVarianceX = sampleVariance(x);
  return Math.sqrt(sampleVarianceX);
}
function quantileSorted(x, p) {
  var idx = (x.length - 1) * p;
  if (x.length === 0) {
    throw new Error("quantile requires at least one data point.");
  } else if (p < 0 || p > 1) {
    throw new Error("quantiles must be between 0 and 1");
  } else if (p === 1) {
    return x[x.length - 1];
  } else if (p === 0) {
    return x[0];
  } else if (idx % 1 !== 0) {
    var lower = Math.floor(idx);
    var upper = Math.ceil(idx);
    var fraction = idx - lower;
    return x[lower] + fraction * (x[upper] - x[lower]);
  } else {
    return x[idx];
  }
}
var BayesianClassifier = function BayesianClassifier2() {
  this.totalCount = 0;
  this.data = {};
};
BayesianClassifier.prototype.train = function train(item, category) {
  if (!this.data[category]) {
    this.data[category] = {};
  }
  for (var k in item) {
    var v = item[k];
    if (this.data[category][k] === void 0) {
      this.data[category][k] = {};
    }
    if (this.data[category][k][v] === void 0) {
      this.data[category][k][v] = 0;
    }
    this.data[category][k][v]++;
  }
  this.totalCount++;
};
BayesianClassifier.prototype.score = function score(item) {
  var odds = {};
  var category;
  for (var k in item) {
    var v = item[k];
    for (category in this.data) {
      if (odds[category] === void 0) {
        odds[category] = {};
      }
      if (this.data[category][k]) {
        odds[category][k + "_" + v] = (this.data[category][k][v] || 0) / this.totalCount;
      } else {
        odds[category][k + "_" + v] = 0;
      }
    }
  }
  var oddsSums = {};
  for (category in odds) {
    oddsSums[category] = 0;
    for (var combination in odds[category]) {
      oddsSums[category] += odds[category][combination];
    }
  }
  return oddsSums;
};
var g = 607 / 128;
var LOGSQRT2PI = Math.log(Math.sqrt(2 * Math.PI));
var SQRT_2PI$1 = Math.sqrt(2 * Math.PI);
function cumulativeDistribution(z2) {
  var sum2 = z2;
  var tmp = z2;
  for (var i = 1; i < 30; i++) {
    tmp *= z2 * z2 / (2 * i + 1);
    sum2 += tmp;
  }
  return Math.round((0.5 + sum2 / SQRT_2PI$1 * Math.exp(-z2 * z2 / 2)) * 1e4) / 1e4;
}
var standardNormalTable = [];
for (z = 0; z <= 3.09; z += 0.01) {
  standardNormalTable.push(cumulativeDistribution(z));
}
var z;
var SQRT_2PI = Math.sqrt(2 * Math.PI);
var PerceptronModel = function PerceptronModel2() {
  this.weights = [];
  this.bias = 0;
};
PerceptronModel.prototype.predict = function predict(features) {
  if (features.length !== this.weights.length) {
    return null;
  }
  var score2 = 0;
  for (var i = 0; i < this.weights.length; i++) {
    score2 += this.weights[i] * features[i];
  }
  score2 += this.bias;
  if (score2 > 0) {
    return 1;
  } else {
    return 0;
  }
};
PerceptronModel.prototype.train = function train2(features, label) {
  if (label !== 0 && label !== 1) {
    return null;
  }
  if (features.length !== this.weights.length) {
    this.weights = features.slice();
    this.bias = 1;
  }
  var prediction = this.predict(features);
  if (typeof prediction === "number" && prediction !== label) {
    var gradient = label - prediction;
    for (var i = 0; i < this.weights.length; i++) {
      this.weights[i] += gradient * features[i];
    }
    this.bias += gradient;
  }
  return this;
};

// lib/circuit/tolerance.ts
function resonantFrequencyWindow(input) {
  const where = "resonantFrequencyWindow";
  requirePositive(input.inductance, "inductance", "H", where);
  requirePositive(input.capacitance, "capacitance", "F", where);
  const tl = input.inductanceTolerance;
  const tc = input.capacitanceTolerance;
  for (const [v, name] of [[tl, "inductanceTolerance"], [tc, "capacitanceTolerance"]]) {
    if (!(Number.isFinite(v) && v >= 0 && v < 1)) {
      throw new TanklightInputError([{ path: name, message: "must be a relative tolerance in [0, 1), e.g. 0.05 for \xB15 %", value: v }], where);
    }
  }
  const dist = input.distribution ?? "uniform";
  if (dist !== "uniform" && dist !== "normal") {
    throw new TanklightInputError([{ path: "distribution", message: "must be 'uniform' or 'normal'", value: dist }], where);
  }
  const n = input.samples ?? 2e4;
  if (!(Number.isInteger(n) && n >= 100)) {
    throw new TanklightInputError([{ path: "samples", message: "must be an integer \u2265 100", value: n }], where);
  }
  const coverage = input.coverage ?? 0.99;
  if (!(coverage > 0 && coverage < 1)) {
    throw new TanklightInputError([{ path: "coverage", message: "must be between 0 and 1", value: coverage }], where);
  }
  const seed = input.seed ?? 1;
  const L = input.inductance;
  const C = input.capacitance;
  const f = (l, c) => 1 / (2 * Math.PI * Math.sqrt(l * c));
  const nominal = f(L, C);
  const rng = createRandom(seed);
  const draw = (t) => {
    if (t === 0) return 0;
    if (dist === "uniform") return rng.uniformIn(-t, t);
    for (; ; ) {
      const x = rng.normal(0, t / 3);
      if (Math.abs(x) <= t) return x;
    }
  };
  const fs = new Float64Array(n);
  for (let k = 0; k < n; k++) fs[k] = f(L * (1 + draw(tl)), C * (1 + draw(tc)));
  const sorted = Array.from(fs).sort((a, b) => a - b);
  const tail = (1 - coverage) / 2;
  const sigma = (t) => dist === "uniform" ? t / Math.sqrt(3) : t / 3;
  return {
    nominal,
    worstCase: { min: f(L * (1 + tl), C * (1 + tc)), max: f(L * (1 - tl), C * (1 - tc)) },
    statistical: {
      mean: mean(sorted),
      sd: sampleStandardDeviation(sorted),
      lower: quantileSorted(sorted, tail),
      upper: quantileSorted(sorted, 1 - tail),
      coverage,
      samples: n,
      seed
    },
    linearisedSd: nominal * 0.5 * Math.sqrt(sigma(tl) ** 2 + sigma(tc) ** 2)
  };
}

// lib/circuit/dielectrics.ts
var MEM = "typical value, from memory (unverified); use the datasheet's tan \u03B4 when known";
var DIELECTRICS = {
  C0G: { name: "class 1 ceramic C0G (NP0)", dissipationFactor: 5e-4, temperatureStability: 3e-3, goodForTanks: true, note: "0 \xB1 30 ppm/K, no DC-bias loss; small values only", source: MEM },
  mica: { name: "silver mica", dissipationFactor: 5e-4, temperatureStability: 5e-3, goodForTanks: true, note: "stable and low-loss; bulky and costly", source: MEM },
  polypropylene: { name: "polypropylene film (PP)", dissipationFactor: 4e-4, temperatureStability: 0.02, goodForTanks: true, note: "low loss, high voltage, the usual choice for larger tank capacitors; mind the AC rating at high frequency", source: MEM },
  PPS: { name: "polyphenylene sulphide film (PPS)", dissipationFactor: 15e-4, temperatureStability: 0.01, goodForTanks: true, note: "stable; loss between PP and PET", source: MEM },
  polyester: { name: "polyester film (PET)", dissipationFactor: 0.01, temperatureStability: 0.05, goodForTanks: false, note: "lossy at 100 kHz and above: runs warm and lowers Q", source: MEM },
  X7R: { name: "class 2 ceramic X7R", dissipationFactor: 0.02, temperatureStability: 0.15, goodForTanks: false, note: "capacitance falls with DC bias and age, \xB115 % over temperature: detunes the tank", source: MEM },
  Y5V: { name: "class 2 ceramic Y5V", dissipationFactor: 0.05, temperatureStability: 0.8, goodForTanks: false, note: "+22/\u221282 % over temperature: unsuitable for tanks", source: MEM }
};
function checkDielectric(d, where) {
  if (typeof d !== "string" || !(d in DIELECTRICS)) {
    throw new TanklightInputError([{ path: "dielectric", message: `must be one of ${Object.keys(DIELECTRICS).join(", ")}`, value: d }], where);
  }
  return d;
}
function dielectric(d) {
  return DIELECTRICS[checkDielectric(d, "dielectric")];
}
function esrFromDissipationFactor(dissipationFactor, frequency2, capacitance2) {
  const where = "esrFromDissipationFactor";
  const td = typeof dissipationFactor === "string" ? DIELECTRICS[checkDielectric(dissipationFactor, where)].dissipationFactor : dissipationFactor;
  if (!(Number.isFinite(td) && td >= 0)) {
    throw new TanklightInputError([{ path: "dissipationFactor", message: "must be a finite number \u2265 0", value: td }], where);
  }
  requirePositive(frequency2, "frequency", "Hz", where);
  requirePositive(capacitance2, "capacitance", "F", where);
  return td / (2 * Math.PI * frequency2 * capacitance2);
}
var VOLTAGE_RATINGS = [6.3, 10, 16, 25, 35, 50, 63, 100, 160, 200, 250, 400, 450, 630, 1e3, 1500, 2e3, 3e3];
function recommendCapacitor(peakVoltage, capacitance2, options = {}) {
  const where = "recommendCapacitor";
  if (!(Number.isFinite(peakVoltage) && peakVoltage >= 0)) {
    throw new TanklightInputError([{ path: "peakVoltage", message: "must be a finite number \u2265 0 V", value: peakVoltage }], where);
  }
  requirePositive(capacitance2, "capacitance", "F", where);
  const derating = options.derating ?? 2;
  requirePositive(derating, "derating", "", where);
  const need = derating * peakVoltage;
  const rated = VOLTAGE_RATINGS.find((v) => v >= need) ?? Infinity;
  const small = capacitance2 <= 1e-8;
  const dielectrics = small ? ["C0G", "polypropylene", "mica"] : ["polypropylene", "C0G", "PPS"];
  const reasons = [
    "stable, low-loss dielectric for a resonant tank (trade practice, no source): class 2 ceramics (X7R, Y5V) drift with bias, temperature and age and detune the tank",
    `rating \u2265 ${derating} \xD7 the peak voltage ${peakVoltage.toPrecision(3)} V (trade practice, no source)`
  ];
  if (!Number.isFinite(rated)) reasons.push(`no standard rating reaches ${need.toPrecision(3)} V: split the capacitor into several in series`);
  reasons.push("film capacitors' AC voltage rating falls with frequency: check the datasheet's AC derating curve at the tank frequency");
  return { dielectrics, ratedVoltage: rated, derating, reasons };
}

// lib/circuit/stress.ts
var HIGH_VOLTAGE_CAUTION = 50;
function capacitorStress(input) {
  const where = "capacitorStress";
  requirePositive(input.capacitance, "capacitance", "F", where);
  requirePositive(input.frequency, "frequency", "Hz", where);
  const hasV = input.voltageAmplitude !== void 0;
  const hasI = input.currentAmplitude !== void 0;
  if (hasV === hasI) {
    throw new TanklightInputError([{ path: "voltageAmplitude", message: "give exactly one of voltageAmplitude and currentAmplitude", value: { voltageAmplitude: input.voltageAmplitude, currentAmplitude: input.currentAmplitude } }], where);
  }
  const given = hasV ? input.voltageAmplitude : input.currentAmplitude;
  if (!(Number.isFinite(given) && given >= 0)) {
    throw new TanklightInputError([{ path: hasV ? "voltageAmplitude" : "currentAmplitude", message: "must be a finite number \u2265 0", value: given }], where);
  }
  const wc = 2 * Math.PI * input.frequency * input.capacitance;
  const vp = hasV ? given : given / wc;
  const ip = hasV ? given * wc : given;
  const diel = input.dielectric ?? "C0G";
  if (!(diel in DIELECTRICS)) {
    throw new TanklightInputError([{ path: "dielectric", message: `must be one of ${Object.keys(DIELECTRICS).join(", ")}`, value: diel }], where);
  }
  const tanD = input.dissipationFactor ?? DIELECTRICS[diel].dissipationFactor;
  const esr = esrFromDissipationFactor(tanD, input.frequency, input.capacitance);
  const irms = ip / Math.SQRT2;
  const vrms = vp / Math.SQRT2;
  const recommendation = recommendCapacitor(vp, input.capacitance);
  const warnings = [];
  if (!DIELECTRICS[diel].goodForTanks) {
    warnings.push(`${DIELECTRICS[diel].name} is not a tank dielectric: ${DIELECTRICS[diel].note}`);
  }
  if (input.ratedVoltage !== void 0) {
    requirePositive(input.ratedVoltage, "ratedVoltage", "V", where);
    if (input.ratedVoltage < vp) warnings.push(`peak voltage ${vp.toPrecision(3)} V exceeds the part's rating ${input.ratedVoltage} V`);
    else if (input.ratedVoltage < recommendation.derating * vp) warnings.push(`rating ${input.ratedVoltage} V is below ${recommendation.derating} \xD7 the peak voltage (trade-practice derating)`);
  }
  const cautions = [];
  if (vp > HIGH_VOLTAGE_CAUTION) {
    cautions.push(
      `tank voltage ${vp.toPrecision(3)} V peak: a resonant tank can hold voltages that shock and burn; insulate it, discharge before handling, and follow local codes, regulations and licensed practice`
    );
  }
  return {
    peakVoltage: vp,
    rmsVoltage: vrms,
    peakCurrent: ip,
    rmsCurrent: irms,
    reactivePower: vrms * irms,
    esr,
    dissipatedPower: irms * irms * esr,
    recommendation,
    warnings,
    cautions
  };
}

// lib/circuit/loads/ledPresets.ts
var TABLE_20MA = "V_F at 20 mA inside the docs/references.md range (reference tables, not a handbook)";
var LOW_POINTS = "1 mA and 5 mA points from memory (unverified), typical indicator-LED curve";
var LED_PRESET_DATA = {
  red: {
    colour: "red",
    chemistry: "AlInGaP",
    wavelength: 625e-9,
    points: [{ current: 1e-3, voltage: 1.66 }, { current: 5e-3, voltage: 1.77 }, { current: 0.02, voltage: 1.92 }],
    source: `${TABLE_20MA} (red AlInGaP 1.8\u20132.1 V); ${LOW_POINTS}`
  },
  orange: {
    colour: "orange",
    chemistry: "AlInGaP",
    wavelength: 605e-9,
    points: [{ current: 1e-3, voltage: 1.78 }, { current: 5e-3, voltage: 1.9 }, { current: 0.02, voltage: 2.05 }],
    source: `${TABLE_20MA} (orange 2.0\u20132.1 V); ${LOW_POINTS}`
  },
  yellow: {
    colour: "yellow",
    chemistry: "AlInGaP",
    wavelength: 59e-8,
    points: [{ current: 1e-3, voltage: 1.85 }, { current: 5e-3, voltage: 1.97 }, { current: 0.02, voltage: 2.15 }],
    source: `${TABLE_20MA} (yellow 2.1\u20132.2 V); ${LOW_POINTS}`
  },
  "green-gap": {
    colour: "green-gap",
    chemistry: "GaP (yellow-green, the older 'about 2 V' indicator green)",
    wavelength: 57e-8,
    points: [{ current: 1e-3, voltage: 1.9 }, { current: 5e-3, voltage: 1.99 }, { current: 0.02, voltage: 2.15 }],
    source: `${TABLE_20MA} (yellow-green GaP about 2.1 V, dim); ${LOW_POINTS}`
  },
  "green-ingan": {
    colour: "green-ingan",
    chemistry: "InGaN (true green)",
    wavelength: 525e-9,
    points: [{ current: 1e-3, voltage: 2.65 }, { current: 5e-3, voltage: 2.85 }, { current: 0.02, voltage: 3.2 }],
    source: `${TABLE_20MA} (green InGaN 3.0\u20133.5 V); ${LOW_POINTS}`
  },
  blue: {
    colour: "blue",
    chemistry: "InGaN",
    wavelength: 47e-8,
    points: [{ current: 1e-3, voltage: 2.7 }, { current: 5e-3, voltage: 2.88 }, { current: 0.02, voltage: 3.15 }],
    source: `${TABLE_20MA} (blue 3.0\u20133.3 V); ${LOW_POINTS}`
  },
  white: {
    colour: "white",
    chemistry: "InGaN blue + phosphor",
    wavelength: 455e-9,
    points: [{ current: 1e-3, voltage: 2.68 }, { current: 5e-3, voltage: 2.86 }, { current: 0.02, voltage: 3.15 }],
    source: `${TABLE_20MA} (white 3.0\u20133.3 V); ${LOW_POINTS}`
  }
};
var DIODE_PRESET_DATA = {
  silicon: {
    points: [{ current: 1e-3, voltage: 0.62 }, { current: 0.01, voltage: 0.74 }, { current: 0.1, voltage: 0.95 }],
    source: "silicon small-signal diode, typical curve from memory (unverified)"
  },
  schottky: {
    points: [{ current: 1e-3, voltage: 0.28 }, { current: 0.01, voltage: 0.36 }, { current: 0.1, voltage: 0.6 }],
    source: "small-signal Schottky diode, typical curve from memory (unverified)"
  }
};
var ledCache = /* @__PURE__ */ new Map();
function ledPreset(colour, options = {}) {
  const data = LED_PRESET_DATA[colour];
  if (!data) {
    const hint = colour === "green" ? "ambiguous: use 'green-gap' (GaP yellow-green, \u2248 2 V, the trade's 'about 2 V' green) or 'green-ingan' (InGaN true green, \u2248 3.2 V)" : `must be one of ${Object.keys(LED_PRESET_DATA).join(", ")}`;
    throw new TanklightInputError([{ path: "colour", message: hint, value: colour }], "ledPreset");
  }
  const key = `${colour}|${options.temperature ?? ""}|${options.label ?? ""}`;
  const hit = ledCache.get(key);
  if (hit) return hit;
  const made = led({
    points: data.points,
    colour,
    label: options.label ?? `${colour} LED (preset)`,
    source: data.source,
    ...options.temperature !== void 0 ? { temperature: options.temperature } : {}
  });
  ledCache.set(key, made);
  return made;
}
function diodePreset(kind, options = {}) {
  const data = DIODE_PRESET_DATA[kind];
  if (!data) {
    throw new TanklightInputError([{ path: "kind", message: "must be 'schottky' or 'silicon'", value: kind }], "diodePreset");
  }
  return diode({
    points: data.points,
    label: options.label ?? `${kind} diode (preset)`,
    source: data.source,
    ...options.temperature !== void 0 ? { temperature: options.temperature } : {}
  });
}

// lib/circuit/loads/tokenCircuits.ts
function requireJunction(x, kind, field, where) {
  const k = x?.kind;
  if (k !== kind) {
    throw new TanklightInputError(
      [{ path: field, message: `must be ${kind === "led" ? "an LED from led()/ledPreset()" : "a diode from diode()/diodePreset()"}`, value: k ?? x }],
      where
    );
  }
}
function requireNonNegative(x, field, unit, where) {
  if (!(typeof x === "number" && Number.isFinite(x) && x >= 0)) {
    throw new TanklightInputError([{ path: field, message: `must be a finite number \u2265 0 ${unit}`, value: x }], where);
  }
}
function requirePos(x, field, unit, where) {
  if (!(typeof x === "number" && Number.isFinite(x) && x > 0)) {
    throw new TanklightInputError([{ path: field, message: `must be a finite number > 0 ${unit}`, value: x }], where);
  }
}
function singleLed(l) {
  requireJunction(l, "led", "led", "singleLed");
  return { kind: "led", led: l };
}
function antiParallelPair(a, b) {
  requireJunction(a, "led", "a", "antiParallelPair");
  requireJunction(b, "led", "b", "antiParallelPair");
  return { kind: "antiParallel", a, b };
}
function sameDirectionPair(a, b) {
  requireJunction(a, "led", "a", "sameDirectionPair");
  requireJunction(b, "led", "b", "sameDirectionPair");
  return { kind: "parallelSameDirection", a, b };
}
function bridgeRectifier(d, l, seriesResistance = 0) {
  requireJunction(d, "diode", "diode", "bridgeRectifier");
  requireJunction(l, "led", "led", "bridgeRectifier");
  requireNonNegative(seriesResistance, "seriesResistance", "\u03A9", "bridgeRectifier");
  return { kind: "bridge", diode: d, led: l, seriesResistance };
}
function halfWaveReservoir(d, l, capacitance2, options = {}) {
  requireJunction(d, "diode", "diode", "halfWaveReservoir");
  requireJunction(l, "led", "led", "halfWaveReservoir");
  requirePos(capacitance2, "capacitance", "F", "halfWaveReservoir");
  if (options.seriesResistance !== void 0) requireNonNegative(options.seriesResistance, "seriesResistance", "\u03A9", "halfWaveReservoir");
  if (options.frequency !== void 0) requirePos(options.frequency, "frequency", "Hz", "halfWaveReservoir");
  return {
    kind: "halfWaveReservoir",
    diode: d,
    led: l,
    capacitance: capacitance2,
    ...options.seriesResistance !== void 0 ? { seriesResistance: options.seriesResistance } : {},
    ...options.frequency !== void 0 ? { frequency: options.frequency } : {}
  };
}
function resistorLoad(resistance2) {
  requirePos(resistance2, "resistance", "\u03A9", "resistorLoad");
  return { kind: "resistor", resistance: resistance2 };
}

// lib/circuit/loads/tokenResponse.ts
function tokenResponse(input) {
  const where = "tokenResponse";
  if (!(Number.isFinite(input.emf) && input.emf >= 0)) {
    throw new TanklightInputError([{ path: "emf", message: "must be a finite number \u2265 0 V (peak)", value: input.emf }], where);
  }
  requirePositive(input.frequency, "frequency", "Hz", where);
  requirePositive(input.inductance, "inductance", "H", where);
  requirePositive(input.coilResistance, "coilResistance", "\u03A9", where);
  requirePositive(input.capacitance, "capacitance", "F", where);
  const esr = input.capacitorEsr ?? 0;
  if (!(Number.isFinite(esr) && esr >= 0)) {
    throw new TanklightInputError([{ path: "capacitorEsr", message: "must be a finite number \u2265 0 \u03A9", value: esr }], where);
  }
  const w = 2 * Math.PI * input.frequency;
  const zr = input.coilResistance;
  const zi = w * input.inductance;
  const xc = -1 / (w * input.capacitance);
  const d = esr * esr + xc * xc;
  const ycr = esr / d;
  const yci = -xc / d;
  const factor = (g3) => {
    const yr = ycr + g3;
    const re = 1 + zr * yr - zi * yci;
    const im = zr * yci + zi * yr;
    return Math.hypot(re, im);
  };
  const e = input.emf;
  const load = input.load;
  if (e === 0) {
    return { amplitude: 0, loadConductance: fundamentalConductance(load, 0), loadPower: 0, coilCurrent: 0, leds: averageLoadCurrent(load, 0), warnings: [] };
  }
  const h = (A2) => A2 * factor(fundamentalConductance(load, A2)) - e;
  let lo = 0;
  let hi = e / factor(fundamentalConductance(load, 0));
  for (let k = 0; k < 200 && h(hi) <= 0; k++) {
    lo = hi;
    hi *= 2;
  }
  if (!(h(hi) > 0)) {
    throw new TanklightInputError([{ path: "emf", message: "no operating point found (the load's describing function does not bound the amplitude)", value: e }], where);
  }
  for (let k = 0; k < 200 && hi - lo > 1e-14 * hi; k++) {
    const m = 0.5 * (lo + hi);
    if (h(m) > 0) hi = m;
    else lo = m;
  }
  const A = 0.5 * (lo + hi);
  const g2 = fundamentalConductance(load, A);
  const coilCurrent = A * Math.hypot(ycr + g2, yci);
  const warnings = [];
  if (A > 50) {
    warnings.push(
      `tank amplitude ${A.toPrecision(3)} V peak: high voltage on the token's capacitor; check its rating (capacitorStress) and follow local codes, regulations and licensed practice`
    );
  }
  return { amplitude: A, loadConductance: g2, loadPower: 0.5 * A * A * g2, coilCurrent, leds: averageLoadCurrent(load, A), warnings };
}

// lib/circuit/drive.ts
function sineDrive(amplitude, outputResistance = 0) {
  nonNegative(amplitude, "amplitude", "V", "sineDrive");
  nonNegative(outputResistance, "outputResistance", "\u03A9", "sineDrive");
  return {
    kind: "voltage",
    amplitude,
    resistance: outputResistance,
    reactance: 0,
    label: `sine source ${fmt(amplitude)} V peak, ${fmt(outputResistance)} \u03A9`,
    assumptions: ["sinusoidal source: the equivalent is exact"]
  };
}
function halfBridgeDrive(supply, onResistance = 0) {
  requirePositive(supply, "supply", "V", "halfBridgeDrive");
  nonNegative(onResistance, "onResistance", "\u03A9", "halfBridgeDrive");
  return {
    kind: "voltage",
    amplitude: 2 * supply / Math.PI,
    resistance: onResistance,
    reactance: 0,
    label: `half bridge from ${fmt(supply)} V (fundamental 2V/\u03C0), R_on ${fmt(onResistance)} \u03A9`,
    assumptions: [
      "50 % duty square wave between 0 and the supply; DC part blocked by the series capacitor",
      "only the fundamental drives the tank (harmonics see a high-Q tank's high impedance)",
      "switching losses and dead time not modelled"
    ]
  };
}
function fullBridgeDrive(supply, onResistance = 0) {
  requirePositive(supply, "supply", "V", "fullBridgeDrive");
  nonNegative(onResistance, "onResistance", "\u03A9", "fullBridgeDrive");
  return {
    kind: "voltage",
    amplitude: 4 * supply / Math.PI,
    resistance: 2 * onResistance,
    reactance: 0,
    label: `full bridge from ${fmt(supply)} V (fundamental 4V/\u03C0), R_on ${fmt(onResistance)} \u03A9 per switch`,
    assumptions: [
      "50 % duty square wave of \xB1supply",
      "only the fundamental drives the tank (harmonics see a high-Q tank's high impedance)",
      "switching losses and dead time not modelled"
    ]
  };
}
function currentDrive(amplitude) {
  nonNegative(amplitude, "amplitude", "A", "currentDrive");
  return {
    kind: "current",
    amplitude,
    label: `regulated coil current ${fmt(amplitude)} A peak`,
    assumptions: ["the regulator holds the coil current's fundamental amplitude; its own loss is not modelled"]
  };
}
var CLASS_E = (() => {
  const pi = Math.PI;
  const thetaPeak = 2 * pi - 2 * Math.atan(pi / 2);
  const peakVoltage = pi * (thetaPeak - 3 * pi / 2 - pi / 2 * Math.cos(thetaPeak) - Math.sin(thetaPeak));
  return {
    resistanceFactor: 8 / (pi * pi + 4),
    shuntFactor: 8 / (pi * (pi * pi + 4)),
    excessReactanceFactor: pi * (pi * pi - 4) / 16,
    peakSwitchVoltageFactor: peakVoltage,
    peakSwitchCurrentFactor: 1 + Math.sqrt(1 + pi * pi / 4),
    fundamentalFactor: 4 / Math.sqrt(pi * pi + 4),
    minimumLoadedQ: 1.7879
  };
})();
function classEDesign(spec) {
  const where = "classEDesign";
  const v = requirePositive(spec.supply, "supply", "V", where);
  const f = requirePositive(spec.frequency, "frequency", "Hz", where);
  if (spec.power === void 0 === (spec.resistance === void 0)) {
    throw new TanklightInputError(
      [{ path: "power", message: "give exactly one of power (W) and resistance (\u03A9)", value: spec.power }],
      where
    );
  }
  const w = 2 * Math.PI * f;
  const r = spec.resistance !== void 0 ? requirePositive(spec.resistance, "resistance", "\u03A9", where) : CLASS_E.resistanceFactor * v * v / requirePositive(spec.power, "power", "W", where);
  const p = CLASS_E.resistanceFactor * v * v / r;
  const x = CLASS_E.excessReactanceFactor * r;
  const idc = p / v;
  const warnings = [];
  let loadedQ;
  let seriesCapacitance;
  if (spec.inductance !== void 0) {
    const l = requirePositive(spec.inductance, "inductance", "H", where);
    loadedQ = w * l / r;
    if (loadedQ < CLASS_E.minimumLoadedQ) {
      warnings.push(
        `classEDesign: loaded Q ${loadedQ.toPrecision(3)} is below the class-E minimum ${CLASS_E.minimumLoadedQ} (Raab 1977); the optimum cannot be reached`
      );
    }
    const xc = w * l - x;
    if (xc > 0) seriesCapacitance = 1 / (w * xc);
    else warnings.push("classEDesign: the coil's reactance is smaller than the excess reactance; no series capacitor realises it");
    if (loadedQ < 5) {
      warnings.push(
        `classEDesign: loaded Q ${loadedQ.toPrecision(3)} is low; the design relations assume a high loaded Q (sinusoidal network current), expect deviations`
      );
    }
  }
  return {
    supply: v,
    frequency: f,
    power: p,
    resistance: r,
    shuntCapacitance: CLASS_E.shuntFactor / (w * r),
    excessReactance: x,
    excessInductance: x / w,
    ...loadedQ !== void 0 ? { loadedQ } : {},
    ...seriesCapacitance !== void 0 ? { seriesCapacitance } : {},
    dcCurrent: idc,
    peakSwitchVoltage: CLASS_E.peakSwitchVoltageFactor * v,
    peakSwitchCurrent: CLASS_E.peakSwitchCurrentFactor * idc,
    loadVoltage: CLASS_E.fundamentalFactor * v,
    loadCurrent: CLASS_E.fundamentalFactor * v / r,
    warnings
  };
}
function classEDrive(design, onResistance = 0) {
  nonNegative(onResistance, "onResistance", "\u03A9", "classEDrive");
  const k = CLASS_E.fundamentalFactor * Math.hypot(1, CLASS_E.excessReactanceFactor);
  return {
    kind: "voltage",
    amplitude: k * design.supply,
    resistance: CLASS_E_ON_RESISTANCE_FACTOR * onResistance,
    reactance: 0,
    label: `class-E single switch from ${fmt(design.supply)} V at ${fmt(design.frequency)} Hz, sized for ${fmt(design.power)} W into ${fmt(design.resistance)} \u03A9`,
    assumptions: [
      "optimum class-E operation (zero-voltage, zero-slope switching) at 50 % duty",
      "loaded Q high enough for a sinusoidal network current",
      `the transmitter's series network keeps the excess reactance ${fmt(design.excessReactance)} \u03A9`,
      "off-nominal loads move the real fundamental away from this equivalent (see docs/methods/link.md)"
    ]
  };
}
var CLASS_E_ON_RESISTANCE_FACTOR = 1.365;
function parallelTankDrive(supply, onResistance = 0) {
  requirePositive(supply, "supply", "V", "parallelTankDrive");
  nonNegative(onResistance, "onResistance", "\u03A9", "parallelTankDrive");
  return {
    kind: "voltage",
    amplitude: Math.PI * supply / 2,
    resistance: onResistance / 2,
    reactance: 0,
    label: `single switch under a parallel tank from ${fmt(supply)} V (tank fundamental \u03C0V/2)`,
    assumptions: [
      "50 % duty, zero-voltage switching, high-Q parallel tank (half-sine swing of peak \u03C0\xB7supply)",
      "use with a parallel-compensated transmitter: the source sits across the tank",
      "switch conduction loss estimated as R_on/2 in series"
    ]
  };
}
function nonNegative(x, field, unit, where) {
  requireFinite(x, field, unit, where);
  if (x < 0) {
    throw new TanklightInputError([{ path: field, message: `must be \u2265 0 ${unit}`, value: x, expected: `\u2265 0 ${unit}` }], where);
  }
}
function fmt(x) {
  return Number(x.toPrecision(4)).toString();
}

// lib/circuit/link/schema.ts
var coilSchema = external_exports.custom(
  (c) => typeof c === "object" && c !== null && Array.isArray(c.filaments) && c.filaments.length > 0 && typeof c.conductor === "object",
  { message: "expected a Coil from a builder (roundCoil, flatSpiral, \u2026)" }
);
var PoseInput = external_exports.strictObject({
  position: vec3(),
  axis: unitVector().optional(),
  spin: angle().optional()
});
var CapacitorInput = external_exports.strictObject({
  capacitance: capacitance(),
  /** equivalent series resistance, Ω (give this or dissipationFactor; default 0) */
  esr: resistance().optional(),
  /** tan δ at the drive frequency, ESR = tan δ/(ωC) */
  dissipationFactor: quantity("dimensionless", { nonNegative: true, max: 1 }).optional(),
  /** voltage rating, V (compared with the peak voltage) */
  rating: voltage({ positive: true }).optional()
});
var DriveInput = external_exports.union([
  external_exports.strictObject({ kind: external_exports.literal("sine"), amplitude: voltage({ nonNegative: true }), outputResistance: resistance().optional() }),
  external_exports.strictObject({ kind: external_exports.literal("halfBridge"), supply: voltage({ positive: true }), onResistance: resistance().optional() }),
  external_exports.strictObject({ kind: external_exports.literal("fullBridge"), supply: voltage({ positive: true }), onResistance: resistance().optional() }),
  external_exports.strictObject({ kind: external_exports.literal("currentRegulated"), amplitude: current({ nonNegative: true }) }),
  external_exports.strictObject({ kind: external_exports.literal("parallelTank"), supply: voltage({ positive: true }), onResistance: resistance().optional() }),
  external_exports.strictObject({ kind: external_exports.literal("classE"), supply: voltage({ positive: true }), power: power({ positive: true }), onResistance: resistance().optional() }),
  external_exports.custom(
    (d) => typeof d === "object" && d !== null && (d.kind === "voltage" || d.kind === "current") && typeof d.amplitude === "number",
    { message: "expected a drive spec { kind: 'sine' | 'halfBridge' | 'fullBridge' | 'currentRegulated' | 'parallelTank' | 'classE', \u2026 } or a drive equivalent from sineDrive(), classEDrive(), \u2026" }
  )
]);
var loadSchema = external_exports.custom(
  (l) => typeof l === "object" && l !== null && (typeof l.kind === "string" || typeof l.conductance === "function"),
  { message: "expected a TokenLoad ({ kind: 'led', led }, \u2026) or a load model with conductance(amplitude)" }
);
var TransmitterInput = external_exports.strictObject({
  label: external_exports.string().optional(),
  coil: coilSchema,
  pose: PoseInput.optional(),
  compensation: external_exports.enum(["series", "parallel", "none"]),
  capacitor: CapacitorInput.optional(),
  drive: DriveInput,
  /** override of the coil's AC resistance, Ω (default: coilResistance at the frequency) */
  resistance: resistance().optional()
});
var ReceiverInput = external_exports.strictObject({
  label: external_exports.string().optional(),
  coil: coilSchema,
  pose: PoseInput,
  topology: external_exports.enum(["series", "parallel"]),
  capacitor: CapacitorInput,
  load: loadSchema,
  resistance: resistance().optional()
});
var LinkSystemInput = external_exports.strictObject({
  frequency: frequency(),
  transmitter: TransmitterInput,
  receivers: external_exports.array(ReceiverInput),
  /** conductor temperature for the coil resistances, K (default 20 °C) */
  temperature: temperature().optional()
});

// lib/circuit/link/complexLu.ts
function complexLuFactor(re, im, n, piv) {
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = -1;
    for (let i = k; i < n; i++) {
      const m = Math.abs(re[i * n + k]) + Math.abs(im[i * n + k]);
      if (m > best) {
        best = m;
        p = i;
      }
    }
    piv[k] = p;
    if (!(best > 0) || !Number.isFinite(best)) return k;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const a = k * n + j;
        const b = p * n + j;
        const tr = re[a];
        re[a] = re[b];
        re[b] = tr;
        const ti = im[a];
        im[a] = im[b];
        im[b] = ti;
      }
    }
    const dr = re[k * n + k];
    const di = im[k * n + k];
    const den = dr * dr + di * di;
    const ir = dr / den;
    const ii = -di / den;
    for (let i = k + 1; i < n; i++) {
      const ar = re[i * n + k];
      const ai = im[i * n + k];
      const lr = ar * ir - ai * ii;
      const li = ar * ii + ai * ir;
      re[i * n + k] = lr;
      im[i * n + k] = li;
      if (lr === 0 && li === 0) continue;
      for (let j = k + 1; j < n; j++) {
        const ur = re[k * n + j];
        const ui = im[k * n + j];
        re[i * n + j] = re[i * n + j] - (lr * ur - li * ui);
        im[i * n + j] = im[i * n + j] - (lr * ui + li * ur);
      }
    }
  }
  return -1;
}
function complexLuSolve(re, im, n, piv, br, bi) {
  for (let k = 0; k < n; k++) {
    const p = piv[k];
    if (p !== k) {
      const tr = br[k];
      br[k] = br[p];
      br[p] = tr;
      const ti = bi[k];
      bi[k] = bi[p];
      bi[p] = ti;
    }
  }
  for (let i = 1; i < n; i++) {
    let sr = br[i];
    let si = bi[i];
    for (let j = 0; j < i; j++) {
      const lr = re[i * n + j];
      const li = im[i * n + j];
      sr -= lr * br[j] - li * bi[j];
      si -= lr * bi[j] + li * br[j];
    }
    br[i] = sr;
    bi[i] = si;
  }
  for (let i = n - 1; i >= 0; i--) {
    let sr = br[i];
    let si = bi[i];
    for (let j = i + 1; j < n; j++) {
      const ur = re[i * n + j];
      const ui = im[i * n + j];
      sr -= ur * br[j] - ui * bi[j];
      si -= ur * bi[j] + ui * br[j];
    }
    const dr = re[i * n + i];
    const di = im[i * n + i];
    const den = dr * dr + di * di;
    br[i] = (sr * dr + si * di) / den;
    bi[i] = (si * dr - sr * di) / den;
  }
}

// lib/circuit/link/network.ts
var DEFAULT_LIT_THRESHOLD = 5e-4;
var DEFAULT_BRIGHTNESS_REFERENCE = 0.02;
var DEFAULT_CAUTION_VOLTAGE = 42.4;

// lib/circuit/link/solveNetwork.ts
var OPEN_LOAD_CONDUCTANCE = 1e-15;
var AMPLITUDE_FLOOR = 1e-12;
var LinkConvergenceError = class extends Error {
  iterations;
  residuals;
  constructor(message, iterations, residuals) {
    super(message);
    this.name = "LinkConvergenceError";
    this.iterations = iterations;
    this.residuals = residuals;
  }
};
var LITTHRESHOLD_SOURCE = "trade practice (no source): indicator LEDs are visible indoors from about 0.1\u20131 mA average current";
function solveLinkNetwork(network, options = {}) {
  const where = "solveLinkNetwork";
  const f = requirePositive(network.frequency, "frequency", "Hz", where);
  const w = 2 * Math.PI * f;
  const rx = network.receivers;
  const n = rx.length + 1;
  const tx = network.transmitter;
  checkNetwork(network, n, where);
  const tol = options.tolerance ?? 1e-10;
  const maxIter = options.maxIterations ?? 80;
  const warnings = [];
  const baseRe = new Float64Array(n * n);
  const baseIm = new Float64Array(n * n);
  const L = network.inductance;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) if (i !== j) baseIm[i * n + j] = w * L[i][j];
  }
  let vthRe = 0;
  let vthIm = 0;
  const drive = tx.drive;
  const c0 = tx.compensation === "none" ? 0 : tx.capacitance;
  const esr0 = tx.capacitorEsr ?? 0;
  const zc0Re = esr0;
  const zc0Im = c0 > 0 ? -1 / (w * c0) : 0;
  let zsRe = 0;
  let zsIm = 0;
  if (drive.kind === "current") {
    for (let j = 0; j < n; j++) baseIm[j] = 0;
    baseRe[0] = 1;
    vthRe = drive.amplitude;
  } else {
    zsRe = drive.resistance;
    zsIm = drive.reactance;
    let thRe = zsRe;
    let thIm = zsIm;
    vthRe = drive.amplitude;
    if (tx.compensation === "series") {
      thRe += zc0Re;
      thIm += zc0Im;
    } else if (tx.compensation === "parallel") {
      const dRe = zsRe + zc0Re;
      const dIm = zsIm + zc0Im;
      const den = dRe * dRe + dIm * dIm;
      const qRe = (zc0Re * dRe + zc0Im * dIm) / den;
      const qIm = (zc0Im * dRe - zc0Re * dIm) / den;
      vthRe = drive.amplitude * qRe;
      vthIm = drive.amplitude * qIm;
      thRe = zsRe * qRe - zsIm * qIm;
      thIm = zsRe * qIm + zsIm * qRe;
    }
    baseRe[0] = thRe + tx.resistance;
    baseIm[0] = thIm + w * L[0][0];
  }
  const m = rx.length;
  const ycRe = new Float64Array(m);
  const ycIm = new Float64Array(m);
  const zcRe = new Float64Array(m);
  const zcIm = new Float64Array(m);
  const series = new Uint8Array(m);
  for (let k = 0; k < m; k++) {
    const r = rx[k];
    const esr = r.capacitorEsr ?? 0;
    zcRe[k] = esr;
    zcIm[k] = -1 / (w * r.capacitance);
    const den = esr * esr + zcIm[k] * zcIm[k];
    ycRe[k] = esr / den;
    ycIm[k] = -zcIm[k] / den;
    series[k] = r.topology === "series" ? 1 : 0;
    baseRe[(k + 1) * n + k + 1] = r.resistance;
    baseIm[(k + 1) * n + k + 1] = w * L[k + 1][k + 1];
  }
  const nl = [];
  for (let k = 0; k < m; k++) if (!rx[k].load.linear) nl.push(k);
  const q = nl.length;
  const zRe = new Float64Array(n * n);
  const zIm = new Float64Array(n * n);
  const piv = new Int32Array(n);
  const iRe = new Float64Array(n);
  const iIm = new Float64Array(n);
  const yG = new Float64Array(m);
  const yB = new Float64Array(m);
  const x = new Float64Array(m);
  const vRe = new Float64Array(m);
  const vIm = new Float64Array(m);
  const zkkRe = new Float64Array(m);
  const zkkIm = new Float64Array(m);
  const colRe = new Float64Array(q * n);
  const colIm = new Float64Array(q * n);
  const setAdmittance = (k, amplitude) => {
    const load = rx[k].load;
    let g2 = load.conductance(amplitude);
    const b = load.susceptance ? load.susceptance(amplitude) : 0;
    if (!Number.isFinite(g2) || !Number.isFinite(b) || g2 < 0) {
      throw new TanklightInputError(
        [{ path: `receivers[${k}].load`, message: `describing function must give a finite conductance \u2265 0 S at ${amplitude} V`, value: g2 }],
        where
      );
    }
    if (Math.hypot(g2, b) < OPEN_LOAD_CONDUCTANCE) g2 = OPEN_LOAD_CONDUCTANCE;
    yG[k] = g2;
    yB[k] = b;
  };
  let factorCount = 0;
  const evaluate = () => {
    zRe.set(baseRe);
    zIm.set(baseIm);
    for (let k = 0; k < m; k++) {
      const d = (k + 1) * n + k + 1;
      const [eRe, eIm] = extImpedance(k);
      zkkRe[k] = baseRe[d] + eRe;
      zkkIm[k] = baseIm[d] + eIm;
      zRe[d] = zkkRe[k];
      zIm[d] = zkkIm[k];
    }
    const bad = complexLuFactor(zRe, zIm, n, piv);
    factorCount++;
    if (bad >= 0) {
      throw new TanklightInputError(
        [{ path: bad === 0 ? "transmitter" : `receivers[${bad - 1}]`, message: "the coupled-circuit matrix is singular (a lossless loop exactly at resonance with no load?)", value: bad }],
        where
      );
    }
    iRe.fill(0);
    iIm.fill(0);
    iRe[0] = vthRe;
    iIm[0] = vthIm;
    complexLuSolve(zRe, zIm, n, piv, iRe, iIm);
    for (let k = 0; k < m; k++) {
      const [zvRe, zvIm] = loadVoltageImpedance(k);
      const ir = iRe[k + 1];
      const ii = iIm[k + 1];
      vRe[k] = ir * zvRe - ii * zvIm;
      vIm[k] = ir * zvIm + ii * zvRe;
    }
  };
  const extImpedance = (k) => {
    const g2 = yG[k];
    const b = yB[k];
    if (series[k]) {
      const den2 = g2 * g2 + b * b;
      return [zcRe[k] + g2 / den2, zcIm[k] - b / den2];
    }
    const tRe = ycRe[k] + g2;
    const tIm = ycIm[k] + b;
    const den = tRe * tRe + tIm * tIm;
    return [tRe / den, -tIm / den];
  };
  const loadVoltageImpedance = (k) => {
    const g2 = yG[k];
    const b = yB[k];
    if (series[k]) {
      const den2 = g2 * g2 + b * b;
      return [g2 / den2, -b / den2];
    }
    const tRe = ycRe[k] + g2;
    const tIm = ycIm[k] + b;
    const den = tRe * tRe + tIm * tIm;
    return [tRe / den, -tIm / den];
  };
  const computeColumns = () => {
    for (let c = 0; c < q; c++) {
      const k = nl[c];
      const oRe = colRe.subarray(c * n, (c + 1) * n);
      const oIm = colIm.subarray(c * n, (c + 1) * n);
      oRe.fill(0);
      oIm.fill(0);
      oRe[k + 1] = 1;
      complexLuSolve(zRe, zIm, n, piv, oRe, oIm);
    }
  };
  let scalarIterations = 0;
  const next = new Float64Array(q);
  const nextG = new Float64Array(q);
  const nextB = new Float64Array(q);
  const localStep = () => {
    for (let c = 0; c < q; c++) {
      const k = nl[c];
      const wRe = colRe[c * n + k + 1];
      const wIm = colIm[c * n + k + 1];
      const wd = wRe * wRe + wIm * wIm;
      const invRe = wRe / wd;
      const invIm = -wIm / wd;
      const ir = iRe[k + 1];
      const ii = iIm[k + 1];
      const eRe = ir * invRe - ii * invIm;
      const eIm = ir * invIm + ii * invRe;
      const d = (k + 1) * n + k + 1;
      const zlRe = invRe - zkkRe[k] + baseRe[d];
      const zlIm = invIm - zkkIm[k] + baseIm[d];
      let aRe = 0;
      let aIm = 0;
      let bRe = zlRe;
      let bIm = zlIm;
      if (series[k]) {
        bRe += zcRe[k];
        bIm += zcIm[k];
      } else {
        aRe = zlRe * ycRe[k] - zlIm * ycIm[k];
        aIm = zlRe * ycIm[k] + zlIm * ycRe[k];
      }
      const res = solveLocal(rx[k], k, Math.hypot(eRe, eIm), 1 + aRe, aIm, bRe, bIm);
      scalarIterations += res.iterations;
      next[c] = res.amplitude;
      nextG[c] = res.g;
      nextB[c] = res.b;
    }
    for (let c = 0; c < q; c++) {
      const k = nl[c];
      x[k] = next[c];
      yG[k] = nextG[c];
      yB[k] = nextB[c];
    }
  };
  const solveLocal = (r, k, eAbs, s0Re, s0Im, bRe, bIm) => {
    if (!(eAbs > 0)) return { amplitude: 0, iterations: 0, g: OPEN_LOAD_CONDUCTANCE, b: 0 };
    const load = r.load;
    const lnE = Math.log(eAbs);
    const sAbs = (v2, out) => {
      let g2 = load.conductance(v2);
      const b = load.susceptance ? load.susceptance(v2) : 0;
      if (!Number.isFinite(g2) || !Number.isFinite(b) || g2 < 0) {
        throw new TanklightInputError(
          [{ path: `receivers[${k}].load`, message: `describing function must give a finite conductance \u2265 0 S at ${v2} V`, value: g2 }],
          where
        );
      }
      if (Math.hypot(g2, b) < OPEN_LOAD_CONDUCTANCE) g2 = OPEN_LOAD_CONDUCTANCE;
      out[0] = s0Re + bRe * g2 - bIm * b;
      out[1] = s0Im + bRe * b + bIm * g2;
      out[2] = g2;
      out[3] = b;
      return Math.hypot(out[0], out[1]);
    };
    const tmp = localTmp;
    const tmp2 = localTmp2;
    const phi = (v2) => Math.log(v2) + Math.log(sAbs(v2, tmp)) - lnE;
    let hi = eAbs / sAbs(0, tmp);
    let its = 0;
    let fhi = phi(hi);
    while (!(fhi >= 0)) {
      hi *= 2;
      fhi = phi(hi);
      if (++its > 200) throw new LinkConvergenceError(`solveLinkNetwork: receiver ${labelOf(r, k)}: no upper bound for the tank amplitude found`, its, []);
    }
    let lo = 0;
    let v = hi;
    let fv = fhi;
    for (let it = 0; it < 200; it++) {
      its++;
      if (fv === 0) break;
      const sRe = tmp[0];
      const sIm = tmp[1];
      const s2 = sRe * sRe + sIm * sIm;
      const h = 1e-7 * v;
      sAbs(v + h, tmp2);
      const dgRe = (tmp2[2] - tmp[2]) / h;
      const dgIm = (tmp2[3] - tmp[3]) / h;
      const dsRe = bRe * dgRe - bIm * dgIm;
      const dsIm = bRe * dgIm + bIm * dgRe;
      const dphi = 1 / v + (sRe * dsRe + sIm * dsIm) / s2;
      if (fv < 0) lo = v;
      else hi = v;
      let vn = v - fv / dphi;
      if (!(dphi > 0) || !(vn > lo && vn < hi)) vn = lo > 0 ? Math.sqrt(lo * hi) : hi / 8;
      const step = Math.abs(vn - v);
      v = vn;
      fv = phi(v);
      if (step <= 1e-12 * v || Math.abs(fv) <= 1e-14 || hi - lo <= 1e-14 * hi) break;
    }
    return { amplitude: v, iterations: its, g: tmp[2], b: tmp[3] };
  };
  const localTmp = new Float64Array(4);
  const localTmp2 = new Float64Array(4);
  for (let k = 0; k < m; k++) if (rx[k].load.linear) setAdmittance(k, 1);
  if (q === 0) evaluate();
  let iterations = 0;
  let converged = q === 0;
  const resid = new Float64Array(q);
  const residualMax = () => {
    let worst = 0;
    for (let c = 0; c < q; c++) {
      const k = nl[c];
      const va = Math.hypot(vRe[k], vIm[k]);
      const xa = x[k];
      const r = Math.abs(va - xa) / (tol * Math.max(va, xa) + AMPLITUDE_FLOOR);
      resid[c] = Math.abs(va - xa);
      worst = Math.max(worst, r);
    }
    return worst;
  };
  const probe = () => {
    for (const k of nl) {
      yG[k] = 1 / (w * L[k + 1][k + 1]);
      yB[k] = 0;
    }
  };
  if (q > 0) {
    probe();
    evaluate();
    computeColumns();
    localStep();
    evaluate();
    iterations = 1;
    const jac = new Float64Array(q * q);
    const rhs = new Float64Array(q);
    const sv = new Float64Array(q);
    const ds = new Float64Array(q);
    const dy = new Float64Array(q * 2);
    const ftrial = new Float64Array(q);
    while (iterations < maxIter) {
      if (residualMax() <= 1) {
        converged = true;
        break;
      }
      iterations++;
      computeColumns();
      if (q === 1) {
        probe();
        evaluate();
        computeColumns();
        localStep();
        evaluate();
        continue;
      }
      const f0 = logResidual(nl, x, vRe, vIm, rhs);
      for (let c = 0; c < q; c++) {
        const k = nl[c];
        const xa = Math.max(x[k], AMPLITUDE_FLOOR);
        sv[c] = Math.log(xa);
        const h = 1e-7 * xa;
        const load = rx[k].load;
        const g1 = load.conductance(xa + h);
        const b1 = load.susceptance ? load.susceptance(xa + h) : 0;
        const g1f = Math.hypot(g1, b1) < OPEN_LOAD_CONDUCTANCE ? OPEN_LOAD_CONDUCTANCE : g1;
        dy[2 * c] = (g1f - yG[k]) / h;
        dy[2 * c + 1] = (b1 - yB[k]) / h;
      }
      for (let c = 0; c < q; c++) {
        const k = nl[c];
        const va2 = Math.max(vRe[k] * vRe[k] + vIm[k] * vIm[k], AMPLITUDE_FLOOR * AMPLITUDE_FLOOR);
        const [zvRe, zvIm] = loadVoltageImpedance(k);
        for (let e = 0; e < q; e++) {
          const j = nl[e];
          const [zjRe, zjIm] = loadVoltageImpedance(j);
          const sqRe = zjRe * zjRe - zjIm * zjIm;
          const sqIm = 2 * zjRe * zjIm;
          const dzRe = -(sqRe * dy[2 * e] - sqIm * dy[2 * e + 1]);
          const dzIm = -(sqRe * dy[2 * e + 1] + sqIm * dy[2 * e]);
          const wRe = colRe[e * n + k + 1];
          const wIm = colIm[e * n + k + 1];
          const ijRe = iRe[j + 1];
          const ijIm = iIm[j + 1];
          const pRe = dzRe * ijRe - dzIm * ijIm;
          const pIm = dzRe * ijIm + dzIm * ijRe;
          const diRe = -(wRe * pRe - wIm * pIm);
          const diIm = -(wRe * pIm + wIm * pRe);
          let dvRe = diRe * zvRe - diIm * zvIm;
          let dvIm = diRe * zvIm + diIm * zvRe;
          if (j === k) {
            const ikRe = iRe[k + 1];
            const ikIm = iIm[k + 1];
            const dzvRe = -(sqRe * dy[2 * e] - sqIm * dy[2 * e + 1]);
            const dzvIm = -(sqRe * dy[2 * e + 1] + sqIm * dy[2 * e]);
            dvRe += ikRe * dzvRe - ikIm * dzvIm;
            dvIm += ikRe * dzvIm + ikIm * dzvRe;
          }
          const xj = Math.max(x[j], AMPLITUDE_FLOOR);
          jac[c * q + e] = (vRe[k] * dvRe + vIm[k] * dvIm) * xj / va2 - (c === e ? 1 : 0);
        }
        rhs[c] = -rhs[c];
      }
      const ok = solveRealInPlace(jac, rhs, q, ds);
      let accepted = false;
      if (ok) {
        let big = 0;
        for (let c = 0; c < q; c++) big = Math.max(big, Math.abs(ds[c]));
        let alpha = big > 3 ? 3 / big : 1;
        for (let tries = 0; tries < 8 && !accepted; tries++) {
          for (let c = 0; c < q; c++) {
            const k = nl[c];
            x[k] = Math.exp(sv[c] + alpha * ds[c]);
            setAdmittance(k, x[k]);
          }
          evaluate();
          const f1 = logResidual(nl, x, vRe, vIm, ftrial);
          if (f1 <= (1 - 1e-4 * alpha) * f0 || residualMax() <= 1) accepted = true;
          else alpha /= 2;
        }
      }
      if (!accepted) {
        for (let c = 0; c < q; c++) {
          const k = nl[c];
          x[k] = Math.exp(sv[c]);
          setAdmittance(k, x[k]);
        }
        evaluate();
        computeColumns();
        localStep();
        evaluate();
      }
    }
    if (!converged && residualMax() <= 1) converged = true;
  }
  if (!converged) {
    const parts = nl.map((k, c) => `${labelOf(rx[k], k)}: |V| \u2212 x = ${resid[c].toExponential(2)} V`);
    const msg = `solveLinkNetwork: the nonlinear operating point did not converge in ${iterations} iterations (${parts.join("; ")}); try a smaller step in the sweep, check the load models, or raise maxIterations`;
    if ((options.onNonConvergence ?? "throw") === "throw") throw new LinkConvergenceError(msg, iterations, Array.from(resid));
    warnings.push(msg);
  }
  void factorCount;
  return assemble(network, options, w, n, iRe, iIm, yG, yB, vRe, vIm, zcRe, zcIm, ycRe, ycIm, series, vthRe, vthIm, zsRe, zsIm, zc0Re, zc0Im, converged, iterations, scalarIterations, warnings);
}
function logResidual(nl, x, vRe, vIm, out) {
  let worst = 0;
  for (let c = 0; c < nl.length; c++) {
    const k = nl[c];
    const va = Math.max(Math.hypot(vRe[k], vIm[k]), AMPLITUDE_FLOOR);
    const xa = Math.max(x[k], AMPLITUDE_FLOOR);
    const r = Math.log(va) - Math.log(xa);
    out[c] = r;
    worst = Math.max(worst, Math.abs(r));
  }
  return worst;
}
function solveRealInPlace(a, b, n, out) {
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]) > Math.abs(a[p * n + k])) p = i;
    if (!(Math.abs(a[p * n + k]) > 0)) return false;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t2 = a[k * n + j];
        a[k * n + j] = a[p * n + j];
        a[p * n + j] = t2;
      }
      const t = b[k];
      b[k] = b[p];
      b[p] = t;
    }
    for (let i = k + 1; i < n; i++) {
      const l = a[i * n + k] / a[k * n + k];
      for (let j = k; j < n; j++) a[i * n + j] = a[i * n + j] - l * a[k * n + j];
      b[i] = b[i] - l * b[k];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i];
    for (let j = i + 1; j < n; j++) s -= a[i * n + j] * out[j];
    out[i] = s / a[i * n + i];
  }
  for (let i = 0; i < n; i++) if (!Number.isFinite(out[i])) return false;
  return true;
}
function labelOf(r, k) {
  return r.label ?? `receiver ${k + 1}`;
}
function checkNetwork(net, n, where) {
  const L = net.inductance;
  if (!Array.isArray(L) || L.length !== n || L.some((row) => !Array.isArray(row) || row.length !== n)) {
    throw new TanklightInputError(
      [{ path: "inductance", message: `must be a ${n}\xD7${n} matrix (transmitter + ${n - 1} receivers)`, value: L }],
      where
    );
  }
  for (let i = 0; i < n; i++) {
    requirePositive(L[i][i], `inductance[${i}][${i}]`, "H", where);
    for (let j = 0; j < n; j++) {
      const v = requireFinite(L[i][j], `inductance[${i}][${j}]`, "H", where);
      const t = L[j][i];
      if (Math.abs(v - t) > 1e-9 * Math.max(Math.abs(v), Math.abs(t))) {
        throw new TanklightInputError(
          [{ path: `inductance[${i}][${j}]`, message: `must equal inductance[${j}][${i}] (reciprocity)`, value: v, expected: `${t} H` }],
          where
        );
      }
      if (i !== j && Math.abs(v) >= Math.sqrt(L[i][i] * L[j][j])) {
        throw new TanklightInputError(
          [{ path: `inductance[${i}][${j}]`, message: "|M| must be below \u221A(L\u1D62L\u2C7C) (coupling factor < 1)", value: v }],
          where
        );
      }
    }
  }
  const tx = net.transmitter;
  nonNeg(tx.resistance, "transmitter.resistance", "\u03A9", where);
  if (tx.compensation !== "none") requirePositive(tx.capacitance ?? NaN, "transmitter.capacitance", "F", where);
  if (tx.capacitorEsr !== void 0) nonNeg(tx.capacitorEsr, "transmitter.capacitorEsr", "\u03A9", where);
  const d = tx.drive;
  nonNeg(d.amplitude, "transmitter.drive.amplitude", d.kind === "current" ? "A" : "V", where);
  if (d.kind === "voltage") {
    nonNeg(d.resistance, "transmitter.drive.resistance", "\u03A9", where);
    requireFinite(d.reactance, "transmitter.drive.reactance", "\u03A9", where);
    if (tx.compensation === "parallel" && d.resistance === 0 && d.reactance === 0 && (tx.capacitorEsr ?? 0) === 0) {
    }
  }
  net.receivers.forEach((r, k) => {
    nonNeg(r.resistance, `receivers[${k}].resistance`, "\u03A9", where);
    requirePositive(r.capacitance, `receivers[${k}].capacitance`, "F", where);
    if (r.capacitorEsr !== void 0) nonNeg(r.capacitorEsr, `receivers[${k}].capacitorEsr`, "\u03A9", where);
    if (r.topology !== "series" && r.topology !== "parallel") {
      throw new TanklightInputError([{ path: `receivers[${k}].topology`, message: "must be 'series' or 'parallel'", value: r.topology }], where);
    }
    if (!r.load || typeof r.load.conductance !== "function") {
      throw new TanklightInputError([{ path: `receivers[${k}].load`, message: "must have a conductance(amplitude) describing function", value: r.load }], where);
    }
  });
}
function nonNeg(x, field, unit, where) {
  requireFinite(x, field, unit, where);
  if (x < 0) throw new TanklightInputError([{ path: field, message: `must be \u2265 0 ${unit}`, value: x }], where);
}
var SQRT1_2 = Math.SQRT1_2;
function assemble(net, options, w, n, iRe, iIm, yG, yB, vRe, vIm, zcRe, zcIm, ycRe, ycIm, series, vthRe, vthIm, zsRe, zsIm, zc0Re, zc0Im, converged, iterations, scalarIterations, warnings) {
  void vthIm;
  const L = net.inductance;
  const tx = net.transmitter;
  const threshold = options.litThreshold ?? DEFAULT_LIT_THRESHOLD;
  const brightRef = options.brightnessReference ?? DEFAULT_BRIGHTNESS_REFERENCE;
  const cautionV = options.cautionVoltage ?? DEFAULT_CAUTION_VOLTAGE;
  const cautions = [];
  const f = w / (2 * Math.PI);
  const i0Re = iRe[0];
  const i0Im = iIm[0];
  let mRe = 0;
  let mIm = 0;
  for (let j = 1; j < n; j++) {
    const x = w * L[0][j];
    mRe += -x * iIm[j];
    mIm += x * iRe[j];
  }
  const l0 = L[0][0];
  const coilVRe = tx.resistance * i0Re - w * l0 * i0Im + mRe;
  const coilVIm = tx.resistance * i0Im + w * l0 * i0Re + mIm;
  const i0a2 = i0Re * i0Re + i0Im * i0Im;
  const refl = i0a2 > 0 ? { re: (mRe * i0Re + mIm * i0Im) / i0a2, im: (mIm * i0Re - mRe * i0Im) / i0a2 } : { re: 0, im: 0 };
  let capVRe = 0;
  let capVIm = 0;
  let capIRe = 0;
  let capIIm = 0;
  let srcIRe = i0Re;
  let srcIIm = i0Im;
  let termVRe = coilVRe;
  let termVIm = coilVIm;
  const esr0 = tx.capacitorEsr ?? 0;
  if (tx.compensation === "series") {
    capIRe = i0Re;
    capIIm = i0Im;
    capVRe = zc0Re * i0Re - zc0Im * i0Im;
    capVIm = zc0Re * i0Im + zc0Im * i0Re;
    termVRe = coilVRe + capVRe;
    termVIm = coilVIm + capVIm;
  } else if (tx.compensation === "parallel") {
    capVRe = coilVRe;
    capVIm = coilVIm;
    const den = zc0Re * zc0Re + zc0Im * zc0Im;
    capIRe = (coilVRe * zc0Re + coilVIm * zc0Im) / den;
    capIIm = (coilVIm * zc0Re - coilVRe * zc0Im) / den;
    srcIRe = i0Re + capIRe;
    srcIIm = i0Im + capIIm;
  }
  const srcIa2 = srcIRe * srcIRe + srcIIm * srcIIm;
  const drive = tx.drive;
  let input;
  let driverLoss = 0;
  if (drive.kind === "voltage") {
    input = 0.5 * drive.amplitude * srcIRe;
    driverLoss = 0.5 * srcIa2 * drive.resistance;
  } else {
    input = 0.5 * (termVRe * srcIRe + termVIm * srcIIm);
  }
  void zsRe;
  void zsIm;
  void vthRe;
  const txCoilLoss = 0.5 * i0a2 * tx.resistance;
  const txCapLoss = 0.5 * (capIRe * capIRe + capIIm * capIIm) * esr0;
  const inZ = srcIa2 > 0 ? { re: (termVRe * srcIRe + termVIm * srcIIm) / srcIa2, im: (termVIm * srcIRe - termVRe * srcIIm) / srcIa2 } : { re: Infinity, im: 0 };
  if (!Number.isFinite(inZ.re)) inZ.re = 0;
  const coilV = Math.hypot(coilVRe, coilVIm);
  const capV = Math.hypot(capVRe, capVIm);
  const txLabel = tx.label ?? "transmitter";
  checkPartVoltage(txLabel + " capacitor", capV, tx.capacitorRating, warnings);
  checkSelfResonance(txLabel + " coil", f, tx.selfResonance, warnings);
  caution(txLabel + " coil", coilV, cautionV, cautions);
  if (tx.compensation !== "none") caution(txLabel + " capacitor", capV, cautionV, cautions);
  const receivers = [];
  let delivered = 0;
  let rxCoil = 0;
  let rxCap = 0;
  net.receivers.forEach((r, k) => {
    const ir = iRe[k + 1];
    const ii = iIm[k + 1];
    let eRe = 0;
    let eIm = 0;
    for (let j = 0; j < n; j++) {
      if (j === k + 1) continue;
      const x = w * L[k + 1][j];
      eRe += x * iIm[j];
      eIm += -x * iRe[j];
    }
    const lk = L[k + 1][k + 1];
    const cvRe = r.resistance * ir - w * lk * ii - eRe;
    const cvIm = r.resistance * ii + w * lk * ir - eIm;
    const vl = Math.hypot(vRe[k], vIm[k]);
    let capV2;
    let capI;
    if (series[k]) {
      capI = Math.hypot(ir, ii);
      capV2 = capI * Math.hypot(zcRe[k], zcIm[k]);
    } else {
      capV2 = vl;
      capI = vl * Math.hypot(ycRe[k], ycIm[k]);
    }
    const ia2 = ir * ir + ii * ii;
    const coilLoss = 0.5 * ia2 * r.resistance;
    const capLoss = 0.5 * capI * capI * (r.capacitorEsr ?? 0);
    const loadPower = 0.5 * yG[k] * vl * vl;
    const loadI = vl * Math.hypot(yG[k], yB[k]);
    const ledList = r.load.ledCurrents ? r.load.ledCurrents(vl) : [];
    const leds = ledList.map((d) => ({
      label: d.label,
      averageCurrent: d.current,
      relativeBrightness: d.relativeBrightness ?? Math.max(d.current, 0) / brightRef,
      lit: d.current >= threshold
    }));
    const label = labelOf(r, k);
    checkPartVoltage(label + " capacitor", capV2, r.capacitorRating, warnings);
    checkSelfResonance(label + " coil", f, r.selfResonance, warnings);
    caution(label + " tank", Math.max(capV2, Math.hypot(cvRe, cvIm)), cautionV, cautions);
    delivered += loadPower;
    rxCoil += coilLoss;
    rxCap += capLoss;
    const coilVa = Math.hypot(cvRe, cvIm);
    receivers.push({
      label,
      emf: Math.hypot(eRe, eIm),
      coilCurrent: Math.sqrt(ia2),
      coilCurrentRms: Math.sqrt(ia2) * SQRT1_2,
      coilCurrentPhasor: { re: ir, im: ii },
      coilVoltage: coilVa,
      coilVoltageRms: coilVa * SQRT1_2,
      capacitorVoltage: capV2,
      capacitorVoltageRms: capV2 * SQRT1_2,
      capacitorCurrent: capI,
      capacitorCurrentRms: capI * SQRT1_2,
      loadVoltage: vl,
      loadVoltageRms: vl * SQRT1_2,
      loadCurrent: loadI,
      loadCurrentRms: loadI * SQRT1_2,
      loadPower,
      coilLoss,
      capacitorLoss: capLoss,
      leds,
      lit: leds.some((d) => d.lit),
      allLit: leds.length > 0 && leds.every((d) => d.lit)
    });
  });
  const i0 = Math.sqrt(i0a2);
  const srcI = Math.sqrt(srcIa2);
  const termV = Math.hypot(termVRe, termVIm);
  const capI0 = Math.hypot(capIRe, capIIm);
  return {
    frequency: f,
    converged,
    iterations,
    scalarIterations,
    transmitter: {
      label: txLabel,
      coilCurrent: i0,
      coilCurrentRms: i0 * SQRT1_2,
      coilCurrentPhasor: { re: i0Re, im: i0Im },
      coilVoltage: coilV,
      coilVoltageRms: coilV * SQRT1_2,
      capacitorVoltage: capV,
      capacitorVoltageRms: capV * SQRT1_2,
      capacitorCurrent: capI0,
      capacitorCurrentRms: capI0 * SQRT1_2,
      sourceCurrent: srcI,
      sourceCurrentRms: srcI * SQRT1_2,
      sourceVoltage: termV,
      sourceVoltageRms: termV * SQRT1_2,
      inputImpedance: inZ,
      reflectedImpedance: refl,
      coilLoss: txCoilLoss,
      capacitorLoss: txCapLoss,
      driverLoss
    },
    receivers,
    power: {
      input,
      delivered,
      driver: driverLoss,
      transmitterCoil: txCoilLoss,
      transmitterCapacitor: txCapLoss,
      receiverCoils: rxCoil,
      receiverCapacitors: rxCap,
      efficiency: input > 0 ? delivered / input : 0
    },
    litThreshold: threshold,
    litThresholdSource: options.litThreshold === void 0 ? LITTHRESHOLD_SOURCE : "set by the user",
    drive: { label: drive.label, assumptions: drive.assumptions },
    warnings,
    cautions
  };
}
function checkPartVoltage(what, peak, rating, warnings) {
  if (rating !== void 0 && peak > rating) {
    warnings.push(`${what}: peak voltage ${peak.toPrecision(3)} V exceeds its rating ${rating} V (overvoltage)`);
  }
}
function checkSelfResonance(what, f, srf, warnings) {
  if (srf !== void 0 && f > srf / 3) {
    warnings.push(
      `${what}: drive frequency ${f.toPrecision(4)} Hz is beyond a third of its self-resonance ${srf.toPrecision(4)} Hz; its inductance and resistance are no longer the low-frequency values`
    );
  }
}
function caution(what, peak, limit, cautions) {
  if (peak > limit) {
    cautions.push(
      `${what}: ${peak.toPrecision(3)} V peak (${(peak * SQRT1_2).toPrecision(3)} V RMS) exceeds ${limit} V peak; high tank voltages can shock or burn: insulate and rate the parts for it, and defer to local electrical codes, regulations and licensed practice`
    );
  }
}

// lib/circuit/link.ts
var coilCache = /* @__PURE__ */ new WeakMap();
var MUTUAL_RTOL = 1e-3;
var evaluatorCache = /* @__PURE__ */ new WeakMap();
function evaluatorFor(a, b) {
  let inner = evaluatorCache.get(a);
  if (inner === void 0) {
    inner = /* @__PURE__ */ new WeakMap();
    evaluatorCache.set(a, inner);
  }
  let ev = inner.get(b);
  if (ev === void 0) {
    ev = couplingEvaluator(a, b, { relTol: MUTUAL_RTOL });
    inner.set(b, ev);
  }
  return ev;
}
function coilNumbers(coil, f, temperature2, warnings, label) {
  const key = `${f}|${temperature2 ?? ""}`;
  let byKey = coilCache.get(coil);
  if (!byKey) {
    byKey = /* @__PURE__ */ new Map();
    coilCache.set(coil, byKey);
  }
  const hit = byKey.get(key);
  if (hit) return hit;
  const inductance = selfInductance(coil, { frequency: f });
  const resistance2 = coilResistance(coil, f, temperature2 !== void 0 ? { temperature: temperature2 } : {});
  let srf;
  try {
    srf = selfResonance(coil);
  } catch (e) {
    warnings.push(`${label}: self-resonance not estimated (${e.message})`);
  }
  const made = { inductance, resistance: resistance2, ...srf !== void 0 ? { selfResonance: srf } : {} };
  byKey.set(key, made);
  return made;
}
function driveOf(d, f, l1, compensation, warnings) {
  if (d.kind === "parallelTank" && compensation !== "parallel") {
    warnings.push(`transmitter: the parallel-tank drive assumes a parallel-compensated transmitter (got '${compensation}')`);
  }
  if (d.kind === "classE" && compensation !== "series") {
    warnings.push(`transmitter: the class-E equivalent assumes a series load network (got '${compensation}' compensation)`);
  }
  switch (d.kind) {
    case "sine":
      return sineDrive(d.amplitude, d.outputResistance ?? 0);
    case "halfBridge":
      return halfBridgeDrive(d.supply, d.onResistance ?? 0);
    case "fullBridge":
      return fullBridgeDrive(d.supply, d.onResistance ?? 0);
    case "currentRegulated":
      return currentDrive(d.amplitude);
    case "parallelTank":
      return parallelTankDrive(d.supply, d.onResistance ?? 0);
    case "classE": {
      const design = classEDesign({ supply: d.supply, frequency: f, power: d.power, inductance: l1 });
      warnings.push(...design.warnings);
      return classEDrive(design, d.onResistance ?? 0);
    }
    default:
      return d;
  }
}
function loadModelOf(load, tabulate) {
  return typeof load.conductance === "function" ? load : tokenLoadModel(load, { tabulate });
}
function esrOf(c, w) {
  if (c.esr !== void 0) return c.esr;
  if (c.dissipationFactor !== void 0) return c.dissipationFactor / (w * c.capacitance);
  return 0;
}
var ORIGIN = { position: [0, 0, 0] };
function linkNetwork(system, options = {}) {
  const s = parseInput(LinkSystemInput, system, "solveLink");
  const f = s.frequency;
  const w = 2 * Math.PI * f;
  const warnings = [];
  const tx = s.transmitter;
  const txLabel = tx.label ?? "transmitter";
  const txNum = coilNumbers(tx.coil, f, s.temperature, warnings, txLabel);
  const coils = [
    { coil: tx.coil, pose: tx.pose ?? ORIGIN, label: txLabel, L: txNum.inductance }
  ];
  const rxNums = s.receivers.map((r, k) => {
    const label = r.label ?? `receiver ${k + 1}`;
    const num = coilNumbers(r.coil, f, s.temperature, warnings, label);
    coils.push({ coil: r.coil, pose: r.pose, label, L: num.inductance });
    return num;
  });
  const n = coils.length;
  const L = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_2, j) => i === j ? coils[i].L : 0));
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const a = coils[i];
      const b = coils[j];
      const m = evaluatorFor(a.coil, b.coil).evaluate(a.pose, b.pose);
      for (const wtext of m.warnings) warnings.push(`${a.label} \u2013 ${b.label}: ${wtext}`);
      L[i][j] = m.mutual;
      L[j][i] = m.mutual;
    }
  }
  const coupling = L.map((row, i) => row.map((m, j) => i === j ? 1 : m / Math.sqrt(L[i][i] * L[j][j])));
  const cap0 = tx.capacitor;
  if (tx.compensation !== "none" && cap0 === void 0) {
    throw new TanklightInputError(
      [{ path: "transmitter.capacitor", message: `a ${tx.compensation}-compensated transmitter needs its capacitor`, value: void 0, expected: "{ capacitance: '100 nF', \u2026 }" }],
      "solveLink"
    );
  }
  const network = {
    frequency: f,
    inductance: L,
    transmitter: {
      label: txLabel,
      resistance: tx.resistance ?? txNum.resistance,
      compensation: tx.compensation,
      ...cap0 !== void 0 ? {
        capacitance: cap0.capacitance,
        capacitorEsr: esrOf(cap0, w),
        ...cap0.rating !== void 0 ? { capacitorRating: cap0.rating } : {}
      } : {},
      ...txNum.selfResonance !== void 0 ? { selfResonance: txNum.selfResonance } : {},
      drive: driveOf(tx.drive, f, txNum.inductance, tx.compensation, warnings)
    },
    receivers: s.receivers.map((r, k) => ({
      label: r.label ?? `receiver ${k + 1}`,
      resistance: r.resistance ?? rxNums[k].resistance,
      topology: r.topology,
      capacitance: r.capacitor.capacitance,
      capacitorEsr: esrOf(r.capacitor, w),
      ...r.capacitor.rating !== void 0 ? { capacitorRating: r.capacitor.rating } : {},
      ...rxNums[k].selfResonance !== void 0 ? { selfResonance: rxNums[k].selfResonance } : {},
      load: loadModelOf(r.load, options.tabulateLoads ?? false)
    }))
  };
  return { network, coupling, warnings };
}
function solveLink(system, options = {}) {
  const built = linkNetwork(system, { tabulateLoads: options.tabulateLoads ?? false });
  const r = solveLinkNetwork(built.network, options);
  return { ...r, warnings: [...built.warnings, ...r.warnings], coupling: built.coupling, network: built.network };
}

// lib/circuit/link/summary.ts
function summarizeLink(result, digits = 3) {
  const rows = [];
  const add = (quantity2, value, unit) => {
    rows.push({ quantity: quantity2, value, unit, text: formatQuantity(value, unit, digits) });
  };
  add("drive frequency", result.frequency, "Hz");
  const t = result.transmitter;
  const tx = t.label;
  add(`${tx} \xB7 coil current (peak)`, t.coilCurrent, "A");
  add(`${tx} \xB7 coil current (RMS)`, t.coilCurrentRms, "A");
  add(`${tx} \xB7 coil voltage (peak)`, t.coilVoltage, "V");
  add(`${tx} \xB7 capacitor voltage (peak)`, t.capacitorVoltage, "V");
  add(`${tx} \xB7 capacitor current (peak)`, t.capacitorCurrent, "A");
  add(`${tx} \xB7 source current (peak)`, t.sourceCurrent, "A");
  add(`${tx} \xB7 reflected resistance`, t.reflectedImpedance.re, "\u03A9");
  add(`${tx} \xB7 reflected reactance`, t.reflectedImpedance.im, "\u03A9");
  add(`${tx} \xB7 coil loss`, t.coilLoss, "W");
  add(`${tx} \xB7 capacitor loss`, t.capacitorLoss, "W");
  add(`${tx} \xB7 driver loss`, t.driverLoss, "W");
  const verdicts = [];
  for (const r of result.receivers) {
    const n = r.label;
    add(`${n} \xB7 induced EMF (peak)`, r.emf, "V");
    add(`${n} \xB7 coil current (peak)`, r.coilCurrent, "A");
    add(`${n} \xB7 tank voltage (peak)`, r.loadVoltage, "V");
    add(`${n} \xB7 tank voltage (RMS)`, r.loadVoltageRms, "V");
    add(`${n} \xB7 capacitor voltage (peak)`, r.capacitorVoltage, "V");
    add(`${n} \xB7 capacitor current (peak)`, r.capacitorCurrent, "A");
    add(`${n} \xB7 load power`, r.loadPower, "W");
    add(`${n} \xB7 coil loss`, r.coilLoss, "W");
    add(`${n} \xB7 capacitor loss`, r.capacitorLoss, "W");
    for (const led2 of r.leds) {
      add(`${n} \xB7 ${led2.label} \xB7 average current`, led2.averageCurrent, "A");
      add(`${n} \xB7 ${led2.label} \xB7 relative brightness`, led2.relativeBrightness, "");
      const cmp = led2.lit ? "\u2265" : "<";
      verdicts.push(
        `${n} \xB7 ${led2.label}: ${led2.lit ? "lit" : "unlit"} (${formatQuantity(led2.averageCurrent, "A", digits)} ${cmp} ${formatQuantity(result.litThreshold, "A", digits)})`
      );
    }
  }
  const p = result.power;
  add("input power", p.input, "W");
  add("power to the loads", p.delivered, "W");
  add("efficiency", p.efficiency * 100, "%");
  const width = Math.max(...rows.map((r) => r.quantity.length));
  const lines = [
    `drive: ${result.drive.label}`,
    ...rows.map((r) => `${r.quantity.padEnd(width)}  ${r.text}`),
    "",
    `lit threshold ${formatQuantity(result.litThreshold, "A", digits)} (${result.litThresholdSource})`,
    ...verdicts,
    ...result.warnings.length ? ["", "warnings:", ...result.warnings.map((w) => `- ${w}`)] : [],
    ...result.cautions.length ? ["", "cautions:", ...result.cautions.map((c) => `- ${c}`)] : [],
    ...result.converged ? [] : ["", "NOT CONVERGED: the numbers above are the last iterate"]
  ];
  return { rows, verdicts, warnings: result.warnings, cautions: result.cautions, text: lines.join("\n") };
}

// lib/circuit/linkLimits.ts
function maxLinkEfficiency(k, q1, q2) {
  const where = "maxLinkEfficiency";
  checkK(k, where);
  requirePositive(q1, "q1", "(dimensionless)", where);
  requirePositive(q2, "q2", "(dimensionless)", where);
  const u = k * k * q1 * q2;
  const d = 1 + Math.sqrt(1 + u);
  return u / (d * d);
}
function optimalLoad(k, q1, q2, r2, options = {}) {
  const where = "optimalLoad";
  checkK(k, where);
  requirePositive(q1, "q1", "(dimensionless)", where);
  requirePositive(q2, "q2", "(dimensionless)", where);
  requirePositive(r2, "r2", "\u03A9", where);
  const rs = r2 * Math.sqrt(1 + k * k * q1 * q2);
  if ((options.topology ?? "series") === "series") return rs;
  const x = requirePositive(options.reactance ?? NaN, "options.reactance", "\u03A9", where);
  const disc = 1 - 4 * rs * rs / (x * x);
  if (disc < 0) {
    throw new TanklightInputError(
      [{ path: "options.reactance", message: `must exceed 2\xB7R_s = ${2 * rs} \u03A9 for a parallel load to reach the optimum`, value: x }],
      where
    );
  }
  return x * x / rs * ((1 + Math.sqrt(disc)) / 2);
}
function checkK(k, where) {
  requireFinite(k, "k", "(dimensionless)", where);
  if (!(Math.abs(k) < 1)) {
    throw new TanklightInputError([{ path: "k", message: "coupling factor must satisfy |k| < 1", value: k, expected: "|k| < 1" }], where);
  }
}

// lib/circuit/frequencySweep.ts
function frequencySweep(network, frequencies, options = {}) {
  const fs = sweepFrequencies(frequencies);
  const at = typeof network === "function" ? network : (f) => ({ ...network, frequency: f });
  const solve = (f) => solveLinkNetwork(at(f), options);
  const n = fs.length;
  const out = {
    transmitterCurrent: new Float64Array(n),
    inputPower: new Float64Array(n),
    delivered: new Float64Array(n),
    efficiency: new Float64Array(n)
  };
  let loadVoltage = [];
  const warnings = /* @__PURE__ */ new Set();
  for (let i = 0; i < n; i++) {
    const r = solve(fs[i]);
    if (i === 0) loadVoltage = r.receivers.map(() => new Float64Array(n));
    out.transmitterCurrent[i] = r.transmitter.coilCurrent;
    out.inputPower[i] = r.power.input;
    out.delivered[i] = r.power.delivered;
    out.efficiency[i] = r.power.efficiency;
    r.receivers.forEach((rx, k) => loadVoltage[k][i] = rx.loadVoltage);
    for (const w of r.warnings) warnings.add(w);
  }
  const pick = {
    transmitterCurrent: (r) => r.transmitter.coilCurrent,
    inputPower: (r) => r.power.input,
    delivered: (r) => r.power.delivered,
    efficiency: (r) => r.power.efficiency
  };
  const refine = options.refine ?? true;
  const peaks = {};
  for (const key of Object.keys(pick)) {
    const ys = out[key];
    const list = [];
    for (let i = 1; i < n - 1; i++) {
      if (ys[i] > ys[i - 1] && ys[i] >= ys[i + 1]) {
        list.push(refine ? goldenMax((f) => pick[key](solve(f)), fs[i - 1], fs[i + 1]) : fs[i]);
      }
    }
    peaks[key] = list;
  }
  return { frequency: fs, ...out, loadVoltage, peaks, warnings: [...warnings] };
}
function sweepFrequencies(spec) {
  const where = "frequencySweep";
  if (Array.isArray(spec)) {
    const list = spec;
    list.forEach((f, i) => requirePositive(f, `frequencies[${i}]`, "Hz", where));
    return Float64Array.from(list);
  }
  const r = spec;
  const a = requirePositive(r.start, "frequencies.start", "Hz", where);
  const b = requirePositive(r.stop, "frequencies.stop", "Hz", where);
  if (!(Number.isInteger(r.points) && r.points >= 2) || !(b > a)) {
    throw new TanklightInputError(
      [{ path: "frequencies", message: "need stop > start and an integer number of points \u2265 2", value: r }],
      where
    );
  }
  const out = new Float64Array(r.points);
  for (let i = 0; i < r.points; i++) {
    const t = i / (r.points - 1);
    out[i] = r.spacing === "log" ? a * Math.pow(b / a, t) : a + (b - a) * t;
  }
  return out;
}
function goldenMax(fn, a, b) {
  const g2 = (Math.sqrt(5) - 1) / 2;
  let c = b - g2 * (b - a);
  let d = a + g2 * (b - a);
  let fc = fn(c);
  let fd = fn(d);
  for (let it = 0; it < 200 && b - a > 1e-11 * Math.abs(b); it++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g2 * (b - a);
      fc = fn(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g2 * (b - a);
      fd = fn(d);
    }
  }
  return (a + b) / 2;
}

// lib/circuit/transient/circuit.ts
var GROUND = "ground";
function elementNodes(e) {
  switch (e.kind) {
    case "resistor":
    case "capacitor":
    case "inductor":
    case "switch":
      return [e.a, e.b];
    case "voltageSource":
      return [e.plus, e.minus];
    case "currentSource":
      return [e.from, e.to];
    case "diode":
      return [e.anode, e.cathode];
    case "coupling":
      return [];
  }
}

// lib/circuit/transient/compile.ts
var WHERE = "simulate";
var DEFAULT_SWITCH_OFF_RESISTANCE = 1e6;
function fail(issues) {
  throw new TanklightInputError(issues, WHERE);
}
function positive(x, path, unit, issues) {
  if (typeof x !== "number" || !Number.isFinite(x) || x <= 0) {
    issues.push({ path, message: `must be a finite number > 0 ${unit}`, value: x, expected: `> 0 ${unit}` });
    return 1;
  }
  return x;
}
function finiteOr(x, dflt, path, unit, issues) {
  if (x === void 0) return dflt;
  if (typeof x !== "number" || !Number.isFinite(x)) {
    issues.push({ path, message: `must be a finite number in ${unit}`, value: x, expected: `finite ${unit}` });
    return dflt;
  }
  return x;
}
var Components = class {
  parent = /* @__PURE__ */ new Map();
  find(x) {
    let p = this.parent.get(x) ?? x;
    if (p === x) return x;
    p = this.find(p);
    this.parent.set(x, p);
    return p;
  }
  union(a, b) {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra === rb) return false;
    this.parent.set(ra, rb);
    return true;
  }
};
function pathThrough(edges, from, to) {
  const prev = /* @__PURE__ */ new Map();
  const seen = /* @__PURE__ */ new Set([from]);
  const queue = [from];
  while (queue.length > 0) {
    const n2 = queue.shift();
    if (n2 === to) break;
    for (const e of edges) {
      const other = e.a === n2 ? e.b : e.b === n2 ? e.a : void 0;
      if (other !== void 0 && !seen.has(other)) {
        seen.add(other);
        prev.set(other, { node: n2, edge: e.name });
        queue.push(other);
      }
    }
  }
  const out = [];
  let n = to;
  while (n !== from) {
    const p = prev.get(n);
    if (!p) break;
    out.push(p.edge);
    n = p.node;
  }
  return out.reverse();
}
function compileCircuit(circuit) {
  const issues = [];
  if (!circuit || !Array.isArray(circuit.elements) || circuit.elements.length === 0) {
    fail([{ path: "circuit.elements", message: "must be a non-empty array of elements", value: circuit?.elements }]);
  }
  const elements = circuit.elements;
  const names = /* @__PURE__ */ new Set();
  elements.forEach((e, i) => {
    const path = `circuit.elements[${i}]`;
    if (typeof e?.name !== "string" || e.name === "") {
      issues.push({ path: `${path}.name`, message: "must be a non-empty string", value: e?.name });
    } else if (names.has(e.name)) {
      issues.push({ path: `${path}.name`, message: "duplicates another element's name", value: e.name });
    } else names.add(e.name);
    const kinds = ["resistor", "capacitor", "inductor", "coupling", "voltageSource", "currentSource", "switch", "diode"];
    if (!kinds.includes(e?.kind)) {
      issues.push({ path: `${path}.kind`, message: `must be one of ${kinds.join(", ")}`, value: e?.kind });
      return;
    }
    for (const n of elementNodes(e)) {
      if (typeof n !== "string" || n === "") issues.push({ path: `${path} (${e.name})`, message: "terminal node names must be non-empty strings", value: n });
    }
  });
  if (issues.length) fail(issues);
  const nodeIndex = /* @__PURE__ */ new Map([[GROUND, -1]]);
  const nodeNames = [];
  const attachedLists = [];
  for (const e of elements) {
    for (const n of elementNodes(e)) {
      if (!nodeIndex.has(n)) {
        nodeIndex.set(n, nodeNames.length);
        nodeNames.push(n);
        attachedLists.push([]);
      }
      const k = nodeIndex.get(n);
      if (k >= 0 && !attachedLists[k].includes(e.name)) attachedLists[k].push(e.name);
    }
  }
  if (nodeNames.length === 0) fail([{ path: "circuit.elements", message: `no node other than "${GROUND}"`, value: elements.map((e) => e.name) }]);
  const idx = (n) => nodeIndex.get(n);
  const comp = new Components();
  for (const e of elements) {
    if (e.kind === "coupling" || e.kind === "currentSource") continue;
    const [a, b] = elementNodes(e);
    comp.union(a, b);
  }
  const groundRoot = comp.find(GROUND);
  const floating = nodeNames.filter((n) => comp.find(n) !== groundRoot);
  if (floating.length) {
    const attachedTo = [...new Set(floating.flatMap((n) => attachedLists[idx(n)]))];
    fail([
      {
        path: "circuit",
        message: `floating node${floating.length > 1 ? "s" : ""} ${floating.map((n) => `"${n}"`).join(", ")}: no path to "${GROUND}" except through current sources; elements attached: ${attachedTo.join(", ")}`,
        value: floating,
        expected: `every node connected to "${GROUND}" through resistors, capacitors, inductors, switches, diodes or voltage sources`
      }
    ]);
  }
  const vsComp = new Components();
  const vsEdges = [];
  for (const e of elements) {
    if (e.kind !== "voltageSource") continue;
    if (!vsComp.union(e.plus, e.minus)) {
      const loop = [...pathThrough(vsEdges, e.plus, e.minus), e.name];
      fail([
        {
          path: "circuit",
          message: `loop of voltage sources: ${loop.join(", ")} (their voltages cannot all be imposed; add a resistance in the loop)`,
          value: loop
        }
      ]);
    }
    vsEdges.push({ name: e.name, a: e.plus, b: e.minus });
  }
  const nNodes = nodeNames.length;
  let row = nNodes;
  const unknownNames = [...nodeNames];
  const resistors = [];
  const capacitors = [];
  const inductors = [];
  const voltageSources = [];
  const currentSources = [];
  const switches = [];
  const diodes = [];
  const couplings = [];
  elements.forEach((e, i) => {
    const path = `circuit.elements[${i}] (${e.name})`;
    switch (e.kind) {
      case "resistor":
        resistors.push({ name: e.name, a: idx(e.a), b: idx(e.b), g: 1 / positive(e.resistance, `${path}.resistance`, "\u03A9", issues) });
        break;
      case "capacitor":
        capacitors.push({
          name: e.name,
          a: idx(e.a),
          b: idx(e.b),
          c: positive(e.capacitance, `${path}.capacitance`, "F", issues),
          v0: finiteOr(e.initialVoltage, 0, `${path}.initialVoltage`, "V", issues)
        });
        break;
      case "inductor": {
        const r = finiteOr(e.resistance, 0, `${path}.resistance`, "\u03A9", issues);
        if (r < 0) issues.push({ path: `${path}.resistance`, message: "must be \u2265 0 \u03A9", value: r, expected: "\u2265 0 \u03A9" });
        inductors.push({
          name: e.name,
          a: idx(e.a),
          b: idx(e.b),
          row: row++,
          r,
          i0: finiteOr(e.initialCurrent, 0, `${path}.initialCurrent`, "A", issues),
          L: positive(e.inductance, `${path}.inductance`, "H", issues),
          l: new Float64Array(0)
        });
        unknownNames.push(`current of ${e.name}`);
        break;
      }
      case "coupling": {
        const pair = e.inductors;
        if (!Array.isArray(pair) || pair.length !== 2) {
          issues.push({ path: `${path}.inductors`, message: "must name exactly two inductors", value: pair });
          break;
        }
        const hasK = e.k !== void 0;
        const hasM = e.mutualInductance !== void 0;
        if (hasK === hasM) {
          issues.push({ path, message: "give exactly one of k and mutualInductance", value: { k: e.k, mutualInductance: e.mutualInductance } });
          break;
        }
        if (hasK) couplings.push({ name: e.name, path, pair, k: finiteOr(e.k, 0, `${path}.k`, "", issues) });
        else couplings.push({ name: e.name, path, pair, m: finiteOr(e.mutualInductance, 0, `${path}.mutualInductance`, "H", issues) });
        break;
      }
      case "voltageSource":
        if (typeof e.waveform !== "function") issues.push({ path: `${path}.waveform`, message: "must be a function of time", value: e.waveform });
        voltageSources.push({ name: e.name, a: idx(e.plus), b: idx(e.minus), row: row++, waveform: e.waveform });
        unknownNames.push(`current of ${e.name}`);
        break;
      case "currentSource":
        if (typeof e.waveform !== "function") issues.push({ path: `${path}.waveform`, message: "must be a function of time", value: e.waveform });
        currentSources.push({ name: e.name, from: idx(e.from), to: idx(e.to), waveform: e.waveform });
        break;
      case "switch": {
        if (typeof e.closed !== "function") issues.push({ path: `${path}.closed`, message: "must be a function of time returning a boolean", value: e.closed });
        const ron = positive(e.onResistance, `${path}.onResistance`, "\u03A9", issues);
        const roff = positive(e.offResistance ?? DEFAULT_SWITCH_OFF_RESISTANCE, `${path}.offResistance`, "\u03A9", issues);
        if (roff <= ron) issues.push({ path: `${path}.offResistance`, message: "must exceed onResistance", value: roff, expected: `> ${ron} \u03A9` });
        switches.push({ name: e.name, a: idx(e.a), b: idx(e.b), gOn: 1 / ron, gOff: 1 / roff, closed: e.closed });
        break;
      }
      case "diode":
        if (!e.model || typeof e.model.current !== "function" || typeof e.model.conductance !== "function") {
          issues.push({ path: `${path}.model`, message: "must be a DiodeModel with current(v) and conductance(v)", value: e.model });
        }
        diodes.push({ name: e.name, a: idx(e.anode), b: idx(e.cathode), model: e.model });
        break;
    }
  });
  if (issues.length) fail(issues);
  const nL = inductors.length;
  const lm = new Float64Array(nL * nL);
  inductors.forEach((ind, j) => lm[j * nL + j] = ind.L);
  const byName = new Map(inductors.map((ind, j) => [ind.name, j]));
  const seenPairs = /* @__PURE__ */ new Set();
  for (const c of couplings) {
    const [p, q] = c.pair;
    const jp = byName.get(p);
    const jq = byName.get(q);
    if (jp === void 0 || jq === void 0) {
      issues.push({ path: `${c.path}.inductors`, message: "must name two inductors of the circuit", value: c.pair });
      continue;
    }
    if (jp === jq) {
      issues.push({ path: `${c.path}.inductors`, message: "must name two different inductors", value: c.pair });
      continue;
    }
    const key = jp < jq ? `${jp},${jq}` : `${jq},${jp}`;
    if (seenPairs.has(key)) {
      issues.push({ path: c.path, message: `couples ${p} and ${q} a second time`, value: c.name });
      continue;
    }
    seenPairs.add(key);
    const lp = lm[jp * nL + jp];
    const lq = lm[jq * nL + jq];
    const m = c.k !== void 0 ? c.k * Math.sqrt(lp * lq) : c.m;
    const k = m / Math.sqrt(lp * lq);
    if (!(Math.abs(k) < 1)) {
      issues.push({ path: c.path, message: "coupling factor must satisfy |k| < 1", value: k, expected: "\u22121 < k < 1" });
      continue;
    }
    lm[jp * nL + jq] = m;
    lm[jq * nL + jp] = m;
  }
  if (issues.length) fail(issues);
  if (nL > 1 && !choleskyOk(lm, nL)) {
    fail([
      {
        path: "circuit",
        message: `the couplings ${couplings.map((c) => c.name).join(", ")} give an inductance matrix that is not positive definite (stored magnetic energy could be negative)`,
        value: couplings.map((c) => c.name)
      }
    ]);
  }
  const inductorsOut = inductors.map((ind, j) => ({
    name: ind.name,
    a: ind.a,
    b: ind.b,
    row: ind.row,
    r: ind.r,
    i0: ind.i0,
    l: lm.slice(j * nL, j * nL + nL)
  }));
  return {
    nodeNames,
    nodeIndex,
    size: row,
    resistors,
    capacitors,
    inductors: inductorsOut,
    voltageSources,
    currentSources,
    switches,
    diodes,
    attached: attachedLists,
    unknownNames
  };
}
function choleskyOk(a, n) {
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i * n + j];
      for (let k = 0; k < j; k++) s -= l[i * n + k] * l[j * n + k];
      if (i === j) {
        if (!(s > 0)) return false;
        l[i * n + i] = Math.sqrt(s);
      } else l[i * n + j] = s / l[j * n + j];
    }
  }
  return true;
}

// lib/circuit/transient/errors.ts
var TransientConvergenceError = class extends Error {
  /** simulated time at which the step failed, s */
  time;
  /** the smallest step tried, s */
  step;
  /** names of the diodes whose voltage was still changing */
  elements;
  constructor(message, time, step, elements) {
    super(message);
    this.name = "TransientConvergenceError";
    this.time = time;
    this.step = step;
    this.elements = elements;
  }
};

// lib/circuit/transient/simulate.ts
var VOLTAGE_ABSTOL = 1e-6;
var CURRENT_ABSTOL = 1e-9;
var NEWTON_RELTOL = 1e-7;
var MAX_HALVINGS = 24;
var MAX_PIECES_PER_STEP = 4096;
var EDGE_RESOLUTION = 1e-10;
function simulate(circuit, opts) {
  const where = "simulate";
  const warnings = [];
  const stop = requirePositive(opts?.stop, "stop", "s", where);
  const frequency2 = opts.frequency === void 0 ? void 0 : requirePositive(opts.frequency, "frequency", "Hz", where);
  let h;
  let spc;
  if (opts.stepsPerCycle !== void 0) {
    if (frequency2 === void 0) throw new TanklightInputError([{ path: "frequency", message: "is needed with stepsPerCycle", value: void 0, expected: "Hz > 0" }], where);
    const n2 = opts.stepsPerCycle;
    if (!(Number.isInteger(n2) && n2 >= 8)) throw new TanklightInputError([{ path: "stepsPerCycle", message: "must be an integer \u2265 8", value: n2, expected: "integer \u2265 8" }], where);
    spc = n2;
    h = 1 / (frequency2 * n2);
  } else if (opts.step !== void 0) {
    h = requirePositive(opts.step, "step", "s", where);
    if (frequency2 !== void 0) {
      spc = Math.max(1, Math.round(1 / (frequency2 * h)));
      const hc = 1 / (frequency2 * spc);
      if (Math.abs(hc - h) > 1e-9 * h) {
        warnings.push(`step adjusted from ${h} s to ${hc} s so that a period of ${frequency2} Hz holds a whole number (${spc}) of steps`);
      }
      h = hc;
    }
  } else {
    throw new TanklightInputError([{ path: "step", message: "give step, or stepsPerCycle with frequency", value: void 0, expected: "s > 0" }], where);
  }
  if (h > stop) throw new TanklightInputError([{ path: "step", message: `must not exceed stop (${stop} s)`, value: h, expected: `\u2264 ${stop} s` }], where);
  const nGrid = Math.max(1, Math.round(stop / h - 1e-9 * (stop / h)));
  if (nGrid > 5e7) throw new TanklightInputError([{ path: "stop", message: `asks for ${nGrid} steps (at most 5e7)`, value: stop, expected: "stop/step \u2264 5e7" }], where);
  let steadyTol = 0;
  let minCycles = 0;
  const wantSteady = opts.untilSteady !== void 0 && opts.untilSteady !== false;
  if (wantSteady) {
    if (spc === void 0) throw new TanklightInputError([{ path: "frequency", message: "is needed with untilSteady", value: void 0, expected: "Hz > 0" }], where);
    const u = typeof opts.untilSteady === "object" ? opts.untilSteady : {};
    steadyTol = u.tolerance ?? 1e-4;
    minCycles = u.minCycles ?? 5;
    if (!(steadyTol > 0 && Number.isFinite(steadyTol))) throw new TanklightInputError([{ path: "untilSteady.tolerance", message: "must be > 0", value: steadyTol }], where);
    if (!(Number.isInteger(minCycles) && minCycles >= 3)) throw new TanklightInputError([{ path: "untilSteady.minCycles", message: "must be an integer \u2265 3", value: minCycles }], where);
  }
  let keep = nGrid + 1;
  const keepCycles = opts.keepCycles ?? (wantSteady ? 4 : void 0);
  if (keepCycles !== void 0) {
    if (spc === void 0) throw new TanklightInputError([{ path: "frequency", message: "is needed with keepCycles", value: void 0, expected: "Hz > 0" }], where);
    if (!(Number.isInteger(keepCycles) && keepCycles >= 1)) throw new TanklightInputError([{ path: "keepCycles", message: "must be an integer \u2265 1", value: keepCycles }], where);
    keep = Math.min(keep, keepCycles * spc + 1);
  }
  const maxNewton = opts.maxNewtonIterations ?? 50;
  if (!(Number.isInteger(maxNewton) && maxNewton >= 2)) throw new TanklightInputError([{ path: "maxNewtonIterations", message: "must be an integer \u2265 2", value: maxNewton }], where);
  const progress = opts.progress;
  const cc = compileCircuit(circuit);
  const engine = new Engine(cc, maxNewton);
  const nNodes = cc.nodeNames.length;
  const nodeOut = cc.nodeNames.map(() => new Float64Array(keep));
  const elemNames = [];
  for (const list of [cc.resistors, cc.capacitors, cc.inductors, cc.voltageSources, cc.currentSources, cc.switches, cc.diodes]) {
    for (const e of list) elemNames.push(e.name);
  }
  const curOut = elemNames.map(() => new Float64Array(keep));
  const timeOut = new Float64Array(keep);
  let recorded = 0;
  const record = (t) => {
    const slot = recorded % keep;
    timeOut[slot] = t;
    const x = engine.x;
    for (let i = 0; i < nNodes; i++) nodeOut[i][slot] = x[i];
    engine.elementCurrents(t, curOut, slot);
    recorded++;
  };
  engine.start(h);
  record(0);
  const nState = cc.capacitors.length + cc.inductors.length;
  const stateNow = new Float64Array(nState);
  const stateLastCycle = new Float64Array(nState);
  const peak = new Float64Array(nState);
  const deltas = [];
  let cycles = 0;
  let steady;
  if (wantSteady) engine.readState(stateLastCycle);
  const progressEvery = Math.max(1, Math.floor(nGrid / 100));
  let n = 1;
  for (; n <= nGrid; n++) {
    engine.advanceTo(n * h, h);
    record(n * h);
    if (wantSteady) {
      engine.readState(stateNow);
      for (let i = 0; i < nState; i++) {
        const v = Math.abs(stateNow[i]);
        if (v > peak[i]) peak[i] = v;
      }
      if (n % spc === 0) {
        cycles++;
        const delta = cycleChange(cc, stateNow, stateLastCycle, peak);
        deltas.push(delta);
        stateLastCycle.set(stateNow);
        peak.fill(0);
        const est = remainingEstimate(deltas);
        steady = { reached: false, cycles, estimatedError: est };
        if (cycles >= minCycles && est <= steadyTol) {
          steady = { reached: true, cycles, estimatedError: est };
          break;
        }
      }
    }
    if (progress && n % progressEvery === 0) progress(n / nGrid, n * h);
  }
  if (progress) progress(1, Math.min(n, nGrid) * h);
  if (wantSteady && !steady?.reached) {
    warnings.push(
      `steady state not reached by ${stop} s (${cycles} cycles; estimated remaining change ${steady?.estimatedError.toExponential(2)}, tolerance ${steadyTol})`
    );
  }
  if (keepCycles !== void 0 && recorded < keep) {
  }
  const count2 = Math.min(recorded, keep);
  const first = recorded > keep ? recorded % keep : 0;
  const unroll = (buf) => {
    const out = new Float64Array(count2);
    for (let i = 0; i < count2; i++) out[i] = buf[(first + i) % keep];
    return out;
  };
  const nodeVoltages = {};
  cc.nodeNames.forEach((name, i) => nodeVoltages[name] = unroll(nodeOut[i]));
  const currents = {};
  elemNames.forEach((name, i) => currents[name] = unroll(curOut[i]));
  warnings.push(...engine.warnings);
  return {
    time: unroll(timeOut),
    step: h,
    nodeVoltages,
    currents,
    ...steady ? { steady } : {},
    stats: {
      steps: engine.steps,
      rejectedSteps: engine.rejected,
      newtonIterations: engine.newtonIterations,
      factorizations: engine.factorizations,
      switchingEvents: engine.switchingEvents
    },
    warnings
  };
}
function cycleChange(cc, now, last, peak) {
  const nC = cc.capacitors.length;
  let maxV = 0;
  let maxI = 0;
  for (let i = 0; i < now.length; i++) {
    if (i < nC) maxV = Math.max(maxV, peak[i]);
    else maxI = Math.max(maxI, peak[i]);
  }
  let delta = 0;
  for (let i = 0; i < now.length; i++) {
    const kindMax = i < nC ? maxV : maxI;
    const scale = Math.max(peak[i], 1e-3 * kindMax);
    if (scale === 0) continue;
    const d = Math.abs(now[i] - last[i]) / scale;
    if (d > delta) delta = d;
  }
  return delta;
}
function remainingEstimate(d) {
  const n = d.length;
  const last = d[n - 1];
  if (last === 0) return 0;
  if (n < 3) return Infinity;
  const r1 = last / d[n - 2];
  const r2 = d[n - 2] / d[n - 3];
  const r = Math.max(r1, r2);
  if (!(r < 1)) return Infinity;
  return last / (1 - r);
}
var Engine = class {
  cc;
  n;
  nNodes;
  /** solution at the current time */
  x;
  xTry;
  xSaved;
  base;
  work;
  rhsBase;
  pivots;
  // history
  capV;
  capI;
  indI;
  indW;
  capVSaved;
  capISaved;
  indISaved;
  indWSaved;
  switchState;
  diodeV;
  /** diode currents of the last accepted solution (linearised at the converged voltage), A */
  diodeI;
  diodeG;
  diodeI0;
  nL;
  maxNewton;
  // cache of the linear matrix
  baseAlpha = NaN;
  baseSwitchVersion = -1;
  switchVersion = 0;
  factoredAlpha = NaN;
  factoredVersion = -1;
  t = 0;
  afterDiscontinuity = true;
  subStep = 0;
  steps = 0;
  rejected = 0;
  newtonIterations = 0;
  factorizations = 0;
  switchingEvents = 0;
  warnings = [];
  constructor(cc, maxNewton) {
    this.cc = cc;
    this.n = cc.size;
    this.nNodes = cc.nodeNames.length;
    this.maxNewton = maxNewton;
    const n = this.n;
    this.x = new Float64Array(n);
    this.xTry = new Float64Array(n);
    this.xSaved = new Float64Array(n);
    this.base = new Float64Array(n * n);
    this.work = new Float64Array(n * n);
    this.rhsBase = new Float64Array(n);
    this.pivots = new Int32Array(n);
    this.capV = Float64Array.from(cc.capacitors, (c) => c.v0);
    this.capI = new Float64Array(cc.capacitors.length);
    this.indI = Float64Array.from(cc.inductors, (l) => l.i0);
    this.indW = new Float64Array(cc.inductors.length);
    this.capVSaved = new Float64Array(cc.capacitors.length);
    this.capISaved = new Float64Array(cc.capacitors.length);
    this.indISaved = new Float64Array(cc.inductors.length);
    this.indWSaved = new Float64Array(cc.inductors.length);
    this.switchState = new Uint8Array(cc.switches.length);
    this.diodeV = new Float64Array(cc.diodes.length);
    this.diodeI = new Float64Array(cc.diodes.length);
    this.diodeG = new Float64Array(cc.diodes.length);
    this.diodeI0 = new Float64Array(cc.diodes.length);
    this.nL = cc.inductors.length;
  }
  /** Sets the switch states at t = 0 and solves the t = 0 network (a backward-Euler step of 1e-4·h, state then restored). */
  start(h) {
    this.cc.switches.forEach((s, i) => this.switchState[i] = s.closed(0) ? 1 : 0);
    this.switchVersion++;
    this.subStep = h;
    this.saveHistory();
    const h0 = 1e-4 * h;
    if (!this.tryStep(h0, h0, true)) {
      throw new TransientConvergenceError(
        `simulate: Newton's method did not converge at t = 0 (diodes: ${this.cc.diodes.map((d) => d.name).join(", ")})`,
        0,
        h0,
        this.cc.diodes.map((d) => d.name)
      );
    }
    this.restoreHistory();
    this.afterDiscontinuity = true;
    this.t = 0;
  }
  /** Copies the state variables (capacitor voltages, then inductor currents) into `out`. */
  readState(out) {
    out.set(this.capV, 0);
    out.set(this.indI, this.capV.length);
  }
  saveHistory() {
    this.capVSaved.set(this.capV);
    this.capISaved.set(this.capI);
    this.indISaved.set(this.indI);
    this.indWSaved.set(this.indW);
    this.xSaved.set(this.x);
  }
  restoreHistory() {
    this.capV.set(this.capVSaved);
    this.capI.set(this.capISaved);
    this.indI.set(this.indISaved);
    this.indW.set(this.indWSaved);
  }
  /** Integrates from the current time to tTarget (≤ one grid step h), cutting at switching instants. */
  advanceTo(tTarget, h) {
    const cc = this.cc;
    const nSw = cc.switches.length;
    let guard = 0;
    while (tTarget - this.t > EDGE_RESOLUTION * h) {
      if (++guard > 1e6) throw new TransientConvergenceError(`simulate: no progress at t = ${this.t} s`, this.t, this.subStep, []);
      const rem = tTarget - this.t;
      let hs = Math.abs(rem - this.subStep) <= 1e-9 * this.subStep ? this.subStep : Math.min(this.subStep, rem);
      if (rem - hs < EDGE_RESOLUTION * h) hs = Math.abs(rem - this.subStep) <= 1e-9 * this.subStep ? this.subStep : rem;
      let flip = false;
      if (nSw > 0) {
        let tEdge = Infinity;
        for (let i = 0; i < nSw; i++) {
          const s = cc.switches[i];
          const now = this.switchState[i] === 1;
          if (s.closed(this.t + hs) !== now) {
            let lo = this.t;
            let hi = this.t + hs;
            while (hi - lo > EDGE_RESOLUTION * h) {
              const mid = 0.5 * (lo + hi);
              if (s.closed(mid) === now) lo = mid;
              else hi = mid;
            }
            if (hi < tEdge) tEdge = hi;
          }
        }
        if (tEdge !== Infinity) {
          flip = true;
          hs = tEdge - this.t;
        }
      }
      const tEnd = this.t + hs;
      if (hs > EDGE_RESOLUTION * h) this.stepWithHalving(hs, h);
      if (flip) {
        const tEdge = tEnd;
        this.t = tEdge;
        for (let i = 0; i < nSw; i++) {
          const v = cc.switches[i].closed(tEdge) ? 1 : 0;
          if (v !== this.switchState[i]) {
            this.switchState[i] = v;
            this.switchingEvents++;
          }
        }
        this.switchVersion++;
        this.afterDiscontinuity = true;
      }
    }
    this.t = tTarget;
  }
  /** One step of length hs, halved until Newton converges. */
  stepWithHalving(hs, h) {
    let remaining = hs;
    let tries = 0;
    let pieces = 0;
    while (remaining > EDGE_RESOLUTION * h) {
      if (++pieces > MAX_PIECES_PER_STEP) {
        const names = this.cc.diodes.map((d) => d.name);
        throw new TransientConvergenceError(
          `simulate: the step collapsed at t = ${this.t} s (more than ${MAX_PIECES_PER_STEP} sub-steps in one step; nonlinear elements: ${names.join(", ") || "none"})`,
          this.t,
          this.subStep,
          names
        );
      }
      const len = Math.min(remaining, this.subStep);
      const tNew = this.t + len;
      const nonlinear = this.cc.diodes.length > 0;
      if (nonlinear) this.saveHistory();
      if (this.tryStep(tNew, len, this.afterDiscontinuity)) {
        this.t = tNew;
        remaining -= len;
        this.steps++;
        this.afterDiscontinuity = false;
        this.subStep = Math.min(h, this.subStep * 2);
        tries = 0;
      } else {
        if (!nonlinear) {
          throw new TransientConvergenceError(`simulate: the solution became non-finite at t = ${this.t} s`, this.t, len, []);
        }
        this.restoreHistory();
        this.x.set(this.xSaved);
        this.rejected++;
        this.subStep = len / 2;
        if (++tries > MAX_HALVINGS) {
          const names = this.cc.diodes.map((d) => d.name);
          throw new TransientConvergenceError(
            `simulate: Newton's method did not converge at t = ${this.t} s even with the step reduced to ${this.subStep} s (nonlinear elements: ${names.join(", ") || "none"})`,
            this.t,
            this.subStep,
            names
          );
        }
      }
    }
  }
  /** Builds the linear part of the MNA matrix for integration coefficient alpha (1/h or 2/h). */
  buildBase(alpha) {
    const cc = this.cc;
    const n = this.n;
    const A = this.base;
    A.fill(0);
    const stampG = (a, b, g2) => {
      if (a >= 0) A[a * n + a] = A[a * n + a] + g2;
      if (b >= 0) A[b * n + b] = A[b * n + b] + g2;
      if (a >= 0 && b >= 0) {
        A[a * n + b] = A[a * n + b] - g2;
        A[b * n + a] = A[b * n + a] - g2;
      }
    };
    for (const r of cc.resistors) stampG(r.a, r.b, r.g);
    cc.switches.forEach((s, i) => stampG(s.a, s.b, this.switchState[i] ? s.gOn : s.gOff));
    for (const c of cc.capacitors) stampG(c.a, c.b, alpha * c.c);
    for (const v of cc.voltageSources) {
      if (v.a >= 0) {
        A[v.a * n + v.row] = A[v.a * n + v.row] + 1;
        A[v.row * n + v.a] = A[v.row * n + v.a] + 1;
      }
      if (v.b >= 0) {
        A[v.b * n + v.row] = A[v.b * n + v.row] - 1;
        A[v.row * n + v.b] = A[v.row * n + v.b] - 1;
      }
    }
    for (const l of cc.inductors) {
      const k = l.row;
      if (l.a >= 0) {
        A[l.a * n + k] = A[l.a * n + k] + 1;
        A[k * n + l.a] = A[k * n + l.a] + 1;
      }
      if (l.b >= 0) {
        A[l.b * n + k] = A[l.b * n + k] - 1;
        A[k * n + l.b] = A[k * n + l.b] - 1;
      }
      A[k * n + k] = A[k * n + k] - l.r;
      cc.inductors.forEach((m, j) => {
        A[k * n + m.row] = A[k * n + m.row] - alpha * l.l[j];
      });
    }
    this.baseAlpha = alpha;
    this.baseSwitchVersion = this.switchVersion;
  }
  /** LU-factorises `m` in place (lib/math/lu.ts); a zero pivot becomes an error naming the elements. */
  factor(m) {
    this.factorizations++;
    try {
      luFactor(m, this.n, this.pivots);
    } catch (e) {
      if (e instanceof SingularMatrixError) this.singular(e.pivotIndex);
      throw e;
    }
  }
  /** Throws a TanklightInputError naming the unknown (and its elements) at a zero pivot. */
  singular(k) {
    const cc = this.cc;
    let what;
    if (k < this.nNodes) {
      what = `node "${cc.nodeNames[k]}" (elements attached: ${cc.attached[k].join(", ")})`;
    } else {
      what = cc.unknownNames[k];
    }
    throw new TanklightInputError(
      [
        {
          path: "circuit",
          message: `singular circuit matrix at t = ${this.t} s: the ${what} is not determined (e.g. inductors coupled with |k| \u2248 1 in parallel, or element values far out of scale)`,
          value: cc.unknownNames[k]
        }
      ],
      "simulate"
    );
  }
  /** Attempts one step to tNew of length hs; on success x and the history hold the new state. */
  tryStep(tNew, hs, backwardEuler) {
    const cc = this.cc;
    const n = this.n;
    const alpha = backwardEuler ? 1 / hs : 2 / hs;
    const theta = backwardEuler ? 0 : 1;
    if (alpha !== this.baseAlpha || this.baseSwitchVersion !== this.switchVersion) this.buildBase(alpha);
    const b = this.rhsBase;
    b.fill(0);
    for (const v of cc.voltageSources) b[v.row] = v.waveform(tNew);
    for (const s of cc.currentSources) {
      const j = s.waveform(tNew);
      if (s.to >= 0) b[s.to] = b[s.to] + j;
      if (s.from >= 0) b[s.from] = b[s.from] - j;
    }
    const capList = cc.capacitors;
    for (let i = 0; i < capList.length; i++) {
      const c = capList[i];
      const jeq = alpha * c.c * this.capV[i] + theta * this.capI[i];
      if (c.a >= 0) b[c.a] = b[c.a] + jeq;
      if (c.b >= 0) b[c.b] = b[c.b] - jeq;
    }
    const indList = cc.inductors;
    const nL = this.nL;
    for (let k = 0; k < nL; k++) {
      const l = indList[k];
      let s = 0;
      for (let j = 0; j < nL; j++) s += l.l[j] * this.indI[j];
      b[l.row] = -alpha * s - theta * this.indW[k];
    }
    const x = this.x;
    const diodes = cc.diodes;
    const nD = diodes.length;
    if (nD === 0) {
      if (this.factoredAlpha !== alpha || this.factoredVersion !== this.switchVersion) {
        this.work.set(this.base);
        this.factor(this.work);
        this.factoredAlpha = alpha;
        this.factoredVersion = this.switchVersion;
      }
      x.set(b);
      luSolve(this.work, n, this.pivots, x);
      for (let i = 0; i < n; i++) if (!Number.isFinite(x[i])) return false;
    } else {
      this.factoredAlpha = NaN;
      const xt = this.xTry;
      for (let d = 0; d < nD; d++) {
        const e = diodes[d];
        this.diodeV[d] = (e.a >= 0 ? x[e.a] : 0) - (e.b >= 0 ? x[e.b] : 0);
      }
      let converged = false;
      for (let it = 0; it < this.maxNewton; it++) {
        this.newtonIterations++;
        const W = this.work;
        W.set(this.base);
        xt.set(b);
        for (let d = 0; d < nD; d++) {
          const e = diodes[d];
          const v0 = this.diodeV[d];
          const g2 = e.model.conductance(v0);
          const i0 = e.model.current(v0);
          this.diodeG[d] = g2;
          this.diodeI0[d] = i0;
          const ieq = i0 - g2 * v0;
          const a = e.a;
          const c = e.b;
          if (a >= 0) {
            W[a * n + a] = W[a * n + a] + g2;
            xt[a] = xt[a] - ieq;
          }
          if (c >= 0) {
            W[c * n + c] = W[c * n + c] + g2;
            xt[c] = xt[c] + ieq;
          }
          if (a >= 0 && c >= 0) {
            W[a * n + c] = W[a * n + c] - g2;
            W[c * n + a] = W[c * n + a] - g2;
          }
        }
        this.factor(W);
        luSolve(W, n, this.pivots, xt);
        let ok = true;
        for (let i = 0; i < n; i++) {
          const xi = xt[i];
          if (!Number.isFinite(xi)) return false;
          const tol = NEWTON_RELTOL * Math.abs(xi) + (i < this.nNodes ? VOLTAGE_ABSTOL : CURRENT_ABSTOL);
          if (Math.abs(xi - x[i]) > tol) ok = false;
        }
        for (let d = 0; d < nD; d++) {
          const e = diodes[d];
          const v = (e.a >= 0 ? xt[e.a] : 0) - (e.b >= 0 ? xt[e.b] : 0);
          if (Math.abs(v - this.diodeV[d]) > NEWTON_RELTOL * Math.abs(v) + VOLTAGE_ABSTOL) ok = false;
          this.diodeI[d] = this.diodeI0[d] + this.diodeG[d] * (v - this.diodeV[d]);
          this.diodeV[d] = v;
        }
        x.set(xt);
        if (ok && it > 0) {
          converged = true;
          break;
        }
      }
      if (!converged) return false;
    }
    for (let i = 0; i < capList.length; i++) {
      const c = capList[i];
      const v = (c.a >= 0 ? x[c.a] : 0) - (c.b >= 0 ? x[c.b] : 0);
      this.capI[i] = alpha * c.c * (v - this.capV[i]) - theta * this.capI[i];
      this.capV[i] = v;
    }
    for (let k = 0; k < nL; k++) {
      const l = indList[k];
      const i = x[l.row];
      const v = (l.a >= 0 ? x[l.a] : 0) - (l.b >= 0 ? x[l.b] : 0);
      this.indI[k] = i;
      this.indW[k] = v - l.r * i;
    }
    return true;
  }
  /** Writes every element's current at the present solution into slot `slot` of the buffers, in compile order. */
  elementCurrents(t, out, slot) {
    const cc = this.cc;
    const x = this.x;
    let k = 0;
    for (const r of cc.resistors) out[k++][slot] = r.g * this.across(r.a, r.b);
    for (let i = 0; i < cc.capacitors.length; i++) out[k++][slot] = this.capI[i];
    for (const l of cc.inductors) out[k++][slot] = x[l.row];
    for (const v of cc.voltageSources) out[k++][slot] = -x[v.row];
    for (const s of cc.currentSources) out[k++][slot] = s.waveform(t);
    for (let i = 0; i < cc.switches.length; i++) {
      const s = cc.switches[i];
      out[k++][slot] = (this.switchState[i] ? s.gOn : s.gOff) * this.across(s.a, s.b);
    }
    for (let d = 0; d < cc.diodes.length; d++) out[k++][slot] = this.diodeI[d];
  }
  /** v(a) − v(b) at the present solution (index −1 is ground). */
  across(a, b) {
    const x = this.x;
    return (a >= 0 ? x[a] : 0) - (b >= 0 ? x[b] : 0);
  }
};
function voltageBetween(result, a, b) {
  const get = (name) => name === GROUND ? void 0 : result.nodeVoltages[name];
  for (const name of [a, b]) {
    if (name !== GROUND && result.nodeVoltages[name] === void 0) {
      throw new TanklightInputError([{ path: "node", message: "is not a node of this result", value: name, expected: Object.keys(result.nodeVoltages).join(", ") }], "voltageBetween");
    }
  }
  const va = get(a);
  const vb = get(b);
  const out = new Float64Array(result.time.length);
  for (let i = 0; i < out.length; i++) out[i] = (va ? va[i] : 0) - (vb ? vb[i] : 0);
  return out;
}

// lib/circuit/transient/waveforms.ts
function sineWaveform(spec) {
  const where = "sineWaveform";
  const a = requireFinite(spec.amplitude, "amplitude", "V or A", where);
  const w = 2 * Math.PI * requirePositive(spec.frequency, "frequency", "Hz", where);
  const ph = requireFinite(spec.phase ?? 0, "phase", "rad", where);
  const off = requireFinite(spec.offset ?? 0, "offset", "V or A", where);
  return (t) => off + a * Math.cos(w * t + ph);
}
function stepWaveform(level, opts = {}) {
  const where = "stepWaveform";
  requireFinite(level, "level", "V or A", where);
  const at = requireFinite(opts.at ?? 0, "at", "s", where);
  const before = requireFinite(opts.before ?? 0, "before", "V or A", where);
  return (t) => t >= at ? level : before;
}
function periodicGate(spec) {
  const where = "periodicGate";
  const f = requirePositive(spec.frequency, "frequency", "Hz", where);
  const duty = spec.duty;
  if (!(Number.isFinite(duty) && duty > 0 && duty < 1)) {
    throw new TanklightInputError([{ path: "duty", message: "must be between 0 and 1 (exclusive)", value: duty, expected: "0 < duty < 1" }], where);
  }
  const delay = requireFinite(spec.delay ?? 0, "delay", "s", where);
  const invert = spec.invert === true;
  return (t) => {
    const phase = (t - delay) * f;
    const frac = phase - Math.floor(phase);
    return frac < duty !== invert;
  };
}

// lib/circuit/transient/harmonics.ts
function waveformHarmonics(time, samples, opts) {
  const where = "waveformHarmonics";
  const f = requirePositive(opts.frequency, "frequency", "Hz", where);
  const count2 = opts.count ?? 10;
  const cycles = opts.cycles ?? 1;
  if (!(Number.isInteger(count2) && count2 >= 1)) throw new TanklightInputError([{ path: "count", message: "must be an integer \u2265 1", value: count2 }], where);
  if (!(Number.isInteger(cycles) && cycles >= 1)) throw new TanklightInputError([{ path: "cycles", message: "must be an integer \u2265 1", value: cycles }], where);
  if (time.length !== samples.length || time.length < 3) {
    throw new TanklightInputError([{ path: "samples", message: "must have the same length as time (\u2265 3)", value: samples.length, expected: `${time.length}` }], where);
  }
  const step = time[1] - time[0];
  const perCycle = 1 / (f * step);
  const spc = Math.round(perCycle);
  if (!(spc >= 2) || Math.abs(perCycle - spc) > 1e-6 * perCycle) {
    throw new TanklightInputError([{ path: "frequency", message: `a period must hold a whole number of steps (holds ${perCycle})`, value: f }], where);
  }
  const N = spc * cycles;
  if (N + 1 > samples.length) {
    throw new TanklightInputError([{ path: "cycles", message: `needs ${N + 1} samples, have ${samples.length}`, value: cycles }], where);
  }
  const start = samples.length - 1 - N;
  const w = 2 * Math.PI * f;
  let dc = 0;
  let sq = 0;
  let peak = 0;
  for (let j = start; j < start + N; j++) {
    const v = samples[j];
    dc += v;
    sq += v * v;
    if (Math.abs(v) > peak) peak = Math.abs(v);
  }
  dc /= N;
  const amplitude = new Float64Array(count2 + 1);
  const phase = new Float64Array(count2 + 1);
  const re = new Float64Array(count2 + 1);
  const im = new Float64Array(count2 + 1);
  amplitude[0] = Math.abs(dc);
  re[0] = dc;
  phase[0] = dc < 0 ? Math.PI : 0;
  const t0 = time[start];
  for (let k = 1; k <= count2; k++) {
    let sr = 0;
    let si = 0;
    for (let j = 0; j < N; j++) {
      const a = 2 * Math.PI * k * j / spc;
      const v = samples[start + j];
      sr += v * Math.cos(a);
      si -= v * Math.sin(a);
    }
    sr *= 2 / N;
    si *= 2 / N;
    const c = Math.cos(k * w * t0);
    const s = Math.sin(k * w * t0);
    const r = sr * c + si * s;
    const i = si * c - sr * s;
    re[k] = r;
    im[k] = i;
    amplitude[k] = Math.hypot(r, i);
    phase[k] = Math.atan2(i, r);
  }
  let hsum = 0;
  for (let k = 2; k <= count2; k++) hsum += amplitude[k] * amplitude[k];
  const a1 = amplitude[1];
  return { dc, amplitude, phase, re, im, distortion: a1 > 0 ? Math.sqrt(hsum) / a1 : Infinity, rms: Math.sqrt(sq / N), peak };
}

// lib/circuit/transient/drives.ts
var DEFAULT_ON_RESISTANCE = 0.05;
function singleSwitchDrive(spec) {
  const where = "singleSwitchDrive";
  const supply = requirePositive(spec.supply, "supply", "V", where);
  const f = requirePositive(spec.frequency, "frequency", "Hz", where);
  const duty = spec.duty ?? 0.5;
  const L = requirePositive(spec.coilInductance, "coilInductance", "H", where);
  const C = requirePositive(spec.tankCapacitance, "tankCapacitance", "F", where);
  const R = nonNegative2(spec.coilResistance ?? 0, "coilResistance", "\u03A9", where);
  const rLoad = nonNegative2(spec.loadResistance ?? 0, "loadResistance", "\u03A9", where);
  const cShunt = nonNegative2(spec.shuntCapacitance ?? 0, "shuntCapacitance", "F", where);
  const ron = requirePositive(spec.onResistance ?? DEFAULT_ON_RESISTANCE, "onResistance", "\u03A9", where);
  const arrangement = spec.arrangement ?? "parallel-tank";
  const warnings = [];
  const gate = periodicGate({ frequency: f, duty });
  const sw = {
    kind: "switch",
    name: "S1",
    a: "switch",
    b: GROUND,
    closed: gate,
    onResistance: ron,
    ...spec.offResistance !== void 0 ? { offResistance: spec.offResistance } : {}
  };
  const elements = [
    { kind: "voltageSource", name: "Vsupply", plus: "supply", minus: GROUND, waveform: stepWaveform(supply) }
  ];
  const nodes = { supply: "supply", switch: "switch" };
  if (arrangement === "parallel-tank") {
    elements.push(
      { kind: "inductor", name: "Ltx", a: "supply", b: "switch", inductance: L, resistance: R + rLoad },
      { kind: "capacitor", name: "Ctank", a: "supply", b: "switch", capacitance: C },
      sw
    );
    nodes.coilTop = "supply";
    nodes.coilBottom = "switch";
  } else if (arrangement === "class-e") {
    const choke = requirePositive(spec.chokeInductance ?? 50 * L, "chokeInductance", "H", where);
    elements.push(
      { kind: "inductor", name: "Lchoke", a: "supply", b: "switch", inductance: choke },
      sw,
      { kind: "capacitor", name: "Cseries", a: "switch", b: "coilTop", capacitance: C }
    );
    if (rLoad > 0) {
      elements.push(
        { kind: "inductor", name: "Ltx", a: "coilTop", b: "load", inductance: L, resistance: R },
        { kind: "resistor", name: "Rload", a: "load", b: GROUND, resistance: rLoad }
      );
      nodes.load = "load";
    } else {
      elements.push({ kind: "inductor", name: "Ltx", a: "coilTop", b: GROUND, inductance: L, resistance: R });
    }
    if (R + rLoad === 0) warnings.push("singleSwitchDrive: the class-E coil branch has no resistance; the drive will not settle");
    nodes.coilTop = "coilTop";
  } else {
    throw new TanklightInputError([{ path: "arrangement", message: "must be 'parallel-tank' or 'class-e'", value: arrangement }], where);
  }
  if (cShunt > 0) elements.push({ kind: "capacitor", name: "Cshunt", a: "switch", b: GROUND, capacitance: cShunt });
  return { circuit: { elements }, frequency: f, coil: "Ltx", nodes, warnings };
}
function bridgeDrive(spec) {
  const where = "bridgeDrive";
  const supply = requirePositive(spec.supply, "supply", "V", where);
  const f = requirePositive(spec.frequency, "frequency", "Hz", where);
  const L = requirePositive(spec.coilInductance, "coilInductance", "H", where);
  const C = requirePositive(spec.tankCapacitance, "tankCapacitance", "F", where);
  const R = nonNegative2(spec.coilResistance ?? 0, "coilResistance", "\u03A9", where);
  const rLoad = nonNegative2(spec.loadResistance ?? 0, "loadResistance", "\u03A9", where);
  const ron = requirePositive(spec.onResistance ?? DEFAULT_ON_RESISTANCE, "onResistance", "\u03A9", where);
  if (spec.bridge !== "half" && spec.bridge !== "full") {
    throw new TanklightInputError([{ path: "bridge", message: "must be 'half' or 'full'", value: spec.bridge }], where);
  }
  const off = spec.offResistance !== void 0 ? { offResistance: spec.offResistance } : {};
  const high = periodicGate({ frequency: f, duty: 0.5 });
  const low = periodicGate({ frequency: f, duty: 0.5, invert: true });
  const elements = [
    { kind: "voltageSource", name: "Vsupply", plus: "supply", minus: GROUND, waveform: stepWaveform(supply) },
    { kind: "switch", name: "SAhigh", a: "supply", b: "midA", closed: high, onResistance: ron, ...off },
    { kind: "switch", name: "SAlow", a: "midA", b: GROUND, closed: low, onResistance: ron, ...off },
    { kind: "capacitor", name: "Ctank", a: "midA", b: "coilTop", capacitance: C }
  ];
  const nodes = { supply: "supply", midA: "midA", coilTop: "coilTop" };
  const end = spec.bridge === "half" ? GROUND : "midB";
  if (spec.bridge === "full") {
    elements.push(
      { kind: "switch", name: "SBhigh", a: "supply", b: "midB", closed: low, onResistance: ron, ...off },
      { kind: "switch", name: "SBlow", a: "midB", b: GROUND, closed: high, onResistance: ron, ...off }
    );
    nodes.midB = "midB";
  }
  if (rLoad > 0) {
    elements.push(
      { kind: "inductor", name: "Ltx", a: "coilTop", b: "load", inductance: L, resistance: R },
      { kind: "resistor", name: "Rload", a: "load", b: end, resistance: rLoad }
    );
    nodes.load = "load";
  } else {
    elements.push({ kind: "inductor", name: "Ltx", a: "coilTop", b: end, inductance: L, resistance: R });
  }
  return { circuit: { elements }, frequency: f, coil: "Ltx", nodes, warnings: [] };
}
function nonNegative2(x, field, unit, where) {
  if (!(typeof x === "number" && Number.isFinite(x) && x >= 0)) {
    throw new TanklightInputError([{ path: field, message: `must be a finite number \u2265 0 ${unit}`, value: x, expected: `\u2265 0 ${unit}` }], where);
  }
  return x;
}

// lib/circuit/transient/token.ts
function addToken(base, spec) {
  const where = "addToken";
  const p = spec.name ?? "token";
  if (typeof p !== "string" || p === "") throw new TanklightInputError([{ path: "name", message: "must be a non-empty string", value: p }], where);
  const L = requirePositive(spec.inductance, "inductance", "H", where);
  const C = requirePositive(spec.capacitance, "capacitance", "F", where);
  const R = spec.resistance;
  if (!(Number.isFinite(R) && R >= 0)) throw new TanklightInputError([{ path: "resistance", message: "must be a finite number \u2265 0 \u03A9", value: R }], where);
  if (spec.k === void 0 === (spec.mutualInductance === void 0)) {
    throw new TanklightInputError([{ path: "k", message: "give exactly one of k and mutualInductance", value: { k: spec.k, mutualInductance: spec.mutualInductance } }], where);
  }
  const target = base.elements.find((e) => e.name === spec.coupledTo);
  if (!target || target.kind !== "inductor") {
    throw new TanklightInputError([{ path: "coupledTo", message: "must name an inductor of the circuit", value: spec.coupledTo }], where);
  }
  const top = `${p}.top`;
  const bottom = GROUND;
  const coupling = spec.k !== void 0 ? { kind: "coupling", name: `${p}.M`, inductors: [spec.coupledTo, `${p}.L`], k: spec.k } : { kind: "coupling", name: `${p}.M`, inductors: [spec.coupledTo, `${p}.L`], mutualInductance: spec.mutualInductance };
  const els = [
    { kind: "inductor", name: `${p}.L`, a: top, b: bottom, inductance: L, resistance: R },
    { kind: "capacitor", name: `${p}.C`, a: top, b: bottom, capacitance: C },
    coupling
  ];
  const leds = {};
  const load = spec.load;
  const rs = (x, path) => {
    const v = x ?? 0;
    if (!(Number.isFinite(v) && v >= 0)) throw new TanklightInputError([{ path, message: "must be a finite number \u2265 0 \u03A9", value: v }], where);
    return v;
  };
  switch (load?.kind) {
    case "led":
      els.push({ kind: "diode", name: `${p}.led`, anode: top, cathode: bottom, model: load.led });
      leds.led = `${p}.led`;
      break;
    case "antiParallel":
      els.push(
        { kind: "diode", name: `${p}.a`, anode: top, cathode: bottom, model: load.a },
        { kind: "diode", name: `${p}.b`, anode: bottom, cathode: top, model: load.b }
      );
      leds.a = `${p}.a`;
      leds.b = `${p}.b`;
      break;
    case "parallelSameDirection":
      els.push(
        { kind: "diode", name: `${p}.a`, anode: top, cathode: bottom, model: load.a },
        { kind: "diode", name: `${p}.b`, anode: top, cathode: bottom, model: load.b }
      );
      leds.a = `${p}.a`;
      leds.b = `${p}.b`;
      break;
    case "bridge": {
      const pos = `${p}.dc+`;
      const neg = `${p}.dc-`;
      els.push(
        { kind: "diode", name: `${p}.d1`, anode: top, cathode: pos, model: load.diode },
        { kind: "diode", name: `${p}.d2`, anode: bottom, cathode: pos, model: load.diode },
        { kind: "diode", name: `${p}.d3`, anode: neg, cathode: top, model: load.diode },
        { kind: "diode", name: `${p}.d4`, anode: neg, cathode: bottom, model: load.diode }
      );
      const r = rs(load.seriesResistance, "load.seriesResistance");
      if (r > 0) {
        els.push(
          { kind: "resistor", name: `${p}.Rs`, a: pos, b: `${p}.mid`, resistance: r },
          { kind: "diode", name: `${p}.led`, anode: `${p}.mid`, cathode: neg, model: load.led }
        );
      } else {
        els.push({ kind: "diode", name: `${p}.led`, anode: pos, cathode: neg, model: load.led });
      }
      leds.led = `${p}.led`;
      break;
    }
    case "halfWaveReservoir": {
      const pos = `${p}.dc+`;
      const r = rs(load.seriesResistance, "load.seriesResistance");
      const cres = requirePositive(load.capacitance, "load.capacitance", "F", where);
      if (r > 0) {
        els.push(
          { kind: "resistor", name: `${p}.Rs`, a: top, b: `${p}.mid`, resistance: r },
          { kind: "diode", name: `${p}.diode`, anode: `${p}.mid`, cathode: pos, model: load.diode }
        );
      } else {
        els.push({ kind: "diode", name: `${p}.diode`, anode: top, cathode: pos, model: load.diode });
      }
      els.push(
        { kind: "capacitor", name: `${p}.Cres`, a: pos, b: bottom, capacitance: cres },
        { kind: "diode", name: `${p}.led`, anode: pos, cathode: bottom, model: load.led }
      );
      leds.led = `${p}.led`;
      break;
    }
    case "resistor":
      els.push({ kind: "resistor", name: `${p}.R`, a: top, b: bottom, resistance: requirePositive(load.resistance, "load.resistance", "\u03A9", where) });
      break;
    default:
      throw new TanklightInputError([{ path: "load.kind", message: "must be a TokenLoad kind (led, antiParallel, parallelSameDirection, bridge, halfWaveReservoir, resistor)", value: load?.kind }], where);
  }
  return { circuit: { elements: [...base.elements, ...els] }, top, coil: `${p}.L`, leds };
}
export {
  ALUMINIUM,
  BOLTZMANN,
  CLASS_E,
  COPPER,
  DEFAULT_LIT_THRESHOLD,
  DIELECTRICS,
  DIMENSIONS,
  DIODE_PRESET_DATA,
  ELEMENTARY_CHARGE,
  EPS0,
  FlatSpiralSpec,
  GROUND,
  HIGH_VOLTAGE_CAUTION,
  LED_PRESET_DATA,
  LinkConvergenceError,
  MATERIALS,
  MU0,
  PLANCK,
  RectLoopSpec,
  RectSpiralSpec,
  RoundCoilSpec,
  SERIES_TOLERANCE,
  SPEED_OF_LIGHT,
  SolenoidSpec,
  TanklightInputError,
  TransientConvergenceError,
  VACUUM_PERMEABILITY,
  VACUUM_PERMITTIVITY,
  VOLTAGE_RATINGS,
  ZERO_CELSIUS,
  addToken,
  antiParallelPair,
  averageLoadCurrent,
  awgDiameter,
  awgWire,
  bestCombination,
  bridgeDrive,
  bridgeRectifier,
  capacitorStress,
  classEDesign,
  classEDrive,
  coaxialLoopMutualInductance,
  coilResistance,
  coilResistanceDetail,
  conductorFootprint,
  copperWeightThickness,
  couplingEvaluator,
  couplingFactor,
  currentDrive,
  currentFedBridge,
  currentSheetInductance,
  detuningTolerance,
  dielectric,
  diode,
  diodePreset,
  esrFromDissipationFactor,
  fitShockley,
  flatSpiral,
  formatQuantity,
  frequencySweep,
  fullBridgeDrive,
  fundamentalConductance,
  groverRectangleInductance,
  halfBridgeDrive,
  halfWaveReservoir,
  isQuantity,
  led,
  ledPreset,
  linkNetwork,
  litzWire,
  loadResponse,
  loopField,
  loopMutualInductance,
  magneticField,
  material,
  maxLinkEfficiency,
  mohanCurrentSheetInductance,
  mohanModifiedWheelerInductance,
  mutualInductance,
  mutualInductanceChecked,
  nearestStandardValue,
  optimalLoad,
  parallelTankDrive,
  parseQuantity,
  pcbTrace,
  periodicGate,
  qualityFactor,
  qualityFactorDetail,
  recommendCapacitor,
  rectLoop,
  rectSpiral,
  reservoirSteadyState,
  resistivityAt,
  resistorLoad,
  resonantCapacitance,
  resonantFrequency,
  resonantFrequencyWindow,
  roundCoil,
  roundWire,
  roundWireAcFactor,
  sameDirectionPair,
  selfCapacitance,
  selfCapacitanceDetail,
  selfInductance,
  selfInductanceDetail,
  selfResonance,
  siUnit,
  simulate,
  sineDrive,
  sineWaveform,
  singleLed,
  singleSwitchDrive,
  skinDepth,
  solenoid,
  solveLink,
  solveLinkNetwork,
  standardValues,
  standardValuesBetween,
  steigerwaldEquivalentResistance,
  stepWaveform,
  summarizeLink,
  tankBandwidth,
  tankQuality,
  thermalVoltage,
  tokenResponse,
  tuneWithStandardParts,
  voltageBetween,
  waveformHarmonics,
  wheeler1982Inductance,
  wheelerFlatSpiralInductance,
  wheelerMultilayerInductance,
  wheelerSingleLayerInductance
};
