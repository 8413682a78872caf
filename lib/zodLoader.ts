/**
 * zod's module, required when lib/zod.ts first needs it (issue 12: import cost). Importing the
 * library therefore loads none of zod's ≈ 100 files; the first schema built loads them. This
 * is zod's CommonJS build, required through `createRequire` because a schema is built inside
 * synchronous functions (Node ≥ 20, Deno, tsx and vitest all run it). In dist/ the bundle
 * (scripts/bundle.ts) puts scripts/zodOnDemand.ts in this module's place, which requires
 * dist/zod.cjs, the part of zod lib/ uses.
 *
 * Two copies of zod may then live in one process (a user's `import { z } from "zod"` is zod's
 * ES build): zod keeps its registry and configuration on `globalThis` and checks `instanceof`
 * by traits, so their schemas compose (tests/bundle.test.ts, tests/importCost.test.ts).
 */
import { createRequire } from "node:module";
import type { z } from "zod";

const requireHere = createRequire(import.meta.url);

/**
 * zod's `z` (its module's members): required on the first call, from Node's module cache after.
 * @example typeof loadZod().string // → "function"
 */
export const loadZod = (): typeof z => requireHere("zod") as typeof z;
