/**
 * What `import { z } from "zod"` means inside the bundled dist/ (scripts/bundle.ts puts this
 * file there as dist/zod.js): zod's `z`, read from dist/zod.cjs (the part of zod lib/ uses,
 * bundled into one CommonJS file) the first time one of its properties is used, that is when the first schema is built
 * (every module-level schema is a `lazySchema`, lib/schema.ts). Importing tanklight from dist/
 * therefore loads and compiles no zod. Runs from source (tsx, Deno, vitest) import zod itself.
 * zod keeps its registry and configuration on `globalThis`, so schemas of this copy and of a
 * user's own zod compose and share metadata (tests/bundle.test.ts).
 */
import { createRequire } from "node:module";
import type { z as Z } from "zod";

type Zod = typeof Z;

let loaded: Zod | undefined; // built once on first use, never changed
const load = (): Zod => (loaded ??= createRequire(import.meta.url)("./zod.cjs") as Zod);

/** zod's `z`, loaded on first use; zod.cjs holds the members lib/ names (scripts/bundle.ts). */
export const z: Zod = new Proxy({} as Zod, {
  get: (_, key) => {
    const zod = load();
    if (typeof key === "string" && !(key in zod)) throw new Error(`dist/zod.cjs has no z.${key}: scripts/bundle.ts bundles the z.<name> that lib/ names; rebuild`);
    return Reflect.get(zod, key);
  },
  has: (_, key) => Reflect.has(load(), key),
});
