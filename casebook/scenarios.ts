/** The casebook's scenarios by name (docs/design.md §7). */
import * as coaxialLoops from "./coaxialLoops.ts";
import * as pebbleDrawer from "./pebbleDrawer.ts";

export interface Scenario {
  /** one line: what question the scenario answers */
  readonly title: string;
  readonly run: () => { notebook: string; results: unknown } | Promise<{ notebook: string; results: unknown }>;
}

export const scenarios: Record<string, Scenario> = {
  "pebble-drawer": { title: "Will every pebble glow, wherever a visitor puts it?", run: pebbleDrawer.run },
  "coaxial-loops": { title: "How fast does coupling fall with height?", run: coaxialLoops.run },
};
