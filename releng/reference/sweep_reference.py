#!/usr/bin/python3
"""sweep_reference.py - Foldbook's own reference pipeline for the stepped-rate sweep, numpy/scipy only.

What it computes (the protocol the Java sweep tests compare against):
  recording   N float64 samples at fs0 = 100000 S/s: five tones a*sin(2*pi*f*t + phase), t = n/fs0,
              (1000 Hz, 1.0, 0.1) (4700, 0.5, 0.7) (13300, 0.3, 1.3) (27100, 0.2, 2.1) (38900, 0.1, 2.9),
              plus white Gaussian noise of std 0.01 from numpy.random.default_rng(12345)
              (clearly synthetic input)
  rate grid   R requested rates geomspace(fs0, 2000, R); each ratio r/fs0 snapped with
              fractions.Fraction(...).limit_denominator(1000) to up/down; repeated ratios dropped
  mode a      bare sampling (no anti-alias filter): output instants t_m = m*down/up input samples,
              m = 0..ceil(N*up/down)-1; y[m] = sum over k = -W+1..W of x[floor(t_m)+k] * h(k - frac(t_m)),
              x = 0 outside, h(tau) = sinc(tau) * I0(beta*sqrt(1-(tau/W)^2)) / I0(beta), W = 16, beta = 10;
              up = 1 is x[::down] (the kernel is a delta at whole samples)
  mode b      scipy.signal.resample_poly(x, up, down) with its default Kaiser (beta 5) design; 1/1 a copy
  spectrum    scipy.signal.welch(y, fs, window='hann', nperseg = min(4096, largest power of two <= len(y)),
              noverlap = nperseg/2, detrend='constant', scaling='density')
  peaks       scipy.signal.find_peaks on 10*log10(max(Pxx, 1e-300)) with prominence 10 dB; bin centres and
              their levels (dB re 1 unit^2/Hz)
"""
import fractions
import math

import numpy as np
from scipy import signal, special

FS0 = 100000.0
TONES = ((1000.0, 1.0, 0.1), (4700.0, 0.5, 0.7), (13300.0, 0.3, 1.3), (27100.0, 0.2, 2.1), (38900.0, 0.1, 2.9))
SEED = 12345
NOISE_STD = 0.01
HALF_TAPS = 16
KAISER_BETA = 10.0
MAX_DEN = 1000
NPERSEG = 4096
PROMINENCE_DB = 10.0


def recording(n):
    t = np.arange(n) / FS0
    x = np.zeros(n)
    for f, a, phase in TONES:
        x += a * np.sin(2 * np.pi * f * t + phase)
    return x + NOISE_STD * np.random.default_rng(SEED).standard_normal(n)


def rate_grid(rates, fs_min=2000.0):
    """[(index, up, down, fs)] for the requested geometric ladder, repeated ratios dropped."""
    grid = []
    seen = set()
    for r in np.geomspace(FS0, fs_min, rates):
        q = fractions.Fraction(float(r) / FS0).limit_denominator(MAX_DEN)
        if q in seen:
            continue
        seen.add(q)
        grid.append((len(grid), q.numerator, q.denominator, FS0 * q.numerator / q.denominator))
    return grid


def bare_sampler(x, up, down):
    """Mode a: the windowed-sinc value of x at every output instant."""
    n = x.size
    m_out = -(-n * up // down)
    if up == 1:
        return x[::down][:m_out].copy()
    w = HALF_TAPS
    k = np.arange(-w + 1, w + 1)
    padded = np.concatenate([np.zeros(w), x, np.zeros(w + 1)])
    y = np.empty(m_out)
    m = np.arange(m_out, dtype=np.int64)
    whole = (m * down) // up
    phase = (m * down) % up
    for p in np.unique(phase):
        sel = np.nonzero(phase == p)[0]
        tau = k - p / up
        h = np.sinc(tau) * special.i0(KAISER_BETA * np.sqrt(np.clip(1 - (tau / w) ** 2, 0, None))) \
            / special.i0(KAISER_BETA)
        idx = whole[sel][:, None] + k[None, :] + w
        y[sel] = padded[idx] @ h
    return y


def filtered_resampler(x, up, down):
    """Mode b: scipy's polyphase resampler with its defaults."""
    if up == 1 and down == 1:
        return x.copy()
    return signal.resample_poly(x, up, down)


def peaks(y, fs):
    nperseg = min(NPERSEG, 1 << int(math.floor(math.log2(y.size))))
    f, pxx = signal.welch(y, fs=fs, window="hann", nperseg=nperseg, noverlap=nperseg // 2,
                          detrend="constant", scaling="density")
    level = 10 * np.log10(np.maximum(pxx, 1e-300))
    found, _ = signal.find_peaks(level, prominence=PROMINENCE_DB)
    return nperseg, [float(v) for v in f[found]], [float(v) for v in level[found]]


def sweep(x, grid, resampler):
    out = []
    for index, up, down, fs in grid:
        y = resampler(x, up, down)
        nperseg, freqs, levels = peaks(y, fs)
        out.append({"index": index, "up": up, "down": down, "fs": fs, "n_out": int(y.size),
                    "nperseg": nperseg, "freqs": freqs, "levels_db": levels})
    return out


def sampler_error_db(fraction, up=443, down=575, n=16384):
    """Largest error of the bare sampler on a pure tone at fraction*fs0, dB re the tone (edges left out)."""
    f = fraction * FS0
    x = np.sin(2 * np.pi * f * np.arange(n) / FS0 + 0.3)
    y = bare_sampler(x, up, down)
    exact = np.sin(2 * np.pi * f * (np.arange(y.size) * down / up) / FS0 + 0.3)
    inner = slice(2 * HALF_TAPS, y.size - 2 * HALF_TAPS)
    return float(20 * np.log10(np.max(np.abs(y[inner] - exact[inner]))))


if __name__ == "__main__":
    # the figures docs/REFERENCES.md quotes for this pipeline
    default = rate_grid(100)
    whole = [(u, d) for _, u, d, _ in default if u == 1]
    print("default grid: %d rates, integer ratios %s, up <= %d, down <= %d"
          % (len(default), whole, max(u for _, u, _, _ in default), max(d for _, _, d, _ in default)))
    for fraction in (0.1, 0.25, 0.39, 0.45):
        print("bare sampler, tone at %.2f fs0, ratio 443/575: largest error %.1f dB"
              % (fraction, sampler_error_db(fraction)))
