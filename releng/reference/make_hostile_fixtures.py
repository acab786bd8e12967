#!/usr/bin/env python3
"""Writes the invented fixtures of the hostile-input corpus's edge entries
(bundles/dev.penduline.cli/src/test/resources/hostile/files/edge/). Each file is a small parts
list or a swing record with one deliberate defect; the swing is a plain damped cosine, no
measurement and no product. Run from the repository root; the output is deterministic."""
import math
import os

OUT = "bundles/dev.penduline.cli/src/test/resources/hostile/files/edge"
H = ("name,shape,mass_kg,density_kg_m3,x_mm,y_mm,z_mm,length_mm,width_mm,height_mm,radius_mm,"
     "inner_radius_mm,axis,cutout,quantity,mass_tol_kg,dim_tol_mm")


def path(name):
    return os.path.join(OUT, name)


def parts(name, row, comment=True):
    with open(path(name), "w") as f:
        f.write(("# invented test input for the hostile-input corpus\n" if comment else "") + H + "\n" + row + "\n")


def rec(name, hdr, rows):
    with open(path(name), "w") as f:
        f.write("# invented test input for the hostile-input corpus\n" + hdr + "\n" + "".join(rows))


def main():
    os.makedirs(OUT, exist_ok=True)
    parts("onaxis.csv", "rod,rod,1,,0,0,0,500,,,,,z,false,1,,", comment=False)
    parts("y-huge.csv", "big,box,1e300,,0,-1e200,0,6,500,600,,,,false,1,,", comment=False)
    parts("length-huge.csv", "big,box,1,,0,-100,0,6e160,500,600,,,,false,1,,", comment=False)
    parts("mass-huge.csv", "big,box,1e200,,0,-100,0,6,500,600,,,,false,1,,", comment=False)
    parts("qty.csv", "m,box,1,,0,-100,0,6,500,600,,,,false,1e12,,", comment=False)
    parts("qty2.csv", "m,box,1,,0,-100,0,6,500,600,,,,false,2.5,,", comment=False)
    parts("ctl.csv", "m\x07bell,box,1,,0,-100,0,6,500,600,,,,false,1,,", comment=False)
    parts("centroid-on-axis.csv", "disc,cylinder,2,,0,0,0,10,,,100,,z,false,1,,")
    parts("nan-mass.csv", "p,box,NaN,,0,-100,0,6,500,600,,,,false,1,,")
    parts("inf-y.csv", "p,box,1,,0,-Infinity,0,6,500,600,,,,false,1,,")
    parts("hex-mass.csv", "p,box,0x10,,0,-100,0,6,500,600,,,,false,1,,")
    parts("neg-mass.csv", "p,box,-1,,0,-100,0,6,500,600,,,,false,1,,")
    parts("zero-length.csv", "p,box,1,,0,-100,0,0,500,600,,,,false,1,,")
    parts("density-huge.csv", "p,box,,1e9,0,-100,0,6,500,600,,,,false,1,,")
    parts("qty-zero.csv", "p,box,1,,0,-100,0,6,500,600,,,,false,0,,")
    parts("esc-name.csv", "p\x1b[31mred,box,1,,0,-100,0,6,500,600,,,,false,1,,")
    parts("good.csv", "plate,box,1.2,,0,-150,0,6,300,300,,,,false,1,,")

    t = [i / 200 for i in range(2400)]
    w = 2 * math.pi / 0.7

    def decay(x):
        return 15 * math.exp(-0.15 * x) * math.cos(w * x)

    swing = [f"{x:.4f},{(decay(x) if x >= 0 else 15):.5f}\n" for x in t]
    rec("swing.csv", "time_s,angle_deg", swing)
    rec("grow.csv", "time_s,angle_deg", [f"{x:.4f},{10 * math.exp(0.1 * x) * math.cos(w * x):.5f}\n" for x in t])
    rec("span.csv", "time_s,angle_deg", [f"{x:.4f},{400 * math.exp(-0.1 * x) * math.cos(w * x):.5f}\n" for x in t])
    rec("tiny-step.csv", "time_s,angle_deg", [f"{x * 1e-9!r},{decay(x):.5f}\n" for x in t])
    rec("ms-as-s.csv", "time_s,angle_deg", [f"{x * 1e-3!r},{decay(x):.5f}\n" for x in t])
    rec("dup-angle.csv", "time_s,angle_deg,angle_deg", [f"{x:.4f},{decay(x):.5f},0\n" for x in t])
    rec("ctl-header.csv", "time_s,ang\x07le_deg", swing)
    rec("nan-angle.csv", "time_s,angle_deg", swing[:100] + ["0.5000,NaN\n"] + swing[101:])
    rec("inf-time.csv", "time_s,angle_deg", swing[:100] + ["Infinity,1.0\n"] + swing[101:])
    rec("backwards.csv", "time_s,angle_deg", swing[:100] + ["0.1000,1.0\n"] + swing[101:])
    rec("flat.csv", "time_s,angle_deg", [f"{x:.4f},3.0\n" for x in t])
    rec("text-cell.csv", "time_s,angle_deg", swing[:50] + ["0.2500,abc\n"] + swing[51:])
    rec("two-rows.csv", "time_s,angle_deg", swing[:2])
    rec("header-only.csv", "time_s,angle_deg", [])
    open(path("empty.csv"), "w").write("")
    open(path("bom-only.csv"), "wb").write(b"\xef\xbb\xbf")
    open(path("latin1.csv"), "wb").write(("# Messung Gr\xfc\xdfe\ntime_s,angle_deg\n" + "".join(swing)).encode("latin-1"))
    open(path("utf16.csv"), "wb").write(("time_s,angle_deg\n" + "".join(swing[:300])).encode("utf-16"))
    open(path("nul-bytes.csv"), "wb").write(b"time_s,angle_deg\n0.0,1\x00\x00\x00\n" + "".join(swing).encode())
    open(path("binary.csv"), "wb").write(bytes(range(256)) * 20)
    open(path("crlf.csv"), "w", newline="").write("time_s,angle_deg\r\n" + "".join(s.replace("\n", "\r\n") for s in swing))
    rec("quoted.csv", '"time_s","angle_deg"', ['"' + s.strip().replace(",", '","') + '"\n' for s in swing])
    rec("unclosed-quote.csv", "time_s,angle_deg", swing[:30] + ['"0.15,1.0\n'] + swing[31:])
    rec("semicolon-comma.csv", "time_s;angle_deg", [s.replace(",", ";").replace(".", ",") for s in swing])


if __name__ == "__main__":
    main()
