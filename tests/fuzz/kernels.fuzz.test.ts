/**
 * Fuzz: the EM kernels and formulas not in em.fuzz.test.ts — loop field and vector potential,
 * segment potential, frames, the classic inductance formulas, straight/polygon/circle–polygon
 * mutuals, the coupling evaluator (its options and its per-pose methods), arrayCoupling,
 * materials and the loss models' internals. Bad and extreme arguments give a clear
 * TanklightInputError naming the function and the argument, or a finite result
 * (framework: tests/fuzz/framework.ts). Coils made by the builders are passed along, not
 * mutated (`skip`); a hand-made coil is mutated field by field.
 */
import { fuzzSuite } from "./framework.ts";
import { tx, tok, hand } from "./emFixtures.ts";
import {
  loopField, arrayCoupling, couplingEvaluator, straightFilamentMutual, polygonPairMutual, circlePolygonMutual,
  resistivityAt, material, COPPER, awgDiameter, currentSheetInductance, wheeler1982Inductance, wheelerSingleLayerInductance,
  wheelerMultilayerInductance, wheelerFlatSpiralInductance, mohanModifiedWheelerInductance, mohanCurrentSheetInductance,
  groverRectangleInductance, conductorFootprint, roundWire, roundWireAcFactor, qualityFactorDetail, selfCapacitanceDetail,
} from "../../lib/mod.ts";
import {
  loopVectorPotential, segmentVectorPotential, poseFrame, worldFilaments, archimedeanArcLength, internalInductanceFactor,
  nagaokaCoefficient, lundinNagaokaCoefficient, rosaB, rosaRoundWireCorrection, roundWireInternalInductanceFactor,
  roundWireProximityFactor, turnFieldsPerAmpere, dowellFactor, dowellDelta, litzResistancePerLength, traceResistancePerLength,
  slabSkinFactor, medhurstCoefficient,
} from "../../lib/advanced.ts";

const square = (h: number, z: number) => [[-h, -h, z], [h, -h, z], [h, h, z], [-h, h, z]];
const ev = couplingEvaluator(tx, tok);
const rho = 1.7241e-8;

fuzzSuite("kernels", [
  // fields and potentials
  { name: "loopField", call: loopField, valid: [0.03, 1, 0.01, 0.02], params: ["radius", "current", "rho", "z"] },
  { name: "loopVectorPotential", call: loopVectorPotential, valid: [0.03, 1, 0.01, 0.02], params: ["radius", "current", "rho", "z"] },
  { name: "segmentVectorPotential", call: segmentVectorPotential, valid: [[0, 0, 0], [0.1, 0, 0], 1, [0.05, 0.02, 0]], params: ["p", "q", "current", "x"] },
  { name: "poseFrame", call: poseFrame, valid: [{ position: [0, 0, 0.01], axis: [0, 0.3, 1], spin: 0.2 }], params: ["pose"] },
  { name: "worldFilaments", call: worldFilaments, valid: [hand(), { position: [0, 0, 0.01], axis: [0, 0.3, 1] }], params: ["coil", "pose"] },
  // classic formulas
  { name: "archimedeanArcLength", call: archimedeanArcLength, valid: [0.005, 0.02, 0.001], params: ["r0", "r1", "pitch"] },
  { name: "internalInductanceFactor", call: internalInductanceFactor, valid: [2], params: ["x"] },
  { name: "nagaokaCoefficient", call: nagaokaCoefficient, valid: [0.01, 0.02], params: ["radius", "length"] },
  { name: "lundinNagaokaCoefficient", call: lundinNagaokaCoefficient, valid: [0.01, 0.02], params: ["radius", "length"] },
  { name: "currentSheetInductance", call: currentSheetInductance, valid: [0.01, 0.02, 10], params: ["radius", "length", "turns"] },
  { name: "wheeler1982Inductance", call: wheeler1982Inductance, valid: [0.01, 0.02, 10], params: ["radius", "length", "turns"] },
  { name: "wheelerSingleLayerInductance", call: wheelerSingleLayerInductance, valid: [0.01, 0.02, 10], params: ["meanRadius", "length", "turns"] },
  { name: "wheelerMultilayerInductance", call: wheelerMultilayerInductance, valid: [0.01, 0.01, 0.005, 50], params: ["meanRadius", "length", "depth", "turns"] },
  { name: "wheelerFlatSpiralInductance", call: wheelerFlatSpiralInductance, valid: [0.02, 0.01, 10], params: ["meanRadius", "depth", "turns"] },
  { name: "mohanModifiedWheelerInductance", call: mohanModifiedWheelerInductance, valid: [10, 0.02, 0.01, "square"], params: ["turns", "outerDiameter", "innerDiameter", "outline"] },
  { name: "mohanCurrentSheetInductance", call: mohanCurrentSheetInductance, valid: [10, 0.02, 0.01, "circle"], params: ["turns", "outerDiameter", "innerDiameter", "outline"] },
  { name: "groverRectangleInductance", call: groverRectangleInductance, valid: [0.1, 0.1, 0.0005, { internal: 0.25 }], params: ["width", "height", "wireRadius", "opts"] },
  { name: "rosaB", call: rosaB, valid: [10], params: ["turns"] },
  { name: "rosaRoundWireCorrection", call: rosaRoundWireCorrection, valid: [0.01, 10, 0.001, 0.0008], params: ["radius", "turns", "pitch", "wireDiameter"] },
  { name: "awgDiameter", call: awgDiameter, valid: [26], params: ["gauge"] },
  // straight conductors, polygons, circle–polygon
  { name: "straightFilamentMutual", call: straightFilamentMutual, valid: [[0, 0, 0], [0.1, 0, 0], [0, 0.01, 0], [0.1, 0.01, 0]], params: ["p1", "q1", "p2", "q2"] },
  { name: "polygonPairMutual", call: polygonPairMutual, valid: [square(0.02, 0), square(0.01, 0.01)], params: ["a", "b"] },
  { name: "circlePolygonMutual", call: circlePolygonMutual, valid: [{ center: [0, 0, 0.02], axis: [0, 0, 1], radius: 0.006 }, square(0.02, 0), { relTol: 1e-10 }], params: ["circle", "polygon", "options"] },
  // the coupling evaluator, its per-pose methods, arrays
  { name: "couplingEvaluator", call: couplingEvaluator, valid: [tx, tok, { relTol: 1e-3, frequency: 2e5 }], params: ["tx", "rx", "options"], skip: ["0", "1"], extreme: [[hand(), hand()]], budgetMs: 4000 },
  { name: "couplingEvaluator().coupling", where: "couplingEvaluator", call: (a: never, b: never) => ev.coupling(a, b), valid: [{ position: [0, 0, 0] }, { position: [0.01, 0, 0.02], axis: [0, 0.2, 1], spin: 0.3 }], params: ["poseTx", "poseRx"] },
  { name: "couplingEvaluator().evaluate", where: "couplingEvaluator", call: (a: never, b: never) => ev.evaluate(a, b), valid: [{ position: [0, 0, 0] }, { position: [0.01, 0, 0.02] }], params: ["poseTx", "poseRx"] },
  { name: "arrayCoupling", call: arrayCoupling, valid: [[{ coil: tx, pose: { position: [0, 0, 0] } }, { coil: tx, pose: { position: [0.05, 0, 0] } }], tok, { relTol: 1e-3 }], params: ["transmitters", "token", "options"], skip: ["0.0.coil", "0.1.coil", "1"], budgetMs: 4000 },
  // materials and loss internals
  { name: "material", call: material, valid: ["copper"], params: ["material"] },
  { name: "resistivityAt", call: resistivityAt, valid: [{ ...COPPER }, 300], params: ["m", "temperature"], text: ["0.name", "0.source"] },
  { name: "roundWireAcFactor", call: roundWireAcFactor, valid: [0.0005, 2e5, rho], params: ["radius", "f", "resistivity"] },
  { name: "roundWireInternalInductanceFactor", call: roundWireInternalInductanceFactor, valid: [0.0005, 2e5, rho], params: ["radius", "f", "resistivity"] },
  { name: "roundWireProximityFactor", call: roundWireProximityFactor, valid: [0.001, 2e5, rho], params: ["diameter", "f", "resistivity"] },
  { name: "turnFieldsPerAmpere", call: turnFieldsPerAmpere, valid: [hand()], params: ["coil"] },
  { name: "dowellFactor", call: dowellFactor, valid: [1.2, 3], params: ["Delta", "layers"] },
  { name: "dowellDelta", call: dowellDelta, valid: [0.0005, 0.0006, 2e5, rho], params: ["diameter", "pitch", "f", "resistivity"] },
  { name: "litzResistancePerLength", call: litzResistancePerLength, valid: [40, 7.1e-5, 6e-4, 2e5, rho], params: ["strands", "strandDiameter", "bundleDiameter", "f", "resistivity"] },
  { name: "traceResistancePerLength", call: traceResistancePerLength, valid: [5e-4, 3.5e-5, 2e5, rho], params: ["width", "thickness", "f", "resistivity"] },
  { name: "slabSkinFactor", call: slabSkinFactor, valid: [1.5], params: ["Delta"] },
  { name: "medhurstCoefficient", call: medhurstCoefficient, valid: [2], params: ["lengthOverDiameter"] },
  { name: "conductorFootprint", call: conductorFootprint, valid: [{ ...roundWire("0.5 mm") }], params: ["c"] },
  { name: "qualityFactorDetail", where: "qualityFactor", call: qualityFactorDetail, valid: [hand(), 2e5, {}], params: ["coil", "f", "opts"] },
  { name: "selfCapacitanceDetail", where: "selfCapacitance", call: selfCapacitanceDetail, valid: [hand()], params: ["coil"] },
]);
