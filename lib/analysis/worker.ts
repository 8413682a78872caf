/**
 * The worker-thread side of ./pool.ts: one default export that tinypool calls with a task.
 * Each worker keeps the probes it has built, by the spec id the main thread gave them, so a
 * probe (coupling evaluators, tabulated loads) is built once per worker and run.
 */
import { makeProbe, MISSING_PROBE, type Probe, type ProbeSpec } from "./probe.ts";
import { solveShared, type SharedBatch } from "./sharedBatch.ts";
import { makeYieldModel, type YieldModel, type YieldSpec, type YieldValues } from "./yieldModel.ts";
import type { Candidate, DesignEvaluation, DesignProblem } from "./designEval.ts";

/** A task for a worker: its share of a batch of token positions (./sharedBatch.ts), samples of a yield model, or a design candidate. */
export type WorkerTask =
  | { readonly kind: "probeShared"; readonly id: string; readonly spec?: ProbeSpec; readonly batch: SharedBatch }
  | { readonly kind: "yield"; readonly id: string; readonly spec: YieldSpec; readonly draws: Float64Array }
  | { readonly kind: "design"; readonly candidate: Candidate; readonly problem: DesignProblem };

// The worker's own cache of built models by spec id (lives as long as the worker thread; a few at most).
const models = new Map<string, Probe | YieldModel>();
const MAX_CACHED = 4;

function cached<T extends Probe | YieldModel>(id: string, make: () => T): T {
  let m = models.get(id);
  if (!m) {
    if (models.size >= MAX_CACHED) models.delete(models.keys().next().value!);
    m = make();
    models.set(id, m);
  }
  return m as T;
}

/** Runs one task (called by tinypool in a worker thread). */
export default async function runTask(task: WorkerTask): Promise<YieldValues | DesignEvaluation | null> {
  switch (task.kind) {
    case "design": {
      // design candidates build coils from their numbers: the builders (schemas, units) load on first use
      const { evaluateDesign } = await import("./designEval.ts");
      return evaluateDesign(task.candidate, task.problem);
    }
    case "probeShared": {
      // the spec travels only when this worker has not built the probe yet (see pointEvaluator);
      // without a probe nothing of the batch is claimed
      const spec = task.spec;
      const probe = spec ? cached(task.id, () => makeProbe(spec)) : (models.get(task.id) as Probe | undefined);
      if (!probe) throw new Error(`${MISSING_PROBE} ${task.id}`);
      solveShared(probe, task.batch);
      return null;
    }
    case "yield":
      return cached(task.id, () => makeYieldModel(task.spec)).evaluate(task.draws);
  }
}
