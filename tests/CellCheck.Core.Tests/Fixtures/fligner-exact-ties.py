#!/usr/bin/env python3
# Check values for tests/CellCheck.Core.Tests/Statistics/FlignerKilleenTests.cs: run from the Fixtures folder with
# /usr/bin/python3 fligner-exact-ties.py (Debian python3-scipy 1.10).
# Fligner-Killeen X2 with ties decided in exact decimal arithmetic (fractions), scores by scipy.stats.norm.ppf.
import csv, sys, collections
from fractions import Fraction as F
import numpy as np
from scipy import stats
def fk(vals, groups):
    keys = sorted(set(groups), key=str)
    dev = []
    for v, g in zip(vals, groups):
        grp = sorted(x for x, h in zip(vals, groups) if h == g); n = len(grp)
        med = grp[n//2] if n % 2 else (grp[n//2-1] + grp[n//2]) / 2
        dev.append(abs(v - med))
    cnt = collections.Counter(dev); pos = {}; c = 0
    for d in sorted(cnt): pos[d] = c + F(cnt[d] + 1, 2); c += cnt[d]
    r = np.array([float(pos[d]) for d in dev]); N = len(vals)
    a = stats.norm.ppf((1 + r / (N + 1)) / 2)
    tot = sum(len(ag) * (ag.mean() - a.mean())**2 for ag in (a[[i for i, h in enumerate(groups) if h == g]] for g in keys))
    x2 = tot / np.var(a, ddof=1); df = len(keys) - 1
    return x2, df, stats.chi2.sf(x2, df)
def load(f, y, g, key=None):
    rows = list(csv.DictReader(open(f)))
    return [F(r[y]) for r in rows], [key(r) if key else r[g] for r in rows]
for name, args in [("gear", ("gear.csv","diameter","batch")), ("insect-sprays", ("insect-sprays.csv","count","spray")),
                   ("plant-growth", ("plant-growth.csv","weight","group")), ("hollander-wolfe", ("hollander-wolfe.csv","value","group"))]:
    print(name, repr(fk(*load(*args))))
v, g = load("poisons.csv", "time", None, key=lambda r: r["poison"] + r["treat"])
print("poisons-time", repr(fk(v, g)))
print("poisons-rate", repr(fk([1 / x for x in v], g)))
