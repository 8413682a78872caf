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
import { TanklightInputError } from "../errors.ts";

/** Something that solves token positions: in this thread or across a pool. */
export interface PointEvaluator {
  readonly threads: number;
  evaluate(positions: Float64Array): Promise<ProbeValues>;
  close(): Promise<void>;
}

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
 * built for one design across runs (repeated maps, a benchmark).
 */
export function contentId(spec: unknown): string {
  // no replacer (one call per value made this 20× slower): a typed array is written as an
  // object of its entries, which is as faithful to the content
  const text = JSON.stringify(spec);
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 0x01000193);
    h2 = Math.imul(h2 ^ c, 0x5bd1e995);
  }
  return `${(h1 >>> 0).toString(16)}${(h2 >>> 0).toString(16)}-${text.length}`;
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
 */
export async function pointEvaluator(spec: ProbeSpec, threads: ThreadsOption, local: () => Probe): Promise<PointEvaluator> {
  const count = typeof threads === "object" ? threads.threads : (threads ?? 1);
  if (count <= 1 || !transferable(spec)) {
    const probe = local();
    return { threads: 1, evaluate: async (positions) => probe.evaluate(positions), close: async () => {} };
  }
  const owned = typeof threads !== "object";
  const pool = typeof threads === "object" ? threads : await taskPool(count);
  const portable = portableSpec(spec);
  const id = contentId(portable);
  // the spec (≈ 14 kB of coils and parts: a few ms to clone each way) goes to a worker only when it
  // has not built this probe yet — at most once per worker and design, nothing for a warm pool
  const withSpec = (positions: Float64Array): Promise<ProbeValues> => pool.run<ProbeValues>({ kind: "probe", id, spec: portable, positions });
  return {
    threads: count,
    evaluate: (positions) =>
      pool.run<ProbeValues>({ kind: "probe", id, positions }).catch((e: unknown) => {
        if (e instanceof Error && e.message.includes(MISSING_PROBE)) return withSpec(positions);
        throw e;
      }),
    close: () => (owned ? pool.close() : Promise.resolve()),
  };
}
