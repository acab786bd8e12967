#!/usr/bin/env python3
"""Writes the regression inputs of the fuzzers' findings
(bundles/dev.penduline.cli/src/test/resources/hostile/files/fuzz/), each a small invented parts
list, swing record or mechanism file reduced from what Jazzer found (releng/fuzz,
releng/scripts/fuzz.sh); the hostile corpus runs them through the command line
(hostile/entries-fuzz.txt) and the fuzz tests replay them as seeds. Run from the repository
root; the output is deterministic."""
import math
import os

OUT = "bundles/dev.penduline.cli/src/test/resources/hostile/files/fuzz"
PARTS = "name,shape,mass_kg,x_m,y_m,z_m,length_m,axis\n"
HEAD = '<?xml version="1.0" encoding="UTF-8"?>\n'
ROOT = ('<penduline:Mechanism xmi:version="2.0" xmlns:xmi="http://www.omg.org/XMI"'
        ' xmlns:penduline="urn:dev.penduline:mechanism:1">\n')
END = "</penduline:Mechanism>\n"


def write(name, data):
    with open(os.path.join(OUT, name), "wb") as f:
        f.write(data if isinstance(data, bytes) else data.encode("utf-8"))


def rows(n=40):
    """An invented decaying 10-degree swing at 100 Hz, comma-separated."""
    return "".join("%.2f,%.4f\n" % (i * 0.01, 10 * math.exp(-0.005 * i) * math.cos(0.06 * i)) for i in range(n))


def main():
    os.makedirs(OUT, exist_ok=True)
    comment = "# invented test input: a fuzzing finding, reduced\n"
    # parts lists: a Latin-1 name on line 3 (was a raw MalformedInputException), UTF-16 (was a
    # control-character message about a column name), a NUL in the header (binary)
    write("parts-latin1.csv", (comment + PARTS + "lid,point,1,0,-0.2,0,,\n").encode("utf-8")
          + b"T\xfcrgriff,point,0.1,0,-0.3,0,,\n")
    write("parts-utf16.csv", (PARTS + "lid,point,1,0,-0.2,0,,\n").encode("utf-16"))
    write("parts-binary.csv", b"\x00\x01\x02\x03name,shape\n\x04\x05\n")
    # parts list: an unknown column whose name holds ESC, echoed raw in the warning
    write("parts-esc-column.csv", comment + 'name,shape,mass_kg,x_m,y_m,z_m,"note\x1b[2J"\n'
          + "lid,point,1,0,-0.2,0,x\n")
    # swing records: a Latin-1 degree sign in the header, a Latin-1 byte in a data line, UTF-16
    # without a byte-order mark, ESC and NUL echoed from cells
    write("record-latin1-header.csv", (comment + "time_s,angle (").encode("utf-8") + b"\xb0)\n"
          + rows().encode("utf-8"))
    write("record-latin1-row.csv", (comment + "time_s,angle_deg\n" + rows(20)).encode("utf-8")
          + b"0.20,1\xe9\n" + rows(40)[len(rows(20)):].encode("utf-8"))
    write("record-utf16-nobom.csv", ("time_s,angle_deg\n" + rows()).encode("utf-16-le"))
    write("record-esc-cell.csv", comment + "time_s,angle_deg\n0.00,1\n0.01,p\x1b[31mred\n")
    write("record-nul-header.csv", b"\x00\x01\x02\x03\x04\x05\x06\x07\x08\n" + rows().encode("utf-8"))
    # mechanism files: not UTF-8 at the start and in the middle (messages named the parser's
    # MalformedByteSequenceException), and a line feed and a C1 control echoed in a bad value
    write("mech-binary-start.penduline", b"\xff\xfe\x00\x01" + (HEAD + ROOT + END).encode("utf-8"))
    write("mech-latin1.penduline", (HEAD + ROOT + "  <name>Trappe d").encode("utf-8") + b"\xe9gag\xe9e</name>\n"
          + END.encode("utf-8"))
    write("mech-control-value.penduline", HEAD + ROOT + "  <part>\n    <id>lid</id>\n"
          + "    <mass>heavy\n\u009b31m</mass>\n  </part>\n" + END)
    write("mech-not-xml.penduline", "junk before the prolog\n")
    # mechanism file that loads: a part's name with a tab and a C1 control (both legal in XML 1.0)
    # and a negative mass; the validation message echoed the name raw
    write("mech-name-controls.penduline", HEAD + ROOT + "  <name>lid</name>\n  <part>\n    <id>plate</id>\n"
          + "    <name>pl\tate\u009b2J</name>\n    <shape>box</shape>\n    <length>0.006</length>\n"
          + "    <width>0.5</width>\n    <height>0.6</height>\n    <mass>-4.86</mass>\n"
          + "    <centroidY>-0.27</centroidY>\n  </part>\n" + END)


if __name__ == "__main__":
    main()
