#!/usr/bin/env python3
"""Reference values for lib/em/classicFormulas.ts (tests/em/classicFormulas.test.ts).

Writes tests/fixtures/em-formulas/nagaoka.json, annulus.json (flat annular sheets, see
annulus_sheet) and multilayer.json (uniform-current multilayer coils, see multilayer_uniform). nagaoka.json: Nagaoka's coefficient K_N of a uniform
cylindrical current sheet (radius a, length l) for a range of x = D/l = 2a/l, computed two ways
at 40 significant digits with mpmath:

  1. the exact Lorenz form  K_N = 4/(3 pi k') [ (k'^2/k^2)(K - E) + E - k ],
     k^2 = 4a^2/(4a^2 + l^2)  (mpmath.ellipk/ellipe take the parameter m = k^2);
  2. independently, the sheet's self-inductance as a double integral of Maxwell's coaxial-circle
     mutual inductance over the sheet:
        L = (N/l)^2 * 2 * int_0^l (l - s) M(a, a, s) ds,   K_N = L / (mu0 pi a^2 N^2 / l),
     M(a, a, s) = mu0 a [ (2/k - k) K(k^2) - (2/k) E(k^2) ],  k^2 = 4a^2/(4a^2 + s^2)
     (Maxwell, Treatise 1873, sec. 701), by tanh-sinh quadrature (log singularity at s = 0).
The script stops if the two disagree by more than 1e-25 relative; the fixture stores method 2.

Run: python3 scripts/gen_formula_fixtures.py
"""
import json
import os

import mpmath as mp

mp.mp.dps = 40
HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "..", "tests", "fixtures", "em-formulas")


def lorenz(x):
    # a = x/2, l = 1 (K_N depends on x only)
    a = mp.mpf(x) / 2
    l = mp.mpf(1)
    k2 = 4 * a * a / (4 * a * a + l * l)
    kp2 = l * l / (4 * a * a + l * l)
    k, kp = mp.sqrt(k2), mp.sqrt(kp2)
    K, E = mp.ellipk(k2), mp.ellipe(k2)
    return 4 / (3 * mp.pi * kp) * ((kp2 / k2) * (K - E) + E - k)


def sheet_integral(x):
    # mu0 cancels; work with mu0 = 1, N = 1.
    a = mp.mpf(x) / 2
    l = mp.mpf(1)

    def m_coax(s):
        kp2 = s * s / (4 * a * a + s * s)
        if kp2 < mp.mpf(10) ** -30:
            # touching limit (Maxwell): M = a (ln(8a/s) - 2) + O(k'^2 ln k'), exact to ~1e-30 here
            return a * (mp.log(8 * a / s) - 2)
        k2 = 4 * a * a / (4 * a * a + s * s)
        k = mp.sqrt(k2)
        return a * ((2 / k - k) * mp.ellipk(k2) - (2 / k) * mp.ellipe(k2))

    # split at a few points so tanh-sinh sees the log singularity only at s = 0
    pts = [0, min(a, l) / 100, min(a, l) / 10, min(a, l), l] if a < l else [0, l / 100, l / 10, l]
    pts = sorted(set(pts))
    L = (1 / l) ** 2 * 2 * mp.quad(lambda s: (l - s) * m_coax(s), pts)
    return L / (mp.pi * a * a / l)


def main():
    xs = ["0.01", "0.02", "0.05", "0.1", "0.2", "0.3", "0.5", "0.7", "1", "1.5", "2", "3", "5", "7", "10", "20", "50", "100"]
    cases = []
    for xs_ in xs:
        x = mp.mpf(xs_)
        v1 = lorenz(x)
        v2 = sheet_integral(x)
        rel = abs(v1 / v2 - 1)
        if rel > mp.mpf("1e-25"):
            raise SystemExit(f"Lorenz form and sheet integral disagree at x={xs_}: {v1} vs {v2}")
        cases.append({"x": float(x), "K_N": float(v2)})
    doc = {
        "source": "independent method: Nagaoka coefficient as the double integral of Maxwell's coaxial-circle formula (Treatise sec. 701) over a uniform current sheet, agreeing with Lorenz's closed form (Nagaoka 1909) to 1e-25",
        "generator": "scripts/gen_formula_fixtures.py (mpmath, 40 digits)",
        "digits": 17,
        "parameters": "x = D/l = 2a/l; K_N dimensionless; L_sheet = K_N mu0 pi a^2 N^2 / l",
        "cases": cases,
    }
    os.makedirs(OUT, exist_ok=True)
    with open(os.path.join(OUT, "nagaoka.json"), "w") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")
    print(f"wrote {len(cases)} cases")




# ── flat annular current sheet ────────────────────────────────────────────────
# A planar annulus r_in ≤ r ≤ r_out carrying N turns' current spread uniformly over its radial width
# (the sheet of a flat spiral). Its self-inductance is the double integral of Maxwell's coaxial
# formula at zero separation over the sheet:
#     L = (N/c)^2 * 2 * int_{r_in}^{r_out} dr1 int_{r_in}^{r1} dr2 M(r1, r2, 0),   c = r_out - r_in,
#     M(r1, r2, 0) = mu0 sqrt(r1 r2) [ (2/k - k) K(k^2) - (2/k) E(k^2) ],  k^2 = 4 r1 r2/(r1 + r2)^2.
# The inner integral has a logarithmic singularity at r2 = r1 (an end point: tanh-sinh copes).
# Stored: L/(mu0 N^2) in metres.

def annulus_sheet(r_in, r_out):
    r_in = mp.mpf(r_in)
    r_out = mp.mpf(r_out)
    c = r_out - r_in

    def m_cop(r1, r2):
        s = r1 + r2
        kp2 = ((r1 - r2) / s) ** 2  # complementary parameter from the geometry
        if kp2 < mp.mpf(10) ** -30:
            # touching limit: M = sqrt(r1 r2) (ln(8 sqrt(r1 r2)/|r1 - r2|) - 2)
            g = mp.sqrt(r1 * r2)
            return g * (mp.log(8 * g / abs(r1 - r2)) - 2) if r1 != r2 else mp.mpf(0)
        k2 = 1 - kp2
        k = mp.sqrt(k2)
        return mp.sqrt(r1 * r2) * ((2 / k - k) * mp.ellipk(k2) - (2 / k) * mp.ellipe(k2))

    inner = lambda r1: mp.quad(lambda r2: m_cop(r1, r2), [r_in, r1])
    return 2 * mp.quad(inner, [r_in, r_out]) / (c * c)


def annulus_fixture():
    mp.mp.dps = 20
    cases = []
    # the sheets of the three flat spirals of tests/em/inductanceCrossChecks.test.ts:
    # inner edge e, width w, pitch p, N turns -> sheet from e + w/2 to e + w/2 + N p
    for e, w, p, N in [("0.005", "0.0004", "0.0006", 10), ("0.01", "0.0005", "0.001", 5), ("0.003", "0.0002", "0.0003", 20)]:
        r0 = mp.mpf(e) + mp.mpf(w) / 2
        r1 = r0 + N * mp.mpf(p)
        cases.append({"rIn": float(r0), "rOut": float(r1), "LOverMu0N2": float(annulus_sheet(r0, r1))})
    # a sweep of fill ratio rho = (r_out - r_in)/(r_out + r_in) at mean radius 10 mm
    for rho in ["0.05", "0.1", "0.2", "0.4", "0.6", "0.8"]:
        rm = mp.mpf("0.01")
        r0 = rm * (1 - mp.mpf(rho))
        r1 = rm * (1 + mp.mpf(rho))
        cases.append({"rIn": float(r0), "rOut": float(r1), "LOverMu0N2": float(annulus_sheet(r0, r1))})
    doc = {
        "source": "independent method: self-inductance of a uniform flat annular current sheet as the double integral of Maxwell's coaxial formula (Treatise sec. 701) over the sheet",
        "generator": "scripts/gen_formula_fixtures.py (mpmath, 20 digits, tanh-sinh quadrature)",
        "digits": 15,
        "parameters": "rIn, rOut in m; LOverMu0N2 = L/(mu0 N^2) in m",
        "cases": cases,
    }
    with open(os.path.join(OUT, "annulus.json"), "w") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")
    print(f"wrote {len(cases)} annulus cases")


# ── multilayer coil of uniform current density ────────────────────────────────
# A coil whose N turns' current is spread uniformly over its rectangular winding cross-section
# r_in ≤ r ≤ r_out, |z| ≤ len/2 (the model of Wheeler's multilayer formula). Computed by
# subdividing the cross-section into n × n cells: each pair of cells by Maxwell's coaxial formula at
# the cell centres (for cells of equal shape the mutual GMD equals the centre distance up to 4th
# order), each cell's own term µ0 r (ln(8r/g) − 2) with the GMD g of the rectangular cell (Maxwell's
# 0.44705·h for a square; Grover's 0.2235(h_r + h_z) otherwise). The discretisation error falls as
# h² (checked: successive differences shrink 4×), so the stored value is the Richardson extrapolation
# of n = 32 and n = 64; `richardsonChange` is its size, an upper estimate of the remaining error.
# numpy/scipy (ellipkm1 with the complementary parameter formed from the geometry).

def multilayer_uniform(r_in, r_out, length, n):
    import numpy as np
    from scipy.special import ellipkm1, ellipe

    hr = (r_out - r_in) / n
    hz = length / n
    rc = r_in + (np.arange(n) + 0.5) * hr
    zc = -length / 2 + (np.arange(n) + 0.5) * hz
    R, Z = np.meshgrid(rc, zc, indexing="ij")
    R = R.ravel()
    Z = Z.ravel()
    g = 0.447049 * hr if abs(hr - hz) < 1e-12 * hr else 0.2235 * (hr + hz)
    total = float(np.sum(R * (np.log(8 * R / g) - 2)))
    for i in range(len(R)):
        r1, z1 = R[i], Z[i]
        r2 = R[i + 1:]
        dz = Z[i + 1:] - z1
        p = ((r1 - r2) ** 2 + dz ** 2) / ((r1 + r2) ** 2 + dz ** 2)
        k2 = 1 - p
        k = np.sqrt(k2)
        total += 2 * float(np.sum(np.sqrt(r1 * r2) * ((2 / k - k) * ellipkm1(p) - (2 / k) * ellipe(k2))))
    return total / len(R) ** 2


def multilayer_fixture():
    cases = []
    # the windows of the roundCoils in tests/em/inductanceCrossChecks.test.ts: 156 turns with 6a ≈ 9b ≈ 10c,
    # and the benchmark transmitter (40 mm former, 20 turns in 4 layers of 0.5 mm wire)
    for r_in, r_out, length in [(0.007, 0.013, 0.0065), (0.04, 0.042, 0.0025)]:
        v32 = multilayer_uniform(r_in, r_out, length, 32)
        v64 = multilayer_uniform(r_in, r_out, length, 64)
        v = v64 + (v64 - v32) / 3
        cases.append({"rIn": r_in, "rOut": r_out, "length": length, "LOverMu0N2": v, "richardsonChange": abs(v - v64) / v})
    doc = {
        "source": "independent method: multilayer coil of uniform current density by cell subdivision with Maxwell's coaxial formula and cell GMDs, Richardson-extrapolated (numpy/scipy)",
        "generator": "scripts/gen_formula_fixtures.py (numpy, scipy.special.ellipkm1/ellipe)",
        "digits": 7,
        "parameters": "rIn, rOut, length in m; LOverMu0N2 = L/(mu0 N^2) in m; richardsonChange = relative size of the extrapolation step",
        "cases": cases,
    }
    with open(os.path.join(OUT, "multilayer.json"), "w") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")
    print(f"wrote {len(cases)} multilayer cases")


if __name__ == "__main__":
    main()
    annulus_fixture()
    multilayer_fixture()
