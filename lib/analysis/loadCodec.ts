/**
 * Token loads as plain data that can cross a worker boundary: an LED or diode is a Shockley
 * junction with closures (current, conductance, voltage), which structured clone cannot copy.
 * `encodeLoad` keeps its parameters; `decodeLoad` rebuilds the same junction with `led()` /
 * `diode()` at the same temperature, so the rebuilt model gives bit-identical currents.
 */
import { diode, led, type Diode, type Junction, type Led } from "../circuit/loads/led.ts";
import type { TokenLoad } from "../circuit/loads/types.ts";
import { assertNever } from "../errors.ts";

/** A junction's parameters (plain numbers and text). */
export interface JunctionData {
  readonly kind: "led" | "diode";
  readonly is: number;
  readonly n: number;
  readonly rs: number;
  readonly temperature: number;
  readonly leakage: number;
  readonly label: string;
  readonly source: string;
  readonly colour?: string;
  readonly ratedCurrent?: number;
}

/** A token load with its junctions as {@link JunctionData}. */
export type LoadData =
  | { readonly kind: "led"; readonly led: JunctionData }
  | { readonly kind: "antiParallel" | "parallelSameDirection"; readonly a: JunctionData; readonly b: JunctionData }
  | { readonly kind: "bridge"; readonly diode: JunctionData; readonly led: JunctionData; readonly seriesResistance?: number }
  | {
      readonly kind: "halfWaveReservoir";
      readonly diode: JunctionData;
      readonly led: JunctionData;
      readonly capacitance: number;
      readonly seriesResistance?: number;
      readonly frequency?: number;
    }
  | { readonly kind: "resistor"; readonly resistance: number };

function junctionData(j: Junction & { kind: "led" | "diode" }): JunctionData {
  const l = j as Partial<Led>;
  return {
    kind: j.kind,
    is: j.is,
    n: j.n,
    rs: j.rs,
    temperature: j.temperature,
    leakage: j.leakage,
    label: j.label,
    source: j.source,
    ...(l.colour !== undefined ? { colour: l.colour } : {}),
    ...(l.ratedCurrent !== undefined ? { ratedCurrent: l.ratedCurrent } : {}),
  };
}

function junctionOf(d: JunctionData): Led | Diode {
  const spec = {
    saturationCurrent: d.is,
    idealityFactor: d.n,
    seriesResistance: d.rs,
    referenceTemperature: d.temperature,
    leakage: d.leakage,
    label: d.label,
    source: d.source,
  };
  if (d.kind === "diode") return diode(spec);
  return led({ ...spec, ...(d.colour !== undefined ? { colour: d.colour } : {}), ...(d.ratedCurrent !== undefined ? { ratedCurrent: d.ratedCurrent } : {}) });
}

/** The load as plain data. */
export function encodeLoad(load: TokenLoad): LoadData {
  switch (load.kind) {
    case "led":
      return { kind: "led", led: junctionData(load.led) };
    case "antiParallel":
    case "parallelSameDirection":
      return { kind: load.kind, a: junctionData(load.a), b: junctionData(load.b) };
    case "bridge":
      return { kind: "bridge", diode: junctionData(load.diode), led: junctionData(load.led), ...(load.seriesResistance !== undefined ? { seriesResistance: load.seriesResistance } : {}) };
    case "halfWaveReservoir":
      return { ...load, diode: junctionData(load.diode), led: junctionData(load.led) };
    case "resistor":
      return { kind: "resistor", resistance: load.resistance };
    default:
      return assertNever(load, "load.kind", "encodeLoad", "is not a known token load");
  }
}

/** The load rebuilt from {@link encodeLoad}'s data. */
export function decodeLoad(d: LoadData): TokenLoad {
  switch (d.kind) {
    case "led":
      return { kind: "led", led: junctionOf(d.led) as Led };
    case "antiParallel":
    case "parallelSameDirection":
      return { kind: d.kind, a: junctionOf(d.a) as Led, b: junctionOf(d.b) as Led };
    case "bridge":
      return { kind: "bridge", diode: junctionOf(d.diode) as Diode, led: junctionOf(d.led) as Led, ...(d.seriesResistance !== undefined ? { seriesResistance: d.seriesResistance } : {}) };
    case "halfWaveReservoir":
      return { ...d, diode: junctionOf(d.diode) as Diode, led: junctionOf(d.led) as Led };
    case "resistor":
      return { kind: "resistor", resistance: d.resistance };
  }
}

/** True when the value is a TokenLoad (plain data with a kind), not a ready load model. */
export function isTokenLoad(load: unknown): load is TokenLoad {
  return typeof load === "object" && load !== null && typeof (load as { kind?: unknown }).kind === "string" && typeof (load as { conductance?: unknown }).conductance !== "function";
}
