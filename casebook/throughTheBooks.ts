/**
 * Casebook — "Through the books": will a bookmark glow on top of a stack of books, with the
 * transmitter under the shelf? Range at its limit, and why paper does not matter while
 * distance does.
 *
 * This scenario is a design file (casebook/designs/through-the-books.json) run through
 * designReport: `npm run casebook -- --design casebook/designs/through-the-books.json` writes
 * the same report. Copy the JSON, change the numbers, and run it the same way.
 *
 * Demo data: the window, shelf, books and parts are our own invention.
 */
import { readFileSync } from "node:fs";
import { designReport, parseDesignText, type DesignResults, type Notebook } from "../lib/mod.ts";
import type { ScenarioOptions } from "./scenarios.ts";

/** The design file this scenario runs. */
export const designFile = new URL("./designs/through-the-books.json", import.meta.url);

/** Runs the scenario: the design file's full report and its numbers. */
export function run(options: ScenarioOptions = {}): { notebook: Notebook; results: DesignResults } {
  return designReport(parseDesignText(readFileSync(designFile, "utf8")), options);
}
