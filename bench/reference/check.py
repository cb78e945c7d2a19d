"""Reference checks for the speed benchmark, written with pandas + scipy only.

Usage: /usr/bin/python3 bench/reference/check.py FILE.csv   (a screen-*.csv written by CellCheck.Benchmarks generate)

It computes the core of what `cellcheck check` reports for the benchmark design, and no more:
  - residuals from the cell-means model (signal minus the mean of its head x reagent_lot x dose cell).
    The design's day block is ignored here, so this script is doing less work than CellCheck, which
    builds the block into its residuals and also runs run-order, model and calibration checks;
  - Shapiro-Wilk per cell (cells with 3..5000 values, as in the R script), counted at p < 0.05;
  - Levene (center='mean'), Brown-Forsythe (levene center='median') and Bartlett across the cells with
    at least two values;
  - a pooled Shapiro-Wilk on all residuals.
"""
import sys
import warnings

import numpy as np
import pandas as pd
from scipy import stats


def main(path):
    factors = ["head", "reagent_lot", "dose"]
    df = pd.read_csv(path, usecols=["seq", *factors, "signal"],
                     dtype={"seq": "int64", "head": "category", "reagent_lot": "category",
                            "dose": "category", "signal": "float64"})

    # Cell number and cell-means residual, from one grouping.
    grouped = df.groupby(factors, sort=False, observed=True)["signal"]
    cell = grouped.ngroup().to_numpy()
    resid = (df["signal"] - grouped.transform("mean")).to_numpy()

    # Split the residuals into one array per cell: a stable sort by cell keeps run order inside each cell.
    order = np.argsort(cell, kind="stable")
    counts = np.bincount(cell)
    groups = np.split(resid[order], np.cumsum(counts)[:-1])

    # Per-cell Shapiro-Wilk, skipping the cells R's shapiro.test would refuse (outside 3..5000, or no spread).
    p_cells = [stats.shapiro(g).pvalue for g in groups
               if 3 <= len(g) <= 5000 and np.ptp(g) >= 1e-10]

    # Spread tests: cells with at least two values (a single value has no spread).
    spread = [g for g in groups if len(g) >= 2]
    levene = stats.levene(*spread, center="mean")
    brown_forsythe = stats.levene(*spread, center="median")
    bartlett = stats.bartlett(*spread)
    k, n = len(spread), sum(len(g) for g in spread)

    # Pooled Shapiro-Wilk on all residuals. scipy computes W for any n but warns that its p is only
    # approximate above 5000 values; the warning is silenced and the p reported as it comes. (scipy 1.10
    # computes W in single precision: at a million values W is off in the 4th decimal, so is its p.)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", UserWarning)
        pooled = stats.shapiro(resid)

    print(f"rows {len(df)}, cells {len(groups)}")
    print(f"per-cell Shapiro-Wilk: {len(p_cells)} cells tested, {sum(p < 0.05 for p in p_cells)} with p < 0.05")
    print(f"Levene (mean):          F = {levene.statistic:.6g}  df = {k - 1}, {n - k}  p = {levene.pvalue:.6g}")
    print(f"Brown-Forsythe (median): F = {brown_forsythe.statistic:.6g}  df = {k - 1}, {n - k}"
          f"  p = {brown_forsythe.pvalue:.6g}")
    print(f"Bartlett:               K2 = {bartlett.statistic:.6g}  df = {k - 1}  p = {bartlett.pvalue:.6g}")
    approx = "; p approximate above 5000" if len(resid) > 5000 else ""
    print(f"pooled Shapiro-Wilk (all {len(resid)} residuals{approx}): W = {pooled.statistic:.6g}  p = {pooled.pvalue:.6g}")


if __name__ == "__main__":
    if len(sys.argv) != 2:
        sys.exit("usage: /usr/bin/python3 check.py FILE.csv")
    main(sys.argv[1])
