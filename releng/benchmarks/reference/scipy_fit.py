#!/usr/bin/env python3
"""Independent reference for Penduline's friction fit, in SciPy.

Fits a free-release swing record with the same model as Penduline's identification
(viscous + Coulomb torques, free pivot inertia, per-record release angle, release time and
sensor offset) using only general-purpose SciPy: solve_ivp with the DOP853 integrator, a
terminal event on the angular velocity that restarts each half-swing with the right friction
sign (and the stick test of dry friction), and least_squares for the fit. It shares no code
with Penduline; it is there to check the Java results and to time them against.

Usage: scipy_fit.py RECORD.csv --mass KG --centroid-distance M --pivot-inertia KG_M2
                    [--gravity G] [--repeat N]
The record has a header `time_s,angle_deg` (lines starting with # are skipped).
Prints one JSON object: parameters, their standard errors, rms residual, seconds per fit.
"""
import argparse
import json
import math
import time

import numpy as np
from scipy.integrate import solve_ivp
from scipy.optimize import least_squares


def simulate(t_out, theta0, j0, k, b, tc):
    """Angle (rad, from equilibrium) at times t_out (from release) of a body released from rest."""
    out = np.empty_like(t_out)
    t0, state = 0.0, np.array([theta0, 0.0])
    i = 0
    n = len(t_out)
    period = 2 * math.pi * math.sqrt(j0 / k)
    while i < n:
        torque = -k * math.sin(state[0])
        if state[1] == 0.0:
            if abs(torque) <= tc:        # static friction holds: at rest from here on
                out[i:] = state[0]
                return out
            sign = -1.0 if torque < 0 else 1.0   # it moves towards the torque
        else:
            sign = 1.0 if state[1] > 0 else -1.0

        def rhs(_t, y, s=sign):
            return [y[1], (-k * math.sin(y[0]) - b * y[1] - tc * s) / j0]

        def reversal(_t, y, s=sign):
            return y[1]
        reversal.terminal = True
        reversal.direction = -sign
        t_end = t_out[-1]
        sol = solve_ivp(rhs, (t0, t_end), state, method="DOP853", rtol=1e-10, atol=1e-12,
                        events=reversal, dense_output=True, max_step=period / 8)
        stop = sol.t_events[0][0] if sol.t_events[0].size else t_end
        j = i
        while j < n and t_out[j] <= stop:
            j += 1
        if j > i:
            out[i:j] = sol.sol(t_out[i:j])[0]
        i = j
        if not sol.t_events[0].size:
            out[i:] = sol.sol(t_end)[0] if i < n else 0
            return out
        t0 = stop
        state = np.array([sol.y_events[0][0][0], 0.0])
    return out


def residuals(p, t, y, k):
    b, tc, j0, theta0, t_rel, offset = p
    model = np.full_like(t, theta0 + offset)
    moving = t > t_rel
    if moving.any():
        model[moving] = offset + simulate(t[moving] - t_rel, theta0, j0, k, b, tc)
    return y - model


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("record")
    ap.add_argument("--mass", type=float, required=True)
    ap.add_argument("--centroid-distance", type=float, required=True)
    ap.add_argument("--pivot-inertia", type=float, required=True)
    ap.add_argument("--gravity", type=float, default=9.80665)
    ap.add_argument("--repeat", type=int, default=1)
    ap.add_argument("--guess", type=float, nargs=6, metavar=("B", "TC", "J0", "THETA0", "T_REL", "OFFSET"))
    a = ap.parse_args()
    with open(a.record, encoding="utf-8") as f:
        lines = [line for line in f if line.strip() and not line.startswith("#")]
    header = lines[0].strip().split(",")
    table = np.array([[float(v) for v in line.split(",")] for line in lines[1:]])
    t = table[:, header.index("time_s")]
    y = np.radians(table[:, header.index("angle_deg")])
    k = a.mass * a.gravity * a.centroid_distance
    if a.guess:
        x0 = np.array(a.guess)
    else:
        # crude but honest starting values: still level, first motion, a small friction guess
        still = y[: max(10, len(y) // 200)]
        offset0 = float(np.median(y[-len(y) // 10:]))
        moving = np.nonzero(np.abs(y - np.median(still)) > 5 * (np.std(still) + 1e-6))[0]
        t_rel0 = float(t[moving[0]]) if moving.size else float(t[0])
        x0 = np.array([1e-3, 1e-3, a.pivot_inertia, float(np.median(still)) - offset0, t_rel0, offset0])
    lower = [0, 0, 0.5 * a.pivot_inertia, -math.pi, t[0], -math.pi]
    upper = [np.inf, np.inf, 2 * a.pivot_inertia, math.pi, t[-1], math.pi]
    x0 = np.clip(x0, lower, upper)
    times = []
    fit = None
    for _ in range(a.repeat):
        start = time.perf_counter()
        fit = least_squares(residuals, x0, args=(t, y, k), bounds=(lower, upper), x_scale="jac",
                            method="trf", xtol=1e-10, ftol=1e-10)
        times.append(time.perf_counter() - start)
    n, p = len(t), len(fit.x)
    rss = float(np.sum(fit.fun ** 2))
    cov = np.linalg.pinv(fit.jac.T @ fit.jac) * rss / (n - p)
    sigma = np.sqrt(np.diag(cov))
    names = ["viscous", "coulomb", "pivot_inertia", "theta0_rad", "release_time_s", "offset_rad"]
    print(json.dumps({
        "parameters": dict(zip(names, map(float, fit.x))),
        "sigma": dict(zip(names, map(float, sigma))),
        "rms_residual_deg": math.degrees(math.sqrt(rss / n)),
        "evaluations": int(fit.nfev),
        "seconds_per_fit": float(np.median(times)),
    }, indent=2))


if __name__ == "__main__":
    main()
