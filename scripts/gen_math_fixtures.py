#!/usr/bin/env python3
"""Generates the reference fixtures of lib/math (tests/fixtures/math/*.json).

Run:  python3 scripts/gen_math_fixtures.py
Needs mpmath and numpy (no network). Every value is computed at 40 significant digits with
mpmath and written as the correctly rounded double (Python repr, 17 significant digits at
most), so "digits": 17. Arguments are written as doubles too, and the reference is computed
for that exact double, never for a decimal the double only approximates.

Conventions (docs/style.md §3): tanklight's ellipticK(m)/ellipticE(m) take the parameter m = k².
mpmath.ellipk(m) and mpmath.ellipe(m) use the same parameter m, so no conversion is needed.
"""
import json
import math
import os
import sys

import mpmath
import numpy as np
from mpmath import mp, mpf

mp.dps = 40
HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "..", "tests", "fixtures", "math")
GENERATOR = "scripts/gen_math_fixtures.py (mpmath %s, numpy %s)" % (mpmath.__version__, np.__version__)


def d(x):
    """Correctly rounded double of an mpf, as a JSON number."""
    return float(x)


def round15(x):
    """x rounded to 15 decimals (the printed precision of A&S Table 17.1), as a double."""
    return float(mp.nint(x * mpf(10) ** 15) / mpf(10) ** 15)


def write(name, source, cases, digits=17, **extra):
    os.makedirs(OUT, exist_ok=True)
    doc = {"source": source, "generator": GENERATOR, "digits": digits}
    doc.update(extra)
    doc["cases"] = cases
    with open(os.path.join(OUT, name), "w") as f:
        json.dump(doc, f, indent=1, allow_nan=False)
        f.write("\n")
    print("wrote", name, len(cases), "cases")


# ── elliptic integrals ─────────────────────────────────────────────────────────────
def elliptic():
    # A&S Table 17.1 spot values: K(m), E(m) at m = 0.00(0.01)1.00 printed to 15 decimals.
    table = []
    for m_text in ["0.0", "0.1", "0.2", "0.3", "0.5", "0.7", "0.8", "0.9", "0.95", "0.99"]:
        m = mpf(m_text)  # the table's argument is the decimal itself
        table.append({
            "m": float(m_text),
            "K": round15(mp.ellipk(m)),
            "E": round15(mp.ellipe(m)),
        })
    write(
        "as-table-17-1.json",
        "values of A&S Table 17.1 regenerated with mpmath (Abramowitz & Stegun 1964, Handbook of "
        "Mathematical Functions, Table 17.1: K(m) and E(m) against the parameter m, 15 decimals)",
        table,
        digits=15,
        note="rounded to 15 decimals like the printed table; the argument m is the decimal of the "
             "table, while the test passes its nearest double (difference below 1e-17 relative, "
             "far inside the 15-decimal rounding).",
    )

    cases = []
    # interior grid and the m → 0 end (parameter form: m given, m1 = 1 − m formed in mpmath)
    ms = [0.0, 1e-300, 1e-20, 1e-16, 1e-12, 1e-8, 1e-5, 1e-3, 0.01, 0.05, 0.1, 0.2, 0.25, 0.3,
          1 / 3, 0.4, 0.5, 0.6, 2 / 3, 0.7, 0.75, 0.8, 0.85, 0.9, 0.95, 0.98, 0.99, 0.999, 0.9999]
    for m in ms:
        mm = mpf(m)
        cases.append({"form": "parameter", "m": m, "K": d(mp.ellipk(mm)), "E": d(mp.ellipe(mm))})
    # the m → 1 end in complementary form: m1 given exactly, m = 1 − m1 in 40 digits
    for m1 in [0.5, 0.1, 1e-2, 1e-3, 1e-4, 1e-5, 1e-6, 3e-7, 1e-7, 1e-8, 1e-9, 1e-10, 1e-11,
               1e-12, 1e-13, 1e-14, 1e-15, 1e-16, 1e-20, 1e-50, 1e-300]:
        # enough working digits that 1 − m1 keeps m1 in full (m1 down to 1e-300)
        with mp.workdps(int(-math.log10(m1)) + 40):
            mm = 1 - mpf(m1)
            cases.append({"form": "complement", "m1": m1, "K": d(mp.ellipk(mm)), "E": d(mp.ellipe(mm))})
    write(
        "elliptic-mpmath.json",
        "mpmath ellipk/ellipe at 40 digits (parameter m = k², the same convention as ours)",
        cases,
    )


# ── Gauss–Legendre ─────────────────────────────────────────────────────────────────
def legendre_pd(n, x):
    p0, p1 = mpf(1), x
    for k in range(2, n + 1):
        p0, p1 = p1, ((2 * k - 1) * x * p1 - (k - 1) * p0) / k
    dp = n * (x * p1 - p0) / (x * x - 1)
    return p1, dp


def gauss_legendre():
    rules = []
    for n in [1, 2, 5, 20, 64, 200, 500]:
        # start from numpy (Golub–Welsch eigenvalues + Newton polish), finish by Newton at 40 digits
        xs, _ = np.polynomial.legendre.leggauss(n)
        half = [x for x in xs if x >= 0]
        nodes, weights = [], []
        for x0 in sorted(half):
            x = mpf(x0)
            if n == 1:
                x = mpf(0)
            else:
                for _ in range(60):
                    p, dp = legendre_pd(n, x)
                    dx = p / dp
                    x -= dx
                    if abs(dx) < mpf(10) ** (-38):
                        break
            if n == 1:
                w = mpf(2)
            else:
                _, dp = legendre_pd(n, x)
                w = 2 / ((1 - x * x) * dp * dp)  # A&S 25.4.29
            nodes.append(d(x))
            weights.append(d(w))
        # independent check inside the generator: weights sum to 2
        total = sum(2 * mpf(w) for w, x in zip(weights, nodes) if x != 0) + sum(mpf(w) for w, x in zip(weights, nodes) if x == 0)
        assert abs(total - 2) < 1e-13, (n, total)
        rules.append({"n": n, "nonNegativeNodes": nodes, "weights": weights})
    write(
        "gauss-legendre.json",
        "Gauss–Legendre nodes (roots of P_n) and weights 2/((1−x²)P_n'(x)²) (A&S 1964 eq. 25.4.29), "
        "Newton's iteration on P_n in mpmath at 40 digits started from numpy.polynomial.legendre.leggauss",
        rules,
        note="only the nodes x ≥ 0 (ascending) and their weights; the rule is symmetric.",
    )


# ── Lambert W ──────────────────────────────────────────────────────────────────────
# Branch-point series of W₀ in p = √(2(ex + 1)) (Corless et al. 1996, eq. 4.22), as typed in
# lib/math/lambertW.ts: checked here against mpmath — with ten terms the error must scale as p¹⁰.
BRANCH_SERIES = [mpf(-1), mpf(1), mpf(-1) / 3, mpf(11) / 72, mpf(-43) / 540, mpf(769) / 17280,
                 mpf(-221) / 8505, mpf(680863) / 43545600, mpf(-1963) / 204120,
                 mpf(226287557) / 37623398400]


def check_branch_series():
    for p in [mpf("0.001"), mpf("0.01"), mpf("0.03")]:
        x = (p * p / 2 - 1) / mp.e
        exact = mp.lambertw(x).real
        series = sum(c * p ** k for k, c in enumerate(BRANCH_SERIES))
        # next coefficient ≈ −0.0036: truncation ≈ 0.004·p¹⁰ (≈ 2e-18 at p = 0.03)
        assert abs(series - exact) < mpf("0.005") * p ** 10, (p, series - exact)
    print("branch series coefficients verified against mpmath")


def lambert():
    check_branch_series()
    inv_e = mp.exp(-1)
    hi = float(inv_e)
    print("1/e split: hi", repr(hi), "lo", repr(float(inv_e - mpf(hi))))
    xs = []
    # approach the branch point −1/e from above (only doubles with x > −1/e exactly)
    x = -hi
    if mpf(x) < -inv_e:
        x = math.nextafter(x, 0)
    for _ in range(4):
        xs.append(x)
        x = math.nextafter(x, 0)
    for delta in [1e-15, 1e-13, 1e-12, 1e-10, 1e-8, 1e-6, 1e-4, 1e-3, 1e-2, 3e-2, 0.05]:
        xs.append(float(-inv_e + delta))
    xs += [-0.3, -0.25, -0.2, -0.1, -0.01, -1e-5, -1e-10, -1e-300, 1e-300, 1e-20, 1e-10, 1e-5,
           0.01, 0.1, 0.5, 1.0, math.e, 2.0, 3.0, 5.0, 10.0, 30.0, 100.0, 1e3, 1e5, 1e10,
           1e20, 1e50, 1e100, 1e200, 1e300, 1.7976931348623157e308]
    cases = []
    for x in xs:
        xm = mpf(x)
        assert xm >= -inv_e
        w = mp.lambertw(xm)
        assert abs(w.imag) == 0
        cases.append({"x": x, "W": d(w.real), "regime": regime(x, inv_e)})
    write(
        "lambertw-mpmath.json",
        "mpmath lambertw (principal branch W₀) at 40 digits, evaluated at the exact double x",
        cases,
    )
    logs = []
    for y in ([-700.0, -50.0, -1.0, 0.0, 0.5, 1.0, 2.0, 10.0, 100.0, 700.0, 709.0, 710.0, 1000.0,
              1e4, 1e6, 1e10, 1e15, 1e100, 1e300]
             # a dense grid over the diode range, and both sides of the hot-path core's
             # switch points (y = −30, 1.5, 1e8), for lambertWOfLogCore
             + [round(-60 + 860 * k / 211 + 0.0137 * k, 6) for k in range(212)]
             + [-30.000001, -29.999999, 1.4999999, 1.5000001, 99999999.0, 100000001.0]):
        w = mp.lambertw(mp.exp(mpf(y)))
        logs.append({"y": y, "W": d(w.real)})
    write(
        "lambertw-of-log-mpmath.json",
        "mpmath lambertw(exp(y)) at 40 digits (W₀ of e^y, formed without overflow in mpmath)",
        logs,
    )


def regime(x, inv_e):
    if mpf(x) + inv_e < mpf("1e-3"):
        return "branch"
    if x > 1e300:
        return "huge"
    return "regular"


# ── xoshiro128** (an independent port of Blackman & Vigna's reference C code) ─────
M32 = 0xFFFFFFFF
M64 = (1 << 64) - 1


def splitmix64(state):
    state = (state + 0x9E3779B97F4A7C15) & M64
    z = state
    z = ((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9) & M64
    z = ((z ^ (z >> 27)) * 0x94D049BB133111EB) & M64
    return state, z ^ (z >> 31)


def rotl(x, k):
    return ((x << k) | (x >> (32 - k))) & M32


class Xoshiro128ss:
    def __init__(self, seed):
        s = []
        sm = seed
        for _ in range(2):
            sm, out = splitmix64(sm)
            s += [out & M32, out >> 32]
        self.s = s

    def next(self):
        s = self.s
        result = (rotl((s[1] * 5) & M32, 7) * 9) & M32
        t = (s[1] << 9) & M32
        s[2] ^= s[0]
        s[3] ^= s[1]
        s[1] ^= s[2]
        s[0] ^= s[3]
        s[2] ^= t
        s[3] = rotl(s[3], 11)
        return result

    def uniform(self):
        a = self.next() >> 5
        b = self.next() >> 6
        return (a * 67108864 + b) / 9007199254740992.0


# Published test data for xoshiro128** (state words and outputs as printed in the source, hex):
# edorfaus/xoshiro-6502, test-rom/testdata.asm (commit 196821ae), "the same data that was used to
# initialize the C reference implementation [of Blackman & Vigna] to generate the other test
# data used for verification". Typed here from the source (a spot-value table), then checked
# against our Python port before it is written.
XOSHIRO_VECTOR_STATES = [
    [0x964D4A0C, 0xD40AB895, 0xAD7FDECB, 0x3006F0F0],
    [0x72410269, 0xEF382C52, 0x2E43BEC7, 0x62432F20],
    [0xFF3A011B, 0xB33A90FC, 0x2C5A18AE, 0xD81B946B],
    [0x941B058C, 0x605A8949, 0xA641E1B5, 0x0824BB59],
    [0xFC65379C, 0x52006D70, 0x87487639, 0xF1908343],
]
XOSHIRO_VECTOR_STARSTAR = [0xF1391922, 0x6FE53806, 0xA5BE2840, 0xF510EE70]


def xoshiro_vectors():
    g = Xoshiro128ss(0)
    g.s = list(XOSHIRO_VECTOR_STATES[0])
    outs = []
    for k in range(4):
        outs.append(g.next())
        assert g.s == XOSHIRO_VECTOR_STATES[k + 1], ("state", k)
    assert outs == XOSHIRO_VECTOR_STARSTAR, outs
    write(
        "xoshiro128ss-c-reference-vectors.json",
        "test data generated with the C reference implementation of xoshiro128** (Blackman & Vigna), "
        "as published in github.com/edorfaus/xoshiro-6502 test-rom/testdata.asm (commit 196821ae)",
        [{"state": XOSHIRO_VECTOR_STATES[0], "outputs": XOSHIRO_VECTOR_STARSTAR,
          "statesAfter": XOSHIRO_VECTOR_STATES[1:]}],
        digits=10,
        note="32-bit unsigned integers; digits is not meaningful for integers (exact).",
    )


def xoshiro():
    xoshiro_vectors()
    cases = []
    for seed in [0, 1, 42, 20261202, 2**32 + 7, 2**53 - 1]:
        g = Xoshiro128ss(seed)
        state = list(g.s)
        ints = [g.next() for _ in range(10)]
        g2 = Xoshiro128ss(seed)
        unis = [g2.uniform() for _ in range(5)]
        cases.append({"seed": seed, "state": state, "uint32": ints, "uniform": unis})
    write(
        "xoshiro128ss.json",
        "independent-method check: a Python port of xoshiro128** 1.1 (Blackman & Vigna 2021) seeded "
        "by SplitMix64 (Steele, Lea & Flood 2014), low 32-bit word first; uniform = 53-bit construction",
        cases,
        digits=17,
    )


if __name__ == "__main__":
    elliptic()
    gauss_legendre()
    lambert()
    xoshiro()
    sys.exit(0)
