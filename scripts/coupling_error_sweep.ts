/**
 * A seeded random sweep of couplingEvaluator's reported error against its true error (docs/methods/em.md,
 * "What the reported error is"): four transmitter kinds (two-layer roundCoil, flat spiral, solenoid,
 * rectangular spiral) × three token kinds (two-layer roundCoil, flat spiral, rectangular loop) × relTol
 * 1e-3 and 1e-5 × n random poses (position within ±50 × ±40 mm, 2–40 mm up; half of them tilted up to
 * 69°, any spin). The reference is mutualInductance's filament-by-filament sum (≤ 1e-9 per pair).
 * Deviations below 1e-8·|M_ref| are taken as the reference's own error and not counted.
 * Prints the worst ratio |M − M_ref| / error, the worst |M − M_ref| / (relTol·|M_ref|), and the 15 worst poses.
 * Run: npx tsx scripts/coupling_error_sweep.ts <seed> <poses per pair>   (demo coils, our own).
 */
import { couplingEvaluator, mutualInductance, roundCoil, flatSpiral, solenoid, rectSpiral, rectLoop } from "../lib/mod.ts";
import { createRandom } from "../lib/advanced.ts";
const seed = Number(process.argv[2] ?? 1), n = Number(process.argv[3] ?? 40);
const txs = {
  round: roundCoil({ innerRadius: 0.02, turns: 8, layers: 2, wire: { diameter: 5e-4 } }),
  spiral: flatSpiral({ innerRadius: 0.01, turns: 8, pitch: 0.002, trace: { width: 0.001, thickness: 35e-6 } }),
  solenoid: solenoid({ radius: 0.015, turns: 8, pitch: 0.001, wire: { diameter: 6e-4 } }),
  rect: rectSpiral({ outerWidth: 0.06, outerHeight: 0.04, turns: 3, pitch: 0.003, wire: { diameter: 6e-4 } }),
};
const toks = {
  round: roundCoil({ innerRadius: 0.005, turns: 6, layers: 2, wire: { diameter: 2e-4 } }),
  spiral: flatSpiral({ innerRadius: 0.003, turns: 5, pitch: 6e-4, trace: { width: 3e-4, thickness: 35e-6 } }),
  loop: rectLoop({ width: 0.012, height: 0.008, wire: { diameter: 3e-4 } }),
};
const rng = createRandom(seed);
let worst = 0, worstTol = 0, count = 0;
const rows: string[] = [];
for (const [tn, tx] of Object.entries(txs)) for (const [rn, rx] of Object.entries(toks)) {
  for (const relTol of [1e-3, 1e-5]) {
    const ev = couplingEvaluator(tx, rx, { relTol });
    for (let i = 0; i < n; i++) {
      const tilt = rng.uniform() < 0.5 ? 0 : rng.uniformIn(0, 1.2), az = rng.uniformIn(0, 2 * Math.PI);
      const pose = { position: [rng.uniformIn(-0.05, 0.05), rng.uniformIn(-0.04, 0.04), rng.uniformIn(0.002, 0.04)] as [number, number, number], axis: [Math.sin(tilt) * Math.cos(az), Math.sin(tilt) * Math.sin(az), Math.cos(tilt)] as [number, number, number], spin: rng.uniformIn(0, 6.28) };
      let ref: number;
      try { ref = mutualInductance(tx, { position: [0, 0, 0] }, rx, pose); } catch { continue; }
      const r = ev.evaluate({ position: [0, 0, 0] }, pose);
      const dev = Math.abs(r.mutual - ref);
      count++;
      worstTol = Math.max(worstTol, dev / (relTol * Math.abs(ref)));
      const ratio = dev / Math.max(r.error, 1e-300);
      // below 1e-8·|ref| the reference's own error shows (≤ 1e-9 of each pair's value, and pairs cancel)
      if (dev > 1e-8 * Math.abs(ref) + 1e-22) { if (ratio > worst) worst = ratio; rows.push(`${tn}/${rn} ${relTol} ${r.method} ratio ${ratio.toPrecision(3)} dev/|M| ${(dev / Math.abs(ref)).toExponential(2)} err/|M| ${(r.error / Math.abs(ref)).toExponential(2)} ${r.warnings.length ? "overlap" : ""}`); }
    }
  }
}
rows.sort((a, b) => Number(b.split("ratio ")[1]!.split(" ")[0]) - Number(a.split("ratio ")[1]!.split(" ")[0]));
console.log(`seed ${seed}, ${count} poses: worst |M − ref| / error ${worst.toPrecision(3)}; worst |M − ref| / (relTol·|ref|) ${worstTol.toPrecision(3)}`);
console.log(rows.slice(0, 15).join("\n"));
