/**
 * The look of tanklight's charts: our own palette (warm paper, slate ink, a teal–amber
 * accent pair, LED colours that read as the LED they stand for) and a vega-lite `config`
 * that every chart builder attaches. Plain data; no module state.
 */
import { TanklightInputError } from "../errors.ts";

/** Named colours of the tanklight palette (hex sRGB). */
export const PALETTE = {
  paper: "#fbf8f1",
  ink: "#26303b",
  muted: "#6f7884",
  grid: "#e7e1d4",
  teal: "#17807a",
  amber: "#d99a1e",
  brick: "#b8412c",
  indigo: "#3f4f9e",
  moss: "#5f8a2b",
  plum: "#84407a",
  /** dead zones and unlit cells */
  dark: "#2f3440",
  /** the lit boundary and reference-level contours */
  boundary: "#f2f2f2",
  limit: "#c0392b",
} as const;

/** Series colours, in order, for curves that are not LEDs. */
export const SERIES_COLOURS: readonly string[] = [PALETTE.teal, PALETTE.amber, PALETTE.indigo, PALETTE.brick, PALETTE.moss, PALETTE.plum];

/**
 * A colour that reads as the LED (by preset name or free text containing it).
 * @example ledSwatch("green-gap") // → "#2f9a4c"
 */
export function ledSwatch(colour: string): string {
  if (typeof colour !== "string") throw new TanklightInputError([{ path: "colour", message: "must be an LED colour (a preset name or free text)", value: colour }], "ledSwatch");
  const c = colour.toLowerCase();
  if (c.includes("red")) return "#d23a2a";
  if (c.includes("orange")) return "#e9781f";
  if (c.includes("yellow")) return "#d7a80f";
  if (c.includes("green")) return "#2f9a4c";
  if (c.includes("blue")) return "#2b67b5";
  if (c.includes("white")) return "#8c8f96";
  return PALETTE.ink;
}

/** Sequential ramp for current and field maps: night blue → teal → sand → pale gold. */
export const HEAT_RAMP: readonly string[] = ["#1d2b4a", "#1c5d74", "#17807a", "#7fb27a", "#e3cf7c", "#fbf1c9"];

/** Diverging ramp for a ratio around 1 (below: teal, above: brick). */
export const RATIO_RAMP: readonly string[] = ["#0f5e59", "#6fb3a8", "#f4efe2", "#e39a7c", "#9d2f1f"];

/** The vega-lite config block every chart carries. */
export const CHART_CONFIG = {
  background: PALETTE.paper,
  padding: 12,
  font: "Helvetica, Arial, sans-serif",
  view: { stroke: PALETTE.grid, fill: "#ffffff" },
  title: { font: "Georgia, serif", fontSize: 15, fontWeight: "normal", color: PALETTE.ink, anchor: "start", subtitleColor: PALETTE.muted, subtitleFontSize: 11, offset: 10 },
  axis: {
    labelColor: PALETTE.muted,
    titleColor: PALETTE.ink,
    titleFont: "Georgia, serif",
    titleFontWeight: "normal",
    titleFontSize: 12,
    labelFontSize: 10,
    gridColor: PALETTE.grid,
    domainColor: PALETTE.muted,
    tickColor: PALETTE.muted,
  },
  legend: { titleFont: "Georgia, serif", titleFontWeight: "normal", labelColor: PALETTE.ink, titleColor: PALETTE.ink, orient: "right", labelLimit: 260 },
  line: { strokeWidth: 2 },
  point: { filled: true, size: 40 },
  range: { category: SERIES_COLOURS },
} as const;
