#!/usr/bin/env python3
"""Reference timing for 'tautline bench frf': the same H1 + coherence with scipy.signal.

Usage: python3 app/src/bench/frf_reference.py RECORDING.wav [SEGMENT]

RECORDING.wav is the file 'tautline bench frf --keep RECORDING.wav' wrote (two channels:
force, response). Prints the time of scipy.signal.welch (both channels) plus csd, and of
reading the file, so the two implementations can be compared on the same machine.
Needs numpy and scipy (for example Debian's python3-scipy).
"""
import sys
import time

import numpy as np
from scipy.io import wavfile
from scipy import signal


def main():
    path = sys.argv[1]
    segment = int(sys.argv[2]) if len(sys.argv) > 2 else 4096
    t0 = time.perf_counter()
    fs, data = wavfile.read(path)
    x = np.ascontiguousarray(data[:, 0], dtype=np.float64)
    y = np.ascontiguousarray(data[:, 1], dtype=np.float64)
    t1 = time.perf_counter()
    kw = dict(fs=fs, window="hann", nperseg=segment, noverlap=segment // 2, detrend="constant")
    _, gxx = signal.welch(x, **kw)
    _, gyy = signal.welch(y, **kw)
    _, gxy = signal.csd(x, y, **kw)
    h1 = gxy / gxx
    coherence = np.abs(gxy) ** 2 / (gxx * gyy)
    t2 = time.perf_counter()
    frames = x.size
    print(f"scipy {__import__('scipy').__version__}: {frames} frames x 2 channels, segment {segment}")
    print(f"  read {t1 - t0:.3f} s, welch x2 + csd {t2 - t1:.3f} s, total {t2 - t0:.3f} s")
    print(f"  spectra throughput {2 * frames / (t2 - t1) / 1e6:.1f} Msamples/s")
    print(f"  check: max coherence {coherence[1:].max():.4f}, |H1| peak at {np.argmax(np.abs(h1[1:])) + 1} bins")


if __name__ == "__main__":
    main()
