#!/usr/bin/env python3
"""Writes the reference corpus: invented swing records of a compound pendulum with a known truth.

Every record is invented test data, made here from the equation of motion with SciPy alone; no
code is shared with Penduline, so a fit of these records by Penduline is checked against an
independent integration. The body, held still at theta0 from its hanging equilibrium, is let go
from rest at the release time and swings by

    J0 theta'' = -K sin(theta) - b omega - Tc sgn(omega) - c omega |omega|,    K = m g Lc.

Within a half-swing the sign of omega is fixed, so each half-swing is integrated on its own with
solve_ivp (DOP853, rtol 1e-11) and a terminal, direction-aware event at omega = 0. At each
reversal the body is at rest: it stays there for good when the gravity torque |K sin(theta)|
does not exceed the static torque Ts (Ts = Tc when there is no separate stiction), else it swings
on in the direction of that torque. The energies dissipated by each loss (integrals of
b omega^2, Tc |omega| and c |omega|^3) are carried as extra states, which gives the true energy
shares. The samples then get a sensor offset, noise from a seeded numpy Generator (white
Gaussian, or AR(1) where a record says so) and, for an encoder record, rounding to counts.

The output folder gets the records, truth.json (one entry per case) and README.md (what each
record is). Fixed seeds and fixed formatting make two runs write identical bytes (the long
record is gzip-compressed with mtime 0 and no file name).

Usage: make_corpus.py [OUTPUT_FOLDER]
    default: bundles/dev.penduline.cli/src/test/resources/reference-corpus/ in this repository
"""
import gzip
import io
import json
import math
import os
import sys

import numpy as np
from scipy.integrate import solve_ivp

STANDARD_GRAVITY = 9.80665
RTOL = 1e-11
ATOL = 1e-13
SOURCE = "SciPy solve_ivp reference, releng/reference/make_corpus.py"
DOMINANCE_MARGIN = 0.15  # a loss is dominant when its share leads the next by >= 15 percentage points

# The arm used by most cases: about 2 kg, centroid 0.4 m below the pivot, J0 = 0.5 kg m^2.
ARM = {"mass_kg": 2.0, "centroid_distance_m": 0.4, "pivot_inertia_kg_m2": 0.5, "gravity_m_s2": STANDARD_GRAVITY}
# A light large plate: 0.5 m x 0.5 m of 1 mm aluminium (0.675 kg) hung by its top edge on a
# ball-bearing hinge: Lc = 0.25 m, J0 = m a^2 / 3 = 0.05625 kg m^2 (thin plate about an edge).
PLATE = {"mass_kg": 0.675, "centroid_distance_m": 0.25, "pivot_inertia_kg_m2": 0.05625,
         "gravity_m_s2": STANDARD_GRAVITY}


class Loss:
    """The friction of a case: b, Tc, Ts, c, and optionally a loss outside the model.

    Outside the model (for the record the model cannot describe): side_tc is a dry friction that
    acts only while the angle is positive (a brush that touches the body on one side of the
    swing only), and holds the body there with the same torque; root_a is a torque
    a sgn(omega) |omega|^0.5.
    """

    def __init__(self, b=0.0, tc=0.0, ts=None, c=0.0, side_tc=0.0, root_a=0.0):
        self.b, self.tc, self.c, self.side_tc, self.root_a = b, tc, c, side_tc, root_a
        self.ts = tc if ts is None else ts
        if self.ts < tc:
            raise ValueError("static torque Ts below Coulomb Tc")

    def outside(self):
        return self.side_tc > 0 or self.root_a > 0

    def static(self, side):
        """Largest torque static friction holds on the given side of the equilibrium (sign of theta)."""
        return self.ts + (self.side_tc if side > 0 else 0.0)


def simulate(mech, loss, theta0, t_end):
    """Integrates the release from rest at theta0 (rad) from t = 0 to t_end (s after release).

    Returns a dict: segments [(t_start, t_stop, dense solution)], reversals [(t, theta)], stop
    (t, theta) or None, the previous reversal where the body did not stick, and the energies
    [viscous, coulomb, drag, outside the model] dissipated up to t_end.
    """
    k = mech["mass_kg"] * mech["gravity_m_s2"] * mech["centroid_distance_m"]
    j0 = mech["pivot_inertia_kg_m2"]
    period = 2 * math.pi * math.sqrt(j0 / k)
    t, y = 0.0, np.array([theta0, 0.0, 0.0, 0.0, 0.0, 0.0])
    segments, reversals = [], [(0.0, theta0)]
    stop = None
    s = 0.0  # direction of motion; 0 while at rest
    side = 1.0 if theta0 > 0 else -1.0  # the side of the equilibrium the body is on
    while t < t_end:
        if s == 0.0:
            gravity = -k * math.sin(y[0])
            if abs(gravity) <= loss.static(side):
                stop = (t, float(y[0]))
                break
            s = 1.0 if gravity > 0 else -1.0

        def rhs(_t, z, s=s, side=side):
            w = z[1]
            aw = s * w  # |omega| within the half-swing (the sign is fixed)
            extra = (loss.side_tc if side > 0 else 0.0) + loss.root_a * math.sqrt(max(aw, 0.0))
            torque = -k * math.sin(z[0]) - loss.b * w - loss.tc * s - loss.c * w * aw - extra * s
            return [w, torque / j0, loss.b * w * w, loss.tc * aw, loss.c * aw ** 3, extra * aw]

        def reversal(_t, z, s=s):
            return s * z[1]
        reversal.terminal = True
        reversal.direction = -1.0  # s*omega rises from 0 at the start and falls through 0 at the end

        def crossing(_t, z, side=side):
            return side * z[0]
        crossing.terminal = True
        crossing.direction = -1.0  # side*theta falls through 0 where the body crosses the equilibrium

        events = [reversal, crossing] if loss.side_tc > 0 else [reversal]
        sol = solve_ivp(rhs, (t, t_end), y, method="DOP853", rtol=RTOL, atol=ATOL, events=events,
                        dense_output=True, max_step=period / 16)
        if sol.status < 0:
            raise RuntimeError("integration failed: " + sol.message)
        if sol.status == 1:
            hits = [(float(te[0]), i) for i, te in enumerate(sol.t_events) if te.size]
            hit = min(hits)[1]
            t_hit = float(sol.t_events[hit][0])
            y = np.array(sol.y_events[hit][0])
            segments.append((t, t_hit, sol.sol))
            t = t_hit
            if hit == 0:
                y[1] = 0.0
                reversals.append((t_hit, float(y[0])))
                s = 0.0
            else:
                y[0] = 0.0
                side = s
        else:
            segments.append((t, t_end, sol.sol))
            y = sol.y[:, -1]
            t = t_end
    previous = reversals[-2] if stop is not None and len(reversals) >= 2 else None
    return {"segments": segments, "reversals": reversals, "stop": stop, "previous": previous,
            "energies": [float(v) for v in y[2:6]], "K": k, "theta0": theta0}


def angles_at(run, times):
    """Angle (rad, from equilibrium) at times after release (all >= 0)."""
    out = np.empty_like(times)
    filled = np.zeros(times.shape, dtype=bool)
    for (a, b, dense) in run["segments"]:
        sel = (times >= a) & (times <= b) & ~filled
        if sel.any():
            out[sel] = dense(times[sel])[0]
            filled |= sel
    if run["stop"] is not None:
        out[~filled] = run["stop"][1]
    elif not filled.all():
        raise RuntimeError("samples beyond the integrated span")
    return out


def noise(rng, n, sigma, ar1):
    """White Gaussian noise of standard deviation sigma, or AR(1) with lag-1 coefficient ar1 and the same sigma."""
    w = rng.standard_normal(n)
    if ar1 == 0.0:
        return sigma * w
    e = np.empty(n)
    e[0] = w[0]
    scale = math.sqrt(1.0 - ar1 * ar1)
    for i in range(1, n):
        e[i] = ar1 * e[i - 1] + scale * w[i]
    return sigma * e


def g6(v):
    """Compact number: 6 significant digits, no exponent for the values written here."""
    text = "%.6g" % v
    return "0" if text == "-0" else text


def shares(energies):
    total = sum(energies)
    return [e / total for e in energies] if total > 0 else [0.0] * len(energies)


def dominant_word(share_map):
    ranked = sorted(share_map.items(), key=lambda kv: -kv[1])
    return ranked[0][0] if ranked[0][1] - ranked[1][1] >= DOMINANCE_MARGIN else "mixed"


def make_session(case, sess, out_dir):
    """Simulates and writes one record; returns its truth entry and its energies."""
    mech, loss = case["mechanism"], case["loss"]
    rate, n = sess["rate_hz"], sess["samples"]
    release = sess["still_s"] + sess["release_fraction"] / rate
    times = np.arange(n) / rate
    t_last = times[-1]
    theta0 = math.radians(sess["theta0_deg"])
    run = simulate(mech, loss, theta0, t_last - release)
    theta = np.full(n, theta0)
    moving = times > release
    theta[moving] = angles_at(run, times[moving] - release)
    rng = np.random.default_rng(sess["seed"])
    offset = math.radians(sess["offset_deg"])
    reading = theta + offset + noise(rng, n, math.radians(sess["noise_deg"]), sess.get("noise_ar1", 0.0))
    cpr = sess.get("counts_per_rev")
    lines = ["# INVENTED TEST DATA, not a measurement: made by releng/reference/make_corpus.py"
             " (SciPy solve_ivp) for case '%s'; the truth is in truth.json." % case["name"]]
    if cpr:
        header = "time_s,counts"
        values = np.rint(reading / (2 * math.pi / cpr)).astype(np.int64)
        body = ["%s,%d" % (g6(t), v) for t, v in zip(times, values)]
    else:
        header = "time_s,angle_deg"
        body = ["%s,%s" % (g6(t), g6(v)) for t, v in zip(times, np.degrees(reading))]
    text = "\n".join(lines + [header] + body) + "\n"
    data = text.encode("ascii")
    name = sess["file"]
    path = os.path.join(out_dir, name)
    if name.endswith(".gz"):
        buf = io.BytesIO()
        with gzip.GzipFile(filename="", mode="wb", fileobj=buf, compresslevel=9, mtime=0) as gz:
            gz.write(data)
        data = buf.getvalue()
    with open(path, "wb") as f:
        f.write(data)

    k = run["K"]
    truth = {
        "file": name,
        "theta0_deg": sess["theta0_deg"],
        "release_time_s": release,
        "offset_deg": sess["offset_deg"],
        "noise_deg": sess["noise_deg"],
        "noise": "AR(1), lag-1 coefficient %g" % sess["noise_ar1"] if sess.get("noise_ar1") else "white Gaussian",
        "noise_seed": sess["seed"],
        "quantisation": ("encoder, %d counts/rev (%.6g deg per count)" % (cpr, 360.0 / cpr)) if cpr
        else "none (angles in degrees, 6 significant digits)",
        "counts_per_rev": cpr if cpr else None,
        "rate_hz": rate,
        "samples": n,
        "duration_s": float(t_last),
        "reversals": len(run["reversals"]) - 1,
    }
    if run["stop"] is not None:
        t_stop, x_rest = run["stop"]
        x_prev = run["previous"][1]
        truth["stop_time_s"] = release + t_stop
        truth["rest_angle_deg"] = math.degrees(x_rest)
        truth["stop_band_N_m"] = {"lower": k * abs(math.sin(x_rest)), "upper": k * abs(math.sin(x_prev)),
                                  "previous_reversal_deg": math.degrees(x_prev)}
    else:
        truth["stop_time_s"] = None
        truth["rest_angle_deg"] = None
        truth["stop_band_N_m"] = None
    e = run["energies"]
    truth["energy_dissipated_J"] = {"viscous": e[0], "coulomb": e[1], "drag": e[2]}
    if loss.outside():
        truth["energy_dissipated_J"]["outside_model"] = e[3]
    return truth, e


def make_case(case, out_dir):
    mech, loss = case["mechanism"], case["loss"]
    sessions, energies = [], np.zeros(4)
    for sess in case["sessions"]:
        t, e = make_session(case, sess, out_dir)
        sessions.append(t)
        energies += np.array(e)
    k = mech["mass_kg"] * mech["gravity_m_s2"] * mech["centroid_distance_m"]
    share = shares(list(energies))
    share_map = {"viscous": share[0], "coulomb": share[1], "drag": share[2]}
    entry = {
        "name": case["name"],
        "what": case["what"],
        "mechanism": dict(mech, K_N_m=k),
        "viscous_N_m_s_rad": loss.b,
        "coulomb_N_m": loss.tc,
        "stiction_N_m": loss.ts,
        "drag_N_m_s2_rad2": loss.c,
        "energy_share": share_map,
    }
    if loss.outside():
        entry["outside_model"] = case["outside_model"]
        if loss.side_tc:
            entry["side_coulomb_N_m"] = loss.side_tc
        if loss.root_a:
            entry["root_law_N_m_s05"] = loss.root_a
        entry["energy_share"]["outside_model"] = share[3]
    if case.get("expect") == "misfit":
        entry["expect"] = "misfit"
        entry["dominant"] = None
    else:
        entry["expect"] = "fit"
        entry["dominant"] = dominant_word(share_map)
    bands = [s["stop_band_N_m"] for s in sessions if s["stop_band_N_m"] is not None]
    if bands:
        entry["stop_band_N_m"] = {"lower": max(b["lower"] for b in bands), "upper": min(b["upper"] for b in bands)}
    else:
        entry["stop_band_N_m"] = None
    entry["record_options"] = case.get("record_options", {})
    entry["sessions"] = sessions
    return entry


def cases():
    """The cases; every one invented. A session: file, theta0, rate, samples, still segment, offset, noise, seed."""
    def session(file, theta0, rate, seconds, seed, offset=0.0, noise_deg=0.02, still=1.5, fraction=0.37, **more):
        s = {"file": file, "theta0_deg": theta0, "rate_hz": rate, "samples": int(round(seconds * rate)) + 1,
             "still_s": still, "release_fraction": fraction, "offset_deg": offset, "noise_deg": noise_deg,
             "seed": seed}
        s.update(more)
        return s

    return [
        {"name": "viscous", "what": "arm, pure viscous damping (oil-damped pivot), 30 deg release",
         "mechanism": ARM, "loss": Loss(b=0.02),
         "sessions": [session("viscous.csv", 30.0, 500, 60, 101, offset=1.2)]},
        {"name": "coulomb", "what": "arm, pure Coulomb friction (dry plain bearing), 30 deg release; stops",
         "mechanism": ARM, "loss": Loss(tc=0.04),
         "sessions": [session("coulomb.csv", 30.0, 500, 50, 102, offset=-0.7)]},
        {"name": "viscous-coulomb", "what": "arm, viscous plus Coulomb friction (viscous leads), 30 deg release",
         "mechanism": ARM, "loss": Loss(b=0.015, tc=0.006),
         "sessions": [session("viscous-coulomb.csv", 30.0, 500, 60, 103, offset=0.4)]},
        {"name": "release-120", "what": "arm released at 120 deg (far beyond small angles), viscous plus Coulomb",
         "mechanism": ARM, "loss": Loss(b=0.03, tc=0.02),
         "sessions": [session("release-120.csv", 120.0, 500, 50, 104, offset=2.5)]},
        {"name": "drag-plate", "what": "light 0.5 m square plate on a ball-bearing hinge, 60 deg release: air drag"
         " takes most of the loss", "mechanism": PLATE, "loss": Loss(b=2e-5, tc=6e-4, c=0.0055),
         "sessions": [session("drag-plate.csv", 60.0, 250, 60, 105, offset=-1.5, noise_deg=0.05)]},
        {"name": "stiction", "what": "arm whose static torque is four times the Coulomb torque: it sticks"
         " off-equilibrium at a reversal where Coulomb friction alone would let it swing on",
         "mechanism": ARM, "loss": Loss(b=0.004, tc=0.03, ts=0.12),
         "sessions": [session("stiction.csv", 20.0, 500, 40, 106, offset=0.9)]},
        {"name": "encoder-12bit", "what": "arm read by a coarse 12-bit encoder (4096 counts/rev, 0.088 deg a"
         " count), noise small against one count", "mechanism": ARM, "loss": Loss(b=0.015, tc=0.005),
         "record_options": {"counts-per-rev": 4096},
         "sessions": [session("encoder-12bit.csv", 35.0, 500, 60, 107, offset=3.3, noise_deg=0.01,
                              counts_per_rev=4096)]},
        {"name": "heavy-noise", "what": "arm with a noisy sensor (0.5 deg white noise), viscous plus Coulomb"
         " (Coulomb leads)", "mechanism": ARM, "loss": Loss(b=0.006, tc=0.025),
         "sessions": [session("heavy-noise.csv", 40.0, 250, 60, 108, offset=-2.0, noise_deg=0.5)]},
        {"name": "low-rate", "what": "arm sampled at 50 Hz (about 80 samples a period), viscous plus Coulomb",
         "mechanism": ARM, "loss": Loss(b=0.01, tc=0.02),
         "sessions": [session("low-rate.csv", 30.0, 50, 60, 109, offset=0.6)]},
        {"name": "long", "what": "arm, long record: 300 000 samples at 1 kHz, lightly damped, AR(1) sensor"
         " noise", "mechanism": ARM, "loss": Loss(b=0.006, tc=0.0025),
         "sessions": [session("long.csv.gz", 30.0, 1000, 299.999, 110, offset=-0.3, noise_ar1=0.8)]},
        {"name": "two-sessions", "what": "one arm released twice, at 15 deg and at 45 deg (fitted jointly)",
         "mechanism": ARM, "loss": Loss(b=0.01, tc=0.025),
         "sessions": [session("two-sessions-15.csv", 15.0, 250, 40, 111, offset=0.8),
                      session("two-sessions-45.csv", 45.0, 250, 60, 112, offset=0.8, fraction=0.61)]},
        {"name": "mixed", "what": "arm whose viscous and Coulomb losses are about equal (no dominant loss)",
         "mechanism": ARM, "loss": Loss(b=0.015, tc=0.015),
         "sessions": [session("mixed.csv", 30.0, 500, 60, 113, offset=-1.1)]},
        {"name": "one-sided", "what": "OUTSIDE THE MODEL: dry friction on one side of the swing only (a brush"
         " that touches the arm only while its angle is positive), plus light viscous damping", "expect": "misfit",
         "outside_model": "a dry friction torque of 0.06 N m (opposing the motion, and holding the body at rest"
         " with the same torque) that acts only while theta > 0; the model's Coulomb term acts on both sides",
         "mechanism": ARM, "loss": Loss(b=0.004, side_tc=0.06),
         "sessions": [session("one-sided.csv", 30.0, 250, 40, 114, offset=0.5)]},
    ]


README_HEAD = """# Reference corpus: invented swing records with a known truth

**Every file here is invented test data, not a measurement.** The records were made by the
committed script `releng/reference/make_corpus.py`, which simulates a compound pendulum with
SciPy alone and shares no code with Penduline; it also wrote this README. `ReferenceCorpusTest`
(in `bundles/dev.penduline.cli/src/test/java/dev/penduline/cli/`) runs Penduline's real `fit`
command on each case and compares what it finds with `truth.json`.

## How the records are made

The body is held still at θ0 from its hanging equilibrium, let go from rest at the release
time, and swings by

    J0 θ'' = −K sin θ − b ω − Tc sgn ω − c ω|ω|,   K = m g Lc.

The sign of ω is fixed within a half-swing, so each half-swing is integrated on its own
(`solve_ivp`, DOP853, rtol 1e-11) up to a terminal, direction-aware event at ω = 0. At a
reversal the body is at rest: it stays there for good when |K sin θ| ≤ Ts (Ts = Tc when there
is no separate static torque), otherwise it swings on in the direction of the gravity torque.
The energies dissipated by each loss (∫b ω², ∫Tc |ω|, ∫c |ω|³) are integrated as extra states
and give the true energy shares. The samples then get the sensor offset, noise from a seeded
numpy Generator (white Gaussian, or AR(1) where the table says so) and, in the encoder record,
rounding to whole counts. Angles are written in degrees with 6 significant digits; the encoder
record is written in counts. Each record starts with a `#` line saying it is invented, then the
header `time_s,angle_deg` (or `time_s,counts`, which the reader needs the counts per
revolution for: see `record_options`). The still segment before the release lasts 1.5 s, and
the release falls between two samples.

## Regenerating

    releng/scripts/make-reference-corpus.sh

(installs Debian's `python3-scipy` when it is missing and runs the script with
`/usr/bin/python3`). Fixed seeds and fixed formatting make the output byte-identical from run
to run; the long record is gzip-compressed with mtime 0 and no stored name, and the test
unpacks it into a temporary folder.

## truth.json

One entry per case: the mechanism (m, Lc, J0, g, K), b, Tc, Ts, c, the true energy shares
(from the release to the end of the record, summed over a case's sessions), the expected
`dominant` (a loss is dominant when its share leads the next by at least 15 percentage points,
else `mixed`; `null` for the misfit case, which has `"expect": "misfit"`), the options the
reader needs (`record_options`), and per session: file, θ0, release time, offset, noise, its
seed, quantisation, rate, samples, stop time and rest angle (or null), and where the body stops
the static-friction band the stop allows: K|sin x_rest| ≤ Ts < K|sin x_prev|, x_prev being the
reversal before, where the body did not stick. A case's band is the intersection over its
sessions.

## The cases

The arm: m = 2 kg, Lc = 0.4 m, J0 = 0.5 kg·m². The plate: 0.5 m × 0.5 m of 1 mm aluminium
(0.675 kg) hung by its top edge, Lc = 0.25 m, J0 = m a²/3 = 0.05625 kg·m².

| case | what | losses (SI) | sessions | shares viscous / Coulomb / drag | dominant | stops |
| --- | --- | --- | --- | --- | --- | --- |
"""

README_TAIL = """
Why friction on one *side* of the swing for the misfit case, and not friction on one *stroke*:
a dry friction that acts only while ω > 0 is, but for where the body sticks, a symmetric Coulomb
friction of half the size plus a shifted sensor offset, so the model describes it (a trial fit left residuals within
3 % of the noise); a torque a sgn ω |ω|^0.5 was nearly described by viscous plus Coulomb
(residuals 1.35 times the noise). A friction on one side of the equilibrium shifts the centre
of the swing on that side only, which no offset and no symmetric term can follow (residuals
about 3.5 times the noise).
"""


def readme(entries):
    rows = []
    for e in entries:
        losses = []
        for key, label in (("viscous_N_m_s_rad", "b"), ("coulomb_N_m", "Tc"), ("drag_N_m_s2_rad2", "c")):
            if e[key]:
                losses.append("%s %s" % (label, g6(e[key])))
        if e["stiction_N_m"] != e["coulomb_N_m"]:
            losses.append("Ts %s" % g6(e["stiction_N_m"]))
        if "side_coulomb_N_m" in e:
            losses.append("dry friction on the θ > 0 side only %s" % g6(e["side_coulomb_N_m"]))
        if "root_law_N_m_s05" in e:
            losses.append("a sgn ω |ω|^0.5 with a = %s" % g6(e["root_law_N_m_s05"]))
        sessions, stops = [], []
        for s in e["sessions"]:
            noise = "%s° %s" % (g6(s["noise_deg"]), "white" if s["noise"] == "white Gaussian" else s["noise"])
            if s["quantisation"].startswith("encoder"):
                noise += ", " + s["quantisation"]
            sessions.append("`%s`: %s°, %s Hz, %s samples, noise %s" % (
                s["file"], g6(s["theta0_deg"]), g6(s["rate_hz"]), s["samples"], noise))
            stops.append("no" if s["stop_time_s"] is None else "at %.1f s, %.3f°" % (
                s["stop_time_s"], s["rest_angle_deg"]))
        sh = e["energy_share"]
        shares = "%.1f / %.1f / %.1f %%" % (100 * sh["viscous"], 100 * sh["coulomb"], 100 * sh["drag"])
        if "outside_model" in sh:
            shares += " (outside the model %.1f %%)" % (100 * sh["outside_model"])
        rows.append("| %s | %s | %s | %s | %s | %s | %s |" % (
            e["name"], e["what"], "; ".join(losses), "<br>".join(sessions), shares,
            e["dominant"] if e["dominant"] else "none: expect misfit", "<br>".join(stops)))
    return README_HEAD + "\n".join(rows) + "\n" + README_TAIL


def main():
    here = os.path.dirname(os.path.abspath(__file__))
    default = os.path.join(here, "..", "..", "bundles", "dev.penduline.cli", "src", "test", "resources",
                           "reference-corpus")
    out_dir = os.path.normpath(sys.argv[1] if len(sys.argv) > 1 else default)
    os.makedirs(out_dir, exist_ok=True)
    entries = [make_case(c, out_dir) for c in cases()]
    manifest = {
        "source": SOURCE,
        "invented": "every record here is invented test data, simulated by the script above; none is a measurement",
        "model": "J0 theta'' = -K sin(theta) - b omega - Tc sgn(omega) - c omega|omega|, K = m g Lc; at each reversal"
                 " the body sticks for good when |K sin(theta)| <= Ts",
        "angles": "theta0, rest and reversal angles are from the hanging equilibrium; a record reads"
                  " theta + offset + noise",
        "energy_share": "each loss's share of the energy dissipated from the release to the end of the record,"
                        " summed over a case's sessions",
        "dominant_rule": "a loss is dominant when its share leads the next by >= 15 percentage points, else mixed",
        "stop_band": "a stop at x_rest after a reversal at x_prev where the body did not stick allows"
                     " K|sin x_rest| <= Ts < K|sin x_prev|; a case's band is the intersection over its sessions",
        "cases": entries,
    }
    with open(os.path.join(out_dir, "truth.json"), "w", encoding="ascii") as f:
        json.dump(manifest, f, indent=1, sort_keys=False)
        f.write("\n")
    with open(os.path.join(out_dir, "README.md"), "w", encoding="utf-8") as f:
        f.write(readme(entries))
    for e in entries:
        s = e["energy_share"]
        print("%-16s %-8s V %5.1f%%  C %5.1f%%  D %5.1f%%  stop %s" % (
            e["name"], e["dominant"], 100 * s["viscous"], 100 * s["coulomb"], 100 * s["drag"],
            ", ".join("none" if x["stop_time_s"] is None else "%.2f s at %.3f deg" % (
                x["stop_time_s"], x["rest_angle_deg"]) for x in e["sessions"])))


if __name__ == "__main__":
    main()
