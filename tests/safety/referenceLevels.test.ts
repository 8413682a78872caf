import { describe, expect, it } from "vitest";
import { EXPOSURE_STANDARDS, basicRestriction, referenceLevel, type ExposureStandardId, type Population } from "../../lib/safety/referenceLevels.ts";
import { MU0 } from "../../lib/constants.ts";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";

interface Row { std: ExposureStandardId; pop: Population; f: number; flux: number; source: string }
// Published values, each with its table (µT or A/m as printed, converted by B = µ0·H where the table prints H).
const ROWS: Row[] = [
  { std: "ICNIRP 2010", pop: "public", f: 200e3, flux: 27e-6, source: "source: ICNIRP 2010, Health Phys. 99:818–836, Table 4 (general public), 3 kHz–10 MHz: 2.7×10⁻⁵ T" },
  { std: "ICNIRP 2010", pop: "occupational", f: 200e3, flux: 100e-6, source: "source: ICNIRP 2010, Table 3 (occupational), 3 kHz–10 MHz: 1×10⁻⁴ T" },
  { std: "ICNIRP 2020 local", pop: "public", f: 200e3, flux: MU0 * (4.9 / 0.2), source: "source: ICNIRP 2020, Health Phys. 118:483–524, Table 6 (local), 0.1–30 MHz: H 4.9/f_M A/m" },
  { std: "ICNIRP 2020 local", pop: "occupational", f: 6.78e6, flux: MU0 * (10.8 / 6.78), source: "source: ICNIRP 2020, Table 6 (local, occupational): H 10.8/f_M A/m" },
  { std: "ICNIRP 2020 whole body", pop: "public", f: 200e3, flux: MU0 * (2.2 / 0.2), source: "from memory (unverified): ICNIRP 2020 Table 5 (whole body), 0.1–30 MHz: H 2.2/f_M A/m" },
  { std: "ICNIRP 2020 whole body", pop: "occupational", f: 200e3, flux: MU0 * (4.9 / 0.2), source: "from memory (unverified): ICNIRP 2020 Table 5 (whole body, occupational): H 4.9/f_M A/m" },
  { std: "ICNIRP 1998", pop: "public", f: 100e3, flux: 6.25e-6, source: "from memory (unverified): ICNIRP 1998, Health Phys. 74:494–522, Table 7 (general public), 3–150 kHz: 6.25 µT" },
  { std: "ICNIRP 1998", pop: "public", f: 400e3, flux: 0.92e-6 / 0.4, source: "from memory (unverified): ICNIRP 1998 Table 7, 0.15–1 MHz: 0.92/f_M µT" },
  { std: "ICNIRP 1998", pop: "occupational", f: 200e3, flux: 2.0e-6 / 0.2, source: "from memory (unverified): ICNIRP 1998 Table 6 (occupational), 0.065–1 MHz: 2.0/f_M µT" },
  { std: "IEEE C95.1-2019 head and torso", pop: "public", f: 200e3, flux: 205e-6, source: "from memory (unverified): IEEE C95.1-2019 ERL head and torso, unrestricted, 3.35 kHz–5 MHz: 205 µT" },
  { std: "IEEE C95.1-2019 head and torso", pop: "occupational", f: 200e3, flux: 615e-6, source: "from memory (unverified): IEEE C95.1-2019 ERL head and torso, restricted: 615 µT" },
  // conflicting memory: 16.3/f_M A/m recalled, 36.4/f_M A/m in a secondary source — the test pins what the code carries, not a verified value
  { std: "IEEE C95.1-2019 RF", pop: "public", f: 200e3, flux: MU0 * (16.3 / 0.2), source: "from memory (unverified, conflicting: 16.3 vs 36.4/f_M A/m): IEEE C95.1-2019 RF ERL, 0.1–1.34 MHz" },
];

describe("reference levels: the carried tables against the published values", () => {
  for (const r of ROWS) {
    it(`${r.std} ${r.pop} at ${r.f / 1e3} kHz`, () => {
      const lv = referenceLevel(r.std, r.pop, r.f)!;
      expectOutside({ quantity: `${r.std} ${r.pop} B reference level at ${r.f / 1e3} kHz`, source: r.source, ours: lv.flux, reference: r.flux, rtol: 1e-12, unit: "T" });
      expect(lv.row).toMatch(/Table|table/);
    });
  }

  it("ICNIRP 2010's B and H columns agree through B = μ0·H to the tables' rounding (two significant figures)", () => {
    // source: ICNIRP 2010 Tables 3 and 4 print 21 A/m beside 27 µT and 80 A/m beside 100 µT; the printed
    // values are rounded (27 µT/μ0 = 21.5 A/m, 100 µT/μ0 = 79.6 A/m), hence 3 % and 1 %
    expectOutside({ quantity: "ICNIRP 2010 public B/μ0 vs 21 A/m", source: "source: ICNIRP 2010 Table 4, H column", ours: referenceLevel("ICNIRP 2010", "public", 1e5)!.fieldStrength, reference: 21, rtol: 0.03, unit: "A/m" });
    expectOutside({ quantity: "ICNIRP 2010 occupational B/μ0 vs 80 A/m", source: "source: ICNIRP 2010 Table 3, H column", ours: referenceLevel("ICNIRP 2010", "occupational", 1e5)!.fieldStrength, reference: 80, rtol: 0.01, unit: "A/m" });
  });

  it("band edges are exact: both edges included, outside is 'not covered', and on a shared edge the stricter row holds", () => {
    expect(referenceLevel("ICNIRP 2010", "public", 3e3)?.flux).toBe(27e-6);
    expect(referenceLevel("ICNIRP 2010", "public", 10e6)?.flux).toBe(27e-6);
    expect(referenceLevel("ICNIRP 2010", "public", 3e3 * (1 - 1e-12))).toBeUndefined();
    expect(referenceLevel("ICNIRP 2010", "public", 10e6 * (1 + 1e-12))).toBeUndefined();
    expectRelClose(referenceLevel("ICNIRP 2020 local", "public", 100e3)!.fieldStrength, 49, 1e-12, "4.9/0.1 A/m at the lower edge");
    expect(referenceLevel("ICNIRP 2020 local", "public", 99_999.999)).toBeUndefined();
    // 150 kHz is in both 3–150 kHz (6.25 µT) and 0.15–1 MHz (0.92/0.15 = 6.133 µT): the lower holds
    expect(referenceLevel("ICNIRP 1998", "public", 150e3)?.flux).toBe(0.92e-6 / 0.15);
    // 65 kHz: 30.7 µT against 2.0/0.065 = 30.77 µT
    expect(referenceLevel("ICNIRP 1998", "occupational", 65e3)?.flux).toBe(30.7e-6);
    expect(referenceLevel("IEEE C95.1-2019 RF", "public", 1.34e6)).toBeDefined();
    expect(referenceLevel("IEEE C95.1-2019 RF", "public", 1.3400001e6)).toBeUndefined();
  });

  it("every table names its status, and IEEE C95.1 RF says it is conflicting memory", () => {
    for (const s of EXPOSURE_STANDARDS) expect(["checked", "memory", "memory, conflicting"]).toContain(s.status);
    expect(EXPOSURE_STANDARDS.find((s) => s.id === "IEEE C95.1-2019 RF")!.status).toBe("memory, conflicting");
  });

  it("ICNIRP 2010 basic restriction on the internal field: 1.35e-4·f (public), 2.7e-4·f (occupational), 3 kHz–10 MHz", () => {
    expectOutside({ quantity: "ICNIRP 2010 basic restriction, public, 200 kHz", source: "source: ICNIRP 2010 Table 2, 1.35×10⁻⁴·f V/m", ours: basicRestriction("public", 200e3)!.field, reference: 27, rtol: 1e-12, unit: "V/m" });
    expectOutside({ quantity: "ICNIRP 2010 basic restriction, occupational, 200 kHz", source: "source: ICNIRP 2010 Table 2, 2.7×10⁻⁴·f V/m", ours: basicRestriction("occupational", 200e3)!.field, reference: 54, rtol: 1e-12, unit: "V/m" });
    expect(basicRestriction("public", 2999)).toBeUndefined();
    expect(basicRestriction("public", 10e6)).toBeDefined();
  });
});
