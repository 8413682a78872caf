/**
 * Harmonic balance of a one-transmitter, one-token link at many couplings: the token's steady
 * state tabulated once against its induced EMF (./tokenTable.ts), then per mutual inductance M
 * only the transmitter's loop equation at the fundamental,
 *   (Z₀ + (ωM)²·Y(x))·I₀ = E₁,   x = |ωM|·|I₀|,
 * Z₀ the transmitter's own impedance behind its drive (Thevenin, ./ports.ts), Y(x) the token's
 * coil admittance at EMF amplitude x. The token's reflected impedance depends on |I₀|, so this
 * is one real equation s·|Z₀ + (ωM)²Y(|ωM|s)| = |E₁| in s = |I₀|, solved by Newton's method
 * with bisection safeguards (slope from the table's Hermite derivative). A current-driven
 * transmitter needs no solve.
 *
 * The drive's harmonics (a bridge's square wave) reach the token as EMF harmonics h·ωM·I₀,h;
 * the table leaves them out. Their size relative to the fundamental EMF, ε = √Σ(h·|I₀,h|)²/|I₀,₁|
 * (I₀,h from the transmitter alone: the token's reflection at h ≥ 2 is of order k², and at
 * those frequencies a tuned tank is far off resonance), is reported per pose; the input power
 * adds the drive harmonics' own power into the transmitter with the same approximation.
 *
 * Applies to: one transmitter (own drive: sine, half or full bridge, or a held current), one
 * receiver with a nonlinear token load. Not to the single-switch drive (its switch node is solved
 * with the tank: a second nonlinear port), several transmitters or several tokens — those keep
 * the direct solve (solveLinkHarmonic).
 */
import type { LinkNetwork } from "../link/network.ts";
import { TanklightInputError } from "../../errors.ts";
import { capacitorAdmittance, capacitorImpedance, transmitterThevenin } from "./ports.ts";
import { emfSpectrum } from "./solveHarmonic.ts";
import { tokenTable, type TokenPoint, type TokenTable } from "./tokenTable.ts";

/**
 * Largest EMF harmonic content ({@link LinkTablePoint.emfHarmonics}) at which a tabulated pose is
 * used: 2 %. Measured against the direct harmonic-balance solve (tests/circuit/harmonic/linkTable.test.ts,
 * a red + InGaN green pair on a full bridge): the LED currents' error grows with it — 0.11 % at
 * 1.4 %, 0.35 % at 2.6 %, 1.2 % at 6.7 % (a transmitter of Q ≈ 8); above the limit a caller
 * solves that pose directly.
 */
export const EMF_HARMONICS_LIMIT = 0.02;

/** The link at one coupling, from the table (SI; amplitudes peak). */
export interface LinkTablePoint {
  /** each LED's average current, A (the token's LED order) */
  readonly leds: Float64Array;
  /** transmitter coil current at the fundamental, A */
  transmitterCurrent: number;
  /** EMF amplitude induced in the token, V */
  emf: number;
  /** mean power the drive delivers, W (fundamental from the solve; drive harmonics with the transmitter alone) */
  input: number;
  /** the EMF harmonics the table leaves out, relative to the fundamental EMF */
  emfHarmonics: number;
}

/** A one-transmitter, one-token link solved at any mutual inductance from its token table. */
export interface LinkTable {
  readonly token: TokenTable;
  /** the link at mutual inductance M (H) into out */
  solve(mutual: number, out: LinkTablePoint): void;
  /** a point record sized for this link */
  point(): LinkTablePoint;
}

/**
 * Why the table cannot solve this network, or undefined when it can.
 * @example linkTableRefusal(networkWithTwoTokens) // "several receivers: …"
 */
export function linkTableRefusal(net: LinkNetwork): string | undefined {
  if ((net.transmitters !== undefined && net.transmitters.length > 1) || net.sharedDrives !== undefined) return "several transmitters or a shared drive";
  if (net.receivers.length !== 1) return "several receivers (the token's environment is not its EMF alone)";
  const load = net.receivers[0]!.load;
  if (load.linear || load.token === undefined) return "the token's load is linear or known only by its describing function";
  const d = net.transmitter.drive;
  if (d.kind === "voltage" && d.waveform?.kind === "singleSwitch") return "the single-switch drive (its switch node is solved with the tank)";
  return undefined;
}

/**
 * Builds the link table (the token table grows on demand as couplings are solved).
 * @param net the link; its mutual inductance is ignored (each solve gives its own).
 * @param options order H, samples N, lit threshold (A).
 * @throws TanklightInputError when {@link linkTableRefusal} gives a reason.
 * @example linkTable(net, { order: 15, samples: 120, litThreshold: 5e-4 }).solve(1e-6, point) writes the link at M = 1 µH
 */
export function linkTable(net: LinkNetwork, options: { readonly order: number; readonly samples: number; readonly litThreshold: number }): LinkTable {
  const refusal = linkTableRefusal(net);
  if (refusal !== undefined) throw new TanklightInputError([{ path: "network", message: `the link table does not apply: ${refusal}`, value: refusal }], "linkTable");
  const w = 2 * Math.PI * net.frequency;
  const tx = net.transmitter;
  const L0 = net.inductance[0]![0]!;
  const R0 = tx.resistance;
  const drive = tx.drive;
  const table = tokenTable(net.frequency, net.inductance[1]![1]!, net.receivers[0]!, options, drive.kind === "voltage" ? { transmitter: tx, inductance: L0 } : undefined);
  const tmp = new Float64Array(2);
  const emf = emfSpectrum(net);
  const H = options.order;
  const c0 = tx.capacitance ?? 0;
  const esr0 = tx.capacitorEsr ?? 0;

  /** mean power into the transmitter at harmonic h for coil current i0 and coil voltage cv (the result's own accounting). */
  const power = (h: number, i0Re: number, i0Im: number, cvRe: number, cvIm: number): number => {
    let sRe = i0Re;
    let sIm = i0Im;
    let tRe = cvRe;
    let tIm = cvIm;
    if (tx.compensation === "series") {
      const [zr, zi] = capacitorImpedance(c0, esr0, h * w);
      tRe += i0Re * zr - i0Im * zi;
      tIm += i0Re * zi + i0Im * zr;
    } else if (tx.compensation === "parallel") {
      const [yr, yi] = capacitorAdmittance(c0, esr0, h * w);
      sRe += cvRe * yr - cvIm * yi;
      sIm += cvRe * yi + cvIm * yr;
    }
    if (drive.kind === "voltage") {
      tRe += sRe * drive.resistance;
      tIm += sIm * drive.resistance;
    }
    return (h === 0 ? 1 : 0.5) * (tRe * sRe + tIm * sIm);
  };

  // the drive's harmonics h ≠ 1 with the transmitter alone: their power and their current
  let harmonicInput = 0;
  let harmonicEmf = 0;
  let e1Re = 0;
  let e1Im = 0;
  let z0Re = 0;
  let z0Im = 0;
  if (drive.kind === "voltage") {
    for (let h = 0; h <= H; h++) {
      const th = transmitterThevenin(tx, drive, emf, h, h * w, tmp);
      const zr = th.zRe + R0;
      const zi = th.zIm + h * w * L0;
      if (h === 1) {
        e1Re = th.eRe;
        e1Im = th.eIm;
        z0Re = zr;
        z0Im = zi;
        continue;
      }
      if (th.eRe === 0 && th.eIm === 0) continue;
      const den = zr * zr + zi * zi;
      const iRe = (th.eRe * zr + th.eIm * zi) / den;
      const iIm = (th.eIm * zr - th.eRe * zi) / den;
      harmonicInput += power(h, iRe, iIm, R0 * iRe - h * w * L0 * iIm, R0 * iIm + h * w * L0 * iRe);
      harmonicEmf += h * h * (iRe * iRe + iIm * iIm);
    }
  }
  const eAbs = Math.hypot(e1Re, e1Im);
  const p: TokenPoint = table.point();

  /** |Z₀ + (ωM)²Y(x)| and its slope in s, at s (x = |ωM|s); Y with the reflection term μ·∂Y/∂μ, μ = M². */
  const loop = (wm: number, s: number): { g: number; dg: number; zr: number; zi: number } => {
    const aw = Math.abs(wm);
    table.at(aw * s, p);
    const wm2 = wm * wm;
    const mu = wm2 / (w * w);
    const zr = z0Re + wm2 * (p.yRe + mu * p.yMuRe);
    const zi = z0Im + wm2 * (p.yIm + mu * p.yMuIm);
    const g = Math.hypot(zr, zi);
    const dg = g > 0 ? (wm2 * aw * (zr * p.dyRe + zi * p.dyIm)) / g : 0;
    return { g, dg, zr, zi };
  };

  const solve = (mutual: number, out: LinkTablePoint): void => {
    const wm = w * mutual;
    const aw = Math.abs(wm);
    let i0Re: number;
    let i0Im: number;
    if (drive.kind === "current") {
      i0Re = drive.amplitude;
      i0Im = 0;
      table.at(aw * drive.amplitude, p);
    } else {
      // s·|Z(s)| = |E₁|: F(0) < 0; F rises past every root's bracket (Re Z ≥ Re Z₀ > 0 for a passive token)
      const zl = loop(wm, 0);
      let s = eAbs / zl.g;
      let lo = 0;
      let hi = Infinity;
      for (let it = 0; it < 200; it++) {
        const l = loop(wm, s);
        const f = s * l.g - eAbs;
        if (f > 0) hi = s;
        else lo = s;
        if (Math.abs(f) <= 1e-13 * eAbs) break;
        const df = l.g + s * l.dg;
        let next = df > 0 ? s - f / df : NaN;
        if (!(next > lo && next < hi)) next = hi === Infinity ? Math.max(2 * s, lo + 1e-300) : 0.5 * (lo + hi);
        if (Math.abs(next - s) <= 1e-14 * s) {
          s = next;
          break;
        }
        s = next;
      }
      const l = loop(wm, s);
      // I₀ = E₁/(Z₀ + (ωM)²Y)
      const den = l.zr * l.zr + l.zi * l.zi;
      i0Re = den > 0 ? (e1Re * l.zr + e1Im * l.zi) / den : 0;
      i0Im = den > 0 ? (e1Im * l.zr - e1Re * l.zi) / den : 0;
      table.at(aw * Math.hypot(i0Re, i0Im), p);
    }
    // the token's coil current I₁ = Y·e, e = −jωM·I₀; the coil voltage (R₀ + jωL₀)I₀ + jωM·I₁
    const mu = mutual * mutual;
    const yRe = p.yRe + mu * p.yMuRe;
    const yIm = p.yIm + mu * p.yMuIm;
    const eRe = wm * i0Im;
    const eIm = -wm * i0Re;
    const i1Re = yRe * eRe - yIm * eIm;
    const i1Im = yRe * eIm + yIm * eRe;
    const cvRe = R0 * i0Re - w * L0 * i0Im - wm * i1Im;
    const cvIm = R0 * i0Im + w * L0 * i0Re + wm * i1Re;
    const s = Math.hypot(i0Re, i0Im);
    for (let i = 0; i < out.leds.length; i++) out.leds[i] = p.leds[i]! + mu * p.ledsMu[i]!;
    out.transmitterCurrent = s;
    out.emf = aw * s;
    out.input = power(1, i0Re, i0Im, cvRe, cvIm) + harmonicInput;
    out.emfHarmonics = s > 0 ? Math.sqrt(harmonicEmf) / s : 0;
  };

  return {
    token: table,
    solve,
    point: () => ({ leds: new Float64Array(table.ledLabels.length), transmitterCurrent: 0, emf: 0, input: 0, emfHarmonics: 0 }),
  };
}
