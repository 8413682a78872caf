/**
 * Several transmitters in one link (issue 13): own drives with phases, shared drives wired in
 * series or in parallel, every transmitter–transmitter and transmitter–token mutual inductance
 * in the network. The linear cases are checked against the circuit equations written out here
 * and solved by mathjs (reference library), in a different formulation from the solver's
 * (node voltages and element currents where the solver uses meshes).
 */
import { describe, expect, it } from "vitest";
import { complex, lusolve, matrix, type Complex, type Matrix } from "mathjs";
import { expectOutside } from "../helpers/validation.ts";
import { expectRelClose } from "../helpers/expectRelClose.ts";
import { linkNetwork, solveLink, type LinkSolution, type LinkSystem } from "../../lib/circuit/link.ts";
import { roundCoil } from "../../lib/em/builders/roundCoil.ts";
import { rectLoop } from "../../lib/em/builders/rectLoop.ts";
import { selfInductance } from "../../lib/em/selfInductance.ts";
import { mutualInductance } from "../../lib/em/mutualInductance.ts";
import { magneticField } from "../../lib/em/magneticField.ts";
import { ledPreset } from "../../lib/circuit/loads/ledPresets.ts";
import { TanklightInputError } from "../../lib/errors.ts";
import type { Vec3 } from "../../lib/em/types.ts";
import { summarizeLink } from "../../lib/circuit/link/summary.ts";
import { supplyBudget } from "../../lib/analysis/supplyBudget.ts";
import { designFromLink } from "../../lib/safety/design.ts";

// demo parts (not a published design): two 40 mm, 5-turn pads side by side and a 30-turn token
const pad = roundCoil({ meanRadius: "40 mm", turns: 5, wire: { diameter: "0.8 mm", insulation: "0.03 mm" } });
const token = roundCoil({ innerRadius: "5 mm", turns: 30, layers: 3, wire: { diameter: "0.1 mm", insulation: "0.01 mm" } });
const f = 200e3;
const w = 2 * Math.PI * f;
const Lpad = selfInductance(pad, { frequency: f });
const Cpad = 1 / (w * w * Lpad);
const Ltok = selfInductance(token, { frequency: f });
const Ctok = 1 / (w * w * Ltok);
const left: Vec3 = [-0.045, 0, 0];
const right: Vec3 = [0.045, 0, 0];
const MNR = "independent method: the circuit equations in node-voltage/element-current form, solved by mathjs lusolve (reference library: mathjs)";

type Tx = NonNullable<LinkSystem["transmitters"]>[number];
const padTx = (position: Vec3, extra: Partial<Tx> = {}): Tx => ({
  coil: pad,
  pose: { position },
  compensation: "series",
  capacitor: { capacitance: Cpad, esr: 0.05 },
  drive: { kind: "sine", amplitude: "5 V", outputResistance: "1 Ω" },
  ...extra,
});
const resistorToken = (position: Vec3, label?: string): LinkSystem["receivers"][number] => ({
  ...(label ? { label } : {}),
  coil: token,
  pose: { position },
  topology: "series",
  capacitor: { capacitance: Ctok, esr: 0.2 },
  load: { kind: "resistor", resistance: 50 },
});
const ledToken = (position: Vec3): LinkSystem["receivers"][number] => ({
  coil: token,
  pose: { position },
  topology: "parallel",
  capacitor: { capacitance: Ctok, dissipationFactor: 1e-3 },
  load: { kind: "led", led: ledPreset("red") },
});

const c = (re: number, im = 0): Complex => complex(re, im);
const zC = (C: number, esr: number): Complex => c(esr, -1 / (w * C));
const sum = (...z: Complex[]): Complex => c(z.reduce((a, x) => a + x.re, 0), z.reduce((a, x) => a + x.im, 0));
const scale = (z: Complex, k: number): Complex => c(k * z.re, k * z.im);
function solveC(rows: Complex[][], rhs: Complex[]): Complex[] {
  const x = lusolve(matrix(rows), matrix(rhs.map((v) => [v]))) as Matrix;
  return (x.toArray() as unknown as Complex[][]).map((r) => r[0]!);
}
function expectPhasor(ours: { re: number; im: number }, ref: Complex, quantity: string, rtol = 1e-11): void {
  const scale = Math.hypot(ref.re, ref.im);
  expectOutside({ quantity: `${quantity} (re)`, source: MNR, ours: ours.re, reference: ref.re, rtol, atol: rtol * scale, unit: "A" });
  expectOutside({ quantity: `${quantity} (im)`, source: MNR, ours: ours.im, reference: ref.im, rtol, atol: rtol * scale, unit: "A" });
}
/** input = driver + coil and capacitor losses + load power, from the result's own fields */
function expectPowerBalance(r: LinkSolution, what: string): void {
  const p = r.power;
  const sum = p.driver + p.transmitterCoil + p.transmitterCapacitor + p.receiverCoils + p.receiverCapacitors + p.delivered;
  expectRelClose(sum, p.input, 1e-9, `power balance, ${what}`);
  let terminal = 0;
  for (const t of r.transmitters) terminal += t.terminalPower!;
  expectRelClose(terminal + p.driver, p.input, 1e-9, `Σ transmitter terminal power + driver loss = input, ${what}`);
}

describe("solveLink with several transmitters", () => {
  it("transmitter: x and transmitters: [x] give the same result bit for bit", () => {
    const tx = { ...padTx([0, 0, 0]), compensation: "parallel" as const, drive: { kind: "parallelTank" as const, supply: "5 V" } };
    const receivers = [ledToken([0, 0, 0.02]), ledToken([0.012, 0.004, 0.025])];
    for (const model of ["fundamental", "auto"] as const) {
      const a = solveLink({ frequency: "200 kHz", transmitter: tx, receivers }, { model });
      const b = solveLink({ frequency: "200 kHz", transmitters: [tx], receivers }, { model });
      expect(b.transmitter).toEqual(a.transmitter);
      expect(b.transmitters).toEqual(a.transmitters);
      expect(b.receivers).toEqual(a.receivers);
      expect(b.power).toEqual(a.power);
      expect(b.drives).toEqual(a.drives);
      expect(b.errorBand).toEqual(a.errorBand);
      expect(b.coupling).toEqual(a.coupling);
      expect(a.transmitters).toEqual([a.transmitter]);
    }
  });

  it("own drives with phases: coil currents match the mesh equations solved by mathjs", () => {
    const sys: LinkSystem = {
      frequency: "200 kHz",
      transmitters: [padTx(left, { label: "A" }), padTx(right, { label: "B", phase: "60 deg" })],
      receivers: [resistorToken([0.01, 0.005, 0.02])],
    };
    const r = solveLink(sys);
    const L = r.network.inductance;
    const Rt = r.network.transmitters!.map((t) => t.resistance);
    const Rk = r.network.receivers[0]!.resistance;
    const zs = c(1);
    const jw = (x: number): Complex => c(0, w * x);
    const za = zC(Cpad, 0.05);
    const zk = zC(Ctok, 0.2);
    const rows = [
      [sum(zs, za, c(Rt[0]!), jw(L[0]![0]!)), jw(L[0]![1]!), jw(L[0]![2]!)],
      [jw(L[1]![0]!), sum(zs, za, c(Rt[1]!), jw(L[1]![1]!)), jw(L[1]![2]!)],
      [jw(L[2]![0]!), jw(L[2]![1]!), sum(c(Rk + 50), zk, jw(L[2]![2]!))],
    ] as Complex[][];
    const e2 = c(5 * Math.cos(Math.PI / 3), 5 * Math.sin(Math.PI / 3));
    const x = solveC(rows, [c(5), e2, c(0)]);
    expectPhasor(r.transmitters[0]!.coilCurrentPhasor, x[0]!, "own drives: coil A current");
    expectPhasor(r.transmitters[1]!.coilCurrentPhasor, x[1]!, "own drives: coil B current");
    expectPhasor(r.receivers[0]!.coilCurrentPhasor, x[2]!, "own drives: token current");
    // each drive's power ½Re(E·I*)
    expectRelClose(r.drives[1]!.inputPower, 0.5 * (e2.re * x[1]!.re + e2.im * x[1]!.im), 1e-10, "drive B input power");
    expect(r.drives.map((d) => d.wiring)).toEqual(["own", "own"]);
    expect(r.transmitters.map((t) => t.label)).toEqual(["A", "B"]);
    // the neighbouring pad is in the network: the pads are coupled (side by side: negative M)
    expect(L[0]![1]!).toBeLessThan(0);
    expectPowerBalance(r, "own drives");
  });

  it("a shared series string, one coil reversed: one current, the mesh equations agree", () => {
    const sys: LinkSystem = {
      frequency: "200 kHz",
      sharedDrives: [{ name: "bus", drive: { kind: "sine", amplitude: "8 V", outputResistance: "0.5 Ω" }, wiring: "series" }],
      transmitters: [padTx(left, { drive: "bus" }), padTx(right, { drive: "bus", phase: "180 deg" })],
      receivers: [resistorToken([0.02, 0, 0.015])],
    };
    const r = solveLink(sys);
    const L = r.network.inductance;
    const R = r.network.transmitters!.map((t) => t.resistance);
    const Rk = r.network.receivers[0]!.resistance;
    // string current J: coil A carries J, coil B −J (reversed); the token current Ik
    const za = zC(Cpad, 0.05);
    const jw = (x: number): Complex => c(0, w * x);
    const zJJ = sum(c(0.5 + R[0]! + R[1]!), za, za, jw(L[0]![0]! + L[1]![1]! - 2 * L[0]![1]!));
    const zJk = jw(L[0]![2]! - L[1]![2]!);
    const zkk = sum(c(Rk + 50), zC(Ctok, 0.2), jw(L[2]![2]!));
    const x = solveC([[zJJ, zJk], [zJk, zkk]], [c(8), c(0)]);
    expectPhasor(r.transmitters[0]!.coilCurrentPhasor, x[0]!, "series string: coil A current");
    expectPhasor(r.transmitters[1]!.coilCurrentPhasor, scale(x[0]!, -1), "series string: reversed coil B current");
    expectPhasor(r.receivers[0]!.coilCurrentPhasor, x[1]!, "series string: token current");
    expect(r.drives).toHaveLength(1);
    expect(r.drives[0]!).toMatchObject({ label: "bus", wiring: "series", transmitters: ["transmitter 1", "transmitter 2"] });
    expectRelClose(r.drives[0]!.sourceCurrent, Math.hypot(x[0]!.re, x[0]!.im), 1e-11, "string current");
    expect(r.transmitters[1]!.driverLoss).toBe(0);
    expectPowerBalance(r, "series string");
  });

  it("parallel tanks in a series string: node equations agree", () => {
    const par = (position: Vec3, phase?: string): Tx => ({ ...padTx(position, { drive: "bus" }), compensation: "parallel", ...(phase ? { phase } : {}) });
    const sys: LinkSystem = {
      frequency: "200 kHz",
      sharedDrives: [{ name: "bus", drive: { kind: "sine", amplitude: "3 V", outputResistance: "2 Ω" }, wiring: "series", phase: "30 deg" }],
      transmitters: [par(left), par(right, "180 deg")],
      receivers: [resistorToken([-0.01, 0.01, 0.02])],
    };
    const r = solveLink(sys);
    const L = r.network.inductance;
    const R = r.network.transmitters!.map((t) => t.resistance);
    const Rk = r.network.receivers[0]!.resistance;
    const jw = (x: number): Complex => c(0, w * x);
    const zc = zC(Cpad, 0.05);
    const s = [1, -1];
    // unknowns J (string), I1, I2 (coils), V1, V2 (tank voltages, coil frame), Ik
    // E − Zs·J − s1·V1 − s2·V2 = 0;  Vi = (Ri + jωLi)Ii + Σ jωM Ij;  Vi = Zc(si·J − Ii);  token loop
    const E = c(3 * Math.cos(Math.PI / 6), 3 * Math.sin(Math.PI / 6));
    const z0 = c(0);
    const rows: Complex[][] = [
      [c(2), z0, z0, c(s[0]!), c(s[1]!), z0],
      [z0, sum(c(R[0]!), jw(L[0]![0]!)), jw(L[0]![1]!), c(-1), z0, jw(L[0]![2]!)],
      [z0, jw(L[1]![0]!), sum(c(R[1]!), jw(L[1]![1]!)), z0, c(-1), jw(L[1]![2]!)],
      [scale(zc, s[0]!), scale(zc, -1), z0, c(-1), z0, z0],
      [scale(zc, s[1]!), z0, scale(zc, -1), z0, c(-1), z0],
      [z0, jw(L[2]![0]!), jw(L[2]![1]!), z0, z0, sum(c(Rk + 50), zC(Ctok, 0.2), jw(L[2]![2]!))],
    ];
    const x = solveC(rows, [E, z0, z0, z0, z0, z0]);
    expectPhasor(r.transmitters[0]!.coilCurrentPhasor, x[1]!, "series string of parallel tanks: coil A");
    expectPhasor(r.transmitters[1]!.coilCurrentPhasor, x[2]!, "series string of parallel tanks: coil B");
    expectPhasor(r.receivers[0]!.coilCurrentPhasor, x[5]!, "series string of parallel tanks: token");
    expectRelClose(r.transmitters[0]!.capacitorVoltage, Math.hypot(x[3]!.re, x[3]!.im), 1e-10, "tank A voltage");
    expectRelClose(r.drives[0]!.sourceCurrent, Math.hypot(x[0]!.re, x[0]!.im), 1e-10, "string current");
    expectPowerBalance(r, "series string of parallel tanks");
  });

  it("a parallel-wired shared drive: node equations with the source impedance agree", () => {
    const sys: LinkSystem = {
      frequency: "200 kHz",
      sharedDrives: [{ name: "rail", drive: { kind: "sine", amplitude: "4 V", outputResistance: "1.5 Ω" }, wiring: "parallel" }],
      transmitters: [
        { ...padTx(left, { drive: "rail" }), compensation: "parallel" },
        padTx(right, { drive: "rail" }), // series-compensated branch
      ],
      receivers: [resistorToken([0.03, 0, 0.02])],
    };
    const r = solveLink(sys);
    const L = r.network.inductance;
    const R = r.network.transmitters!.map((t) => t.resistance);
    const Rk = r.network.receivers[0]!.resistance;
    const jw = (x: number): Complex => c(0, w * x);
    const zc = zC(Cpad, 0.05);
    // unknowns Vt (terminals), I1 (coil A), Ic1 (capacitor A), I2 (branch B), Ik
    const z0 = c(0);
    const rows: Complex[][] = [
      [c(1 / 1.5), c(1), c(1), c(1), z0], // (E − Vt)/Zs = I1 + Ic1 + I2
      [c(-1), sum(c(R[0]!), jw(L[0]![0]!)), z0, jw(L[0]![1]!), jw(L[0]![2]!)],
      [c(-1), z0, zc, z0, z0],
      [c(-1), jw(L[1]![0]!), z0, sum(c(R[1]!), zc, jw(L[1]![1]!)), jw(L[1]![2]!)],
      [z0, jw(L[2]![0]!), z0, jw(L[2]![1]!), sum(c(Rk + 50), zC(Ctok, 0.2), jw(L[2]![2]!))],
    ];
    const x = solveC(rows, [c(4 / 1.5), z0, z0, z0, z0]);
    expectPhasor(r.transmitters[0]!.coilCurrentPhasor, x[1]!, "parallel wiring: coil A");
    expectPhasor(r.transmitters[1]!.coilCurrentPhasor, x[3]!, "parallel wiring: coil B");
    expectPhasor(r.receivers[0]!.coilCurrentPhasor, x[4]!, "parallel wiring: token");
    const src = sum(x[1]!, x[2]!, x[3]!);
    expectRelClose(r.drives[0]!.sourceCurrent, Math.hypot(src.re, src.im), 1e-10, "rail source current");
    expectRelClose(r.drives[0]!.sourceVoltage, Math.hypot(x[0]!.re, x[0]!.im), 1e-10, "rail terminal voltage");
    expectPowerBalance(r, "parallel wiring");
  });

  it("a shared current-regulated string holds every series-tuned coil's current", () => {
    const r = solveLink({
      frequency: "200 kHz",
      sharedDrives: [{ name: "cc", drive: { kind: "currentRegulated", amplitude: "0.8 A" }, wiring: "series" }],
      transmitters: [padTx(left, { drive: "cc" }), padTx(right, { drive: "cc" })],
      receivers: [ledToken([0, 0, 0.02])],
    });
    for (const t of r.transmitters) {
      expectRelClose(t.coilCurrentPhasor.re, 0.8, 1e-14, "held current (re)");
      expect(Math.abs(t.coilCurrentPhasor.im)).toBeLessThan(1e-15);
    }
    expectPowerBalance(r, "current-regulated string");
  });

  it("two identical pads in anti-phase: no normal field and no EMF on their symmetry plane", () => {
    const sys = (phase: string): LinkSystem => ({
      frequency: "200 kHz",
      transmitters: [padTx(left), padTx(right, { phase })],
      receivers: [resistorToken([0, 0.006, 0.02])],
    });
    const anti = solveLink(sys("180 deg"));
    const inPhase = solveLink(sys("0 deg"));
    // mirror symmetry x → −x: the anti-phase currents are each other's mirror image, so on x = 0
    // the field is normal to the plane (B_y = B_z = 0) and a flat token there links no flux
    const i1 = anti.transmitters[0]!.coilCurrentPhasor;
    const i2 = anti.transmitters[1]!.coilCurrentPhasor;
    expectRelClose(i2.re, -i1.re, 1e-9, "anti-phase currents mirror each other (re)");
    expectRelClose(i2.im, -i1.im, 1e-9, "anti-phase currents mirror each other (im)");
    for (const p of [[0, 0, 0.01], [0, 0.02, 0.015], [0, -0.03, 0.005]] as Vec3[]) {
      const b1 = magneticField(pad, { position: left }, 1, p);
      const b2 = magneticField(pad, { position: right }, 1, p);
      // B = I₁B₁ + I₂B₂ (real and imaginary parts), the z component
      const bzRe = i1.re * b1[2] + i2.re * b2[2];
      const bzIm = i1.im * b1[2] + i2.im * b2[2];
      const scale = Math.hypot(i1.re, i1.im) * Math.abs(b1[2]);
      expect(Math.hypot(bzRe, bzIm)).toBeLessThan(1e-9 * scale);
      expect(Math.abs(b1[2] - b2[2])).toBeLessThan(1e-12 * Math.abs(b1[2]));
    }
    expect(anti.receivers[0]!.emf).toBeLessThan(1e-6 * inPhase.receivers[0]!.emf);
  });

  it("a 2-coil and a 2 × 2 array: the inductance matrix is symmetric and positive definite; M agrees with the filament sum", () => {
    const sq = rectLoop({ width: "100 mm", height: "100 mm", awg: 18 });
    const at = (x: number, y: number): Tx => ({ coil: sq, pose: { position: [x, y, 0] }, compensation: "series", capacitor: { capacitance: "47 nF" }, drive: { kind: "sine", amplitude: "1 V" } });
    for (const txs of [[at(-0.052, 0), at(0.052, 0)], [at(-0.052, -0.052), at(0.052, -0.052), at(-0.052, 0.052), at(0.052, 0.052)]]) {
      const { network } = linkNetwork({ frequency: "200 kHz", transmitters: txs, receivers: [] });
      const L = network.inductance;
      const n = L.length;
      // Cholesky: positive pivots ⇔ positive definite (stored magnetic energy ½IᵀLI > 0)
      const ch = L.map((row) => row.slice());
      for (let k = 0; k < n; k++) {
        for (let j = 0; j < n; j++) expect(L[k]![j]).toBe(L[j]![k]);
        for (let p = 0; p < k; p++) ch[k]![k] = ch[k]![k]! - ch[k]![p]! ** 2;
        expect(ch[k]![k]!).toBeGreaterThan(0);
        ch[k]![k] = Math.sqrt(ch[k]![k]!);
        for (let i = k + 1; i < n; i++) {
          for (let p = 0; p < k; p++) ch[i]![k] = ch[i]![k]! - ch[i]![p]! * ch[k]![p]!;
          ch[i]![k] = ch[i]![k]! / ch[k]![k]!;
        }
      }
      // the evaluator's M against the exact filament sum, to its 0.1 % (the link's MUTUAL_RTOL)
      const exact = mutualInductance(sq, { position: [-0.052, txs.length === 2 ? 0 : -0.052, 0] }, sq, { position: [0.052, txs.length === 2 ? 0 : -0.052, 0] });
      expectRelClose(L[0]![1]!, exact, 1e-3, "neighbouring squares' M");
    }
  });

  it("refuses what it cannot solve, naming the field", () => {
    const base: LinkSystem = { frequency: "200 kHz", transmitters: [padTx(left), padTx(right)], receivers: [] };
    expect(() => solveLink({ ...base, transmitter: padTx(left) })).toThrow(/transmitters.*either 'transmitter' \(one\) or 'transmitters'/);
    expect(() => solveLink({ frequency: "200 kHz", receivers: [] } as LinkSystem)).toThrow(/transmitter/);
    expect(() => solveLink({ ...base, transmiters: [] } as unknown as LinkSystem)).toThrow(/transmiters.*did you mean 'transmitters'/);
    const shared = (drive: NonNullable<LinkSystem["sharedDrives"]>[number], txs: Tx[]): LinkSystem => ({ ...base, sharedDrives: [drive], transmitters: txs });
    const bus = { name: "bus", drive: { kind: "sine" as const, amplitude: "5 V" }, wiring: "series" as const };
    expect(() => solveLink(shared(bus, [padTx(left, { drive: "buss" })]))).toThrow(/transmitters\[0\]\.drive.*did you mean 'bus'/);
    expect(() => solveLink(shared(bus, [padTx(left, { drive: "bus", phase: "90 deg" })]))).toThrow(/transmitters\[0\]\.phase.*0 or 180°/);
    expect(() => solveLink(shared({ ...bus, drive: { kind: "classE", supply: "12 V", power: "5 W" } } as never, [padTx(left, { drive: "bus" })]))).toThrow(/sharedDrives\[0\]\.drive\.kind.*cannot be shared/);
    expect(() => solveLink(shared({ name: "cc", drive: { kind: "currentRegulated", amplitude: "1 A" }, wiring: "parallel" }, [padTx(left, { drive: "cc" })]))).toThrow(/sharedDrives\[0\]\.wiring.*in series/);
    expect(() => solveLink(shared(bus, [padTx(left, { drive: "bus" })]), { model: "harmonic" })).toThrow(/model.*own drives/);
    const unused = solveLink({ ...base, sharedDrives: [bus] });
    expect(unused.warnings.join(" ")).toMatch(/'bus' feeds no transmitter/);
    expect(unused.errorBand.relative).toBe(Infinity);
    expect(unused.model).toBe("fundamental");
  });
});

describe("several transmitters downstream: summary, supply budget, safety design", () => {
  const sys: LinkSystem = {
    frequency: "200 kHz",
    sharedDrives: [{ name: "bus", drive: { kind: "fullBridge", supply: "12 V", onResistance: "0.1 Ω" }, wiring: "series" }],
    transmitters: [padTx(left, { label: "A", drive: { kind: "halfBridge", supply: "12 V" } }), padTx(right, { label: "B", drive: "bus" }), padTx([0, 0.09, 0], { label: "C", drive: "bus", phase: "180 deg" })],
    receivers: [ledToken([0, 0.02, 0.02])],
  };
  const r = solveLink(sys);
  it("the summary lists every transmitter and the shared drive", () => {
    const text = summarizeLink(r).text;
    for (const l of ["A · coil current", "B · coil current", "C · coil current", "drive bus (series: B, C)"]) expect(text).toContain(l);
  });
  it("the supply budget sums every drive's draw from the one supply voltage", () => {
    const b = supplyBudget(sys, { kind: "bench", voltage: "12 V", current: "10 A" });
    expectRelClose(b.current, r.drives.reduce((a, d) => a + Math.max(0, d.inputPower), 0) / 12, 1e-12, "Σ P_in/V_DD");
    expect(r.drives.map((d) => d.label)).toEqual(["A", "bus"]);
    const mixed = { ...sys, transmitters: [padTx(left, { drive: { kind: "halfBridge", supply: "5 V" } }), ...sys.transmitters!.slice(1)] };
    expect(() => supplyBudget(mixed, { kind: "bench", voltage: "12 V", current: "10 A" })).toThrow(/sharedDrives\[0\]\.drive.*one supply budget needs one supply voltage/);
  });
  it("designFromLink carries each transmitter's solved current and its (shared) drive's switch voltage", () => {
    const d = designFromLink(sys, r, { surfaceHeight: 0.004 });
    expect(d.transmitters.map((t) => t.label)).toEqual(["A", "B", "C"]);
    d.transmitters.forEach((t, i) => expect(t.current).toBe(r.transmitters[i]!.coilCurrent));
    expect(d.transmitters.map((t) => t.switchPeakVoltage)).toEqual([12, 12, 12]);
  });
});

describe("solveLink input checks (issue 11)", () => {
  const one: LinkSystem = { frequency: "200 kHz", transmitter: padTx([0, 0, 0]), receivers: [ledToken([0, 0, 0.02])] };
  it("options are strict: a typo names the key and the nearest valid one", () => {
    expect(() => solveLink(one, { litTreshold: 1e-3 } as never)).toThrow(TanklightInputError);
    expect(() => solveLink(one, { litTreshold: 1e-3 } as never)).toThrow(/litTreshold.*did you mean 'litThreshold'/);
    expect(() => solveLink(one, { model: "harmonik" } as never)).toThrow(/model/);
    expect(() => solveLink(one, { samples: 1e9 } as never)).toThrow(/samples/);
    // quantities with units are accepted
    expect(solveLink(one, { litThreshold: "2 mA" } as never).litThreshold).toBe(2e-3);
  });
  it("an LED load without its LED names the field", () => {
    const bad = { ...one, receivers: [{ ...ledToken([0, 0, 0.02]), load: { kind: "led" } }] } as unknown as LinkSystem;
    expect(() => solveLink(bad)).toThrow(TanklightInputError);
    expect(() => solveLink(bad)).toThrow(/receivers\[0\]\.load\.led/);
  });
  it("two tokens at one pose: an error naming both receivers", () => {
    const two = { ...one, receivers: [ledToken([0, 0, 0.02]), { ...ledToken([0, 0, 0.02]), label: "second" }] };
    expect(() => solveLink(two)).toThrow(TanklightInputError);
    expect(() => solveLink(two)).toThrow(/receivers\[0\].*receiver 1 and second \(receivers\[1\]\) are the same coil at the same pose/);
  });
});
