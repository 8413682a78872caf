/**
 * The link solver's internal entries and the steady-state engines (issue 11): a null or junk
 * record argument gives a clear TanklightInputError naming the function and the argument, not a
 * TypeError from inside. Their full fuzz suites (every field of a network) are still to come
 * (tests/fuzz/coverage.test.ts lists them).
 */
import { describe, expect, it } from "vitest";
import { solveLinkNetwork, summarizeLink, periodicSteadyState, solveLinkHarmonic, solveLinkModel } from "../../lib/mod.ts";
import { fundamentalCheck } from "../../lib/advanced.ts";
import { TanklightInputError } from "../../lib/errors.ts";

describe("link and steady-state entries refuse a missing record by name", () => {
  const cases: [string, () => unknown, RegExp][] = [
    ["solveLinkNetwork", () => solveLinkNetwork(null as never), /^solveLinkNetwork: network: must be an object, got null/],
    ["solveLinkNetwork options", () => solveLinkNetwork({ frequency: 1 } as never, 42 as never), /^solveLinkNetwork: options: must be an object, got 42/],
    ["summarizeLink", () => summarizeLink("banana" as never), /^summarizeLink: result: must be an object, got 'banana'/],
    ["periodicSteadyState", () => periodicSteadyState({ elements: [] } as never, null as never), /^periodicSteadyState: opts: must be an object, got null/],
    ["solveLinkHarmonic", () => solveLinkHarmonic(null as never), /^solveLinkHarmonic: network: must be an object, got null/],
    ["solveLinkModel", () => solveLinkModel([] as never), /^solveLinkModel: network: must be an object, got \[\]/],
    ["fundamentalCheck", () => fundamentalCheck(null as never, null as never), /^fundamentalCheck: network: must be an object, got null/],
  ];
  for (const [label, call, message] of cases) {
    it(`${label}: a clear TanklightInputError`, () => {
      expect(call).toThrow(TanklightInputError);
      expect(call).toThrow(message);
    });
  }
});
