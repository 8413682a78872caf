/**
 * Worker threads for maps, yields and searches, through tinypool (npm; a small, dependency-free
 * worker_threads pool, MIT). The work is split into tasks whose results depend only on their
 * inputs, so any number of threads gives the same numbers as one.
 *
 * The same code runs from the TypeScript sources and from the built JavaScript:
 * - from the bundled dist/ the worker is dist/analysis/worker.js, plain JavaScript;
 * - from the .ts sources under Node the worker imports ./worker.ts after registering tsx's
 *   loader in the thread (tsx, the project's TypeScript runner, must be installed);
 * - under Deno the worker module is TypeScript that Deno runs natively (node:worker_threads).
 */
import { createRequire } from "node:module";
import { pathToFileURL } from "node:url";
import type { ProbeSpec, ProbeValues, Probe } from "./probe.ts";
import { transferable, portableSpec, MISSING_PROBE } from "./probe.ts";
import type { WorkerTask } from "./worker.ts";
import { sharedBatch, SHARED_DONE, SHARED_UNCONVERGED, POINTS_PER_CLAIM } from "./sharedBatch.ts";
import { TanklightInputError } from "../errors.ts";

/** Something that solves token positions: in this thread or across a pool. */
export interface PointEvaluator {
  readonly threads: number;
  /** solves every position ([x, y, z, …], m); `done(units)` is told as positions are solved */
  evaluate(positions: Float64Array, done: (units: number) => void): Promise<ProbeValues>;
  close(): Promise<void>;
}

/** How often the progress of a shared batch is read, ms. */
const PROGRESS_POLL_MS = 100;

/** A pool of worker threads running ./worker.ts tasks. */
export interface TaskPool {
  readonly threads: number;
  run<T>(task: WorkerTask): Promise<T>;
  close(): Promise<void>;
}

declare const Deno: unknown;

/**
 * The module tinypool loads in each worker. From JavaScript (dist/) or under Deno it is the
 * worker module itself. From the .ts sources under Node it is a small bootstrap module (a data:
 * URL) that registers tsx's loader in the worker thread and then imports ./worker.ts: Node 20
 * does not apply a parent's `--import` loader to a worker's own imports.
 */
function workerModule(): string {
  // bundled dist/: this code sits in dist/mod.js or a shared chunk beside it, and the worker is
  // the bundle's own entry dist/analysis/worker.js (scripts/bundle.ts)
  if (!import.meta.url.endsWith(".ts")) return new URL("./analysis/worker.js", import.meta.url).href;
  const worker = new URL("./worker.ts", import.meta.url).href;
  if (typeof Deno !== "undefined") return worker;
  const tsxPackage = pathToFileURL(createRequire(import.meta.url).resolve("tsx/package.json"));
  const api = new URL("./dist/esm/api/index.mjs", tsxPackage).href;
  const code = `import { register } from ${JSON.stringify(api)};\nregister();\nconst m = await import(${JSON.stringify(worker)});\nexport default m.default;\n`;
  return `data:text/javascript,${encodeURIComponent(code)}`;
}

/**
 * Starts a pool of `threads` worker threads (tinypool) to share between coverage maps, yields
 * and searches (`{ threads: pool }`): each worker loads the numeric core once.
 * @param threads worker threads, integer ≥ 1.
 * @returns `{ threads, run(task), close() }`; close it when done.
 * @example const pool = await taskPool(2); await coverageMap(sys, region, { threads: pool }); await pool.close();
 */
export async function taskPool(threads: number): Promise<TaskPool> {
  if (!(Number.isInteger(threads) && threads >= 1 && threads <= 256)) {
    throw new TanklightInputError([{ path: "threads", message: "must be an integer from 1 to 256", value: threads }], "taskPool");
  }
  const { Tinypool } = await import("tinypool");
  // Under Deno tinypool's Atomics.wait loop never sees a task (Deno's worker_threads do not
  // deliver receiveMessageOnPort there): every run waited forever. Plain messages work.
  const pool = new Tinypool({ filename: workerModule(), minThreads: threads, maxThreads: threads, idleTimeout: 60_000, useAtomics: typeof Deno === "undefined" });
  return {
    threads,
    run: <T>(task: WorkerTask): Promise<T> => pool.run(task) as Promise<T>,
    close: () => pool.destroy(),
  };
}

/** Throws TanklightInputError unless `threads` is undefined, an integer from 1 to 256, or a pool. */
export function checkThreads(threads: ThreadsOption, where: string): void {
  if (threads === undefined || (typeof threads === "object" && typeof threads.run === "function")) return;
  if (!(Number.isInteger(threads) && (threads as number) >= 1 && (threads as number) <= 256)) {
    throw new TanklightInputError([{ path: "threads", message: "must be an integer from 1 to 256 or a pool from taskPool()", value: threads }], where);
  }
}

/**
 * An id derived from a spec's content (FNV-1a over its JSON), so a worker keeps the model it
 * built for one design across runs (repeated maps, a benchmark). Each coil's JSON is made once
 * per coil object (a spec's `coils`: immutable; writing out their numbers was most of a map's cost on
 * the main thread).
 */
export function contentId(spec: unknown): string {
  const { coils, ...rest } = spec as { coils?: unknown };
  const text = JSON.stringify(rest) + (Array.isArray(coils) ? coils.map((c: unknown) => (typeof c === "object" && c !== null ? coilText(c) : JSON.stringify(c))).join(",") : "");
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 0x01000193);
    h2 = Math.imul(h2 ^ c, 0x5bd1e995);
  }
  return `${(h1 >>> 0).toString(16)}${(h2 >>> 0).toString(16)}-${text.length}`;
}

/** Coils' JSON by coil object (immutable plain data from the builders). */
const coilTexts = new WeakMap<object, string>();
function coilText(coil: object): string {
  let t = coilTexts.get(coil);
  if (t === undefined) {
    t = JSON.stringify(coil);
    coilTexts.set(coil, t);
  }
  return t;
}

/** A unique id for a probe or run spec, so workers build each probe once. */
export function specId(): string {
  return globalThis.crypto.randomUUID();
}

/** How a long run uses threads: a count (a pool is started and closed for the run), or a running pool to share between runs. */
export type ThreadsOption = number | TaskPool | undefined;

/**
 * An evaluator of token positions: the probe in this thread when one thread is asked for (or
 * the system's loads are ready-made functions that cannot cross to a worker), else a pool —
 * the caller's (left running) or one started for this run (closed by `close()`).
 *
 * On a pool a batch is shared, not split into tasks: the positions and the result arrays sit in
 * shared memory, each thread gets one task and claims POINTS_PER_CLAIM positions at a
 * time from an atomic counter until none are left (self-scheduling), writing each position's
 * values at its own index. The main thread posts one message per thread and waits — no per-chunk
 * messages to answer, no thread idle while the last chunks run — and the numbers are the same
 * as one thread's, position by position. Progress is read from the shared counter every
 * {@link PROGRESS_POLL_MS} ms.
 */
export async function pointEvaluator(spec: ProbeSpec, threads: ThreadsOption, local: () => Probe): Promise<PointEvaluator> {
  const count = typeof threads === "object" ? threads.threads : (threads ?? 1);
  if (count <= 1 || !transferable(spec)) {
    const probe = local();
    return { threads: 1, evaluate: async (positions, done) => evaluateInChunks(probe, positions, done), close: async () => {} };
  }
  const owned = typeof threads !== "object";
  const pool = typeof threads === "object" ? threads : await taskPool(count);
  const portable = portableSpec(spec);
  const id = contentId(portable);
  const na = spec.axes.length;
  return {
    threads: count,
    evaluate: async (positions, done) => {
      const batch = sharedBatch(positions, na);
      // the spec (≈ 14 kB of coils and parts: a few ms to clone each way) goes to a worker only when it
      // has not built this probe yet — at most once per worker and design, nothing for a warm pool
      const run = (): Promise<null> =>
        pool.run<null>({ kind: "probeShared", id, batch }).catch((e: unknown) => {
          if (e instanceof Error && e.message.includes(MISSING_PROBE)) return pool.run<null>({ kind: "probeShared", id, spec: portable, batch });
          throw e;
        });
      let reported = 0;
      const report = (): void => {
        const d = Atomics.load(batch.counter, SHARED_DONE);
        if (d > reported) done(d - reported);
        reported = Math.max(reported, d);
      };
      const timer = setInterval(report, PROGRESS_POLL_MS);
      try {
        await Promise.all(Array.from({ length: count }, run));
      } finally {
        clearInterval(timer);
      }
      report(); // also orders this thread's reads after the workers' writes (an atomic read of what they last added)
      return { current: batch.current.slice(), mutual: batch.mutual.slice(), supply: batch.supply.slice(), unconverged: Atomics.load(batch.counter, SHARED_UNCONVERGED) };
    },
    close: () => (owned ? pool.close() : Promise.resolve()),
  };
}

/** The probe over positions in this thread, in about eight chunks so progress is reported as it goes. */
function evaluateInChunks(probe: Probe, positions: Float64Array, done: (units: number) => void): ProbeValues {
  const n = positions.length / 3;
  const na = probe.spec.axes.length;
  const chunk = Math.max(64, Math.ceil(n / 8));
  const current = new Float64Array(n);
  const mutual = new Float64Array(n * na);
  const supply = new Float64Array(n);
  let unconverged = 0;
  for (let s = 0; s < n; s += chunk) {
    const e = Math.min(n, s + chunk);
    const v = probe.evaluate(positions.subarray(3 * s, 3 * e));
    current.set(v.current, s);
    mutual.set(v.mutual, s * na);
    supply.set(v.supply, s);
    unconverged += v.unconverged;
    done(e - s);
  }
  return { current, mutual, supply, unconverged };
}
