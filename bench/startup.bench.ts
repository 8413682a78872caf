/**
 * Start-up cost, measured as whole fresh processes (wall time of spawning node): the bare
 * `node -e 0`; importing the package from dist/ (`npm run build` first); importing lib/mod.ts
 * through tsx; and a one-off script that imports the library and computes the 121 × 61
 * coupling map (bench/em.bench.ts) beside the same script written with the vectorised peer
 * (bench/couplingMapPeer.ts, bundled to plain JS so it needs no loader). Ratios against the
 * bare node start and against the peer are printed from the same run.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { buildSync } from "esbuild";
import type { Workload } from "./harness.ts";
import { roundCoil } from "../lib/em/builders/roundCoil.ts";
import { peerTurns } from "./couplingMapPeer.ts";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const dist = join(root, "dist", "mod.js");
const work = mkdtempSync(join(tmpdir(), "tanklight-bench-"));

const run = (args: readonly string[], cwd = root): (() => number) => () => {
  const r = spawnSync(process.execPath, args, { cwd, encoding: "utf8" });
  if (r.status !== 0) throw new Error(`bench: node ${args.join(" ")} failed: ${r.stderr}`);
  return r.stdout.length;
};

// the one-off scripts: same coils, same grid, same relTol (1e-3)
const tx = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
const token = roundCoil({ innerRadius: 0.006, turns: 30, wire: { diameter: 1e-4 } });
const grid = `const xs = Array.from({ length: 121 }, (_, i) => -0.06 + i * 0.001), hs = Array.from({ length: 61 }, (_, i) => 0.002 + i * 0.002);`;
const libScript = join(work, "library-map.mjs");
writeFileSync(
  libScript,
  `import { roundCoil, couplingEvaluator } from ${JSON.stringify(pathToFileURL(dist).href)};
const tx = roundCoil({ innerRadius: 0.04, turns: 20, layers: 4, wire: { diameter: 5e-4 } });
const token = roundCoil({ innerRadius: 0.006, turns: 30, wire: { diameter: 1e-4 } });
${grid}
const ev = couplingEvaluator(tx, token);
let s = 0;
for (const h of hs) for (const x of xs) s += ev.mutual({ position: [0, 0, 0] }, { position: [x, 0, h] });
console.log(s);
`,
);
const peerModule = join(work, "peer.mjs");
buildSync({ entryPoints: [join(root, "bench", "couplingMapPeer.ts")], outfile: peerModule, format: "esm", platform: "node", bundle: true, logLevel: "warning" });
const turns = (t: ReturnType<typeof peerTurns>) => `{ r: Float64Array.of(${[...t.r].join(",")}), z: Float64Array.of(${[...t.z].join(",")}), w: Float64Array.of(${[...t.w].join(",")}) }`;
const peerScript = join(work, "peer-map.mjs");
writeFileSync(
  peerScript,
  `import { peerMap } from "./peer.mjs";
const tx = ${turns(peerTurns(tx.filaments))};
const token = ${turns(peerTurns(token.filaments))};
${grid}
const m = peerMap(tx, token, xs, hs, 1e-3);
console.log(m.reduce((a, b) => a + b, 0));
`,
);

/** Newest modification time of any file under `dir`, ms. */
const newest = (dir: string): number => {
  let t = 0;
  const walk = (d: string): void => {
    for (const e of readdirSync(d, { withFileTypes: true })) {
      const p = join(d, e.name);
      if (e.isDirectory()) walk(p);
      else t = Math.max(t, statSync(p).mtimeMs);
    }
  };
  walk(dir);
  return t;
};
const distFresh = existsSync(dist) && statSync(dist).mtimeMs >= newest(join(root, "lib"));
if (!distFresh) console.log("startup bench: dist/ is missing or older than lib/ — run `npm run build` first; the dist workloads are skipped");

const bare = "fresh process: node -e 0";
const tsxBare = "fresh process: node --import tsx -e 0 (tsx's own start)";
const peerName = "fresh process: peer script, 121×61 map (no library)";
// Each workload is one whole process, timed after one warm-up call (which fills the file
// cache). The start-up comparisons re-run their reference in alternating rounds (`interleave`),
// so the ratios hold when the machine's load changes during the run; the peer map (seconds
// under load) is measured once, its ratio to the library is large.
export const workloads: Workload[] = [
  { name: bare, size: "1 process", rounds: 9, warmup: 0, fn: run(["-e", "0"]) },
  ...(distFresh
    ? [
        { name: "fresh process: import tanklight from dist/", size: "1 process", rounds: 9, warmup: 0, target: 0.3, against: bare, interleave: true, maxSlowdown: 1.5, fn: run(["-e", `import(${JSON.stringify(pathToFileURL(dist).href)})`]) },
      ]
    : []),
  { name: tsxBare, size: "1 process", rounds: 5, warmup: 0, fn: run(["--import", "tsx", "-e", "0"]) },
  { name: "fresh process: import lib/mod.ts through tsx", size: "1 process", rounds: 5, warmup: 0, target: 1, against: tsxBare, interleave: true, fn: run(["--import", "tsx", "-e", `import(${JSON.stringify(pathToFileURL(join(root, "lib", "mod.ts")).href)})`]) },
  { name: peerName, size: "1 process", rounds: 5, warmup: 0, fn: run([peerScript], work) },
  ...(distFresh
    ? [{ name: "fresh process: import tanklight + 121×61 map", size: "1 process", rounds: 5, warmup: 0, target: 0.5, against: peerName, targetRatio: 1, fn: run([libScript]) }]
    : []),
];
