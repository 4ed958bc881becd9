#!/usr/bin/env python3
"""Straightforward vectorised NumPy evaluation of the sweep benchmark grid, for comparing speed.

Same grid and metrics as bench/sweep.ts (taper weights from SciPy's windows) (28 GHz; nx 4/8/16; ny 1/4; pitch 0.45..0.6 lambda; four x tapers;
continuous/3/4/6-bit phase; cosine q = 1.5 element; steer 0..60 deg in azimuth). Each point is computed the
direct way: the full array factor sum over all elements on a 1-degree direction grid for the peak, fine
0.02-degree cuts through the peak for HPBW and side lobes, and a 1-degree midpoint sum over the sphere for
directivity. No reuse across points. Prints one JSON object: points evaluated, seconds, points per second.

usage: numpy_sweep.py [--every K]   evaluate every K-th point of the 4,992 (default 64) and report its rate
"""
import json
import math
import sys
import time
import warnings

import numpy as np
from scipy.signal import windows

# chebwin warns that a 30 dB design is unusual for spectral analysis; for an array taper it is the point.
warnings.filterwarnings("ignore", category=UserWarning)

C = 299_792_458.0
F_GHZ = 28.0
LAM_MM = C / (F_GHZ * 1e9) * 1e3
K = 2 * math.pi / LAM_MM
Q = 1.5
DEG = math.pi / 180

NX = [4, 8, 16]
NY = [1, 4]
DL = [0.45, 0.5, 0.55, 0.6]
TAPERS = ["uniform", "taylor", "chebyshev", "hamming"]
BITS = [None, 3, 4, 6]
STEER = [5 * i for i in range(13)]


def taper(kind, n):
    if n == 1 or kind == "uniform":
        w = np.ones(n)
    elif kind == "taylor":
        w = windows.taylor(n, nbar=4, sll=25, norm=True)
    elif kind == "chebyshev":
        w = windows.chebwin(n, at=30)
    else:
        w = windows.hamming(n, sym=True)
    return w / w.max()


def points():
    # Same order as the TypeScript grid: design fields slowest first, steering innermost.
    for nx in NX:
        for ny in NY:
            for dl in DL:
                for t in TAPERS:
                    for bits in BITS:
                        for az in STEER:
                            yield nx, ny, dl * LAM_MM, t, bits, az


def excitation(nx, ny, d, t, bits, az0):
    m = np.arange(nx)
    n = np.arange(ny)
    x = (m - (nx - 1) / 2) * d
    y = (n - (ny - 1) / 2) * d
    w = np.outer(taper(t, nx), np.ones(ny))
    dphx = 360 * d / LAM_MM * math.sin(az0 * DEG)
    prog = m[:, None] * dphx + n[None, :] * 0.0
    if bits is None:
        ph = -prog * DEG
    else:
        step = 360 / 2 ** bits
        codes = np.mod(np.floor(prog / step + 0.5), 2 ** bits)
        ph = -codes * step * DEG
    X, Y = np.meshgrid(x, y, indexing="ij")
    return X.ravel(), Y.ravel(), (w * np.exp(1j * ph)).ravel()


def power(X, Y, A, az, el):
    """|AF|^2 * cos^q(theta) for direction arrays az, el (radians); zero behind the array."""
    u = np.sin(az) * np.cos(el)
    v = np.sin(el)
    af = np.exp(1j * K * (np.multiply.outer(u, X) + np.multiply.outer(v, Y))) @ A
    ct = np.cos(az) * np.cos(el)
    e = np.where(ct > 0, np.abs(ct) ** Q, 0.0)
    return np.abs(af) ** 2 * e


def cut_metrics(p, ang, i0):
    """HPBW (interpolated) and highest side lobe outside the first nulls, on a sampled cut."""
    half = p[i0] / 2
    lo = i0
    while lo > 0 and p[lo] >= half:
        lo -= 1
    hi = i0
    while hi < len(p) - 1 and p[hi] >= half:
        hi += 1
    def cross(a, b):
        if p[a] == p[b]:
            return ang[a]
        return ang[a] + (half - p[a]) * (ang[b] - ang[a]) / (p[b] - p[a])
    width = cross(hi, hi - 1) - cross(lo, lo + 1)
    a = i0
    while a > 0 and p[a - 1] <= p[a]:
        a -= 1
    b = i0
    while b < len(p) - 1 and p[b + 1] <= p[b]:
        b += 1
    side = np.concatenate([p[:a], p[b + 1:]])
    sll = 10 * np.log10(side.max() / p[i0]) if side.size and side.max() > 0 else None
    return width, sll


# 1-degree direction grids, built once (the only thing shared: they do not depend on the point).
G = np.arange(-90, 90.5, 1.0) * DEG
GAZ, GEL = np.meshgrid(G, G, indexing="ij")
TH = (np.arange(180) + 0.5) * DEG
PH = (np.arange(360) + 0.5) * DEG
STH, SPH = np.meshgrid(TH, PH, indexing="ij")
SX, SY, SZ = np.sin(STH) * np.cos(SPH), np.sin(STH) * np.sin(SPH), np.cos(STH)
S_AZ = np.arctan2(SX, SZ)
S_EL = np.arcsin(np.clip(SY, -1, 1))
DOMEGA = np.sin(STH) * DEG * DEG
FINE = np.arange(-90, 90.0001, 0.02) * DEG


def directivity(X, Y, A):
    p = power(X, Y, A, S_AZ, S_EL)
    return p, (p * DOMEGA).sum()


def evaluate(nx, ny, d, t, bits, az0, power_dbm=None):
    X, Y, A = excitation(nx, ny, d, t, bits, az0)
    p = power(X, Y, A, GAZ, GEL)
    i, j = np.unravel_index(np.argmax(p), p.shape)
    paz, pel = G[i], G[j]
    paz_cut = power(X, Y, A, FINE, np.full_like(FINE, pel))
    ia = int(np.argmax(paz_cut))
    paz = FINE[ia]
    pel_cut = power(X, Y, A, np.full_like(FINE, paz), FINE)
    ie = int(np.argmax(pel_cut))
    pel = FINE[ie]
    hpbw_az, sll_az = cut_metrics(paz_cut, FINE / DEG, ia)
    hpbw_el, sll_el = cut_metrics(pel_cut, FINE / DEG, ie)
    pk = max(paz_cut[ia], pel_cut[ie])
    _, total = directivity(X, Y, A)
    dir_dbi = 10 * math.log10(4 * math.pi * pk / total)
    Xb, Yb, Ab = excitation(nx, ny, d, t, None, 0)
    pb = power(Xb, Yb, Ab, np.zeros(1), np.zeros(1))[0]
    _, totb = directivity(Xb, Yb, Ab)
    scan_loss = 10 * math.log10(4 * math.pi * pb / totb) - dir_dbi
    w = np.abs(A)
    eff = 10 * math.log10(w.sum() ** 2 / (w.size * (w ** 2).sum()))
    onset = 90.0 if d <= LAM_MM / 2 else math.degrees(math.asin(max(0.0, LAM_MM / d - 1)))
    return {
        "peakAzDeg": paz / DEG, "peakElDeg": pel / DEG, "hpbwAzDeg": hpbw_az, "hpbwElDeg": hpbw_el,
        "sllAzDb": sll_az, "sllElDb": sll_el, "directivityDbi": dir_dbi, "scanLossDb": scan_loss,
        "taperEfficiencyDb": eff, "gratingLobeOnsetAzDeg": onset, "channels": nx * ny,
        "apertureXMm": nx * d, "apertureYMm": ny * d,
    }


def main():
    every = 64
    if "--every" in sys.argv:
        every = int(sys.argv[sys.argv.index("--every") + 1])
    pts = list(points())
    sample = pts[::every]
    t0 = time.perf_counter()
    for p in sample:
        evaluate(*p)
    s = time.perf_counter() - t0
    print(json.dumps({"gridPoints": len(pts), "points": len(sample), "seconds": s, "pointsPerSecond": len(sample) / s, "numpy": np.__version__}))


if __name__ == "__main__":
    main()
