import { describe, expect, it } from "vitest";
import { resonantCapacitance, roundCoil, selfInductance, supplyBudget, supplyVerdict, TanklightInputError, USB_SUPPLIES } from "../../lib/mod.ts";
import { expectOutside } from "../helpers/validation.ts";

describe("supply budget", () => {
  it("names the USB port ratings at 5 V", () => {
    // source: USB 2.0 Specification §7.2.1 (500 mA); USB 3.2 Specification (900 mA); USB Type-C
    // Specification (Type-C current 1.5 A and 3.0 A)
    expect(USB_SUPPLIES.usb2.current).toBe(0.5);
    expect(USB_SUPPLIES.usb3.current).toBe(0.9);
    expect(USB_SUPPLIES["usb-c-1.5a"].current).toBe(1.5);
    expect(USB_SUPPLIES["usb-c-3a"].current).toBe(3);
    for (const s of Object.values(USB_SUPPLIES)) expect(s.voltage).toBe(5);
  });

  it("warns that a 1-turn coil on a 5 V half bridge draws far more than a USB port gives", () => {
    const coil = roundCoil({ meanRadius: "50 mm", turns: 1, wire: { diameter: "0.8 mm" } });
    const f = 200e3;
    const c = resonantCapacitance(selfInductance(coil, { frequency: f }), f);
    const b = supplyBudget(
      { frequency: f, transmitter: { coil, compensation: "series", capacitor: { capacitance: c }, drive: { kind: "halfBridge", supply: "5 V", onResistance: 0.05 } }, receivers: [] },
      "usb2",
    );
    expect(b.verdict).toBe("over");
    // independent method: the DC current is the drive's input power over the supply voltage
    expectOutside({ quantity: "1-turn coil, 5 V half bridge: DC supply current", source: "independent method: power balance P_in / V_DD", ours: b.current, reference: b.solution.power.input / 5, rtol: 1e-12, unit: "A" });
    expect(b.current).toBeGreaterThan(5);
    expect(b.message).toMatch(/USB 2\.0 port rated 500 mA at 5 V/);
    expect(b.message).toMatch(/× its rating/);
  });

  it("grades a draw within, tight, over and at the wrong voltage", () => {
    expect(supplyVerdict({ voltage: 5, current: 0.3 }, "usb2").verdict).toBe("within");
    expect(supplyVerdict({ voltage: 5, current: 0.45 }, "usb2").verdict).toBe("tight");
    expect(supplyVerdict({ voltage: 5, current: 1.2 }, "usb3").verdict).toBe("over");
    expect(supplyVerdict({ voltage: 12, current: 0.2 }, "usb-c-3a").verdict).toBe("voltage mismatch");
    const bench = supplyVerdict({ voltage: 12, current: 1.5 }, { kind: "bench", voltage: "12 V", current: "2 A" });
    expect(bench.verdict).toBe("within");
    expect(bench.utilisation).toBe(0.75);
    expect(() => supplyVerdict({ voltage: 5, current: 1 }, "usb4" as "usb2")).toThrow(TanklightInputError);
  });

  it("refuses a drive without a DC supply", () => {
    const coil = roundCoil({ meanRadius: "50 mm", turns: 3, wire: { diameter: "0.8 mm" } });
    expect(() => supplyBudget({ frequency: 2e5, transmitter: { coil, compensation: "none", drive: { kind: "sine", amplitude: 1 } }, receivers: [] }, "usb2")).toThrowErrorMatchingInlineSnapshot(`[TanklightInputError: supplyBudget: transmitter.drive: names no DC supply voltage (sine and current-regulated drives have no supply budget here), got {"kind":"sine","amplitude":1}]`);
  });
});
