/**
 * Writes docs/design.schema.json, the JSON Schema of design files for editors (from the zod
 * schema in lib/report/designFile.ts). Run: npx tsx scripts/design-schema.ts
 * tests/report/designFile.test.ts checks that the committed file is current.
 */
import { writeFileSync } from "node:fs";
import { designJsonSchema } from "../lib/mod.ts";

const out = new URL("../docs/design.schema.json", import.meta.url);
writeFileSync(out, JSON.stringify(designJsonSchema(), null, 2) + "\n");
console.log(`wrote ${out.pathname}`);
