#!/usr/bin/env python3
"""Writes fixtures/discrete.json: discrete-time equivalents computed by scipy.signal.cont2discrete.

Reference for tests/lib/control/discretize.test.ts and discrete-pid.test.ts. Not run in CI;
rerun by hand (python3 with scipy) after changing the cases below:

    python3 tests/reference/generate_discrete_fixtures.py

Methods: 'zoh'; 'bilinear' (Tustin); Tustin pre-warped at w is the bilinear map with the
sample time replaced by 2·tan(w·ts/2)/w (so that s = (w/tan(w·ts/2))·(z−1)/(z+1));
'backward_diff' (gbt with alpha = 1, i.e. s = (z−1)/(ts·z)) for the controller cases.
"""
import json
import math
import os

import numpy as np
import scipy
from scipy.signal import cont2discrete

# (name, num, den, ts) — continuous plants in descending powers of s.
PLANTS = [
    ("first order 1/(10s+1)", [1.0], [10.0, 1.0], 1.0),
    ("two lags 2.5/((30s+1)(5s+1))", [2.5], [150.0, 35.0, 1.0], 0.5),
    ("underdamped 1/(s^2+0.4s+1)", [1.0], [1.0, 0.4, 1.0], 0.1),
    ("lead-lag with feedthrough (s+2)/(s+1)", [1.0, 2.0], [1.0, 1.0], 0.2),
    ("zero and two poles (s+1)/(s^2+3s+2)", [1.0, 1.0], [1.0, 3.0, 2.0], 0.05),
    ("right-half-plane zero (-2s+1)/((5s+1)(s+1))", [-2.0, 1.0], [5.0, 6.0, 1.0], 0.25),
    ("integrator with lag 0.4/(s(2s+1))", [0.4], [2.0, 1.0, 0.0], 0.5),
    ("repeated poles 1/(s+1)^3", [1.0], [1.0, 3.0, 3.0, 1.0], 0.1),
    ("wide time scales 1/((0.001s+1)(100s+1))", [1.0], [0.1, 100.001, 1.0], 0.01),
    ("sixth order 1/(s+1)^6", [1.0], list(np.poly([-1.0] * 6)), 0.3),
    ("open-loop unstable 1/(4s-1)", [1.0], [4.0, -1.0], 0.5),
]

# (name, num, den, ts, w) for Tustin pre-warped at w rad/s.
PREWARPED = [
    ("notch-free resonance 1/(s^2+0.2s+4) at w = 2", [1.0], [1.0, 0.2, 4.0], 0.5, 2.0),
    ("first order 1/(10s+1) at w = 0.5", [1.0], [10.0, 1.0], 1.0, 0.5),
]


def controller_cases():
    """Ideal and series PID with derivative filter, td/n, as rational C(s) = num/den."""
    cases = []
    for (kc, ti, td, n, ts) in [(2.0, 10.0, 1.5, 10.0, 0.1), (0.8, 40.0, 4.0, 8.0, 1.0)]:
        tf_ = td / n
        num = [kc * (ti * tf_ + ti * td), kc * (ti + tf_), kc]
        den = [ti * tf_, ti, 0.0]
        cases.append(({"form": "ideal", "kc": kc, "ti": ti, "td": td, "n": n}, num, den, ts))
        snum = list(kc * np.polymul([ti, 1.0], [td, 1.0]))
        sden = [ti * tf_, ti, 0.0]
        cases.append(({"form": "series", "kc": kc, "ti": ti, "td": td, "n": n}, snum, sden, ts))
    # parallel with filter and a PI without derivative
    kp, ki, kd, tfil, ts = 1.2, 0.05, 3.0, 0.4, 0.2
    cases.append(({"form": "parallel", "kp": kp, "ki": ki, "kd": kd, "tf": tfil},
                  [kp * tfil + kd, kp + ki * tfil, ki], [tfil, 1.0, 0.0], ts))
    cases.append(({"form": "ideal", "kc": 1.5, "ti": 25.0}, [1.5 * 25.0, 1.5], [25.0, 0.0], 0.5))
    return cases


def discrete(num, den, ts, method):
    numd, dend, _ = cont2discrete((num, den), ts, method=method)
    numd = np.atleast_1d(np.squeeze(numd))
    scale = dend[0]
    return {"num": list(map(float, numd / scale)), "den": list(map(float, dend / scale))}


def main():
    out = {
        "source": f"scipy.signal.cont2discrete (scipy {scipy.__version__}, numpy {np.__version__})",
        "plants": [],
        "prewarped": [],
        "controllers": [],
    }
    for name, num, den, ts in PLANTS:
        out["plants"].append({
            "name": name, "tf": {"num": list(map(float, num)), "den": list(map(float, den))}, "ts": ts,
            "zoh": discrete(num, den, ts, "zoh"),
            "tustin": discrete(num, den, ts, "bilinear"),
        })
    for name, num, den, ts, w in PREWARPED:
        warped_ts = 2.0 * math.tan(w * ts / 2.0) / w
        out["prewarped"].append({
            "name": name, "tf": {"num": num, "den": den}, "ts": ts, "prewarp": w,
            "tustin": discrete(num, den, warped_ts, "bilinear"),
        })
    for controller, num, den, ts in controller_cases():
        out["controllers"].append({
            "controller": controller, "ts": ts,
            "continuous": {"num": list(map(float, num)), "den": list(map(float, den))},
            "backwardEuler": discrete(num, den, ts, "backward_diff"),
            "tustin": discrete(num, den, ts, "bilinear"),
        })
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "fixtures", "discrete.json")
    with open(path, "w") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")
    print(f"wrote {path}")


if __name__ == "__main__":
    main()
