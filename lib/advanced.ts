/**
 * tanklight/advanced — kernels and numerics for people who build on the library rather than
 * design with it: elliptic integrals, quadrature, Kelvin functions, Lambert W, dense linear
 * algebra, complex arithmetic, seeded random numbers, the input-guard
 * helpers, the circular-filament and frame kernels, and the loss models' internals.
 *
 * The designer's names (builders, M/L/k, losses, parts, loads, link, transient, analysis,
 * safety, reports) are in `tanklight` (lib/mod.ts); nothing here is needed for a design run.
 * Hot-path forms here may skip validation where their doc comment says so.
 */

// ── errors and schema building blocks ────────────────────────────────
export { requirePositive, requireNonNegative, requireFinite, describeValue, formatIssue } from "./errors.ts";
export {
  quantity,
  quantityMeta,
  parseInput,
  vec3,
  unitVector,
  type Vec3Schema,
  type UnitVectorSchema,
  type QuantityOptions,
  type QuantityMeta,
  type QuantitySchema,
} from "./schema.ts";
/** Schema shorthands by dimension: `schema.length()`, `schema.frequency()`, … (lib/schema.ts). */
export * as schema from "./schema.ts";

// ── lib/math ─────────────────────────────────────────────────────────────────
export {
  ellipticK,
  ellipticE,
  ellipticKE,
  ellipticKEComplement,
  ellipticKEInto,
  type EllipticPair,
} from "./math/elliptic.ts";
export {
  gaussLegendre,
  integrateGaussLegendre,
  integrateAdaptive,
  type GaussRule,
  type IntegrationResult,
  type AdaptiveOptions,
} from "./math/quadrature.ts";
export { lambertW, lambertWOfLog } from "./math/lambertW.ts";
export {
  complexMul,
  complexMulConj,
  complexDiv,
  complexInv,
  complexAbs,
  complexArg,
  complexSqrt,
  complexFromPolar,
  type Complex,
} from "./math/complex.ts";
export { solveComplex } from "./math/solveComplex.ts";
export { complexLuFactor, complexLuSolve } from "./math/complexLu.ts";
export { luFactor, luSolve, solveLinear, SingularMatrixError, LU_PIVOT_RTOL } from "./math/lu.ts";
export { createRandom, createRandomFromState, type RandomSource } from "./math/random.ts";
export { kelvin, kelvinScaled, ber, bei, berPrime, beiPrime, type KelvinValues } from "./math/kelvin.ts";

// ── lib/em kernels ───────────────────────────────────────────────────────────
export { loopVectorPotential } from "./em/vectorPotential.ts";
export { segmentVectorPotential } from "./em/segmentPotential.ts";
export { poseFrame, worldFilaments, type Frame } from "./em/frames.ts";
export { archimedeanArcLength } from "./em/builders/common.ts";
export { internalInductanceFactor } from "./em/selfInductance.ts";
export { INCH, MICROHENRY, nagaokaCoefficient, lundinNagaokaCoefficient, rosaB, rosaRoundWireCorrection } from "./em/classicFormulas.ts";
export { roundWireInternalInductanceFactor } from "./em/losses/roundWireAcFactor.ts";
export { roundWireProximityFactor, turnFieldsPerAmpere, type TurnFields } from "./em/losses/proximity.ts";
export { dowellFactor, dowellDelta } from "./em/losses/dowell.ts";
export { litzResistancePerLength, type LitzResistance } from "./em/losses/litz.ts";
export { traceResistancePerLength, slabSkinFactor, type TraceResistance } from "./em/losses/trace.ts";
export { medhurstCoefficient, MEDHURST_TABLE } from "./em/selfCapacitance.ts";

// ── lib/circuit internals ────────────────────────────────────────────────────
export { fundamentalCurrentSlope, describingFunctionReference } from "./circuit/loads/describingFunction.ts";
export { tokenLoadModel, type TokenLoadModelOptions } from "./circuit/link/tokenLoad.ts";
export { fundamentalCheck, type FundamentalCheck } from "./circuit/harmonic/modelChoice.ts";
