#!/usr/bin/python3
"""Reference vectors for Foldbook's filter models, computed by scipy.signal (Debian python3-scipy).

Writes small CSV files into bundles/org.foldbook.dsp.tests/resources/reference/filters/:
  analog_cases.csv     one row per analog design (family, order, ripple, stopband, Bessel norm, cutoff)
  analog_response.csv  H(j*2*pi*f) of each design from scipy.signal.freqs_zpk (real, imaginary part)
  digital_cases.csv    one row per digital design at a sample rate (bilinear, pre-warped at the cutoff)
  digital_response.csv |H(e^jw)| from scipy.signal.sosfreqz
  digital_output.csv   scipy.signal.sosfilt of a synthetic test signal, from rest and from the
                       steady state sosfilt_zi(sos)*x[0]
  exact_cases.csv      chains for the exact (frequency-domain) modelled mode at fs0 = 100 kS/s:
                       low-passes at fs0/fc = 2..200, a sensor resonance, a conditioner band-pass
  exact_response.csv   H(j*2*pi*f) of each over 0..0.49*fs0 (freqs_zpk; scipy.signal.freqs for the
                       resonance, written as b/a like a data sheet gives it)

The test signal is SYNTHETIC (made here by formula, not a recording):
  x[n] = sin(2*pi*0.013*n) + 0.5*sin(2*pi*0.31*n + 0.3) + 0.7*(n >= 40) + 0.25, n = 0..119

Run:  /usr/bin/python3 releng/reference/filter_vectors.py   (from the repository root)
"""
import csv
import os
import sys

import numpy as np
import scipy
from scipy import signal

OUT = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "..",
                   "bundles", "org.foldbook.dsp.tests", "resources", "reference", "filters")

CUTOFF_HZ = 1000.0

# family, order, ripple dB, stopband dB, bessel norm
ANALOG = []
for n in (1, 2, 3, 4, 5, 8, 12, 24):
    ANALOG.append(("butterworth", n, 0, 0, ""))
for norm in ("delay", "phase", "mag"):
    for n in (1, 2, 3, 4, 5, 6, 8, 10, 12, 16):
        ANALOG.append(("bessel", n, 0, 0, norm))
for n, rp in ((1, 0.5), (2, 1.0), (3, 0.5), (4, 0.1), (5, 1.0), (6, 3.0), (9, 0.25), (16, 0.5)):
    ANALOG.append(("chebyshev1", n, rp, 0, ""))
for n, rp, rs in ((1, 1.0, 40), (2, 0.5, 40), (3, 0.1, 60), (4, 1.0, 80), (5, 0.5, 60), (6, 0.1, 90), (8, 0.05, 100),
                  (10, 0.5, 120), (12, 0.1, 140)):
    ANALOG.append(("elliptic", n, rp, rs, ""))

# family, order, ripple, stopband, norm, cutoff Hz, sample rate Hz
DIGITAL = [
    ("butterworth", 1, 0, 0, "", 1000.0, 10000.0),
    ("butterworth", 4, 0, 0, "", 1000.0, 10000.0),
    ("butterworth", 8, 0, 0, "", 2000.0, 48000.0),
    ("bessel", 4, 0, 0, "mag", 1000.0, 8000.0),
    ("bessel", 6, 0, 0, "delay", 500.0, 20000.0),
    ("chebyshev1", 5, 1.0, 0, "", 1000.0, 20000.0),
    ("elliptic", 6, 0.5, 60, "", 4000.0, 48000.0),
    ("elliptic", 5, 0.1, 70, "", 9000.0, 25600.0),
    ("elliptic", 10, 0.1, 100, "", 3000.0, 48000.0),
    ("chebyshev1", 12, 0.5, 0, "", 1500.0, 30000.0),
    ("butterworth", 14, 0, 0, "", 4000.0, 51200.0),
]


def design(family, n, rp, rs, norm, wn, fs=None, output="zpk"):
    kw = dict(analog=True) if fs is None else dict(fs=fs)
    if family == "butterworth":
        return signal.butter(n, wn, output=output, **kw)
    if family == "bessel":
        return signal.bessel(n, wn, norm=norm, output=output, **kw)
    if family == "chebyshev1":
        return signal.cheby1(n, rp, wn, output=output, **kw)
    if family == "elliptic":
        return signal.ellip(n, rp, rs, wn, output=output, **kw)
    raise ValueError(family)


def test_signal():
    n = np.arange(120)
    return (np.sin(2 * np.pi * 0.013 * n) + 0.5 * np.sin(2 * np.pi * 0.31 * n + 0.3)
            + 0.7 * (n >= 40) + 0.25)


def g(v):
    return repr(float(v))


def main():
    os.makedirs(OUT, exist_ok=True)
    head = "# scipy %s numpy %s, written by releng/reference/filter_vectors.py" % (scipy.__version__, np.__version__)

    freqs = np.concatenate([CUTOFF_HZ * np.logspace(-2, 2, 25), [CUTOFF_HZ, 0.0]])
    with open(os.path.join(OUT, "analog_cases.csv"), "w", newline="") as fc, \
         open(os.path.join(OUT, "analog_response.csv"), "w", newline="") as fr:
        fc.write(head + "\n")
        fr.write(head + "\n")
        wc, wr = csv.writer(fc, lineterminator="\n"), csv.writer(fr, lineterminator="\n")
        wc.writerow(["case", "family", "order", "ripple_db", "stopband_db", "norm", "cutoff_hz"])
        wr.writerow(["case", "f_hz", "re", "im"])
        for i, (fam, n, rp, rs, norm) in enumerate(ANALOG):
            wc.writerow([i, fam, n, rp, rs, norm, CUTOFF_HZ])
            z, p, k = design(fam, n, rp, rs, norm, 2 * np.pi * CUTOFF_HZ, output="zpk")
            _, h = signal.freqs_zpk(z, p, k, worN=2 * np.pi * freqs)
            for f, hv in zip(freqs, h):
                wr.writerow([i, g(f), g(hv.real), g(hv.imag)])

    x = test_signal()
    with open(os.path.join(OUT, "digital_cases.csv"), "w", newline="") as fc, \
         open(os.path.join(OUT, "digital_response.csv"), "w", newline="") as fr, \
         open(os.path.join(OUT, "digital_output.csv"), "w", newline="") as fo:
        for f_ in (fc, fr, fo):
            f_.write(head + "\n")
        wc = csv.writer(fc, lineterminator="\n")
        wr = csv.writer(fr, lineterminator="\n")
        wo = csv.writer(fo, lineterminator="\n")
        wc.writerow(["case", "family", "order", "ripple_db", "stopband_db", "norm", "cutoff_hz", "fs_hz"])
        wr.writerow(["case", "f_hz", "magnitude"])
        wo.writerow(["case", "n", "x", "y_from_rest", "y_from_steady_state"])
        for i, (fam, n, rp, rs, norm, fcut, fs) in enumerate(DIGITAL):
            wc.writerow([i, fam, n, rp, rs, norm, fcut, fs])
            sos = design(fam, n, rp, rs, norm, fcut, fs=fs, output="sos")
            fgrid = np.concatenate([np.linspace(0, 0.5 * fs, 41)[:-1], [fcut, 0.499 * fs]])
            _, h = signal.sosfreqz(sos, worN=fgrid, fs=fs)
            for f, hv in zip(fgrid, h):
                wr.writerow([i, g(f), g(abs(hv))])
            y0 = signal.sosfilt(sos, x)
            y1, _ = signal.sosfilt(sos, x, zi=signal.sosfilt_zi(sos) * x[0])
            for k in range(len(x)):
                wo.writerow([i, k, g(x[k]), g(y0[k]), g(y1[k])])
    write_exact(head)
    print("wrote", os.path.normpath(OUT), file=sys.stderr)


FS0 = 100000.0


def exact_cases():
    """(kind, order, ripple, stopband, norm, a, b): a = fs0/fc for low-passes, fn/Q, or fh/fl in Hz."""
    cases = []
    for n in (1, 4, 8):
        for r in (2, 5, 10, 50, 200):
            cases.append(("butterworth", n, 0, 0, "", r, 0))
    for r in (2, 10, 200):
        cases.append(("bessel", 4, 0, 0, "mag", r, 0))
        cases.append(("chebyshev1", 6, 0.5, 0, "", r, 0))
        cases.append(("elliptic", 8, 0.1, 80, "", r, 0))
    cases.append(("resonance", 2, 0, 0, "", 20000.0, 10.0))
    cases.append(("resonance", 2, 0, 0, "", 40000.0, 25.0))
    cases.append(("bandpass", 2, 0, 0, "", 10.0, 20000.0))
    return cases


def exact_grid():
    f = np.concatenate([np.linspace(0, 0.49 * FS0, 50), np.logspace(1, np.log10(0.49 * FS0), 20),
                        FS0 * np.array([0.45, 0.47, 0.48, 0.485])])
    return np.unique(f)


def exact_response(case, f):
    kind, n, rp, rs, norm, a, b = case
    w = 2 * np.pi * f
    if kind == "resonance":
        wn = 2 * np.pi * a
        _, h = signal.freqs([wn * wn], [1.0, wn / b, wn * wn], worN=w)
        return h
    if kind == "bandpass":
        wh, wl = 2 * np.pi * a, 2 * np.pi * b
        _, h = signal.freqs_zpk([0.0], [-wh, -wl], wl, worN=w)
        return h
    z, p, k = design(kind, n, rp, rs, norm, 2 * np.pi * FS0 / a, output="zpk")
    _, h = signal.freqs_zpk(z, p, k, worN=w)
    return h


def write_exact(head):
    f = exact_grid()
    with open(os.path.join(OUT, "exact_cases.csv"), "w", newline="") as fc, \
         open(os.path.join(OUT, "exact_response.csv"), "w", newline="") as fr:
        fc.write(head + " (fs0 = %r Hz)\n" % FS0)
        fr.write(head + "\n")
        wc, wr = csv.writer(fc, lineterminator="\n"), csv.writer(fr, lineterminator="\n")
        wc.writerow(["case", "kind", "order", "ripple_db", "stopband_db", "norm", "a", "b"])
        wr.writerow(["case", "f_hz", "re", "im"])
        for i, c in enumerate(exact_cases()):
            wc.writerow([i] + list(c))
            for fv, hv in zip(f, exact_response(c, f)):
                wr.writerow([i, g(fv), g(hv.real), g(hv.imag)])


if __name__ == "__main__":
    main()
