#!/usr/bin/python3
"""Writes the HDF5 and delimited-text reference files of the org.foldbook.io tests.

HDF5 files are written by Debian's python3-h5py; each dataset's values are also dumped by numpy as raw
little-endian float64 (frames x channels, row-major), which the tests compare with what our reader returns.
Delimited text is written in both number conventions (dot decimal with ',' separator; comma decimal with
';' separator, as spreadsheet exports in many European locales do), with numpy's shortest round-trip
repr so the parsed doubles must match the float64 dump exactly. The jitter/gap file comes with a
properties file of the timing figures computed here by numpy (median interval, jitter, gaps).

Run from the repository root with Debian's interpreter:  /usr/bin/python3 releng/reference/io_files.py
All signals are synthetic test input (tones with a fixed-seed noise), not measurements.
"""
import os

import h5py
import numpy as np

ROOT = "bundles/org.foldbook.io.tests/resources/org/foldbook/io"
H5 = os.path.join(ROOT, "hdf5", "h5py")
CSV = os.path.join(ROOT, "csv", "numpy")
os.makedirs(H5, exist_ok=True)
os.makedirs(CSV, exist_ok=True)
rng = np.random.default_rng(20261201)


def tones(n, fs, freqs, amp=0.7):
    t = np.arange(n) / fs
    return np.stack([amp * np.sin(2 * np.pi * f * t) for f in freqs], axis=1)


def dump(path, frames_by_channels):
    np.ascontiguousarray(frames_by_channels, dtype="<f8").tofile(path)


# --- HDF5 -------------------------------------------------------------------------------------------
x = tones(1000, 2000.0, [50.0])[:, 0] + 0.01 * rng.standard_normal(1000)
with h5py.File(os.path.join(H5, "accel-1d.h5"), "w") as f:
    d = f.create_dataset("accel", data=x)
    d.attrs["sample_rate"] = 2000.0
    d.attrs["units"] = "m/s^2"
dump(os.path.join(H5, "accel-1d.f64"), x.reshape(-1, 1))

v = tones(500, 10000.0, [100.0, 250.0, 1200.0]).astype(np.float32)
with h5py.File(os.path.join(H5, "daq-2d.h5"), "w") as f:
    g = f.create_group("daq")
    d = g.create_dataset("voltages", data=v)
    d.attrs["sample_rate"] = np.int32(10000)
    d.attrs["units"] = np.array([b"V", b"V", b"mV"])
    d.attrs["channel_names"] = np.array([b"bridge", b"reference", b"preamp"])
    f.create_dataset("notes_count", data=np.int64(3))
dump(os.path.join(H5, "daq-2d.f64"), v.astype(np.float64))

counts = np.round(tones(3000, 10000.0, [440.0], amp=20000.0)[:, 0]).astype(np.int16)
with h5py.File(os.path.join(H5, "counts-chunked.h5"), "w") as f:
    d = f.create_dataset("counts", data=counts, chunks=(256,), compression="gzip")
    d.attrs["sample_interval"] = 1e-4
dump(os.path.join(H5, "counts-chunked.f64"), counts.astype(np.float64).reshape(-1, 1))

planes = np.round(tones(400, 1000.0, [10.0, 30.0], amp=1e6)).astype(np.int32).T.copy()  # (2, 400)
with h5py.File(os.path.join(H5, "channels-first.h5"), "w") as f:
    d = f.create_dataset("emg", data=planes)
    d.attrs["sample_rate"] = 1000.0
    d.attrs["channel_axis"] = np.int32(0)
    d.attrs["units"] = "uV"
dump(os.path.join(H5, "channels-first.f64"), planes.T.astype(np.float64))

# a hard link that makes the group graph cyclic (/loop/again is /loop itself), one dataset inside
with h5py.File(os.path.join(H5, "cyclic-links.h5"), "w") as f:
    g = f.create_group("loop")
    d = g.create_dataset("pressure", data=x[:100])
    d.attrs["sample_rate"] = 2000.0
    g["again"] = g
dump(os.path.join(H5, "cyclic-links.f64"), x[:100].reshape(-1, 1))

# --- delimited text -----------------------------------------------------------------------------------
def rows_to_text(path, header, cols, sep, decimal, fmt=repr):
    with open(path, "w", encoding="utf-8", newline="\n") as out:
        if header is not None:
            out.write(sep.join(header) + "\n")
        for row in zip(*cols):
            cells = []
            for value in row:
                if value is None or (isinstance(value, float) and np.isnan(value)):
                    cells.append("")
                else:
                    s = fmt(float(value))
                    cells.append(s.replace(".", decimal) if decimal != "." else s)
            out.write(sep.join(cells) + "\n")


n = 200
fs = 1000.0
t = np.arange(n) / fs
sig = tones(n, fs, [37.0, 120.0]) + 0.001 * rng.standard_normal((n, 2))
rows_to_text(os.path.join(CSV, "dot-comma.csv"), ["time [s]", "accel [m/s^2]", "v (V)"],
             [t, sig[:, 0], sig[:, 1]], ",", ".")
rows_to_text(os.path.join(CSV, "comma-semicolon.csv"), ["time (ms)", "force [N]", "angle [deg]"],
             [t * 1000.0, sig[:, 0], sig[:, 1]], ";", ",")
dump(os.path.join(CSV, "signals-200x2.f64"), sig)

rows_to_text(os.path.join(CSV, "no-header.tsv"), None, [sig[:, 0], sig[:, 1]], "\t", ".")

holes = sig.copy()
holes[5, 0] = np.nan
holes[17, 1] = np.nan
holes[18, 1] = np.nan
rows_to_text(os.path.join(CSV, "missing-cells.csv"), ["t", "a", "b"], [t, holes[:, 0], holes[:, 1]], ",", ".")
dump(os.path.join(CSV, "missing-cells.f64"), holes)

# irregular clock: 500 rows at nominal 2 ms with +-20 us uniform jitter, and two gaps (rows dropped)
nominal = 0.002
ideal = np.arange(520) * nominal
jit = rng.uniform(-20e-6, 20e-6, size=ideal.size)
stamps = ideal + jit
keep = np.ones(ideal.size, dtype=bool)
keep[100:103] = False        # 3 samples missing after row 100
keep[300:310] = False        # 10 samples missing
stamps = stamps[keep]
vals = np.sin(2 * np.pi * 5.0 * stamps)
with open(os.path.join(CSV, "jitter-gaps.csv"), "w", encoding="utf-8", newline="\n") as out:
    out.write("time [s],value\n")
    for a, b in zip(stamps, vals):
        out.write("%.7f,%s\n" % (a, repr(float(b))))
# timing figures recomputed from the stamps as written (7 decimals)
written = np.array([float("%.7f" % a) for a in stamps])
dt = np.diff(written)
med = float(np.median(dt[:1001]))
is_gap = dt > 1.5 * med
dev = dt[~is_gap] - med
gap_lines = (np.nonzero(is_gap)[0] + 2 + 1).tolist()  # line of the row after which the gap starts: header=1
with open(os.path.join(CSV, "jitter-gaps.properties"), "w", encoding="utf-8") as out:
    out.write("# computed by releng/reference/io_files.py with numpy %s\n" % np.__version__)
    out.write("rows=%d\n" % written.size)
    out.write("nominalInterval=%r\n" % med)
    out.write("maxJitter=%r\n" % float(np.max(np.abs(dev))))
    out.write("rmsJitter=%r\n" % float(np.sqrt(np.mean(dev ** 2))))
    out.write("gapCount=%d\n" % int(is_gap.sum()))
    out.write("gapLines=%s\n" % ",".join(str(x - 1) for x in gap_lines))
    out.write("gapMissing=%s\n" % ",".join(str(int(round(d / med)) - 1) for d in dt[is_gap]))
    out.write("firstTime=%r\nlastTime=%r\n" % (float(written[0]), float(written[-1])))
dump(os.path.join(CSV, "jitter-gaps.f64"), vals.reshape(-1, 1))
print("written to", H5, "and", CSV)
