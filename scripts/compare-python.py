#!/usr/bin/env python3
"""The Python side of compare-python.sh: recomputes the case that
scripts/compare (qult) wrote to case.json, two ways -- vectorised with
NumPy and with plain loops -- checks that the answers agree with qult's,
and prints the times and ratios.

The case (a scenario of our own, invented numbers): ten layers, beta =
K*tan(delta) with K and delta given in the sands, alpha given in the
clays, qp = Nq*sigma'v in the sands and Nc*su in the clays, a weightless
circular pile; compression capacity Rc = Qp + Qs. Monte Carlo: K normal,
su lognormal, gamma_sat normal (all layers but the first), water depth
uniform; the tip at MCTip.
"""
import json
import math
import random
import sys
import time

import numpy as np

case = json.load(open(sys.argv[1]))
LOOP_MC_SAMPLES = int(sys.argv[2]) if len(sys.argv) > 2 else 200_000
layers = case["Layers"]
D = case["Diameter"]
P = math.pi * D
A = math.pi * D * D / 4
GW = case["GammaW"]
nl = len(layers)


def best(f, repeat=7):
    """Median wall time of f over repeat runs, seconds."""
    ts = []
    for _ in range(repeat):
        t0 = time.perf_counter()
        f()
        ts.append(time.perf_counter() - t0)
    ts.sort()
    return ts[len(ts) // 2]


def depth_grid(step, to):
    """The tip depths as qult makes them: from + i*step, the last one `to`."""
    frm = step
    n = int(math.floor((to - frm) / step + 1e-9)) + 1
    z = [min(frm + i * step, to) for i in range(n)]
    if to - z[-1] > 1e-9 * step:
        z.append(to)
    return z


# ---------- plain loops, as many engineers write them ----------

def sigma_loop(z, water, gsat):
    """Effective vertical stress at depth z, Pa."""
    s = 0.0
    for i, l in enumerate(layers):
        a, b = l["Top"], min(l["Bottom"], z)
        if b <= a:
            break
        if b <= water:  # all above water
            s += l["Gamma"] * (b - a)
        elif a >= water:  # all below
            s += (gsat[i] - GW) * (b - a)
        else:
            s += l["Gamma"] * (water - a) + (gsat[i] - GW) * (b - water)
    return s


def capacity_loop(z, water, gsat, k, su):
    """Compression capacity with the tip at z, N."""
    qs = 0.0
    for i, l in enumerate(layers):
        top, bot = l["Top"], min(l["Bottom"], z)
        if bot <= top:
            break
        if l["Drained"]:
            beta = k[i] * math.tan(l["Delta"])
            cuts = [top, bot]
            if top < water < bot:
                cuts = [top, water, bot]
            for a, b in zip(cuts, cuts[1:]):
                qs += beta * (sigma_loop(a, water, gsat) + sigma_loop(b, water, gsat)) / 2 * (b - a)
        else:
            qs += l["Alpha"] * su[i] * (bot - top)
    # The tip: the layer below where z is a boundary, the last at the bottom.
    t = nl - 1
    for i, l in enumerate(layers):
        if l["Top"] <= z < l["Bottom"]:
            t = i
            break
    lt = layers[t]
    if lt["Drained"]:
        qp = lt["Nq"] * sigma_loop(z, water, gsat)
    else:
        qp = lt["Nc"] * su[t]
    return qp * A + qs * P


base_gsat = [l["Gsat"] for l in layers]
base_k = [l["K"] for l in layers]
base_su = [l["Su"] for l in layers]
water0 = case["Water"]


def with_depth_loop(zs):
    return [capacity_loop(z, water0, base_gsat, base_k, base_su) for z in zs]


# ---------- NumPy, vectorised over depths and over samples ----------

tops = np.array([l["Top"] for l in layers])
bots = np.array([l["Bottom"] for l in layers])
drained = np.array([l["Drained"] for l in layers])
gam = np.array([l["Gamma"] for l in layers])
fac = np.array([l["K"] * math.tan(l["Delta"]) if l["Drained"] else 0.0 for l in layers])
adh = np.array([0.0 if l["Drained"] else l["Alpha"] * l["Su"] for l in layers])
tipf = np.array([l["Nq"] if l["Drained"] else l["Nc"] * l["Su"] for l in layers])


def with_depth_numpy(z):
    # Break points: layer boundaries and the water table; sigma'v linear between.
    br = np.unique(np.concatenate([tops, bots, [water0]]))
    unit = np.where(br[:-1] < water0, gam[np.searchsorted(tops, br[:-1], "right") - 1],
                    np.array(base_gsat)[np.searchsorted(tops, br[:-1], "right") - 1] - GW)
    sig_br = np.concatenate([[0.0], np.cumsum(unit * np.diff(br))])
    lay_br = np.searchsorted(tops, br[:-1], "right") - 1
    # Shaft integrand at the ends of each piece, and its integral.
    f0 = np.where(drained[lay_br], fac[lay_br] * sig_br[:-1], adh[lay_br])
    f1 = np.where(drained[lay_br], fac[lay_br] * sig_br[1:], adh[lay_br])
    cum = np.concatenate([[0.0], np.cumsum((f0 + f1) / 2 * np.diff(br))])
    k = np.clip(np.searchsorted(br, z, "right") - 1, 0, len(br) - 2)
    sig = sig_br[k] + unit[k] * (z - br[k])
    lz = lay_br[k]
    fz = np.where(drained[lz], fac[lz] * sig, adh[lz])
    qs = cum[k] + (f0[k] + fz) / 2 * (z - br[k])
    lt = np.minimum(np.searchsorted(tops, z, "right") - 1, nl - 1)
    qp = np.where(drained[lt], tipf[lt] * sig, tipf[lt])
    return qp * A + qs * P


def mc_numpy(n, seed):
    rng = np.random.default_rng(seed)
    w = rng.uniform(case["WaterLo"], case["WaterHi"], n)
    sv = np.zeros(n)
    qs = np.zeros(n)
    zt = case["MCTip"]
    qp = None
    for i, l in enumerate(layers):
        top, bot = l["Top"], min(l["Bottom"], zt)
        g = np.full(n, l["Gsat"])
        if l["GsatSD"] > 0:
            g = rng.normal(l["Gsat"], l["GsatSD"], n)
        if l["Drained"]:
            k = rng.normal(l["K"], l["KCoV"] * l["K"], n)
            b = k * math.tan(l["Delta"])
            if i == 0:  # the water table lies in the first layer
                s_w = l["Gamma"] * (w - top)
                s_b = s_w + (g - GW) * (bot - w)
                qs += b * (sv + s_w) / 2 * (w - top) + b * (s_w + s_b) / 2 * (bot - w)
            else:
                s_b = sv + (g - GW) * (bot - top)
                qs += b * (sv + s_b) / 2 * (bot - top)
        else:
            s2 = math.log1p(l["SuCoV"] ** 2)
            su = rng.lognormal(math.log(l["Su"]) - s2 / 2, math.sqrt(s2), n)
            s_b = sv + (g - GW) * (bot - top)
            qs += l["Alpha"] * su * (bot - top)
        if top <= zt < l["Bottom"]:
            qp = l["Nq"] * s_b if l["Drained"] else l["Nc"] * su
        sv = s_b
        if l["Bottom"] >= zt:
            break
    r = qp * A + qs * P
    return r.mean(), r.std(ddof=1)


def mc_loop(n, seed):
    rnd = random.Random(seed)
    s1 = s2 = 0.0
    zt = case["MCTip"]
    for _ in range(n):
        water = rnd.uniform(case["WaterLo"], case["WaterHi"])
        gsat, k, su = list(base_gsat), list(base_k), list(base_su)
        for i, l in enumerate(layers):
            if l["GsatSD"] > 0:
                gsat[i] = rnd.gauss(l["Gsat"], l["GsatSD"])
            if l["Drained"]:
                k[i] = rnd.gauss(l["K"], l["KCoV"] * l["K"])
            else:
                v = math.log1p(l["SuCoV"] ** 2)
                su[i] = rnd.lognormvariate(math.log(l["Su"]) - v / 2, math.sqrt(v))
        r = capacity_loop(zt, water, gsat, k, su)
        s1 += r
        s2 += r * r
    mean = s1 / n
    return mean, math.sqrt(max(s2 - n * mean * mean, 0) / (n - 1))


ok = True
print(f"qult: {case['GoVersion']} {case['GOOS']}/{case['GOARC']}, {case['Cores']} cores; "
      f"Python {sys.version.split()[0]}, NumPy {np.__version__}")
print()
print("Capacity with depth (compression at every tip depth)")
print(f"{'depths':>7} {'qult':>12} {'NumPy':>12} {'loops':>12} {'NumPy/qult':>11} {'loops/qult':>11} {'max rel. diff':>14}")
for step in case["Steps"]:
    key = repr(step) if repr(step) in case["WithDepth"] else str(step)
    key = next(k for k in case["WithDepth"] if float(k) == step)
    zs = depth_grid(step, case["To"])
    go_z, go_r = case["Depths"][key], case["WithDepth"][key]
    if zs != go_z:
        print(f"  the depth grids differ ({len(zs)} against {len(go_z)})")
        ok = False
        continue
    za = np.array(zs)
    rn = with_depth_numpy(za)
    rl = with_depth_loop(zs)
    g = np.array(go_r)
    dev = max(np.max(np.abs(rn - g) / np.abs(g)), np.max(np.abs(np.array(rl) - g) / np.abs(g)))
    tn = best(lambda: with_depth_numpy(za), 21)
    tl = best(lambda: with_depth_loop(zs), 5)
    tg = case["NsPerCall"][key] * 1e-9
    print(f"{len(zs):>7} {tg*1e6:>9.1f} µs {tn*1e6:>9.1f} µs {tl*1e3:>9.2f} ms {tn/tg:>10.1f}× {tl/tg:>10.0f}× {dev:>14.2e}")
    if not dev <= 1e-6:
        print("  DISAGREE: more than 1e-6 relative")
        ok = False

print()
n_go = case["MCSamples"]
print(f"Monte Carlo of the compression capacity, tip at {case['MCTip']} m "
      f"({'closed form' if case['MCClosedForm'] else 'full analysis'} in qult, {case['MCWorkers']} workers)")
t0 = time.perf_counter()
mn, sn = mc_numpy(n_go, 12345)
tn = time.perf_counter() - t0
t0 = time.perf_counter()
ml, sl = mc_loop(LOOP_MC_SAMPLES, 6789)
tl = (time.perf_counter() - t0) * n_go / LOOP_MC_SAMPLES
tg = case["MCSeconds"]
print(f"{'':>10} {'samples':>9} {'mean (kN)':>11} {'sd (kN)':>9} {'time (s)':>9} {'time/qult':>10}")
print(f"{'qult':>10} {n_go:>9} {case['MCMean']/1e3:>11.1f} {case['MCSD']/1e3:>9.2f} {tg:>9.3f} {1:>9.1f}×")
print(f"{'NumPy':>10} {n_go:>9} {mn/1e3:>11.1f} {sn/1e3:>9.2f} {tn:>9.3f} {tn/tg:>9.1f}×")
print(f"{'loops':>10} {LOOP_MC_SAMPLES:>9} {ml/1e3:>11.1f} {sl/1e3:>9.2f} {tl:>9.1f} {tl/tg:>9.0f}×  (time for {n_go} samples, from {LOOP_MC_SAMPLES})")
for name, m, s, n in (("NumPy", mn, sn, n_go), ("loops", ml, sl, LOOP_MC_SAMPLES)):
    # Sampling errors of a mean and a standard deviation: s/sqrt(n) and
    # s/sqrt(2(n - 1)) (normal approximation); the bound is 4 of them.
    sd = case["MCSD"]
    em = 4 * math.sqrt(sd * sd / n_go + s * s / n)
    es = 4 * math.sqrt(sd * sd / (2 * (n_go - 1)) + s * s / (2 * (n - 1)))
    if abs(m - case["MCMean"]) > em or abs(s - sd) > es:
        print(f"  DISAGREE ({name}): mean off by {abs(m - case['MCMean']):.4g} N (bound {em:.4g}), sd by {abs(s - sd):.4g} N (bound {es:.4g})")
        ok = False
    else:
        print(f"  {name} agrees with qult within sampling error (mean off {abs(m - case['MCMean'])/em*4:.2f}, sd off {abs(s - sd)/es*4:.2f} standard errors)")
print()
print("all agree" if ok else "SOME DISAGREE")
sys.exit(0 if ok else 1)
