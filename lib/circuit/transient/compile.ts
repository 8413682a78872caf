/**
 * Checks a `TransientCircuit` and compiles it into index arrays for the engine: node numbers,
 * branch-current numbers (voltage sources and inductors, the extra unknowns of modified
 * nodal analysis, Ho, Ruehli & Brennan 1975), the inductance matrix with its mutual terms,
 * and the topology checks: a floating node (no path to ground except through current
 * sources), a loop of voltage sources, an inductance matrix that is not positive definite.
 * Each error names the elements involved.
 */

import { TanklightInputError, assertNever, type InputIssue } from "../../errors.ts";
import type { DiodeModel } from "../types.ts";
import { elementNodes, GROUND, type CircuitElement, type TransientCircuit, type Waveform } from "./circuit.ts";

const WHERE = "simulate";

/** Default off-state resistance of a switch, Ω. */
export const DEFAULT_SWITCH_OFF_RESISTANCE = 1e6;

/** The circuit as index arrays (node index −1 is ground). */
export interface CompiledCircuit {
  readonly nodeNames: readonly string[];
  readonly nodeIndex: ReadonlyMap<string, number>;
  /** node count (without ground) + branch count */
  readonly size: number;
  readonly resistors: { readonly name: string; readonly a: number; readonly b: number; readonly g: number }[];
  readonly capacitors: { readonly name: string; readonly a: number; readonly b: number; readonly c: number; readonly v0: number }[];
  /** `row` is the unknown holding the branch current; `l` is row of the inductance matrix (H) */
  readonly inductors: { readonly name: string; readonly a: number; readonly b: number; readonly row: number; readonly r: number; readonly i0: number; readonly l: Float64Array }[];
  readonly voltageSources: { readonly name: string; readonly a: number; readonly b: number; readonly row: number; readonly waveform: Waveform }[];
  readonly currentSources: { readonly name: string; readonly from: number; readonly to: number; readonly waveform: Waveform }[];
  readonly switches: { readonly name: string; readonly a: number; readonly b: number; readonly gOn: number; readonly gOff: number; readonly closed: (t: number) => boolean }[];
  readonly diodes: { readonly name: string; readonly a: number; readonly b: number; readonly model: DiodeModel }[];
  /** elements attached to each node (for error messages), by node index */
  readonly attached: readonly (readonly string[])[];
  /** names of the unknowns: node names, then "current of <element>" */
  readonly unknownNames: readonly string[];
}

function fail(issues: InputIssue[]): never {
  throw new TanklightInputError(issues, WHERE);
}

function positive(x: unknown, path: string, unit: string, issues: InputIssue[]): number {
  if (typeof x !== "number" || !Number.isFinite(x) || x <= 0) {
    issues.push({ path, message: `must be a finite number > 0 ${unit}`, value: x, expected: `> 0 ${unit}` });
    return 1;
  }
  return x;
}

function finiteOr(x: unknown, dflt: number, path: string, unit: string, issues: InputIssue[]): number {
  if (x === undefined) return dflt;
  if (typeof x !== "number" || !Number.isFinite(x)) {
    issues.push({ path, message: `must be a finite number in ${unit}`, value: x, expected: `finite ${unit}` });
    return dflt;
  }
  return x;
}

/** A DiodeModel: current(v) and conductance(v) functions. */
function isDiodeModel(m: unknown): m is DiodeModel {
  const d = m as DiodeModel | undefined;
  return typeof d === "object" && d !== null && typeof d.current === "function" && typeof d.conductance === "function";
}

/** Union–find over node names. */
class Components {
  private parent = new Map<string, string>();
  find(x: string): string {
    let p = this.parent.get(x) ?? x;
    if (p === x) return x;
    p = this.find(p);
    this.parent.set(x, p);
    return p;
  }
  union(a: string, b: string): boolean {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra === rb) return false;
    this.parent.set(ra, rb);
    return true;
  }
}

/** The elements on the path from `from` to `to` through the given edges (breadth-first). */
function pathThrough(edges: readonly { name: string; a: string; b: string }[], from: string, to: string): string[] {
  const prev = new Map<string, { node: string; edge: string }>();
  const seen = new Set([from]);
  const queue = [from];
  while (queue.length > 0) {
    const n = queue.shift()!;
    if (n === to) break;
    for (const e of edges) {
      const other = e.a === n ? e.b : e.b === n ? e.a : undefined;
      if (other !== undefined && !seen.has(other)) {
        seen.add(other);
        prev.set(other, { node: n, edge: e.name });
        queue.push(other);
      }
    }
  }
  const out: string[] = [];
  let n = to;
  while (n !== from) {
    const p = prev.get(n);
    if (!p) break;
    out.push(p.edge);
    n = p.node;
  }
  return out.reverse();
}

/** Inductors as collected: the compiled fields plus the self-inductance L, before the matrix is built. */
type RawInductor = { name: string; a: number; b: number; row: number; r: number; i0: number; l: Float64Array; L: number };
/** A coupling as collected: the two inductor names and k or M. */
type RawCoupling = { name: string; path: string; pair: readonly [string, string]; k?: number; m?: number };

/** Node numbering: names in order of first appearance, ground = −1, and the elements at each node. */
interface NodeTable {
  readonly nodeIndex: Map<string, number>;
  readonly nodeNames: string[];
  readonly attached: string[][];
}

const ELEMENT_KINDS = ["resistor", "capacitor", "inductor", "coupling", "voltageSource", "currentSource", "switch", "diode"];

/** Every element has a unique non-empty name, a known kind and non-empty terminal names. */
function checkElements(circuit: TransientCircuit): readonly CircuitElement[] {
  if (!circuit || !Array.isArray(circuit.elements) || circuit.elements.length === 0) {
    fail([{ path: "circuit.elements", message: "must be a non-empty array of elements", value: circuit?.elements }]);
  }
  const issues: InputIssue[] = [];
  const elements = circuit.elements as readonly CircuitElement[];
  const names = new Set<string>();
  elements.forEach((e, i) => {
    const path = `circuit.elements[${i}]`;
    if (typeof e?.name !== "string" || e.name === "") {
      issues.push({ path: `${path}.name`, message: "must be a non-empty string", value: e?.name });
    } else if (names.has(e.name)) {
      issues.push({ path: `${path}.name`, message: "duplicates another element's name", value: e.name });
    } else names.add(e.name);
    if (!ELEMENT_KINDS.includes(e?.kind)) {
      issues.push({ path: `${path}.kind`, message: `must be one of ${ELEMENT_KINDS.join(", ")}`, value: e?.kind });
      return;
    }
    for (const n of elementNodes(e)) {
      if (typeof n !== "string" || n === "") issues.push({ path: `${path} (${e.name})`, message: "terminal node names must be non-empty strings", value: n });
    }
  });
  if (issues.length) fail(issues);
  return elements;
}

/** Numbers the nodes in order of first appearance and lists the elements attached to each. */
function numberNodes(elements: readonly CircuitElement[]): NodeTable {
  const nodeIndex = new Map<string, number>([[GROUND, -1]]);
  const nodeNames: string[] = [];
  const attached: string[][] = [];
  for (const e of elements) {
    for (const n of elementNodes(e)) {
      if (!nodeIndex.has(n)) {
        nodeIndex.set(n, nodeNames.length);
        nodeNames.push(n);
        attached.push([]);
      }
      const k = nodeIndex.get(n)!;
      if (k >= 0 && !attached[k]!.includes(e.name)) attached[k]!.push(e.name);
    }
  }
  if (nodeNames.length === 0) fail([{ path: "circuit.elements", message: `no node other than "${GROUND}"`, value: elements.map((e) => e.name) }]);
  return { nodeIndex, nodeNames, attached };
}

/** Fails on a node with no path to ground except through current sources (named, with its elements). */
function checkFloating(elements: readonly CircuitElement[], nodes: NodeTable): void {
  const comp = new Components();
  for (const e of elements) {
    if (e.kind === "coupling" || e.kind === "currentSource") continue;
    const [a, b] = elementNodes(e) as [string, string];
    comp.union(a, b);
  }
  const groundRoot = comp.find(GROUND);
  const floating = nodes.nodeNames.filter((n) => comp.find(n) !== groundRoot);
  if (floating.length === 0) return;
  const attachedTo = [...new Set(floating.flatMap((n) => nodes.attached[nodes.nodeIndex.get(n)!]!))];
  fail([
    {
      path: "circuit",
      message:
        `floating node${floating.length > 1 ? "s" : ""} ${floating.map((n) => `"${n}"`).join(", ")}: no path to "${GROUND}" ` +
        `except through current sources; elements attached: ${attachedTo.join(", ")}`,
      value: floating,
      expected: `every node connected to "${GROUND}" through resistors, capacitors, inductors, switches, diodes or voltage sources`,
    },
  ]);
}

/** Fails on a loop of voltage sources, naming the sources in it. */
function checkSourceLoops(elements: readonly CircuitElement[]): void {
  const vsComp = new Components();
  const vsEdges: { name: string; a: string; b: string }[] = [];
  for (const e of elements) {
    if (e.kind !== "voltageSource") continue;
    if (!vsComp.union(e.plus, e.minus)) {
      const loop = [...pathThrough(vsEdges, e.plus, e.minus), e.name];
      fail([
        {
          path: "circuit",
          message: `loop of voltage sources: ${loop.join(", ")} (their voltages cannot all be imposed; add a resistance in the loop)`,
          value: loop,
        },
      ]);
    }
    vsEdges.push({ name: e.name, a: e.plus, b: e.minus });
  }
}

/** The element lists of a compiled circuit before the inductance matrix, plus the couplings. */
interface Collected {
  size: number;
  readonly unknownNames: string[];
  readonly resistors: CompiledCircuit["resistors"];
  readonly capacitors: CompiledCircuit["capacitors"];
  readonly inductors: RawInductor[];
  readonly voltageSources: CompiledCircuit["voltageSources"];
  readonly currentSources: CompiledCircuit["currentSources"];
  readonly switches: CompiledCircuit["switches"];
  readonly diodes: CompiledCircuit["diodes"];
  readonly couplings: RawCoupling[];
}

/** Checks each element's values and collects it by kind; branch unknowns are numbered after the nodes. */
function collectElements(elements: readonly CircuitElement[], nodes: NodeTable): Collected {
  const issues: InputIssue[] = [];
  const idx = (n: string) => nodes.nodeIndex.get(n)!;
  const c: Collected = {
    size: nodes.nodeNames.length, unknownNames: [...nodes.nodeNames],
    resistors: [], capacitors: [], inductors: [], voltageSources: [], currentSources: [], switches: [], diodes: [], couplings: [],
  };
  elements.forEach((e, i) => {
    const path = `circuit.elements[${i}] (${e.name})`;
    switch (e.kind) {
      case "resistor":
        c.resistors.push({ name: e.name, a: idx(e.a), b: idx(e.b), g: 1 / positive(e.resistance, `${path}.resistance`, "Ω", issues) });
        break;
      case "capacitor":
        c.capacitors.push({
          name: e.name, a: idx(e.a), b: idx(e.b),
          c: positive(e.capacitance, `${path}.capacitance`, "F", issues),
          v0: finiteOr(e.initialVoltage, 0, `${path}.initialVoltage`, "V", issues),
        });
        break;
      case "inductor": {
        const r = finiteOr(e.resistance, 0, `${path}.resistance`, "Ω", issues);
        if (r < 0) issues.push({ path: `${path}.resistance`, message: "must be ≥ 0 Ω", value: r, expected: "≥ 0 Ω" });
        c.inductors.push({
          name: e.name, a: idx(e.a), b: idx(e.b), row: c.size++, r,
          i0: finiteOr(e.initialCurrent, 0, `${path}.initialCurrent`, "A", issues),
          L: positive(e.inductance, `${path}.inductance`, "H", issues),
          l: new Float64Array(0),
        });
        c.unknownNames.push(`current of ${e.name}`);
        break;
      }
      case "coupling":
        collectCoupling(e, path, c.couplings, issues);
        break;
      case "voltageSource":
        if (typeof e.waveform !== "function") issues.push({ path: `${path}.waveform`, message: "must be a function of time", value: e.waveform });
        c.voltageSources.push({ name: e.name, a: idx(e.plus), b: idx(e.minus), row: c.size++, waveform: e.waveform });
        c.unknownNames.push(`current of ${e.name}`);
        break;
      case "currentSource":
        if (typeof e.waveform !== "function") issues.push({ path: `${path}.waveform`, message: "must be a function of time", value: e.waveform });
        c.currentSources.push({ name: e.name, from: idx(e.from), to: idx(e.to), waveform: e.waveform });
        break;
      case "switch": {
        if (typeof e.closed !== "function") issues.push({ path: `${path}.closed`, message: "must be a function of time returning a boolean", value: e.closed });
        const ron = positive(e.onResistance, `${path}.onResistance`, "Ω", issues);
        const roff = positive(e.offResistance ?? DEFAULT_SWITCH_OFF_RESISTANCE, `${path}.offResistance`, "Ω", issues);
        if (roff <= ron) issues.push({ path: `${path}.offResistance`, message: "must exceed onResistance", value: roff, expected: `> ${ron} Ω` });
        c.switches.push({ name: e.name, a: idx(e.a), b: idx(e.b), gOn: 1 / ron, gOff: 1 / roff, closed: e.closed });
        if (e.bodyDiode !== undefined) {
          if (!isDiodeModel(e.bodyDiode)) issues.push({ path: `${path}.bodyDiode`, message: "must be a DiodeModel with current(v) and conductance(v) (e.g. bodyDiodeModel())", value: e.bodyDiode });
          else if (elements.some((x) => x.name === `${e.name}.body`)) issues.push({ path: `${path}.bodyDiode`, message: `its diode is named "${e.name}.body", which another element already uses`, value: e.name });
          // anode at b (source), cathode at a (drain)
          c.diodes.push({ name: `${e.name}.body`, a: idx(e.b), b: idx(e.a), model: e.bodyDiode });
        }
        break;
      }
      case "diode":
        if (!isDiodeModel(e.model)) {
          issues.push({ path: `${path}.model`, message: "must be a DiodeModel with current(v) and conductance(v)", value: e.model });
        }
        c.diodes.push({ name: e.name, a: idx(e.anode), b: idx(e.cathode), model: e.model });
        break;
      default:
        return assertNever(e, `circuit.elements[${i}].kind`, WHERE);
    }
  });
  if (issues.length) fail(issues);
  return c;
}

/** A coupling element's pair and its k or M (exactly one). */
function collectCoupling(e: Extract<CircuitElement, { kind: "coupling" }>, path: string, out: RawCoupling[], issues: InputIssue[]): void {
  const pair = e.inductors;
  if (!Array.isArray(pair) || pair.length !== 2) {
    issues.push({ path: `${path}.inductors`, message: "must name exactly two inductors", value: pair });
    return;
  }
  const hasK = e.k !== undefined;
  const hasM = e.mutualInductance !== undefined;
  if (hasK === hasM) {
    issues.push({ path, message: "give exactly one of k and mutualInductance", value: { k: e.k, mutualInductance: e.mutualInductance } });
    return;
  }
  if (hasK) out.push({ name: e.name, path, pair, k: finiteOr(e.k, 0, `${path}.k`, "", issues) });
  else out.push({ name: e.name, path, pair, m: finiteOr(e.mutualInductance, 0, `${path}.mutualInductance`, "H", issues) });
}

/**
 * The inductance matrix (row-major, nL × nL) with its mutual terms; fails on a coupling that
 * names no inductor pair, couples a pair twice, has |k| ≥ 1, or on a matrix that is not
 * positive definite.
 */
function inductanceMatrix(inductors: readonly RawInductor[], couplings: readonly RawCoupling[]): Float64Array {
  const issues: InputIssue[] = [];
  const nL = inductors.length;
  const lm = new Float64Array(nL * nL);
  inductors.forEach((ind, j) => (lm[j * nL + j] = ind.L));
  const byName = new Map(inductors.map((ind, j) => [ind.name, j]));
  const seenPairs = new Set<string>();
  for (const c of couplings) {
    const [p, q] = c.pair;
    const jp = byName.get(p);
    const jq = byName.get(q);
    if (jp === undefined || jq === undefined) {
      issues.push({ path: `${c.path}.inductors`, message: "must name two inductors of the circuit", value: c.pair });
      continue;
    }
    if (jp === jq) {
      issues.push({ path: `${c.path}.inductors`, message: "must name two different inductors", value: c.pair });
      continue;
    }
    const key = jp < jq ? `${jp},${jq}` : `${jq},${jp}`;
    if (seenPairs.has(key)) {
      issues.push({ path: c.path, message: `couples ${p} and ${q} a second time`, value: c.name });
      continue;
    }
    seenPairs.add(key);
    const lp = lm[jp * nL + jp]!;
    const lq = lm[jq * nL + jq]!;
    const m = c.k !== undefined ? c.k * Math.sqrt(lp * lq) : c.m!;
    const k = m / Math.sqrt(lp * lq);
    if (!(Math.abs(k) < 1)) {
      issues.push({ path: c.path, message: "coupling factor must satisfy |k| < 1", value: k, expected: "−1 < k < 1" });
      continue;
    }
    lm[jp * nL + jq] = m;
    lm[jq * nL + jp] = m;
  }
  if (issues.length) fail(issues);
  if (nL > 1 && !choleskyOk(lm, nL)) {
    fail([
      {
        path: "circuit",
        message: `the couplings ${couplings.map((c) => c.name).join(", ")} give an inductance matrix that is not positive definite (stored magnetic energy could be negative)`,
        value: couplings.map((c) => c.name),
      },
    ]);
  }
  return lm;
}

/** Validates and compiles a circuit; throws TanklightInputError naming the elements at fault. */
export function compileCircuit(circuit: TransientCircuit): CompiledCircuit {
  const elements = checkElements(circuit);
  const nodes = numberNodes(elements);
  checkFloating(elements, nodes);
  checkSourceLoops(elements);
  const c = collectElements(elements, nodes);
  const lm = inductanceMatrix(c.inductors, c.couplings);
  const nL = c.inductors.length;
  const inductorsOut = c.inductors.map((ind, j) => ({
    name: ind.name, a: ind.a, b: ind.b, row: ind.row, r: ind.r, i0: ind.i0,
    l: lm.slice(j * nL, j * nL + nL),
  }));
  return {
    nodeNames: nodes.nodeNames,
    nodeIndex: nodes.nodeIndex,
    size: c.size,
    resistors: c.resistors,
    capacitors: c.capacitors,
    inductors: inductorsOut,
    voltageSources: c.voltageSources,
    currentSources: c.currentSources,
    switches: c.switches,
    diodes: c.diodes,
    attached: nodes.attached,
    unknownNames: c.unknownNames,
  };
}

/** True when the symmetric matrix is positive definite (Cholesky succeeds). */
function choleskyOk(a: Float64Array, n: number): boolean {
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i * n + j]!;
      for (let k = 0; k < j; k++) s -= l[i * n + k]! * l[j * n + k]!;
      if (i === j) {
        if (!(s > 0)) return false;
        l[i * n + i] = Math.sqrt(s);
      } else l[i * n + j] = s / l[j * n + j]!;
    }
  }
  return true;
}
