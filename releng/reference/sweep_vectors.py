#!/usr/bin/python3
"""sweep_vectors.py - reference vectors for the stepped-rate sweep tests.

Runs the peer implementation (numpy/scipy; ../shared/peer/peer_sweep.py beside the repository, or the
path in $PEER_SWEEP) on a small case and stores what the Java tests compare against:

  peer_signal.f64    the peer's synthetic recording (tones + numpy PCG64 noise, seed 12345),
                     raw little-endian float64, 100000 S/s  (clearly synthetic input)
  peer_grid.txt      the peer's rate grid, 'index up down fs' lines (geomspace 100000..2000,
                     limit_denominator(1000), duplicates dropped)
  peer_details.json  per-rate peak lists of mode a (bare Kaiser-sinc sampler, W=16, beta=10) and
                     mode b (scipy.signal.resample_poly defaults), Welch PSD + find_peaks (10 dB)
  peer_run.json      the peer's one-line JSON summary (versions of numpy/scipy used, tone checks)
  peer_grid_100.txt  the peer's default grid (100 rates, 100000..2000 S/s) for the ladder test

Run with Debian's interpreter:  /usr/bin/python3 releng/reference/sweep_vectors.py
"""
import os
import subprocess
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
REPO = os.path.dirname(os.path.dirname(HERE))
OUT = os.path.join(REPO, "bundles", "org.foldbook.sweep.tests", "resources", "reference", "sweep")
PEER = os.environ.get("PEER_SWEEP",
                      os.path.join(os.path.dirname(REPO), "shared", "peer", "peer_sweep.py"))

SAMPLES = 16384
RATES = 16


def main():
    if not os.path.exists(PEER):
        sys.exit("peer script not found at %s (set PEER_SWEEP)" % PEER)
    os.makedirs(OUT, exist_ok=True)
    cmd = ["/usr/bin/python3", PEER, "--samples", str(SAMPLES), "--rates", str(RATES),
           "--mode", "both", "--repeat", "1",
           "--write-signal", os.path.join(OUT, "peer_signal.f64"),
           "--write-grid", os.path.join(OUT, "peer_grid.txt"),
           "--details", os.path.join(OUT, "peer_details.json")]
    run = subprocess.run(cmd, check=True, capture_output=True, text=True)
    with open(os.path.join(OUT, "peer_run.json"), "w") as fh:
        fh.write(run.stdout)
    subprocess.run(["/usr/bin/python3", PEER, "--samples", "4096", "--rates", "100", "--mode", "a",
                    "--repeat", "1", "--write-grid", os.path.join(OUT, "peer_grid_100.txt")],
                   check=True, capture_output=True)
    print("wrote", OUT)


if __name__ == "__main__":
    main()
