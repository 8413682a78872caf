/** The casebook's scenarios by name (design.md §7). */
import type { Notebook } from "../lib/mod.ts";
import * as coaxialLoops from "./coaxialLoops.ts";
import * as driveWaveforms from "./driveWaveforms.ts";
import * as gameBoard from "./gameBoard.ts";
import * as museumShelf from "./museumShelf.ts";
import * as pebbleDrawer from "./pebbleDrawer.ts";
import * as resinPendant from "./resinPendant.ts";
import * as throughTheBooks from "./throughTheBooks.ts";
import * as tokenBatch from "./tokenBatch.ts";
import * as unknownDriver from "./unknownDriver.ts";

/** What every scenario's run() accepts. */
export interface ScenarioOptions {
  /** receives progress lines of long steps */
  readonly log?: (line: string) => void;
}

export interface Scenario {
  /** one line: what question the scenario answers */
  readonly title: string;
  readonly run: (options?: ScenarioOptions) => { notebook: Notebook; results: unknown } | Promise<{ notebook: Notebook; results: unknown }>;
}

export const scenarios: Record<string, Scenario> = {
  "pebble-drawer": { title: "Will every pebble glow, wherever a visitor puts it?", run: pebbleDrawer.run },
  "coaxial-loops": { title: "How fast does coupling fall with height?", run: coaxialLoops.run },
  "through-the-books": { title: "Will a bookmark glow on top of a stack of books?", run: throughTheBooks.run },
  "museum-shelf": { title: "Do replica coins and gems glow anywhere on a 60 cm shelf, and what does it take?", run: museumShelf.run },
  "resin-pendant": { title: "Which frequency, colour and tilt suit a pendant with a tiny coil?", run: resinPendant.run },
  "token-batch": { title: "Will two hundred hand-wound tokens all light, and what does 99 % take?", run: tokenBatch.run },
  "drive-waveforms": { title: "What does the single switch from 5 V really do to the coil, and how far does the fast model hold?", run: driveWaveforms.run },
  "game-board": { title: "How do four tiles light 24 pieces anywhere on a 40 cm board?", run: gameBoard.run },
  "unknown-driver": { title: "How far will a new pebble reach on a pad whose driver nobody documented?", run: unknownDriver.run },
};
