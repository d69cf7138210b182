#!/usr/bin/python3
"""Writes delimited-text files with quoted cells for the org.foldbook.io tests, using Python's own csv
module (the standard library's writer decides what to quote and how), and numpy for the values.

  quoted-header.csv      ',' separated; header cells that hold the separator and a doubled quote, quoted
                         by csv.QUOTE_MINIMAL; numbers unquoted
  quoted-all.csv         ';' separated, decimal comma, every cell quoted (csv.QUOTE_ALL), CRLF line ends
                         (the csv module's default), one '#' comment line first
  quoted-values.f64      the two channels' values as numpy wrote them: raw little-endian float64,
                         frames x channels

The values are synthetic test input (two tones and fixed-seed noise), not measurements. Needs only
Debian's python3-numpy. Run from the repository root:  /usr/bin/python3 releng/reference/csv_files.py
"""
import csv
import os

import numpy as np

OUT = "bundles/org.foldbook.io.tests/resources/org/foldbook/io/csv/pycsv"
os.makedirs(OUT, exist_ok=True)
rng = np.random.default_rng(20261203)

n = 120
fs = 500.0
t = np.arange(n) / fs
x = 0.8 * np.sin(2 * np.pi * 12.0 * t) + 0.001 * rng.standard_normal(n)
y = 0.3 * np.cos(2 * np.pi * 40.0 * t) + 0.001 * rng.standard_normal(n)

with open(os.path.join(OUT, "quoted-header.csv"), "w", encoding="utf-8", newline="") as fh:
    w = csv.writer(fh, delimiter=",", quoting=csv.QUOTE_MINIMAL, lineterminator="\n")
    w.writerow(["time [s]", "accel, x [m/s^2]", 'bridge "B" (mV)'])
    for row in zip(t, x, y):
        w.writerow([repr(float(v)) for v in row])

with open(os.path.join(OUT, "quoted-all.csv"), "w", encoding="utf-8", newline="") as fh:
    fh.write("# written by releng/reference/csv_files.py with Python's csv module\r\n")
    w = csv.writer(fh, delimiter=";", quoting=csv.QUOTE_ALL)
    w.writerow(["time (ms)", "force; left [N]", "force; right [N]"])
    for row in zip(t * 1000.0, x, y):
        w.writerow([repr(float(v)).replace(".", ",") for v in row])

np.ascontiguousarray(np.stack([x, y], axis=1), dtype="<f8").tofile(os.path.join(OUT, "quoted-values.f64"))
print("written to", OUT)
