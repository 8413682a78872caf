/**
 * Fuzz: the analysis layer's small functions of lib/mod.ts (issue 11) — wilsonInterval and
 * drivePlausibility. Bad and extreme arguments give a clear TanklightInputError naming the
 * function and the argument, or a finite result (framework: tests/fuzz/framework.ts). The
 * whole-design runs (coverageMap, findRange, toleranceYield, searchDesign, calibrate, predict*,
 * taskPool) are listed in tests/fuzz/coverage.test.ts with their reason.
 */
import { fuzzSuite } from "./framework.ts";
import { wilsonInterval, drivePlausibility } from "../../lib/mod.ts";

fuzzSuite("analysis", [
  { name: "wilsonInterval", call: wilsonInterval, valid: [45, 50, 0.95], params: ["successes", "trials", "level"] },
  { name: "drivePlausibility", call: drivePlausibility, valid: ["2.1 A", { inductance: "6 uH", resistance: 0.1, frequency: "200 kHz" }, { supply: "5 V", currentLimit: 0.5 }], params: ["coilCurrent", "coil", "supply"] },
]);
