/**
 * What lib/zodLoader.ts is inside the bundled dist/ (scripts/bundle.ts puts this file in its
 * place): `loadZod()` requires dist/zod.cjs — the members of zod's `z` that lib/ uses, bundled
 * into one CommonJS file — the first time lib/zod.ts calls into zod, that is when the first
 * schema is built (every module-level schema is a `lazySchema`, lib/schema.ts). Importing
 * tanklight from dist/ therefore loads and compiles no zod. Runs from source (tsx, Deno,
 * vitest) require zod's own CommonJS build instead (lib/zodLoader.ts). zod keeps its registry
 * and configuration on `globalThis`, so schemas of this copy and of a user's own zod compose
 * and share metadata (tests/bundle.test.ts).
 */
import { createRequire } from "node:module";
import type { z } from "zod";

const requireHere = createRequire(import.meta.url);

/** zod's `z` as far as dist/zod.cjs holds it (the members lib/ names; scripts/bundle.ts). */
export const loadZod = (): typeof z => requireHere("./zod.cjs") as typeof z;
