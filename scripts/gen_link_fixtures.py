#!/usr/bin/env python3
"""Reference values for the link solver and the drives (tanklight, lib/circuit/drive.ts, link/).

Writes tests/fixtures/link/class-e-ideal.json: the ideal class-E switch waveform of Sokal &
Sokal 1975 / Raab 1977 (50 % duty, shunt capacitor, high loaded Q) evaluated with mpmath —
its peak by numerical maximisation and its fundamental by numerical Fourier integrals — as an
independent check of the closed forms in lib/circuit/drive.ts (not the same formulas: here the
peak comes from a bracketed root of dv/dθ and the fundamental from quadrature).

Writes tests/fixtures/link/coupled-3coil.json: a three-coil linear network solved with mpmath's
complex LU at 30 digits, as an independent reference for the numeric core.

Run: python3 scripts/gen_link_fixtures.py
"""
import json
import os
import mpmath as mp

mp.mp.dps = 40
OUT = os.path.join(os.path.dirname(__file__), "..", "tests", "fixtures", "link")
os.makedirs(OUT, exist_ok=True)


def s17(x):
    return float(mp.nstr(x, 17))


# ── ideal class-E switch waveform, V_DD = 1; switch closed on [0, π), open on [π, 2π) ──
pi = mp.pi


def v_open(t):
    return pi * ((t - 3 * pi / 2) - (pi / 2) * mp.cos(t) - mp.sin(t))


def dv(t):
    return pi * (1 + (pi / 2) * mp.sin(t) - mp.cos(t))


t_peak = mp.findroot(dv, (3.5, 5.5), solver="bisect")
v_peak = v_open(t_peak)
avg = mp.quad(v_open, [pi, 2 * pi]) / (2 * pi)
a1 = mp.quad(lambda t: v_open(t) * mp.cos(t), [pi, 2 * pi]) / pi
b1 = mp.quad(lambda t: v_open(t) * mp.sin(t), [pi, 2 * pi]) / pi
fund = mp.sqrt(a1 ** 2 + b1 ** 2)
classe = {
    "source": "ideal class-E waveform after Sokal & Sokal, IEEE JSSC SC-10(3), 1975 and Raab, IEEE TCAS 24(12), 1977",
    "generator": "scripts/gen_link_fixtures.py (mpmath quadrature and bracketed root)",
    "digits": 17,
    "cases": [
        {"quantity": "average switch voltage / V_DD", "value": s17(avg)},
        {"quantity": "peak switch voltage / V_DD", "value": s17(v_peak), "theta": s17(t_peak)},
        {"quantity": "switch-node fundamental amplitude / V_DD", "value": s17(fund)},
        {"quantity": "R·P/V_DD^2 = 8/(pi^2+4)", "value": s17(8 / (pi ** 2 + 4))},
        {"quantity": "omega·C1·R = 8/(pi(pi^2+4))", "value": s17(8 / (pi * (pi ** 2 + 4)))},
        {"quantity": "X/R = pi(pi^2-4)/16", "value": s17(pi * (pi ** 2 - 4) / 16)},
        {"quantity": "peak switch current / I_DC = 1 + sqrt(1 + pi^2/4)", "value": s17(1 + mp.sqrt(1 + pi ** 2 / 4))},
    ],
}
with open(os.path.join(OUT, "class-e-ideal.json"), "w") as fh:
    json.dump(classe, fh, indent=1)

# ── a three-coil linear network: series-compensated transmitter, a series-tuned receiver with a
# resistor, a parallel-tuned receiver with a resistor, all couplings ──
f = mp.mpf(200e3)
w = 2 * pi * f
L = [[mp.mpf("24e-6"), mp.mpf("1.1e-6"), mp.mpf("0.6e-6")],
     [mp.mpf("1.1e-6"), mp.mpf("180e-6"), mp.mpf("9e-6")],
     [mp.mpf("0.6e-6"), mp.mpf("9e-6"), mp.mpf("150e-6")]]
R = [mp.mpf("0.25"), mp.mpf("6.5"), mp.mpf("5.2")]
C = [mp.mpf("27e-9"), mp.mpf("3.3e-9"), mp.mpf("4.7e-9")]
ESR = [mp.mpf("0.02"), mp.mpf("0.4"), mp.mpf("0.3")]
RL = [None, mp.mpf("150"), mp.mpf("2200")]
Vs = mp.mpf(7)
Rs = mp.mpf("0.8")
j = mp.mpc(0, 1)
zc = [ESR[i] + 1 / (j * w * C[i]) for i in range(3)]
Z = mp.matrix(3, 3)
for a in range(3):
    for b in range(3):
        Z[a, b] = j * w * L[a][b]
Z[0, 0] += Rs + R[0] + zc[0]
Z[1, 1] += R[1] + zc[1] + RL[1]
Z[2, 2] += R[2] + 1 / (1 / zc[2] + 1 / RL[2])
bvec = mp.matrix([Vs, 0, 0])
I = mp.lu_solve(Z, bvec)
Vpar = I[2] / (1 / zc[2] + 1 / RL[2])
net = {
    "source": "independent method: coupled-circuit loop equations solved with mpmath lu_solve at 40 digits",
    "generator": "scripts/gen_link_fixtures.py",
    "digits": 17,
    "cases": [{
        "frequency": s17(f), "inductance": [[s17(x) for x in row] for row in L],
        "resistance": [s17(x) for x in R], "capacitance": [s17(x) for x in C], "esr": [s17(x) for x in ESR],
        "loadResistance": [None, s17(RL[1]), s17(RL[2])], "sourceAmplitude": s17(Vs), "sourceResistance": s17(Rs),
        "current": [[s17(mp.re(I[i])), s17(mp.im(I[i]))] for i in range(3)],
        "parallelLoadVoltage": s17(abs(Vpar)),
        "inputPower": s17(mp.re(Vs * mp.conj(I[0])) / 2),
    }],
}
with open(os.path.join(OUT, "coupled-3coil.json"), "w") as fh:
    json.dump(net, fh, indent=1)

# ── published class-E spot values, as printed (docs/references.md: checked) ──
spot = {
    "source": "Sokal & Sokal, IEEE JSSC SC-10(3), 1975; Raab, IEEE TCAS 24(12), 1977 (4-digit design values)",
    "generator": "typed from the published design equations (handbook spot values)",
    "digits": 4,
    "cases": [
        {"quantity": "R·P/V_DD^2", "value": 0.5768},
        {"quantity": "omega·C1·R", "value": 0.1836},
        {"quantity": "X/R", "value": 1.1525},
        {"quantity": "peak switch voltage / V_DD", "value": 3.562},
        {"quantity": "peak switch current / I_DC", "value": 2.862},
        {"quantity": "minimum loaded Q", "value": 1.7879},
    ],
}
with open(os.path.join(OUT, "sokal1975-raab1977.json"), "w") as fh:
    json.dump(spot, fh, indent=1)
print("wrote", OUT)
