# Check values for the Levene and Brown-Forsythe tests, scipy 1.10 (/usr/bin/python3).
# Run from this folder: /usr/bin/python3 check-values.py
import csv
import numpy as np
from scipy import stats


def load(file, value, keys, transform=lambda x: x):
    groups = {}
    for row in csv.DictReader(open(file)):
        groups.setdefault(tuple(row[k] for k in keys), []).append(transform(float(row[value])))
    return [np.array(g) for g in groups.values()]


sets = {
    "gear": load("gear.csv", "diameter", ["batch"]),
    "insect-sprays": load("insect-sprays.csv", "count", ["spray"]),
    "plant-growth": load("plant-growth.csv", "weight", ["group"]),
    "poisons-time": load("poisons.csv", "time", ["poison", "treat"]),
    "poisons-rate": load("poisons.csv", "time", ["poison", "treat"], lambda t: 1 / t),
    "hollander-wolfe": load("hollander-wolfe.csv", "value", ["group"]),
    "zero-spread": [np.array([1.0, 1, 1]), np.array([1.0, 2, 3]), np.array([2.0, 4, 7])],
}
for name, groups in sets.items():
    for centre in ("mean", "median"):
        r = stats.levene(*groups, center=centre)
        print(name, centre, repr(r.statistic), repr(r.pvalue))
