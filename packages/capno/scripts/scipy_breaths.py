#!/usr/bin/env python3
"""Independent breath detector for cross-checking Upstroke's engine (tests and benchmark).

Reads JSON on stdin: {"values": [mmHg...], "sampleRateHz": fs, "repeat": n (optional)}.
Prints JSON: {"breaths": [{"tSec", "etco2MmHg"}], "computeSec": median seconds per run,
"cpuSec": median CPU seconds of the process per run, "runsSec": every run's seconds,
"cpuRunsSec": every run's CPU seconds}.

Method (SciPy only, no shared code with the TypeScript engine): smooth with a 0.1 s moving
average; scipy.signal.find_peaks with prominence >= 3 mmHg, width >= 0.6 s at half
prominence and peaks >= 1 s apart, so each exhalation plateau is one peak. A breath's time
is where the smoothed upstroke crosses 40 % of the peak's prominence (the left edge from
peak_widths); EtCO2 is the mean of the raw signal over 0.5 s ending 0.25 s before the
plateau's right edge at 40 %, mirroring the engine's published definition.
"""
import json
import sys
import time

import numpy as np
from scipy.ndimage import uniform_filter1d
from scipy.signal import find_peaks, peak_widths


def detect(values, fs):
    x = np.asarray(values, dtype=float)
    w = max(1, int(round(0.1 * fs)))
    xs = uniform_filter1d(x, size=w, mode="nearest")
    peaks, props = find_peaks(
        xs, prominence=3.0, width=0.6 * fs, distance=max(1, int(fs)), rel_height=0.5
    )
    if len(peaks) == 0:
        return []
    _, _, left, right = peak_widths(xs, peaks, rel_height=0.6, prominence_data=(
        props["prominences"], props["left_bases"], props["right_bases"]))
    guard = int(round(0.25 * fs))
    win = int(round(0.5 * fs))
    cums = np.concatenate(([0.0], np.cumsum(x)))
    out = []
    for lft, rgt in zip(left, right):
        end = max(int(np.floor(rgt)) - guard, int(np.ceil(lft)))
        start = max(int(np.ceil(lft)), end - win)
        mean = (cums[end + 1] - cums[start]) / (end + 1 - start)
        out.append({"tSec": float(lft) / fs, "etco2MmHg": float(mean)})
    return out


def main():
    req = json.load(sys.stdin)
    fs = float(req["sampleRateHz"])
    values = np.asarray(req["values"], dtype=float)
    runs = []
    cpu = []
    breaths = []
    for _ in range(int(req.get("repeat", 1))):
        t0, c0 = time.perf_counter(), time.process_time()
        breaths = detect(values, fs)
        runs.append(time.perf_counter() - t0)
        cpu.append(time.process_time() - c0)
    out = {
        "breaths": breaths,
        "computeSec": float(np.median(runs)),
        "cpuSec": float(np.median(cpu)),
        "runsSec": runs,
        "cpuRunsSec": cpu,
    }
    json.dump(out, sys.stdout)


if __name__ == "__main__":
    main()
