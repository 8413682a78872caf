import type { Workload } from "./harness.ts";
import { ellipticKE } from "../lib/math/elliptic.ts";

let i = 0;
const ms = Array.from({ length: 1024 }, (_, j) => (j + 0.5) / 1024);

export const workloads: Workload[] = [
  {
    name: "ellipticK+E pair (AGM)",
    size: "1 evaluation",
    target: 60e-9,
    fn: () => ellipticKE(ms[i++ & 1023]!),
  },
];
