#!/usr/bin/env python3
"""Class-E single-switch drive off its nominal load: a time-domain simulation of the ideal
circuit (an independent method for lib/circuit/drive.ts classEDrive).

Circuit (normalised: V_DD = 1 V, omega = 1 rad/s, design R = 1 ohm): supply -> feed choke L_f
(= 200 R/omega, large) -> switch node; shunt capacitor C1 = 0.1836/(omega R) and an ideal switch
(50 % duty, with an anti-parallel diode that clamps the node at 0 V) to ground; series network
L0 = (Q_L R + X)/omega, C0 = 1/(omega^2 Q_L R/omega), load R'. Design values after Sokal &
Sokal 1975 / Raab 1977 (X = 1.1525 R). Fixed-step classical RK4, 4000 steps per period, 400
periods to steady state, then the fundamental of the network current by the rectangle rule over
the last 10 periods (exact for a periodic, band-limited signal up to the step).

For each load ratio R'/R it records the simulated fundamental network current and what the
frequency-domain equivalent predicts: a 1.6389 V_DD source (the switch-node fundamental at the
optimum) in series with the network (R' + jX).
Run: python3 scripts/gen_classe_offnominal.py  (about a minute)
"""
import json
import math
import os

import numpy as np

OUT = os.path.join(os.path.dirname(__file__), "..", "tests", "fixtures", "link", "class-e-offnominal.json")
W = 1.0
R = 1.0
X = math.pi * (math.pi ** 2 - 4) / 16
C1 = 8 / (math.pi * (math.pi ** 2 + 4)) / (W * R)
LF = 200.0 * R / W


def simulate(rl, ql, periods=400, steps=4000):
    lr = ql * R / W
    l0 = lr + X / W
    c0 = 1 / (W * W * lr)
    T = 2 * math.pi / W
    dt = T / steps
    # state: i_f, v_s, i_l, v_c0
    s = np.array([0.0, 0.0, 0.0, 0.0])

    def f(st, on):
        i_f, v_s, i_l, v_c = st
        d_if = (1.0 - v_s) / LF
        if on:
            d_vs = 0.0
        else:
            d_vs = (i_f - i_l) / C1
            if v_s <= 0.0 and d_vs < 0.0:
                d_vs = 0.0  # diode clamp
        d_il = (v_s - v_c - rl * i_l) / l0
        d_vc = i_l / c0
        return np.array([d_if, d_vs, d_il, d_vc])

    a1 = b1 = 0.0
    vpk = 0.0
    rec = 10
    for p in range(periods):
        for k in range(steps):
            on = k < steps // 2  # switch closed for the first half period
            k1 = f(s, on)
            k2 = f(s + 0.5 * dt * k1, on)
            k3 = f(s + 0.5 * dt * k2, on)
            k4 = f(s + dt * k3, on)
            s = s + dt / 6 * (k1 + 2 * k2 + 2 * k3 + k4)
            if on:
                s[1] = 0.0
            elif s[1] < 0.0:
                s[1] = 0.0
            if p >= periods - rec:
                t = (k + 1) * dt
                a1 += s[2] * math.cos(W * t) * dt
                b1 += s[2] * math.sin(W * t) * dt
                vpk = max(vpk, s[1])
    amp = 2 / (rec * T) * math.hypot(a1, b1)
    return amp, vpk


cases = []
for ql in (10.0,):
    for ratio in (0.25, 0.5, 0.8, 1.0, 1.25, 2.0, 4.0):
        amp, vpk = simulate(ratio * R, ql)
        eq = 4 / math.sqrt(math.pi ** 2 + 4) * math.hypot(1, X) / math.hypot(ratio * R, X)
        cases.append({"loadedQ": ql, "loadRatio": ratio, "simulatedCurrent": amp, "equivalentCurrent": eq,
                      "simulatedPeakSwitchVoltage": vpk})
        print(ql, ratio, amp, eq, amp / eq, vpk)

with open(OUT, "w") as fh:
    json.dump({
        "source": "independent method: time-domain RK4 simulation of the ideal class-E circuit (scripts/gen_classe_offnominal.py)",
        "generator": "scripts/gen_classe_offnominal.py",
        "digits": 6,
        "note": "V_DD = 1 V, omega = 1 rad/s, design R = 1 ohm; currents are peak fundamental amplitudes of the series-network current",
        "cases": cases,
    }, fh, indent=1)
