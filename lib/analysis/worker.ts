/**
 * The worker-thread side of ./pool.ts: one default export that tinypool calls with a task.
 * Each worker keeps the probes it has built, by the spec id the main thread gave them, so a
 * probe (coupling evaluators, tabulated loads) is built once per worker and run.
 */
import { makeProbe, type Probe, type ProbeSpec, type ProbeValues } from "./probe.ts";

/** A task for a worker. */
export type WorkerTask = { readonly kind: "probe"; readonly id: string; readonly spec: ProbeSpec; readonly positions: Float64Array };

// The worker's own cache of built probes (lives as long as the worker thread; at most a few).
const probes = new Map<string, Probe>();
const MAX_CACHED = 4;

function probeFor(id: string, spec: ProbeSpec): Probe {
  let p = probes.get(id);
  if (!p) {
    if (probes.size >= MAX_CACHED) probes.delete(probes.keys().next().value!);
    p = makeProbe(spec);
    probes.set(id, p);
  }
  return p;
}

/** Runs one task (called by tinypool in a worker thread). */
export default function runTask(task: WorkerTask): ProbeValues {
  switch (task.kind) {
    case "probe":
      return probeFor(task.id, task.spec).evaluate(task.positions);
  }
}
