#!/usr/bin/python3
"""sweep_vectors.py - reference vectors for the stepped-rate sweep tests.

Runs Foldbook's own numpy/scipy reference pipeline (sweep_reference.py beside this script; the protocol is
described there) on a small case and stores what the Java tests compare against:

  peer_signal.f64    the synthetic recording (tones + numpy PCG64 noise, seed 12345), raw little-endian
                     float64, 100000 S/s, 16384 samples  (clearly synthetic input)
  peer_grid.txt      the rate grid of 16 requested rates, 'index up down fs' lines
  peer_details.json  per-rate peak lists of mode a (bare Kaiser-sinc sampler, W=16, beta=10) and mode b
                     (scipy.signal.resample_poly defaults), Welch PSD + find_peaks (10 dB)
  peer_run.json      what produced them (Python, numpy, scipy versions, parameters) and a tone check
  peer_grid_100.txt  the default grid (100 requested rates, 100000..2000 S/s) for the ladder test

("peer" in the file names: the reference the Java sweep is checked against, side by side.)
Needs only Debian's python3-numpy and python3-scipy; nothing outside the repository.
Run from anywhere:  /usr/bin/python3 releng/reference/sweep_vectors.py
"""
import json
import os
import platform
import sys

import numpy as np
import scipy

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
import sweep_reference as ref  # noqa: E402  (beside this script)

REPO = os.path.dirname(os.path.dirname(HERE))
OUT = os.path.join(REPO, "bundles", "org.foldbook.sweep.tests", "resources", "reference", "sweep")

SAMPLES = 16384
RATES = 16


def write_grid(path, grid):
    with open(path, "w", encoding="ascii", newline="\n") as fh:
        for index, up, down, fs in grid:
            fh.write("%d %d %d %.9f\n" % (index, up, down, fs))


def tone_check(details, bare):
    """How many tone positions have a peak within 1.5 bins: every alias (bare), tones below 0.45 fs (filtered)."""
    found = expected = 0
    for rate in details:
        fs, bin_hz = rate["fs"], rate["fs"] / rate["nperseg"]
        for f, _, _ in ref.TONES:
            where = abs(f - fs * round(f / fs)) if bare else (f if f < 0.45 * fs else None)
            if where is None:
                continue
            expected += 1
            found += any(abs(p - where) <= 1.5 * bin_hz for p in rate["freqs"])
    return {"found": found, "expected": expected}


def main():
    os.makedirs(OUT, exist_ok=True)
    x = ref.recording(SAMPLES)
    np.ascontiguousarray(x, dtype="<f8").tofile(os.path.join(OUT, "peer_signal.f64"))
    grid = ref.rate_grid(RATES)
    write_grid(os.path.join(OUT, "peer_grid.txt"), grid)
    details = {"a": ref.sweep(x, grid, ref.bare_sampler), "b": ref.sweep(x, grid, ref.filtered_resampler)}
    with open(os.path.join(OUT, "peer_details.json"), "w", encoding="ascii", newline="\n") as fh:
        json.dump(details, fh)
    run = {"tool": "releng/reference/sweep_vectors.py",
           "host": {"python": platform.python_version(), "numpy": np.__version__, "scipy": scipy.__version__},
           "params": {"samples": SAMPLES, "fs0": ref.FS0, "seed": ref.SEED, "rates": RATES, "max_den": ref.MAX_DEN,
                      "half_taps": ref.HALF_TAPS, "kaiser_beta": ref.KAISER_BETA, "nperseg": ref.NPERSEG,
                      "prominence_db": ref.PROMINENCE_DB},
           "tone_check": {"a": tone_check(details["a"], True), "b": tone_check(details["b"], False)}}
    with open(os.path.join(OUT, "peer_run.json"), "w", encoding="ascii", newline="\n") as fh:
        json.dump(run, fh)
        fh.write("\n")
    write_grid(os.path.join(OUT, "peer_grid_100.txt"), ref.rate_grid(100))
    print("wrote", OUT)


if __name__ == "__main__":
    main()
