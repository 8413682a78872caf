/**
 * Analysis workloads (issue 16 targets): coverageMap 121 × 61, one round transmitter, one LED
 * token, a full nonlinear solve at every point (no refinement) ≤ 0.3 s on one core and ≥ 1.7×
 * faster on two (1 and 2 threads timed in alternating rounds of one run); toleranceYield 10,000
 * samples, one token at one pose ≤ 0.3 s; searchDesign for a 40 cm board ≤ 30 s on two cores,
 * with progress. `npm run bench -- analysis coverage` (or yield, search) runs one part.
 *
 * The harness (./harness.ts) times synchronous calls; these runs are asynchronous (worker
 * threads), so this file times them itself — warm-up first, then several runs, min and median —
 * and prints them with the harness's formatResult. The two-thread runs use one pool started
 * before timing (its start-up, about a second per worker, is not part of a map). findRange is a
 * synchronous harness workload.
 */
import { readFileSync } from "node:fs";
import { formatResult, type Workload } from "./harness.ts";
import { coverageMap, findRange, ledPreset, roundCoil, searchDesign, taskPool, toleranceYield, type LinkSystem } from "../lib/mod.ts";

const tx = roundCoil({ meanRadius: 0.05, turns: 5, wire: { diameter: 0.8e-3, insulation: 0.03e-3 } });
const token = roundCoil({ innerRadius: 0.0065, turns: 120, layers: 6, wire: { diameter: 0.1e-3, insulation: 0.01e-3 } });
const system: LinkSystem = {
  frequency: 196.9e3,
  transmitter: { coil: tx, compensation: "parallel", capacitor: { capacitance: 106.8e-9 }, drive: { kind: "parallelTank", supply: 5, onResistance: 0.05 } },
  receivers: [{ coil: token, pose: { position: [0, 0, 0.045] }, topology: "parallel", capacitor: { capacitance: 2.2e-9 }, load: { kind: "led", led: ledPreset("red") } }],
};
const region = { x: { from: -0.09, to: 0.09, points: 121 }, y: { from: 0, to: 0.09, points: 61 }, z: 0.02 };

/** `npm run bench -- analysis <part>` runs only the parts whose name contains <part>: "coverage", "yield", "search". */
const part = process.argv[3];
const want = (name: string): boolean => part === undefined || name.includes(part);

async function time(runs: number, fn: () => Promise<unknown>, warm = true): Promise<{ min: number; median: number; rounds: number }> {
  if (warm) await fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    t.push((performance.now() - t0) / 1000);
  }
  return stats(t);
}

function stats(t: number[]): { min: number; median: number; rounds: number } {
  const s = [...t].sort((a, b) => a - b);
  return { min: s[0]!, median: s[Math.floor(s.length / 2)]!, rounds: s.length };
}

/**
 * Two async runs timed in alternating rounds after three warm-ups each, so a change of machine load
 * during the run falls on both (the ratio is taken from the same run). Also the process's CPU time
 * per run (all threads: process.cpuUsage), which the load of other processes hardly changes: the
 * two-thread run's CPU over the one-thread run's shows what the pool costs (start-up excluded).
 */
async function interleaved(rounds: number, a: () => Promise<unknown>, b: () => Promise<unknown>): Promise<[ReturnType<typeof stats>, ReturnType<typeof stats>, number, number]> {
  // three warm-up runs each: V8 keeps optimising the solver's functions over the first maps
  // (measured: its compiler threads took 85 ms of CPU per map over maps 2–11, 26 ms after six)
  for (let w = 0; w < 3; w++) {
    await a();
    await b();
  }
  const ta: number[] = [];
  const tb: number[] = [];
  const ca: number[] = [];
  const cb: number[] = [];
  const cpu = (): number => {
    const u = process.cpuUsage();
    return (u.user + u.system) / 1e6;
  };
  for (let i = 0; i < rounds; i++) {
    let c0 = cpu();
    let t0 = performance.now();
    await a();
    ta.push((performance.now() - t0) / 1000);
    ca.push(cpu() - c0);
    c0 = cpu();
    t0 = performance.now();
    await b();
    tb.push((performance.now() - t0) / 1000);
    cb.push(cpu() - c0);
  }
  return [stats(ta), stats(tb), stats(ca).median, stats(cb).median];
}

function line(name: string, size: string, r: { min: number; median: number; rounds: number }, target?: number): void {
  console.log(formatResult({ name, size, min: r.min, median: r.median, rounds: r.rounds, ...(target !== undefined ? { target } : {}) }));
}

/** The machine's load average (Linux), printed beside the ratios: the machine is shared. */
function load(): string {
  try {
    return `load average ${readFileSync("/proc/loadavg", "utf8").split(" ").slice(0, 3).join(" ")}`;
  } catch {
    return "load average unknown";
  }
}

const pool = await taskPool(2);
try {
  if (want("coverage")) {
    // one thread and two (the pool started before timing) in alternating rounds of the same run
    const [one, two, cpuOne, cpuTwo] = await interleaved(9, () => coverageMap(system, region, { refine: false }), () => coverageMap(system, region, { refine: false, threads: pool }));
    line("analysis: coverageMap, 1 thread", "121×61 nonlinear solves", one, 0.3);
    line("analysis: coverageMap, 2 threads (pool started)", "121×61 nonlinear solves", two);
    const ratio = one.median / two.median;
    console.log(
      `analysis: coverageMap 2-thread speed-up  median/median ${ratio.toFixed(2)}×, min/min ${(one.min / two.min).toFixed(2)}×  target ≥ 1.70× ${ratio >= 1.7 ? "met" : "MISSED"} (${load()})`,
    );
    console.log(
      `analysis: coverageMap CPU time per map (all threads, median)  1 thread ${cpuOne.toFixed(3)} s, 2 threads ${cpuTwo.toFixed(3)} s: 2-thread/1-thread CPU ${(cpuTwo / cpuOne).toFixed(2)}× (below 1: the pool costs less CPU than it saves)`,
    );
    const refined = await time(1, () => coverageMap(system, region));
    line("analysis: coverageMap with refinement, 1 thread", "121×61 + refined cells", refined);
  }
  if (want("yield")) {
    const y = await time(5, () => toleranceYield(system, { tokenCapacitor: 0.1, transmitterCapacitor: 0.05, supply: 0.05, ledBrightness: 0.3 }, { samples: 10_000, seed: 1 }));
    line("analysis: toleranceYield, 1 thread", "10,000 samples, 1 pose", y, 0.3);
    // the LED tables of each forward-voltage level are built per call (nodes on first use)
    const yv = await time(3, () => toleranceYield(system, { ledForwardVoltage: "preset", tokenCapacitor: 0.1 }, { samples: 10_000, seed: 1 }));
    line("analysis: toleranceYield with LED V_F spread, 1 thread", "10,000 samples, 1 pose", yv);
    // two transmitters 90 mm apart, the token between them with placement and tilt spread: M to each per sample
    const pair: LinkSystem = { frequency: system.frequency, transmitters: [-0.045, 0.045].map((x) => ({ ...system.transmitter!, pose: { position: [x, 0, 0] } })), receivers: [{ ...system.receivers[0]!, pose: { position: [0, 0, 0.03] } }] } as LinkSystem;
    const ya = await time(3, () => toleranceYield(pair, { transmitterCapacitor: 0.05, placement: "3 mm", tilt: "10 deg" }, { samples: 10_000, seed: 1 }));
    line("analysis: toleranceYield, 2 transmitters, placement and tilt, 1 thread", "10,000 samples", ya);
    console.log(`analysis: toleranceYield measured at ${load()}`);
  }
  if (want("search")) {
    // the 40 cm game board (demo): one coil or arrays of up to 3 × 3 coils tiling the board, three
    // phasings; 5 V USB-C 3 A; ICNIRP 2010 basic restriction and 47 CFR 15.209 with 6 dB margins
    let last = { done: 0, total: 0, remaining: 0 };
    const estimates: string[] = [];
    const run = (maxEvaluations: number) =>
        searchDesign(
          {
            cover: { width: "400 mm", depth: "400 mm" },
            barrier: "8 mm",
            token: { innerRadius: "10 mm", layers: 4, size: "35 mm" },
            colours: ["red"],
            supply: "usb-c-3a",
            frequency: { min: "100 kHz", max: "250 kHz" },
            litShare: 0.95,
            emission: { rules: ["47 CFR 15.209"] },
          },
          { radius: { min: "60 mm", max: "200 mm" }, turns: { min: 4, max: 20 }, wire: ["1 mm"], tokenTurns: { min: 40, max: 120 }, layout: { rows: { min: 1, max: 3 }, columns: { min: 1, max: 3 } } },
          {
            threads: pool,
            maxEvaluations,
            onResistance: 1,
            onProgress: (p) => {
              last = p;
              if (p.done === Math.round(p.total / 2)) estimates.push(`at ${p.done}/${p.total}: ${p.elapsed.toFixed(1)} s spent, ${p.remaining.toFixed(1)} s estimated left`);
            },
          },
        );
    // warm-up: a 4-design search loads the design modules in both workers (seconds under tsx), then the timed runs
    await run(4);
    estimates.length = 0;
    const board = await time(2, () => run(60), false);
    line("analysis: searchDesign, 40 cm board, 2 threads", `${last.done} designs`, board, 30);
    console.log(`analysis: searchDesign progress ${estimates.join("; ")} (${load()})`);
  }
} finally {
  await pool.close();
}

export const workloads: Workload[] = [
  {
    name: "analysis: findRange on the axis (0.1 mm)",
    size: "scan + bisection",
    minTime: 1,
    fn: () => findRange(system, { from: [0, 0, 0.005], along: [0, 0, 1] }),
  },
];
