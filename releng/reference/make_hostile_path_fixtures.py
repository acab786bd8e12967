#!/usr/bin/env python3
"""Writes the invented fixtures of the hostile-input corpus's path entries
(bundles/dev.penduline.cli/src/test/resources/hostile/files/paths/): a small test-rig project
with one swing record and two mechanism files, rig.penduline (one session of the record, with its
SHA-256) and dup.penduline (two sessions of that one record, as a hand-edited file could hold).
The record is a free swing of the rig's plate integrated here (classical RK4 of the nonlinear
pendulum with viscous damping, step 1 ms) with seeded Gaussian noise: invented, no measurement.
The corpus's entries make the rest (named pipes, symbolic links, changed and missing records)
in their setup step, since git cannot hold a named pipe. Run from the repository root; the
output is deterministic."""
import hashlib
import math
import os
import random

OUT = "bundles/dev.penduline.cli/src/test/resources/hostile/files/paths/rig"

# the plate: box 6 mm x 300 mm x 300 mm, 1.2 kg, centroid 150 mm below the pivot axis (z)
MASS, LC, G = 1.2, 0.15, 9.80665
J0 = MASS * (0.006 ** 2 + 0.3 ** 2) / 12 + MASS * LC ** 2
VISCOUS = 0.002      # N m s/rad
THETA0 = math.radians(20)
STILL_S, SWING_S, RATE = 0.5, 15.0, 100
NOISE_DEG = 0.02


def accel(x, v):
    return -(MASS * G * LC * math.sin(x) + VISCOUS * v) / J0


def record():
    rng = random.Random(20261202)
    lines = ["# invented test input for the hostile-input corpus: a simulated free swing, not a measurement",
             "time_s,angle_deg"]
    x, v, h = THETA0, 0.0, 0.001
    steps_per_sample = round(1 / (RATE * h))
    for i in range(round((STILL_S + SWING_S) * RATE)):
        t = i / RATE
        if t >= STILL_S:
            for _ in range(steps_per_sample if i > round(STILL_S * RATE) else 0):
                k1x, k1v = v, accel(x, v)
                k2x, k2v = v + h / 2 * k1v, accel(x + h / 2 * k1x, v + h / 2 * k1v)
                k3x, k3v = v + h / 2 * k2v, accel(x + h / 2 * k2x, v + h / 2 * k2v)
                k4x, k4v = v + h * k3v, accel(x + h * k3x, v + h * k3v)
                x += h / 6 * (k1x + 2 * k2x + 2 * k3x + k4x)
                v += h / 6 * (k1v + 2 * k2v + 2 * k3v + k4v)
        lines.append(f"{t:.2f},{math.degrees(x) + rng.gauss(0, NOISE_DEG):.4f}")
    return ("\n".join(lines) + "\n").encode("utf-8")


def session(ident, name, sha):
    return f"""  <session>
    <id>{ident}</id>
    <name>{name}</name>
    <recordPath>records/swing.csv</recordPath>
    <timeColumnName>time_s</timeColumnName>
    <angleColumnName>angle_deg</angleColumnName>
    <angleUnit>deg</angleUnit>
    <contentHash>{sha}</contentHash>
  </session>
"""


def mechanism(name, sessions):
    return f"""<?xml version="1.0" encoding="UTF-8"?>
<penduline:Mechanism xmi:version="2.0" xmlns:xmi="http://www.omg.org/XMI" xmlns:penduline="urn:dev.penduline:mechanism:1">
  <name>{name}</name>
  <description>INVENTED TEST INPUT of the hostile-input corpus, not a real product or measurement.</description>
  <part>
    <id>plate</id>
    <name>plate</name>
    <shape>box</shape>
    <length>0.006</length>
    <width>0.3</width>
    <height>0.3</height>
    <mass>1.2</mass>
    <centroidY>-0.15</centroidY>
  </part>
{"".join(sessions)}</penduline:Mechanism>
"""


def main():
    os.makedirs(os.path.join(OUT, "records"), exist_ok=True)
    data = record()
    with open(os.path.join(OUT, "records", "swing.csv"), "wb") as f:
        f.write(data)
    sha = hashlib.sha256(data).hexdigest()
    with open(os.path.join(OUT, "rig.penduline"), "w") as f:
        f.write(mechanism("Test rig (invented)", [session("swing", "swing", sha)]))
    with open(os.path.join(OUT, "dup.penduline"), "w") as f:
        f.write(mechanism("Test rig, one record twice (invented)",
                          [session("swing", "swing", sha), session("swing-again", "swing again", sha)]))


if __name__ == "__main__":
    main()
