import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { designJsonSchema, parseDesign, parseDesignText, DESIGN_FILE_MAX_BYTES } from "../../lib/report/designFile.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

const file = new URL("../../casebook/designs/through-the-books.json", import.meta.url);
const text = readFileSync(file, "utf8");
const good = JSON.parse(text) as Record<string, any>;

function issuesOf(f: () => unknown): { path: string; message: string }[] {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(TanklightInputError);
    return [...(e as TanklightInputError).issues];
  }
  throw new Error("expected a TanklightInputError");
}

describe("design files", () => {
  it("parse the casebook's design with quantities in SI", () => {
    const d = parseDesignText(text);
    expect(d.token.tuneTo).toBe(150e3);
    expectRelClose(d.surface.gap, 0.08, 1e-12, "80 mm");
    expect(d.supply.voltage).toBe(5);
  });

  it("name the offending field by its JSON path, and every bad field at once", () => {
    const bad = structuredClone(good);
    bad.transmitter.coil.turns = "ten";
    bad.token.tuneTo = "150 mm";
    bad.token.leds = ["ultraviolet"];
    bad.surface.extra = 1;
    const paths = issuesOf(() => parseDesign(bad)).map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["transmitter.coil.turns", "token.tuneTo", "token.leds[0]"]));
    expect(paths.some((p) => p.startsWith("surface"))).toBe(true);
  });

  it("treat the file as untrusted: size limit, JSON only, bounded work", () => {
    expect(issuesOf(() => parseDesignText(" ".repeat(DESIGN_FILE_MAX_BYTES + 1)))[0]!.message).toMatch(/too large/);
    expect(issuesOf(() => parseDesignText("{ name: 'x', run: () => 1 }"))[0]!.message).toMatch(/not valid JSON/);
    const huge = structuredClone(good);
    huge.token.coil.turns = 1e9;
    expect(issuesOf(() => parseDesign(huge))[0]!.path).toBe("token.coil.turns");
    const proto = JSON.parse(text.replace('"name"', '"__proto__": { "polluted": true }, "name"'));
    expect(issuesOf(() => parseDesign(proto)).length).toBeGreaterThan(0);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it("export a JSON Schema for editors that is committed and current (regenerate: npx tsx scripts/design-schema.ts)", () => {
    const committed = JSON.parse(readFileSync(new URL("../../docs/design.schema.json", import.meta.url), "utf8"));
    expect(committed).toEqual(JSON.parse(JSON.stringify(designJsonSchema())));
    expect(committed.required).toEqual(expect.arrayContaining(["name", "title", "dataNote", "transmitter", "token", "supply", "surface"]));
    expect(committed.properties.surface.properties.gap.description).toMatch(/a length/);
  });
});
