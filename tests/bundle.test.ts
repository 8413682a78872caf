/**
 * The bundled build (scripts/bundle.ts) into out/: importing it loads no zod (dist/zod.cjs is
 * required when the first schema is built), and it then behaves as the sources do — the same
 * parsed values and error messages, the same JSON Schema of design files — and its schemas
 * compose with a user's own zod (a user schema holding RoundCoilSpec parses, and
 * z.toJSONSchema of the user's zod reads our metadata).
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { runInBundle } from "./helpers/bundledRun.ts";
import * as t from "../lib/mod.ts";


/** The same calls in the bundle (printed as JSON by a plain node process) and from source. */
const script = `
const before = zodLoaded();
const tx = t.roundCoil({ innerRadius: "40 mm", turns: 20, layers: 4, wire: { diameter: "0.5 mm" } });
const after = zodLoaded();
let message;
try { t.roundCoil({ innerRadius: "5 kHz", turns: 20, wire: { diameter: "0.5 mm" } }); } catch (e) { message = e.message; }
let zodMessage; // zod's own wording (its English locale)
try { t.parseDesign({ name: 5, title: ["x"], colour: 1 }); } catch (e) { zodMessage = e.message; }
const user = z.object({ coil: t.RoundCoilSpec, label: z.string() });
const parsed = user.parse({ coil: { innerRadius: "6 mm", turns: 30, wire: { diameter: "0.1 mm" } }, label: "token" });
const userSchema = z.toJSONSchema(z.object({ design: t.DesignFile }), { io: "input", unrepresentable: "any" });
const result = { before, after, message, zodMessage, innerRadius: parsed.coil.innerRadius, inductance: t.selfInductance(tx), designSchema: t.designJsonSchema(), userSchema };
`;

describe("bundled build", () => {
  it("imports without zod, loads it on the first schema, and agrees with the sources", async () => {
    const fromBundle = JSON.parse(
      await runInBundle(
        "bundle-test",
        `import * as t from "./mod.js";
import { createRequire } from "node:module";
import { z } from "zod";
const require = createRequire(import.meta.url);
const zodLoaded = () => require.resolve("./zod.cjs") in require.cache;
${script}
console.log(JSON.stringify(result));
`,
      ),
    ) as Record<string, unknown>;

    const zodLoaded = () => true;
    const fromSource = new Function("t", "z", "zodLoaded", `${script}; return result;`)(t, z, zodLoaded) as Record<string, unknown>;

    expect(fromBundle.before).toBe(false);
    expect(fromBundle.after).toBe(true);
    expect(fromBundle.message).toBe("roundCoil: innerRadius: expected a length like '12 mm', got '5 kHz' (a frequency)");
    expect(fromBundle.zodMessage).toContain("name: expected string");
    for (const key of ["message", "zodMessage", "innerRadius", "inductance", "designSchema", "userSchema"]) expect(fromBundle[key], key).toEqual(fromSource[key]);
    // our metadata reaches the user's zod: the design file's coil description is in the user's JSON Schema
    expect(JSON.stringify(fromBundle.userSchema)).toContain("a coil: shape 'roundCoil'");
  }, 120_000);
});
