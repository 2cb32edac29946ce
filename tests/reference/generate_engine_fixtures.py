#!/usr/bin/env python3
"""Reference fixtures for the calculation engine (src/lib/control), computed independently
with numpy/scipy. Not run in CI: run by hand after changing a case, and commit the JSON.

    python3 tests/reference/generate_engine_fixtures.py

Writes tests/reference/fixtures/*.json. Methods:
- step/impulse responses: scipy.signal.step / scipy.signal.impulse of the rational part; dead time
  by evaluating at t - delay (a fine first sample at 0 keeps scipy's start at rest).
- sampled-input responses: scipy.signal.lsim (linear interpolation between samples).
- frequency responses: magnitude from scipy.signal.freqresp; phase as the sum of numpy.angle over
  numpy.roots of numerator and denominator minus w*delay (the contract's continuous phase).
- poles and zeros: numpy.roots.
- margins: scipy.optimize.brentq on log|L(jw)| = 0 and on phase(w) + 180 = 0 after a dense scan;
  Ms and Mt by scipy.optimize.minimize_scalar (bounded) around the dense-grid maximum, and their
  limits as w -> 0 (a supremum can sit there: T -> 1 with integral action).
- closed loops with dead time inside the loop: a method-of-steps DDE integration: scipy's
  solve_ivp (RK45, rtol 1e-10) over successive intervals one loop delay long, the delayed
  measurement taken from the previous interval's dense output.
The plant names are from the fictional Brindlewood Creamery demo; all numbers are invented.
"""
import json
import os

import numpy as np
from scipy import signal, optimize
from scipy.integrate import solve_ivp

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "fixtures")
SOURCE = "scipy " + __import__("scipy").__version__ + ", numpy " + np.__version__


def write(name, payload):
    os.makedirs(OUT, exist_ok=True)
    with open(os.path.join(OUT, name), "w") as f:
        json.dump({"generatedBy": "tests/reference/generate_engine_fixtures.py", "source": SOURCE, **payload}, f, indent=1)
        f.write("\n")


def tf(num, den, delay=0.0):
    return {"num": [float(v) for v in num], "den": [float(v) for v in den], "delay": float(delay)}


def delayed(fn, sys, t, delay):
    """fn response at t - delay, zero before; each point by a two-sample call [0, tau] (scipy
    needs evenly spaced times starting at the rest instant)."""
    y = np.zeros_like(t)
    for k, tk in enumerate(t):
        tau = tk - delay
        if tau < -1e-12:
            continue
        if tau <= 1e-12:
            y[k] = fn(sys, T=np.array([0.0, 1.0]))[1][0]
        else:
            y[k] = fn(sys, T=np.array([0.0, tau]))[1][1]
    return y


def time_responses():
    cases = [
        ("second order, zeta 0.3", tf([1], [1, 0.6, 1]), 30.0),
        ("inverse response, RHP zero", tf([-2, 1], [3, 4, 1]), 30.0),
        ("repeated poles (s+1)^4", tf([1], np.poly([-1, -1, -1, -1])), 25.0),
        ("biproper lead, starts away from zero", tf([2, 1], [1, 1]), 8.0),
        ("raw-milk silo level, FOPDT with delay off the grid", tf([1.6], [40, 1], 7.3), 300.0),
        ("time constants 1 ms and 10 000 s", tf([0.5, 1], np.polymul([0.001, 1], [10000, 1])), 60000.0),
        ("lightly damped third order with delay", tf([4], np.polymul([1, 0.2, 4], [2, 1]), 1.25), 60.0),
    ]
    out = []
    for name, g, tfinal in cases:
        t = np.linspace(0, tfinal, 241)
        sys = signal.lti(g["num"], g["den"])
        ys = delayed(signal.step, sys, t, g["delay"])
        yi = delayed(signal.impulse, sys, t, g["delay"])
        out.append({"name": name, "tf": g, "t": t.tolist(), "step": ys.tolist(), "impulse": yi.tolist()})
    lsim_cases = []
    t = np.linspace(0, 40, 401)
    u = np.sin(0.4 * t) + 0.05 * t + (t > 12) * 1.0
    u[t > 12] += 0.0
    g = tf([2, 1], [4, 2.2, 1])
    _, y, _ = signal.lsim(signal.lti(g["num"], g["den"]), U=u, T=t)
    lsim_cases.append({"name": "CIP supply temperature, sine plus ramp plus step", "tf": g, "t": t.tolist(), "u": u.tolist(), "y": y.tolist()})
    write("time-responses.json", {"cases": out, "lsim": lsim_cases})


def phase_deg(num, den, delay, w):
    zs, ps = np.roots(num), np.roots(den)
    k = num[0] / den[0]
    ph = np.zeros_like(w) + (np.pi if k < 0 else 0.0)
    for z in zs:
        ph += np.angle(1j * w - z)
    for p in ps:
        ph -= np.angle(1j * w - p)
    return np.degrees(ph - w * delay)


def frequency_responses():
    cases = [
        ("triple integrator", tf([1], [1, 0, 0, 0])),
        ("pasteurizer hot-water loop, three lags and delay", tf([2.5], np.polymul(np.polymul([30, 1], [5, 1]), [1, 1]), 4.0)),
        ("tenth order, expanded (s+1)^10", tf([1], np.poly([-1] * 10))),
        ("RHP zero and unstable pole", tf([-1, 2], [1, -0.5, 3])),
        ("negative gain lead-lag", tf([-3, -1], [10, 1], 0.5)),
        ("lightly damped resonance, zeta 0.02", tf([1], [1, 0.04, 1])),
    ]
    out = []
    for name, g in cases:
        w = np.logspace(-3, 2, 61)
        _, h = signal.freqresp(signal.lti(g["num"], g["den"]), w=w)
        out.append({"name": name, "tf": g, "w": w.tolist(), "mag": np.abs(h).tolist(),
                    "phaseDeg": phase_deg(np.array(g["num"]), np.array(g["den"]), g["delay"], w).tolist()})
    write("frequency-responses.json", {"cases": out})


def roots_cases():
    polys = [
        ("boiler drum level, cubic", [2.0, 7.0, 5.0, 1.0]),
        ("quartic with complex pairs", [1.0, 2.0, 11.0, 10.0, 26.0]),
        ("roots 1 ms to 10 000 s", list(np.polymul(np.polymul([0.001, 1], [10000, 1]), [1, 2, 5]))),
        ("degree 12, mixed", list(np.poly([-0.5, -1.5, -2, -3 + 1j, -3 - 1j, 0.7, -0.1 + 2j, -0.1 - 2j, -8, -12, -20, -35]).real)),
        ("degree 20, on a circle", list(np.poly(np.exp(1j * np.pi * (np.arange(20) + 0.5) / 20) * -1).real)),
    ]
    out = []
    for name, p in polys:
        r = np.roots(p)
        r = sorted(r, key=lambda z: (z.real, z.imag))
        out.append({"name": name, "poly": [float(v) for v in p], "roots": [{"re": float(z.real), "im": float(z.imag)} for z in r]})
    write("roots.json", {"cases": out})


def loop_value(blocks, w):
    v = np.ones_like(w, dtype=complex)
    for b in blocks:
        v *= np.polyval(b["num"], 1j * w) / np.polyval(b["den"], 1j * w) * np.exp(-1j * w * b["delay"])
    return v


def loop_phase(blocks, w):
    return sum(phase_deg(np.array(b["num"]), np.array(b["den"]), b["delay"], w) for b in blocks)


def pid_ideal(kc, ti, td, n):
    a = td / n
    if td == 0:
        return tf([kc * ti, kc], [ti, 0])
    return tf([kc * ti * (a + td), kc * (ti + a), kc], [ti * a, ti, 0])


def low_limit(blocks):
    """|S| and |T| as w -> 0: with a pole at the origin S -> 0 and T -> 1, else from L(0)."""
    num = np.prod([b["num"][-1] for b in blocks])
    den = np.prod([b["den"][-1] for b in blocks])
    if den == 0:
        return 0.0, 1.0
    l0 = num / den
    return 1 / abs(1 + l0), abs(l0 / (1 + l0))


def margins_cases():
    cases = [
        ("integrator with delay K=0.5, theta=1", [tf([0.5], [1, 0], 1.0)]),
        ("third order, gain 4", [tf([4], np.poly([-1, -1, -1]))]),
        ("HTST hot water, filtered ideal PID", [pid_ideal(1.1, 26, 4, 10), tf([1.8], [24, 1], 3.5), tf([1], [6, 1]), tf([1], [2, 1]), tf([1], [0.8, 1])]),
        ("glycol chiller, PI on SOPDT with sensor lag", [pid_ideal(0.9, 18, 0, 10), tf([-1.2 * -1], np.polymul([15, 1], [4, 1]), 2.0), tf([1], [1.5, 1])]),
        ("twelfth order plant with PI", [pid_ideal(0.4, 8, 0, 10), tf([1], np.poly([-1.0] * 6 + [-2.0] * 6))]),
        ("unstable plant, P control with delay", [tf([1.6], [1, -1], 0.2)]),
    ]
    out = []
    for name, blocks in cases:
        w = np.logspace(-5, 3, 40001)
        L = loop_value(blocks, w)
        lm = np.log(np.abs(L))
        ph = loop_phase(blocks, w)
        f_mag = lambda x: np.log(np.abs(loop_value(blocks, np.array([x]))[0]))
        gcs = [optimize.brentq(f_mag, w[i], w[i + 1], xtol=1e-14, rtol=1e-14) for i in range(len(w) - 1) if np.sign(lm[i]) != np.sign(lm[i + 1])]
        pcs = []
        j = np.floor((ph + 180) / 360)
        for i in range(len(w) - 1):
            if j[i] != j[i + 1] and len(pcs) < 3:
                level = -180 + 360 * max(j[i], j[i + 1])
                f_ph = lambda x: loop_phase(blocks, np.array([x]))[0] - level
                pcs.append(optimize.brentq(f_ph, w[i], w[i + 1], xtol=1e-14, rtol=1e-14))
        wgc = gcs[0] if gcs else None
        wpc = pcs[0] if pcs else None
        pm = None
        if wgc is not None:
            pm = 180 + loop_phase(blocks, np.array([wgc]))[0]
            pm = pm - 360 * np.ceil((pm - 180) / 360)
        gm = 1 / abs(loop_value(blocks, np.array([wpc]))[0]) if wpc is not None else None
        S = 1 / np.abs(1 + L)
        T = np.abs(L) / np.abs(1 + L)
        def peak(F):
            i = int(np.argmax(F))
            lo, hi = np.log(w[max(i - 1, 0)]), np.log(w[min(i + 1, len(w) - 1)])
            res = optimize.minimize_scalar(lambda x: -F_of(F, np.exp(x)), bounds=(lo, hi), method="bounded", options={"xatol": 1e-12})
            return float(max(F[i], -res.fun))
        def F_of(F, x):
            v = loop_value(blocks, np.array([x]))[0]
            return 1 / abs(1 + v) if F is S else abs(v) / abs(1 + v)
        out.append({
            "name": name, "blocks": blocks,
            "gainCrossover": wgc, "phaseMarginDeg": None if pm is None else float(pm),
            "phaseCrossover": wpc, "gainMargin": None if gm is None else float(gm),
            "delayMargin": None if pm is None else float(np.radians(pm) / wgc),
            "gainCrossovers": [float(x) for x in gcs], "firstPhaseCrossovers": [float(x) for x in pcs],
            "ms": max(peak(S), low_limit(blocks)[0]), "mt": max(peak(T), low_limit(blocks)[1]),
        })
    write("margins.json", {"cases": out})


def ss_of(g):
    a, b, c, d = signal.tf2ss(g["num"], g["den"])
    return a, b.flatten(), c.flatten(), float(d.flatten()[0]) if d.size else 0.0


def closed_loop_dde(controller, plant, sensor, tfinal, inp):
    """Method of steps: e(t) = r - m(t - theta) with m = H_R·(C·G_R·e + G_R·d); y(t) = z(t - theta_G)."""
    theta = plant["delay"] + sensor["delay"]
    p = tf(np.polymul(controller["num"], plant["num"]), np.polymul(controller["den"], plant["den"]))
    gr = tf(plant["num"], plant["den"])
    hr = tf(sensor["num"], sensor["den"])
    ap, bp, cp, dp = ss_of(p)
    ag, bg, cg, dg = ss_of(gr)
    ah, bh, ch, dh = ss_of(hr)
    assert dp == 0.0 and dg == 0.0, "fixtures use strictly proper C·G and G"
    npn, ng, nh = len(ap), len(ag), len(ah)
    r = 1.0 if inp == "setpoint" else 0.0
    d = 0.0 if inp == "setpoint" else 1.0
    segments = []

    def m_of(t):
        if t <= 0:
            return 0.0
        for (t0, t1, sol) in segments:
            if t0 <= t <= t1 + 1e-12:
                x = sol(t)
                z = cp @ x[:npn] + cg @ x[npn:npn + ng]
                return float(ch @ x[npn + ng:] + dh * z) if nh else float(dh * z)
        raise ValueError(t)

    def rhs(t, x):
        e = r - m_of(t - theta)
        xp, xg, xh = x[:npn], x[npn:npn + ng], x[npn + ng:]
        z = cp @ xp + cg @ xg
        dxp = ap @ xp + bp * e
        dxg = ag @ xg + bg * d
        dxh = ah @ xh + bh * z if nh else np.zeros(0)
        return np.concatenate([dxp, dxg, dxh])

    x0 = np.zeros(npn + ng + nh)
    t0 = 0.0
    while t0 < tfinal + theta:
        t1 = min(t0 + theta, tfinal + theta)
        sol = solve_ivp(rhs, (t0, t1), x0, method="RK45", rtol=1e-10, atol=1e-12, dense_output=True)
        segments.append((t0, t1, sol.sol))
        x0 = sol.y[:, -1]
        t0 = t1

    def z_of(t):
        if t <= 0:
            return 0.0
        for (a0, a1, sol) in segments:
            if a0 <= t <= a1 + 1e-12:
                x = sol(t)
                return float(cp @ x[:npn] + cg @ x[npn:npn + ng])
        raise ValueError(t)

    t = np.linspace(0, tfinal, 201)
    y = [z_of(tk - plant["delay"]) for tk in t]
    return t.tolist(), y


def closed_loops():
    cases = [
        ("raw-milk silo outlet flow, FOPDT with PI, setpoint", pid_ideal(0.5, 10, 0, 10), tf([1], [10, 1], 2.0), tf([1], [1]), 60.0, "setpoint"),
        ("raw-milk silo outlet flow, FOPDT with PI, load", pid_ideal(0.5, 10, 0, 10), tf([1], [10, 1], 2.0), tf([1], [1]), 60.0, "load"),
        ("HTST holding tube, SOPDT with filtered PID and sensor lag and delay", pid_ideal(1.4, 14, 2.5, 8), tf([1.2], np.polymul([12, 1], [3, 1]), 1.5), tf([1], [0.7, 1], 0.4), 90.0, "setpoint"),
        ("wastewater pH dosing, integrating plant with PI", pid_ideal(0.25, 20, 0, 10), tf([0.2], [1, 0], 3.0), tf([1], [1]), 200.0, "setpoint"),
        ("unstable exothermic step, P control with delay", tf([1.6], [1]), tf([1], [1, -1], 0.2), tf([1], [1]), 20.0, "setpoint"),
        ("packaging conveyor, delay 100 times the time constant", pid_ideal(0.2, 5.0, 0, 10), tf([1], [0.1, 1], 10.0), tf([1], [1]), 300.0, "setpoint"),
    ]
    out = []
    for name, c, g, h, tfinal, inp in cases:
        t, y = closed_loop_dde(c, g, h, tfinal, inp)
        out.append({"name": name, "controller": c, "plant": g, "sensor": h, "input": inp, "t": t, "y": y})
    write("closed-loops.json", {"cases": out})


if __name__ == "__main__":
    time_responses()
    frequency_responses()
    roots_cases()
    margins_cases()
    closed_loops()
    print("fixtures written to", OUT)
