#!/usr/bin/env python3
"""Invented free-release records that end at rest, with the true stick instant, made in SciPy.

An outside reference for where Penduline's `analyze` says the body stopped. It integrates the
equation of motion of a pivoted body with dry friction and stiction,

    J x'' = -K sin x - b x' - Tc sgn(x') - c x'|x'|,     K = m g Lc,   x = angle from equilibrium,

one half-swing at a time with scipy.integrate.solve_ivp (DOP853) and a terminal event at x' = 0.
At each reversal the static test decides: when |K sin x| <= Ts the static friction can hold the
body against gravity and it sticks there for good (nothing else acts on it); otherwise it sets
off again towards the gravity torque. It is written from that equation alone and shares no code
with Penduline.

Each record is a still segment at the release angle, the release between two samples, the
swing, the stick and a long rest, in the sensor's frame (reading = offset + x) with seeded
Gaussian noise and, for one record, encoder quantisation; one record adds a slow creep of the
reading after the stick (the body settling in its bearing), which is not a swing. Everything
here is INVENTED test data, not a measurement.

Writes into DIR (default: the physics bundle's test resources, stop-records/):
  NAME.csv     header `time_s,angle_deg`, comment lines start with #
  truth.csv    one row per record: the mechanism, the friction, the noise, and the truth --
               release time, stick time, rest angle and the angle of the reversal before the
               stick (both from the equilibrium), the small-angle period

Usage: make_stop_records.py [DIR]      (needs numpy and scipy, e.g. Debian's python3-scipy)
"""
import math
import os
import sys

import numpy as np
from scipy.integrate import solve_ivp

G = 9.80665

# name, m (kg), Lc (m), J0 (kg m^2), b, Tc, Ts, c (SI), theta0 (deg), offset (deg), rate (Hz),
# still (s), duration after release (s), noise (deg), counts per rev (0: none), first time (s),
# creep after the stick (deg, time constant s), seed
RECORDS = [
    ("lid-250hz", 1.5, 0.25, 0.12, 0.004, 0.012, 0.0135, 0.0, 15.37, 1.5, 250, 1.0, 30.0, 0.02, 0,
     0.0, (0.0, 1.0), 101),
    ("gate-encoder-100hz", 8.0, 0.6, 4.0, 0.02, 0.15, 0.2, 0.0, 10.1, -0.8, 100, 2.0, 36.0, 0.01, 4096,
     12.5, (0.0, 1.0), 102),
    ("flap-500hz", 0.8, 0.5, 0.25, 0.01, 0.004, 0.006, 0.002, 4.0, 2.2, 500, 1.5, 28.0, 0.03, 0,
     3.0, (0.0, 1.0), 103),
    ("arm-creep-200hz", 3.0, 0.3, 0.4, 0.113, 0.002, 0.03, 0.0, 8.0, 0.4, 200, 1.2, 38.0, 0.02, 0,
     0.0, (0.03, 4.0), 104),
]


def integrate(k, j0, b, tc, ts, c, x0):
    """Release from rest at x0 at time 0: the reversals (t, x) and the stick (t, x)."""
    period = 2 * math.pi * math.sqrt(j0 / k)
    t0, x = 0.0, x0
    if abs(k * math.sin(x)) <= ts:
        raise ValueError("the release angle is inside the stiction band: the body would not move")
    reversals = [(0.0, x0)]
    segments = []
    while True:
        s = 1.0 if -k * math.sin(x) > 0 else -1.0     # it sets off towards the gravity torque

        def rhs(_t, y, s=s):
            return [y[1], (-k * math.sin(y[0]) - b * y[1] - tc * s - c * y[1] * abs(y[1])) / j0]

        def stops(_t, y):
            return y[1]
        stops.terminal = True
        stops.direction = -s
        sol = solve_ivp(rhs, (t0, t0 + 10 * period), [x, 0.0], method="DOP853", rtol=1e-11, atol=1e-13,
                        events=stops, dense_output=True, max_step=period / 20)
        if not sol.t_events[0].size:
            raise RuntimeError("no reversal within 10 periods")
        t1 = float(sol.t_events[0][0])
        x = float(sol.y_events[0][0][0])
        segments.append((t0, t1, sol.sol))
        t0 = t1
        if abs(k * math.sin(x)) <= ts:                   # the static friction holds it here
            return reversals, (t1, x), segments
        reversals.append((t1, x))
        if len(reversals) > 100000:
            raise RuntimeError("too many reversals")


def make(spec, out_dir):
    (name, m, lc, j0, b, tc, ts, c, theta0_deg, offset_deg, rate, still, duration, noise_deg, counts,
     first, creep, seed) = spec
    k = m * G * lc
    x0 = math.radians(theta0_deg)
    reversals, (t_stick, x_rest), segments = integrate(k, j0, b, tc, ts, c, x0)
    t_release = first + still + 0.37 / rate
    n = int(round((still + duration) * rate))
    t = first + np.arange(n) / rate
    x = np.full(n, x0)
    since = t - t_release
    for (a, e, sol) in segments:
        inside = (since > a) & (since <= e)
        if inside.any():
            x[inside] = sol(since[inside])[0]
    after = since > t_stick
    x[after] = x_rest
    creep_deg, creep_tau = creep
    if creep_deg:
        x[after] += math.radians(creep_deg) * (1 - np.exp(-(since[after] - t_stick) / creep_tau))
    rng = np.random.default_rng(seed)
    reading = math.radians(offset_deg) + x + math.radians(noise_deg) * rng.standard_normal(n)
    if counts:
        q = 2 * math.pi / counts
        reading = q * np.rint(reading / q)
    if t_stick > duration - 5:
        raise RuntimeError(name + ": the stick at " + str(t_stick) + " s leaves too little rest")
    x_prev = reversals[-1][1]
    with open(os.path.join(out_dir, name + ".csv"), "w") as f:
        f.write("# INVENTED test record made by releng/reference/make_stop_records.py (SciPy solve_ivp);"
                " not a measurement.\n")
        f.write("# m %.6g kg, Lc %.6g m, J0 %.6g kg m2; b %.6g, Tc %.6g, Ts %.6g, c %.6g (SI); noise %.6g deg;"
                " counts/rev %d; seed %d\n" % (m, lc, j0, b, tc, ts, c, noise_deg, counts, seed))
        f.write("# truth in truth.csv: stick at %.6f s (record time)\n" % (t_release + t_stick))
        f.write("time_s,angle_deg\n")
        for ti, yi in zip(t, np.degrees(reading)):
            f.write("%.6f,%.6f\n" % (ti, yi))
    return (name, m, lc, j0, b, tc, ts, c, math.radians(noise_deg), counts, math.radians(offset_deg),
            t_release, t_release + t_stick, x_rest, x_prev, 2 * math.pi * math.sqrt(j0 / k),
            len(reversals))


def main():
    here = os.path.dirname(os.path.abspath(__file__))
    default = os.path.join(here, "..", "..", "bundles", "dev.penduline.physics", "src", "test", "resources",
                           "stop-records")
    out_dir = os.path.normpath(sys.argv[1] if len(sys.argv) > 1 else default)
    os.makedirs(out_dir, exist_ok=True)
    rows = [make(spec, out_dir) for spec in RECORDS]
    with open(os.path.join(out_dir, "truth.csv"), "w") as f:
        f.write("# INVENTED: the truth of the records made by releng/reference/make_stop_records.py (SciPy)\n")
        f.write("record,mass_kg,centroid_m,pivot_inertia_kg_m2,viscous,coulomb,stiction,drag,noise_rad,"
                "counts_per_rev,offset_rad,release_s,stick_s,rest_rad,previous_reversal_rad,period_s,"
                "reversals\n")
        for r in rows:
            f.write("%s,%.9g,%.9g,%.9g,%.9g,%.9g,%.9g,%.9g,%.9g,%d,%.12g,%.9f,%.9f,%.12g,%.12g,%.9g,%d\n" % r)
    for r in rows:
        print("%-20s stick at %9.4f s, rest %+.5f deg, previous reversal %+.5f deg, %d half-swings"
              % (r[0], r[12], math.degrees(r[13]), math.degrees(r[14]), r[16]))


if __name__ == "__main__":
    main()
