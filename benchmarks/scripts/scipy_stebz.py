#!/usr/bin/env python3
"""Times LAPACK's bisection + inverse-iteration driver through scipy on the EigenBenchmark matrix.

Reads the CSV files written by org.wurtzkit.benchmarks.ExportChannelWell (the same doubles the
Java benchmark uses), checks the 10 lowest eigenvalues against a full scipy solve, and times
    scipy.linalg.eigh_tridiagonal(d, e, select='i', select_range=(0, 9), lapack_driver='stebz')
(dstebz for the eigenvalues, dstein for the vectors). Prints one Markdown row per N with the
median, minimum and maximum of the per-call wall-clock and process CPU times (ms).

Usage: python3 scipy_stebz.py DIR N [N ...]
"""
import csv
import os
import statistics
import sys
import time

import numpy as np
import scipy
from scipy.linalg import eigh_tridiagonal


def load(path):
    d, e = [], []
    with open(path, newline="") as f:
        for row in csv.DictReader(f):
            d.append(float(row["diag"]))
            if row["off"]:
                e.append(float(row["off"]))
    return np.array(d), np.array(e)


def timed(d, e, seconds=2.0):
    calls = 0
    start = time.perf_counter()
    while time.perf_counter() - start < 0.5:  # warm-up
        eigh_tridiagonal(d, e, select="i", select_range=(0, 9), lapack_driver="stebz")
        calls += 1
    walls, cpus = [], []
    end = time.perf_counter() + seconds
    while time.perf_counter() < end or len(walls) < 5:
        w0, c0 = time.perf_counter(), time.process_time()
        w, v = eigh_tridiagonal(d, e, select="i", select_range=(0, 9), lapack_driver="stebz")
        walls.append((time.perf_counter() - w0) * 1e3)
        cpus.append((time.process_time() - c0) * 1e3)
    return w, v, walls, cpus


def main():
    directory, sizes = sys.argv[1], [int(a) for a in sys.argv[2:]]
    print(f"scipy {scipy.__version__}, numpy {np.__version__}, OMP/BLAS threads: "
          f"{os.environ.get('OMP_NUM_THREADS', 'default')}")
    print("| N | wall median (ms) | wall min-max | CPU median (ms) | calls |")
    print("| ---: | ---: | --- | ---: | ---: |")
    for n in sizes:
        d, e = load(os.path.join(directory, f"channel-well-{n}.csv"))
        w, v, walls, cpus = timed(d, e)
        ref = eigh_tridiagonal(d, e, eigvals_only=True, select="i", select_range=(0, 9))
        norm = max(abs(d).max() + 2 * abs(e).max(), 1e-300)
        if np.max(np.abs(w - ref)) > 1e-10 * norm:
            raise SystemExit(f"N = {n}: stebz eigenvalues disagree with the default driver")
        res = np.linalg.norm(d[:, None] * v + np.vstack([e[:, None] * v[1:], np.zeros((1, 10))])
                             + np.vstack([np.zeros((1, 10)), e[:, None] * v[:-1]]) - v * w, axis=0).max()
        if res > 1e-9 * norm:
            raise SystemExit(f"N = {n}: residual {res / norm} of the norm")
        print(f"| {n} | {statistics.median(walls):.3f} | {min(walls):.3f}-{max(walls):.3f} | "
              f"{statistics.median(cpus):.3f} | {len(walls)} |")


if __name__ == "__main__":
    main()
