#!/usr/bin/env python3
"""Reference values for tests/em (tanklight). Run: python3 scripts/gen_em_fixtures.py

Writes JSON fixtures { source, generator, digits, cases } to tests/fixtures/em/.
Closed forms are evaluated with mpmath at 50 significant digits (so cancellation in the
textbook forms costs nothing); the general circle pairs are computed twice by independent
methods: mpmath quadrature of the single line integral (Grover 1944 / Babic 2010 form,
evaluated with the textbook A_phi at 50 digits) and a double Neumann integral in numpy
(periodic trapezoidal rule in both variables, independent of the closed-form potential).
mpmath's ellipk(m)/ellipe(m) use the parameter convention m = k^2, the same as lib/math.
"""
import json, os, math
import mpmath as mp
import numpy as np

mp.mp.dps = 50
MU0 = mp.mpf("1.25663706212e-6")  # CODATA 2018, same as lib/constants.ts
HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "..", "tests", "fixtures", "em")
os.makedirs(OUT, exist_ok=True)
GEN = "scripts/gen_em_fixtures.py"


def s17(x):
    return float(mp.nstr(x, 17)) if not isinstance(x, float) else x


def write(name, source, cases, digits=17):
    with open(os.path.join(OUT, name), "w") as f:
        json.dump({"source": source, "generator": GEN, "digits": digits, "cases": cases}, f, indent=1)
    print(name, len(cases))


# ---------------------------------------------------------------- loop field
def loop_field(a, rho, z, I=1):
    """Simpson et al. 2001 (NASA NTRS 20010038494) eqs. for B_rho, B_z; on-axis limit separately."""
    a, rho, z = mp.mpf(a), mp.mpf(rho), mp.mpf(z)
    if rho == 0:
        bz = MU0 * I * a**2 / (2 * (a**2 + z**2) ** mp.mpf(1.5))
        return mp.mpf(0), bz
    r2 = rho**2 + z**2
    al2 = a**2 + r2 - 2 * a * rho
    be2 = a**2 + r2 + 2 * a * rho
    be = mp.sqrt(be2)
    m = 1 - al2 / be2
    K, E = mp.ellipk(m), mp.ellipe(m)
    C = MU0 * I / mp.pi
    bz = C / (2 * al2 * be) * ((a**2 - r2) * E + al2 * K)
    brho = C * z / (2 * al2 * be * rho) * ((a**2 + r2) * E - al2 * K)
    return brho, bz


def vector_potential(a, rho, z, I=1):
    """Smythe 1950 §7.10: A_phi = (mu0 I / (pi k)) sqrt(a/rho) [(1 - k^2/2) K - E]."""
    a, rho, z = mp.mpf(a), mp.mpf(rho), mp.mpf(z)
    if rho == 0:
        return mp.mpf(0)
    m = 4 * a * rho / ((a + rho) ** 2 + z**2)
    k = mp.sqrt(m)
    return MU0 * I / (mp.pi * k) * mp.sqrt(a / rho) * ((1 - m / 2) * mp.ellipk(m) - mp.ellipe(m))


cases = []
a = 0.04
pts = []
for rho in [0, 1e-9, 1e-6, 1e-3, 0.01, 0.02, 0.039, 0.0399, 0.03999, 0.04, 0.0401, 0.041, 0.06, 0.1, 0.5, 4.0, 40.0]:
    for z in [0, 1e-6, 1e-3, 0.01, 0.04, 0.2, 4.0, -0.03]:
        if rho == 0.04 and z == 0:
            continue
        pts.append((rho, z))
pts += [(1e3, 1e-3), (1e-3, 1e3), (0.04 + 1e-7, 1e-7), (0.04 - 1e-5, 0)]
for rho, z in pts:
    br, bz = loop_field(a, rho, z)
    ap = vector_potential(a, rho, z)
    cases.append({"radius": a, "rho": rho, "z": z, "bRho": s17(br), "bZ": s17(bz), "aPhi": s17(ap)})
write("loopField.json",
      "Simpson, Lane, Immer, Youngquist 2001, NASA NTRS 20010038494 (B); Smythe 1950 §7.10 (A_phi); evaluated with mpmath at 50 digits",
      cases)

# ---------------------------------------------------------------- coaxial mutual
def maxwell(ra, rb, d):
    ra, rb, d = mp.mpf(ra), mp.mpf(rb), mp.mpf(d)
    m = 4 * ra * rb / ((ra + rb) ** 2 + d**2)
    k = mp.sqrt(m)
    return MU0 * mp.sqrt(ra * rb) * ((2 / k - k) * mp.ellipk(m) - 2 / k * mp.ellipe(m))


cases = []
for ra, rb, d in [(0.04, 0.006, 0.03), (0.04, 0.04, 0.001), (0.04, 0.04, 1e-6), (0.04, 0.0400001, 0),
                  (0.04, 0.006, 0), (0.1, 0.1, 0.1), (0.04, 0.006, 1.0), (0.04, 0.006, 100.0),
                  (1e-3, 1e-3, 10.0), (0.05, 0.02, -0.07), (0.006, 0.04, 0.03), (1.0, 1e-4, 0.0),
                  (0.01, 0.0101, 1e-4), (0.01, 0.01, 0.5)]:
    cases.append({"ra": ra, "rb": rb, "d": d, "M": s17(maxwell(ra, rb, d))})
write("coaxialMutual.json", "Maxwell 1873, Treatise §701 (coaxial circles), evaluated with mpmath at 50 digits", cases)


# ---------------------------------------------------------------- general circle pairs
def frame(n):
    n = np.array(n, float); n /= np.linalg.norm(n)
    t = np.array([1.0, 0, 0]) if abs(n[0]) < 0.9 else np.array([0, 1.0, 0])
    u = np.cross(n, t); u /= np.linalg.norm(u)
    v = np.cross(n, u)
    return n, u, v


def neumann_numpy(A, B, N=3000):
    """Double Neumann integral M = mu0/(4 pi) ∮∮ dl_a·dl_b / R, periodic trapezoid N×N."""
    na, ua, va = frame(A["axis"]); nb, ub, vb = frame(B["axis"])
    t = 2 * np.pi * np.arange(N) / N
    ca, cb = np.array(A["center"], float), np.array(B["center"], float)
    Pa = ca + A["radius"] * (np.outer(np.cos(t), ua) + np.outer(np.sin(t), va))
    Ta = A["radius"] * (np.outer(-np.sin(t), ua) + np.outer(np.cos(t), va))
    Pb = cb + B["radius"] * (np.outer(np.cos(t), ub) + np.outer(np.sin(t), vb))
    Tb = B["radius"] * (np.outer(-np.sin(t), ub) + np.outer(np.cos(t), vb))
    total = 0.0
    for i in range(N):
        R = np.linalg.norm(Pb - Pa[i], axis=1)
        total += np.sum((Tb @ Ta[i]) / R)
    h = 2 * np.pi / N
    return float(MU0) / (4 * np.pi) * total * h * h


def line_integral_mp(A, B):
    """M = ∮_b A_a · dl_b with A_a from Smythe's closed form, mpmath quadrature (Grover 1944; Babic et al. 2010)."""
    na, _, _ = frame(A["axis"]); nb, ub, vb = frame(B["axis"])
    na = [mp.mpf(x) for x in na]; ub = [mp.mpf(x) for x in ub]; vb = [mp.mpf(x) for x in vb]
    ca = [mp.mpf(x) for x in A["center"]]; cb = [mp.mpf(x) for x in B["center"]]
    ra, rb = mp.mpf(A["radius"]), mp.mpf(B["radius"])

    def cross(p, q):
        return [p[1]*q[2]-p[2]*q[1], p[2]*q[0]-p[0]*q[2], p[0]*q[1]-p[1]*q[0]]

    def dot(p, q):
        return p[0]*q[0]+p[1]*q[1]+p[2]*q[2]

    def f(t):
        c, s = mp.cos(t), mp.sin(t)
        P = [cb[i] + rb*(c*ub[i] + s*vb[i]) - ca[i] for i in range(3)]
        T = [rb*(-s*ub[i] + c*vb[i]) for i in range(3)]
        z = dot(P, na)
        w = cross(na, P)
        rho = mp.sqrt(dot(w, w))
        if rho == 0:
            return mp.mpf(0)
        return vector_potential(ra, rho, z) / rho * dot(w, T)
    return mp.quad(f, mp.linspace(0, 2*mp.pi, 9))


def rot_axis(tilt, az=0.0):
    return [math.sin(tilt)*math.cos(az), math.sin(tilt)*math.sin(az), math.cos(tilt)]


pairs = [
    ("bench: 40 mm / 6 mm, offset 20 mm, height 30 mm, tilt 30°",
     {"center": [0, 0, 0], "axis": [0, 0, 1], "radius": 0.04},
     {"center": [0.02, 0, 0.03], "axis": rot_axis(math.radians(30)), "radius": 0.006}),
    ("offset coplanar-axis pair",
     {"center": [0, 0, 0], "axis": [0, 0, 1], "radius": 0.05},
     {"center": [0.03, 0.01, 0.02], "axis": [0, 0, 1], "radius": 0.02}),
    ("crossed (perpendicular axes), offset",
     {"center": [0, 0, 0], "axis": [0, 0, 1], "radius": 0.03},
     {"center": [0.01, 0.02, 0.05], "axis": [1, 0, 0], "radius": 0.02}),
    ("tilted 60° about a skew axis, token beyond the winding edge",
     {"center": [0, 0, 0], "axis": [0, 0, 1], "radius": 0.04},
     {"center": [0.055, 0.01, 0.01], "axis": rot_axis(math.radians(60), 1.0), "radius": 0.006}),
    ("both tilted, arbitrary positions",
     {"center": [0.01, -0.02, 0.005], "axis": rot_axis(0.3, 2.0), "radius": 0.025},
     {"center": [-0.015, 0.01, 0.06], "axis": rot_axis(1.1, -0.7), "radius": 0.035}),
    ("close: small loop 1 mm above the winding",
     {"center": [0, 0, 0], "axis": [0, 0, 1], "radius": 0.04},
     {"center": [0.04, 0, 0.001], "axis": rot_axis(0.4), "radius": 0.003}),
    ("near-coaxial, nearly touching (adjacent turns)",
     {"center": [0, 0, 0], "axis": [0, 0, 1], "radius": 0.01},
     {"center": [1e-5, 0, 2e-4], "axis": rot_axis(1e-3), "radius": 0.0101}),
    ("far: 1 m apart, tilted",
     {"center": [0, 0, 0], "axis": [0, 0, 1], "radius": 0.04},
     {"center": [0.3, 0.2, 1.0], "axis": rot_axis(0.7, 0.3), "radius": 0.006}),
]
cases = []
for label, A, B in pairs:
    A = dict(A, axis=list(frame(A["axis"])[0])); B = dict(B, axis=list(frame(B["axis"])[0]))
    mli = line_integral_mp(A, B)
    close = label.startswith("close") or label.startswith("near-coaxial")
    neu = None if close else neumann_numpy(A, B)
    cases.append({"label": label, "a": A, "b": B, "M": s17(mli), "neumann": neu})
write("loopMutual.json",
      "Grover 1944 (Proc. IRE 32) / Babic et al. 2010 (IEEE Trans. Magn. 46(9)) single line integral of Smythe's A_phi, mpmath quad at 50 digits; "
      "'neumann': double Neumann integral by the periodic trapezoidal rule (3000×3000, numpy double), an independent method",
      cases)


# ---------------------------------------------------------------- internal inductance factor Y(r/delta)
def y_exact(x):
    """Y = 2π L_int'/μ0 of a round wire from its exact internal impedance
    Z' = (k ρ / (2π r)) J0(kr)/J1(kr), k = (1 − j)/δ (Ramo, Whinnery & Van Duzer 1994 §5.5);
    x = r/δ. Y → 1/4 as x → 0 and → 1/(2x) as x → ∞."""
    x = mp.mpf(x)
    k = (1 - 1j)  # in units of 1/δ
    kr = k * x
    ratio = mp.besselj(0, kr) / mp.besselj(1, kr)
    # Z' = ρ k J0/(2π r J1); ρ = ω μ0 δ²/2 ⇒ Z'/(ω μ0/(2π)) = (δ²/2) k J0/(r J1) (δ units = 1)
    zn = k * ratio / (2 * x)  # Z' / (ω μ0 / 2π) · j ... its imaginary part is 2πωL'_int/(ω μ0) = Y
    return float(mp.im(zn))


cases = []
for x in [1e-3, 0.1, 0.3, 0.5, 0.8, 1, 1.5, 2, 3, 5, 10, 30, 100]:
    cases.append({"x": x, "Y": y_exact(x)})
write("internalInductance.json",
      "exact internal impedance of a round wire, Z' = (kρ/2πr)·J0(kr)/J1(kr), k = (1−j)/δ (Ramo, Whinnery & Van Duzer 1994 §5.5); Y = 2πL'_int/μ0; mpmath",
      cases)
