/** The casebook's scenarios by name (design.md §7). */
import * as coaxialLoops from "./coaxialLoops.ts";

export interface Scenario {
  /** one line: what question the scenario answers */
  readonly title: string;
  readonly run: () => { notebook: string; results: unknown } | Promise<{ notebook: string; results: unknown }>;
}

export const scenarios: Record<string, Scenario> = {
  "coaxial-loops": { title: "How fast does coupling fall with height?", run: coaxialLoops.run },
};
