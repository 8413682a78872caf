/**
 * Fuzz: the EM layer's public functions (lib/em via lib/mod.ts) — bad and extreme inputs give a
 * clear TanklightInputError or a finite result, never a TypeError, NaN or a hang
 * (framework: tests/fuzz/framework.ts).
 */
import { fuzzSuite } from "./framework.ts";
import { tx, tok, hand } from "./emFixtures.ts";
import { mutualInductance, mutualInductanceChecked, couplingFactor } from "../../lib/em/mutualInductance.ts";
import { selfInductance, selfInductanceDetail } from "../../lib/em/selfInductance.ts";
import { magneticField } from "../../lib/em/magneticField.ts";
import { loopMutualInductance } from "../../lib/em/loopMutual.ts";
import { coaxialLoopMutualInductance } from "../../lib/em/coaxialMutual.ts";
import { coilResistance, coilResistanceDetail } from "../../lib/em/losses/coilResistance.ts";
import { qualityFactor } from "../../lib/em/losses/qualityFactor.ts";
import { skinDepth } from "../../lib/em/losses/skinDepth.ts";
import { selfCapacitance, selfResonance } from "../../lib/em/selfCapacitance.ts";

const loopA = { center: [0, 0, 0], axis: [0, 0, 1], radius: 0.03 };
const loopB = { center: [0.01, 0, 0.02], axis: [0, 0.3, 1], radius: 0.01 };

fuzzSuite("em", [
  { name: "mutualInductance", call: mutualInductance, valid: [hand(), { position: [0, 0, 0] }, tok, { position: [0, 0, 0.02], axis: [0, 0.2, 1], spin: 0.1 }], params: ["a", "poseA", "b", "poseB"], skip: ["2"] },
  { name: "mutualInductanceChecked", where: "mutualInductance", call: mutualInductanceChecked, valid: [tok, { position: [0, 0, 0] }, hand(), { position: [0, 0, 0.02] }], params: ["a", "poseA", "b", "poseB"], skip: ["0"] },
  { name: "couplingFactor", call: couplingFactor, valid: [tx, { position: [0, 0, 0] }, tok, { position: [0, 0, 0.02], axis: [0, 0, 1] }], params: ["a", "poseA", "b", "poseB"], skip: ["0", "2"] },
  { name: "selfInductance", call: selfInductance, valid: [hand(), { frequency: 2e5 }], params: ["coil", "options"] },
  { name: "selfInductanceDetail", where: "selfInductance", call: selfInductanceDetail, valid: [hand(), { frequency: "200 kHz" }], params: ["coil", "options"] },
  { name: "magneticField", call: magneticField, valid: [hand(), { position: [0, 0, 0] }, 1, [0.005, 0, 0.01]], params: ["coil", "pose", "current", "point"] },
  { name: "loopMutualInductance", call: loopMutualInductance, valid: [loopA, loopB, { relTol: 1e-9 }], params: ["a", "b", "options"] },
  { name: "coaxialLoopMutualInductance", call: coaxialLoopMutualInductance, valid: [0.04, 0.006, 0.03], params: ["ra", "rb", "d"] },
  { name: "coilResistance", call: coilResistance, valid: [hand(), "200 kHz", { temperature: 300 }], params: ["coil", "f", "opts"] },
  { name: "coilResistanceDetail", where: "coilResistance", call: coilResistanceDetail, valid: [hand(), 2e5, { temperature: "30 degC" }], params: ["coil", "f", "opts"] },
  { name: "qualityFactor", call: qualityFactor, valid: [hand(), 2e5, {}], params: ["coil", "f", "opts"] },
  { name: "skinDepth", call: skinDepth, valid: ["200 kHz", 1.7241e-8, 1], params: ["f", "resistivity", "muR"] },
  { name: "selfCapacitance", call: selfCapacitance, valid: [hand()], params: ["coil"] },
  { name: "selfResonance", call: selfResonance, valid: [hand()], params: ["coil"] },
]);
