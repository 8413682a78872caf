/**
 * The sampled output of a run: every node voltage and element current at each output time,
 * kept in a ring of `keep` samples (so a long run that keeps only its last cycles needs memory
 * for those alone), returned in time order.
 */
import type { CompiledCircuit } from "./compile.ts";
import type { Engine } from "./engine.ts";

/** Waveforms in time order: sample times (s), node voltages (V), element currents (A). */
export interface Recording {
  readonly time: Float64Array;
  readonly nodeVoltages: Record<string, Float64Array>;
  readonly currents: Record<string, Float64Array>;
}

/** Element names in the order {@link Engine.elementCurrents} writes them. */
export function currentNames(cc: CompiledCircuit): string[] {
  const names: string[] = [];
  for (const list of [cc.resistors, cc.capacitors, cc.inductors, cc.voltageSources, cc.currentSources, cc.switches, cc.diodes]) {
    for (const e of list) names.push(e.name);
  }
  return names;
}

/** A ring buffer of the last `keep` samples of every waveform of one circuit. */
export class Recorder {
  private readonly cc: CompiledCircuit;
  private readonly keep: number;
  private readonly elemNames: readonly string[];
  private readonly timeOut: Float64Array;
  private readonly nodeOut: Float64Array[];
  private readonly curOut: Float64Array[];
  /** samples recorded so far (may exceed keep) */
  recorded = 0;

  /** @param keep samples to keep, ≥ 1 */
  constructor(cc: CompiledCircuit, keep: number) {
    this.cc = cc;
    this.keep = keep;
    this.elemNames = currentNames(cc);
    this.timeOut = new Float64Array(keep);
    this.nodeOut = cc.nodeNames.map(() => new Float64Array(keep));
    this.curOut = this.elemNames.map(() => new Float64Array(keep));
  }

  /** Records the engine's present solution as the sample at time t (s). */
  record(t: number, engine: Engine): void {
    const slot = this.recorded % this.keep;
    this.timeOut[slot] = t;
    const x = engine.x;
    for (let i = 0; i < this.nodeOut.length; i++) this.nodeOut[i]![slot] = x[i]!;
    engine.elementCurrents(t, this.curOut, slot);
    this.recorded++;
  }

  /** The kept samples, unrolled into time order (new arrays). */
  finish(): Recording {
    const keep = this.keep;
    const count = Math.min(this.recorded, keep);
    const first = this.recorded > keep ? this.recorded % keep : 0;
    const unroll = (buf: Float64Array): Float64Array => {
      const out = new Float64Array(count);
      for (let i = 0; i < count; i++) out[i] = buf[(first + i) % keep]!;
      return out;
    };
    const nodeVoltages: Record<string, Float64Array> = {};
    this.cc.nodeNames.forEach((name, i) => (nodeVoltages[name] = unroll(this.nodeOut[i]!)));
    const currents: Record<string, Float64Array> = {};
    this.elemNames.forEach((name, i) => (currents[name] = unroll(this.curOut[i]!)));
    return { time: unroll(this.timeOut), nodeVoltages, currents };
  }
}
