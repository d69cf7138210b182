#!/usr/bin/python3
"""Writes the CSV and HDF5 recordings the org.foldbook.cli tests sweep (`foldbook sweep --input`) and the
org.foldbook.channel tests read as notebook channels (the workbench's path); the same files go to both.

Written by tools outside Foldbook: the CSV by Python's csv module (a time column in seconds, then two
value columns, numbers in Python's shortest round-trip repr), the HDF5 file by Debian's python3-h5py (one
float64 dataset with a sample_rate attribute). Both hold the same clearly synthetic signal: a 3000 Hz
tone (amplitude 0.5) and a 700 Hz tone (0.2) at 8000 S/s with fixed-seed noise (std 1e-4); the CSV's second
value column holds a 1500 Hz tone. numpy's own look at the content goes into expected.properties: the
frequency of the largest bin of a Hann-windowed FFT of the first channel (the tests compare the sweep's
source peak with it).

Run from the repository root with Debian's interpreter:  /usr/bin/python3 releng/reference/cli_recordings.py
"""
import csv
import os

import h5py
import numpy as np

OUT = "bundles/org.foldbook.cli.tests/resources/org/foldbook/cli/recordings"
os.makedirs(OUT, exist_ok=True)
rng = np.random.default_rng(20261203)

fs = 8000.0
n = 8192
t = np.arange(n) / fs
x = 0.5 * np.sin(2 * np.pi * 3000.0 * t + 0.3) + 0.2 * np.sin(2 * np.pi * 700.0 * t) + 1e-4 * rng.standard_normal(n)
y = 0.4 * np.sin(2 * np.pi * 1500.0 * t) + 1e-4 * rng.standard_normal(n)

with open(os.path.join(OUT, "two-tones.csv"), "w", encoding="utf-8", newline="") as fh:
    w = csv.writer(fh, delimiter=",", quoting=csv.QUOTE_MINIMAL, lineterminator="\n")
    w.writerow(["time [s]", "accel [m/s^2]", "reference [V]"])
    for row in zip(t, x, y):
        w.writerow([repr(float(v)) for v in row])

with h5py.File(os.path.join(OUT, "two-tones.h5"), "w") as f:
    d = f.create_dataset("accel", data=x)
    d.attrs["sample_rate"] = fs
    d.attrs["units"] = "m/s^2"

spectrum = np.abs(np.fft.rfft(x * np.hanning(n)))
peak_hz = float(np.argmax(spectrum)) * fs / n
with open(os.path.join(OUT, "expected.properties"), "w", encoding="utf-8") as fh:
    fh.write("# numpy %s, h5py %s: largest bin of a Hann-windowed FFT of the first channel\n"
             % (np.__version__, h5py.__version__))
    fh.write("rate=%r\n" % fs)
    fh.write("frames=%d\n" % n)
    fh.write("largestPeakHz=%r\n" % peak_hz)
# the channel tests read the same two recordings through a notebook (copies, byte for byte)
import shutil
CHANNEL_OUT = "bundles/org.foldbook.channel.tests/resources/org/foldbook/channel/recordings"
os.makedirs(CHANNEL_OUT, exist_ok=True)
for name in ("two-tones.csv", "two-tones.h5"):
    shutil.copyfile(os.path.join(OUT, name), os.path.join(CHANNEL_OUT, name))
print("written to", OUT, "and", CHANNEL_OUT)
