/**
 * The part of zod's `z` that lib/ uses, loaded on first use (issue 12: import cost): a module
 * of lib/ imports this file as the namespace `z` (`import * as z`, with the relative path to
 * lib/zod.ts) where a user imports zod's `z`, and uses `z.strictObject(…)`, `z.output<…>` as usual. Each function here calls zod's own the
 * first time a schema is built (every module-level schema is a `lazySchema`, lib/schema.ts),
 * so importing the library loads no zod at all (tests/importCost.test.ts). A member lib/
 * needs and this file lacks is a type error, not a run-time one.
 */
import type { z as Zod } from "zod";
import { loadZod } from "./zodLoader.ts";

type ZodApi = typeof Zod;

export type { ZodType, ZodObject, ZodRawShape, ZodNumber, ZodSafeParseResult, input, output } from "zod";
export type * as core from "zod/v4/core";

/** zod's function `name`, called through on each use (zod itself is loaded on the first). */
function member<K extends keyof ZodApi>(name: K): ZodApi[K] {
  const call = (...args: unknown[]): unknown => {
    const f = loadZod()[name];
    if (typeof f !== "function") throw new Error(`zod has no function z.${String(name)} (lib/zod.ts)`);
    return (f as (...a: unknown[]) => unknown)(...args);
  };
  return call as ZodApi[K];
}

export const strictObject = member("strictObject");
export const looseObject = member("looseObject");
export const object = member("object");
export const string = member("string");
export const number = member("number");
export const int = member("int");
export const boolean = member("boolean");
export const literal = member("literal");
export const unknown = member("unknown");
export const custom = member("custom");
export const array = member("array");
export const tuple = member("tuple");
export const set = member("set");
export const record = member("record");
export const union = member("union");
export const discriminatedUnion = member("discriminatedUnion");
export const preprocess = member("preprocess");
export const toJSONSchema = member("toJSONSchema");
// `enum` is a reserved word: exported under its zod name from a local one
const zodEnum = member("enum");
export { zodEnum as enum };

/**
 * What a transform returns after it has pushed an issue: a placeholder typed `never`, as
 * zod's own `NEVER` (zod reads the pushed issues, never this value).
 */
export const NEVER: never = Object.freeze({ status: "aborted" }) as never;

/** zod's global registry of schema metadata (on `globalThis`, shared by every copy of zod). */
export const globalRegistry: Pick<ZodApi["globalRegistry"], "get" | "add"> = {
  get: (schema) => loadZod().globalRegistry.get(schema),
  add: (schema, ...meta) => loadZod().globalRegistry.add(schema, ...meta),
};
