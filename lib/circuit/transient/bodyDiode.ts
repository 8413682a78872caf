/**
 * The intrinsic (body) diode of a MOSFET used as a switch: the p-n junction between body and
 * drift region, which in an n-channel part runs from source (anode) to drain (cathode) and
 * conducts whenever the drain is pulled below the source by its forward drop, whatever the
 * gate says. Modelled as the project's junction (Shockley equation with series resistance,
 * lib/circuit/loads/led.ts `diode`), fitted to two forward points typical of a small
 * logic-level MOSFET's source-drain diode: 0.65 V at 0.1 A and 0.80 V at 1 A, ideality 2 (from
 * memory (unverified): datasheets of such parts give V_SD ≈ 0.8 V typical, 1.2 V maximum at
 * their rated current). Reverse recovery and junction capacitance are not modelled (add a
 * capacitor across the switch for the output capacitance).
 */
import { diode, type Diode } from "../loads/led.ts";

/**
 * The default body diode of a switch (see the module comment): V ≈ 0.65 V at 0.1 A, 0.80 V at 1 A.
 * @returns a junction model (`current(v)`, `conductance(v)`, `voltage(i)`) for a switch's `bodyDiode`.
 * @example bodyDiodeModel().voltage(1) // → 0.8 (V)
 */
export function bodyDiodeModel(): Diode {
  return diode({
    points: [{ current: 0.1, voltage: 0.65 }, { current: 1, voltage: 0.8 }],
    idealityFactor: 2,
    label: "MOSFET body diode (typical small logic-level part)",
    source: "two forward points typical of a small logic-level MOSFET's source-drain diode, from memory (unverified)",
  });
}
