#!/usr/bin/env python3
"""Reference values for the Kelvin functions and the conductor-loss models (issue 4).

Writes JSON fixtures { source, generator, digits, cases } to tests/fixtures/losses/:

  kelvin_mpmath.json            ber, bei, ber', bei', ber_2, bei_2 at 40 working digits
                                (mpmath.ber / mpmath.bei; derivatives by mpmath.diff, i.e. not
                                through the order-1 identities our code uses)
  kelvin_abramowitz_stegun.json a few spot values of A&S 1964 Table 9.12 as we read them,
                                each checked here against mpmath to the printed digits
  round_wire_ac_factor.json     exact R_ac/R_dc of an isolated round wire from the complex
                                Bessel form (k a / 2) J0(k a) / J1(k a), k = (1 - j)/delta
                                (an independent route from the Kelvin-function form we code)
  proximity_uniform_field.json  eddy loss per unit length of a round wire in a uniform
                                transverse field: the exact 2-D solution (modified Bessel
                                functions of complex argument, loss by quadrature of |J|^2)
                                beside the Kelvin-function formula of docs/references.md; the
                                generator asserts the two agree (that is the verification of
                                the formula, which docs/references.md says was never seen in print)
  dowell_layer_factor.json      Dowell 1966 F_R for a few (Delta, m) at 40 digits

Run: python3 scripts/gen_loss_fixtures.py
"""
import json
import os

import mpmath as mp

mp.mp.dps = 40
HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "..", "tests", "fixtures", "losses")
GEN = "scripts/gen_loss_fixtures.py (mpmath %s, 40 digits)" % mp.__version__


def s17(x):
    """A float at 17 significant digits (the JSON number is parsed as float64)."""
    return float(mp.nstr(mp.mpf(x), 17, strip_zeros=False, min_fixed=-1, max_fixed=-1))


def dump(name, obj):
    os.makedirs(OUT, exist_ok=True)
    with open(os.path.join(OUT, name), "w") as f:
        json.dump(obj, f, indent=1)
        f.write("\n")


# ── Kelvin functions ─────────────────────────────────────────────────────────
def kelvin_row(x):
    x = mp.mpf(x)
    ber = mp.ber(0, x)
    bei = mp.bei(0, x)
    dber = mp.diff(lambda t: mp.ber(0, t), x)
    dbei = mp.diff(lambda t: mp.bei(0, t), x)
    ber2 = mp.ber(2, x)
    bei2 = mp.bei(2, x)
    return {
        "x": s17(x),
        "ber": s17(ber),
        "bei": s17(bei),
        "berp": s17(dber),
        "beip": s17(dbei),
        "ber2": s17(ber2),
        "bei2": s17(bei2),
    }


xs = [0, 1e-3, 0.1, 0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4, 5, 6, 7, 8, 10, 12, 14, 16, 18, 20, 22, 24, 25, 25.9, 25.99,
      26, 26.01, 26.1, 27, 28, 30, 35, 40, 50, 60, 80, 100, 200, 500]
dump("kelvin_mpmath.json", {
    "source": "mpmath ber/bei (Kelvin functions, A&S 1964 §9.9 definition ber_n x + i bei_n x = J_n(x e^{3πi/4})); "
              "derivatives by mpmath.diff",
    "generator": GEN,
    "digits": 17,
    "cases": [kelvin_row(x) for x in xs],
})

# A&S 1964 Table 9.12 (Kelvin functions, x = 0(.1)5): spot values as we read them (printed to
# 9-10 decimals). We could not open a scan of the printed page in this session: the numbers
# below are as recalled and are accepted only because they agree with mpmath to the printed
# digits (asserted here), so the fixture says "from memory (checked against mpmath)".
AS_SPOT = [
    # x, {name: printed value}. Derivative values we recalled for x = 2..5 disagreed with mpmath
    # (our memory, not the table, is at fault) and were dropped rather than "corrected".
    (1.0, {"ber": "0.98438178", "bei": "0.24956604", "berp": "-0.06244575", "beip": "0.49739651"}),
    (2.0, {"ber": "0.75173418", "bei": "0.97229163"}),
    (3.0, {"ber": "-0.22138", "bei": "1.93759"}),
    (4.0, {"ber": "-2.56342", "bei": "2.29269"}),
    (5.0, {"ber": "-6.23008248", "bei": "0.11603438"}),
]
as_cases = []
for (x, values) in AS_SPOT:
    refs = {"ber": mp.ber(0, x), "bei": mp.bei(0, x),
            "berp": mp.diff(lambda t: mp.ber(0, t), x),
            "beip": mp.diff(lambda t: mp.bei(0, t), x)}
    for key, printed in values.items():
        decimals = len(printed.split(".")[1])
        assert abs(mp.mpf(printed) - refs[key]) <= 0.51 * mp.mpf(10) ** (-decimals), (x, key, printed, refs[key])
    case = {"x": x, "decimals": min(len(v.split(".")[1]) for v in values.values())}
    case.update({k: float(v) for k, v in values.items()})
    as_cases.append(case)
dump("kelvin_abramowitz_stegun.json", {
    "source": "Abramowitz & Stegun 1964, Table 9.12 (Kelvin functions ber, bei, ber', bei') — spot values from "
              "memory (unverified against the printed page), each agreeing with mpmath to the digits given",
    "generator": GEN + " (typed values, checked against mpmath)",
    "digits": 9,
    "cases": as_cases,
})


# ── round wire AC factor, complex-Bessel route ───────────────────────────────
def ac_factor(r_over_delta):
    # Internal impedance per unit length of a round wire (e^{jωt}): Z = (k/(2πσa)) J0(ka)/J1(ka),
    # k = (1 - j)/δ; R_dc = 1/(σπa²) ⇒ Z/R_dc = (ka/2) J0(ka)/J1(ka). (Ramo, Whinnery & Van Duzer,
    # Fields and Waves in Communication Electronics, §5.14; standard.)
    u = mp.mpf(r_over_delta) * (1 - 1j)
    return mp.re(u / 2 * mp.besselj(0, u) / mp.besselj(1, u))


def internal_y(r_over_delta):
    # Internal inductance factor Y = 2πL'_int/μ0 (1/4 at DC): ωL'_int = Im Z, so
    # Y = Im[(ka/2) J0(ka)/J1(ka)] / (a/δ)² (δ² = 2ρ/(ωμ0)).
    x = mp.mpf(r_over_delta)
    u = x * (1 - 1j)
    return mp.im(u / 2 * mp.besselj(0, u) / mp.besselj(1, u)) / x ** 2


ratios = [1e-3, 0.01, 0.1, 0.3, 0.5, 0.8, 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 7, 10, 12.7, 15, 20, 30, 50, 100, 300, 1000]
dump("round_wire_ac_factor.json", {
    "source": "exact isolated round wire, R_ac/R_dc = Re[(ka/2) J0(ka)/J1(ka)], k = (1-j)/δ; "
              "internalY = 2πL'_int/μ0 = Im[(ka/2) J0/J1]/(a/δ)² "
              "(Ramo, Whinnery & Van Duzer 1994 §5.14; evaluated with mpmath complex Bessel J)",
    "generator": GEN,
    "digits": 17,
    "cases": [{"rOverDelta": s17(r), "factor": s17(ac_factor(r)), "internalY": s17(internal_y(r))} for r in ratios],
})


# ── round wire in a uniform transverse field ─────────────────────────────────
def prox_exact(gamma):
    """P'σ/Ĥ² for a round wire of radius a = γδ/√2 in a uniform transverse peak field Ĥ.

    Inside ∇²A = κ²A with κ² = jωμ0σ = 2j/δ², A = C I1(κr) cos φ; outside A = (−B0 r + D/r) cos φ;
    continuity of A and ∂A/∂r (μr = 1) gives C = −2B0/(κ I0(κa)). Loss per unit length
    P' = ½σω²∫|A|²dA = ½σω²|C|²π∫0^a |I1(κr)|² r dr. Set δ = 1 (the result depends on γ only).
    """
    delta = mp.mpf(1)
    a = gamma * delta / mp.sqrt(2)
    kappa = mp.sqrt(2j) / delta  # κ = (1 + j)/δ
    # choose σ = 1, μ0 = 1 ⇒ ω = 2/δ²; B0 = μ0 Ĥ = 1 ⇒ P'σ/Ĥ² = P'
    omega = 2 / delta ** 2
    C = -2 / (kappa * mp.besseli(0, kappa * a))
    integral = mp.quad(lambda r: abs(mp.besseli(1, kappa * r)) ** 2 * r, [0, a / 2, a])
    return mp.mpf(1) / 2 * omega ** 2 * abs(C) ** 2 * mp.pi * integral


def prox_kelvin(gamma):
    """docs/references.md: P'σ/Ĥ² = −2πγ (ber2 γ ber'γ + bei2 γ bei'γ)/(ber²γ + bei²γ)."""
    g = mp.mpf(gamma)
    ber, bei = mp.ber(0, g), mp.bei(0, g)
    dber = mp.diff(lambda t: mp.ber(0, t), g)
    dbei = mp.diff(lambda t: mp.bei(0, t), g)
    return -2 * mp.pi * g * (mp.ber(2, g) * dber + mp.bei(2, g) * dbei) / (ber ** 2 + bei ** 2)


gammas = [0.01, 0.1, 0.3, 0.5, 1, 1.5, 2, 3, 4, 5, 7, 10, 15, 20, 30]
prox_cases = []
for g in gammas:
    exact = prox_exact(g)
    formula = prox_kelvin(g)
    assert abs(exact / formula - 1) < mp.mpf("1e-20"), (g, exact, formula)
    low = mp.pi * mp.mpf(g) ** 4 / 8  # low-frequency limit πσω²B²a⁴/8 in these units
    prox_cases.append({"gamma": s17(g), "exact": s17(exact), "kelvinFormula": s17(formula), "lowFrequency": s17(low)})
dump("proximity_uniform_field.json", {
    "source": "exact 2-D eddy-current solution for a round non-magnetic wire in a uniform transverse field "
              "(modified Bessel I0, I1 of complex argument, loss by quadrature); the Kelvin-function formula of "
              "docs/references.md agrees with it to 1e-20 (asserted by the generator); quantity P'·σ/Ĥ², Ĥ peak, "
              "γ = d/(δ√2); lowFrequency = πσω²B²a⁴/8 (derived in docs/methods/losses.md)",
    "generator": GEN,
    "digits": 17,
    "cases": prox_cases,
})


# ── Dowell 1966 ──────────────────────────────────────────────────────────────
def dowell(delta, m):
    d = mp.mpf(delta)
    skin = (mp.sinh(2 * d) + mp.sin(2 * d)) / (mp.cosh(2 * d) - mp.cos(2 * d))
    prox = (mp.sinh(d) - mp.sin(d)) / (mp.cosh(d) + mp.cos(d))
    return d * (skin + 2 * (m * m - 1) / mp.mpf(3) * prox)


dump("dowell_layer_factor.json", {
    "source": "Dowell, Proc. IEE 113(8):1387-1394, 1966, F_R = Δ[(sinh2Δ+sin2Δ)/(cosh2Δ−cos2Δ) + "
              "(2(m²−1)/3)(sinhΔ−sinΔ)/(coshΔ+cosΔ)] (winding average over m layers), evaluated at 40 digits",
    "generator": GEN,
    "digits": 17,
    "cases": [{"Delta": s17(d), "m": m, "factor": s17(dowell(d, m))}
              for d in (0.01, 0.1, 0.5, 1, 2, 5) for m in (1, 2, 4)],
})
print("wrote", OUT)
